/** Hydrogen-burning limit, Msun: below it an object never reaches the main sequence (Chabrier & Baraffe 2000, ARA&A 38, 337: ≈ 0.07–0.09; 0.075 used). */
export const HYDROGEN_BURNING_LIMIT = 0.075;

/**
 * Brown-dwarf cooling, the power-law fits of Burrows & Liebert 1993 (Rev. Mod. Phys. 65,
 * 301) as given by Burrows et al. 2001 (Rev. Mod. Phys. 73, 719, eqs. 1–2; from memory):
 * L ≈ 4×10⁻⁵ Lsun (t/Gyr)^-1.3 (M/0.05 Msun)^2.64 (κ/0.01 cm² g⁻¹)^0.35,
 * Teff ≈ 1550 K (t/Gyr)^-0.32 (M/0.05 Msun)^0.83 (κ/0.01)^0.088.
 * The opacity factor is taken as (Z/Z☉)^1 times 0.01 (common practice). The fits are meant
 * for ages above ~10 Myr; younger ages are held at the 1 Myr value (deuterium burning keeps
 * young brown dwarfs bright). The radius follows from Stefan–Boltzmann and comes out near a
 * Jupiter radius (≈ 0.1 Rsun).
 *
 * @param age yr
 * @param mass Msun
 * @param zRatio Z/Z☉
 * @returns luminosity (Lsun) and teff (K)
 * @example brownDwarfCooling(1e9, 0.05, 1) // { luminosity: 4e-5, teff: 1550 }
 */
export function brownDwarfCooling(age: number, mass: number, zRatio: number): { luminosity: number; teff: number } {
  const t = Math.max(age, 1e6) / 1e9;
  const m = mass / 0.05;
  const k = zRatio;
  return {
    luminosity: 4e-5 * t ** -1.3 * m ** 2.64 * k ** 0.35,
    teff: 1550 * t ** -0.32 * m ** 0.83 * k ** 0.088,
  };
}

/**
 * Brown-dwarf radius, Rsun: R ≈ 0.1 Rsun (M/0.05 Msun)^(-1/8) (t/Gyr)^(-0.04). Electron
 * degeneracy makes brown dwarfs nearly the same size whatever their mass (a fully degenerate
 * n = 1.5 polytrope has R ∝ M^(-1/3); Coulomb forces flatten it toward Jupiter's radius at low
 * mass — Burrows & Liebert 1993, Rev. Mod. Phys. 65, 301, §III), shrinking slowly as they
 * cool. The exponents are this model's calibration to cooling-model radii (from memory:
 * ≈ 1.1 R_J at 0.013 Msun and ≈ 0.9 R_J at 0.07 Msun over 1–10 Gyr; Chabrier & Baraffe 2000,
 * ARA&A 38, 337). The track takes L from {@link brownDwarfCooling} and this radius, and Teff
 * from Stefan–Boltzmann.
 *
 * @param age yr (held at 1 Myr below it)
 * @param mass Msun
 * @example brownDwarfRadius(1e9, 0.05) // 0.1
 */
export function brownDwarfRadius(age: number, mass: number): number {
  return 0.1 * (mass / 0.05) ** (-1 / 8) * (Math.max(age, 1e6) / 1e9) ** -0.04;
}
