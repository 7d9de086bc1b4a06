import { SOLAR_Z } from './limits.js';

/** Hydrogen burned per unit luminosity: L☉ · 1 yr / (0.007 c² M☉), Msun/yr per Lsun. */
export const HYDROGEN_BURN_RATE = (3.828e26 * 365.25 * 86400) / (0.007 * 299792458 ** 2 * 1.98841e30);

/**
 * Red-giant core-mass–luminosity relation of the homology form of Refsdal & Weigert 1970
 * (A&A 6, 426): L ≈ 2.3×10⁵ Lsun (Mc/Msun)⁶, as fitted in Kippenhahn, Weigert & Weiss 2012
 * (§33.2) for degenerate helium cores (REFERENCES.md; from memory).
 * @example rgbLuminosity(0.48) // ≈ 2812
 */
export function rgbLuminosity(coreMass: number): number {
  return 2.3e5 * coreMass ** 6;
}

/**
 * Core-mass–luminosity relation on the thermally pulsing AGB, Paczyński 1970 (Acta Astron.
 * 20, 47): L = 59250 (Mc − 0.522) Lsun (REFERENCES.md; from memory). Below Mc = 0.54 Msun,
 * where the linear law would fall to zero, it is continued as L(0.54)·(Mc/0.54)⁶ (the
 * homology exponent of the Refsdal & Weigert relation), so it stays positive and continuous.
 * @example agbLuminosity(0.6) // ≈ 4622
 */
export function agbLuminosity(coreMass: number): number {
  if (coreMass >= 0.54) return 59250 * (coreMass - 0.522);
  return 59250 * 0.018 * (coreMass / 0.54) ** 6;
}

/**
 * Effective temperature of the Hayashi line, the locus of fully convective envelopes that
 * red giants and supergiants climb (Hayashi 1961, PASJ 13, 450). Its form — log Teff
 * quadratic in log L (the giant branch bends to the red as it climbs), linear in log M and
 * log Z — follows the homology of convective envelopes; the coefficients are this model's
 * calibration: a 1 Msun giant branch from ≈ 4850 K at its base to the red-giant tip at
 * ≈ 2800 Lsun and ≈ 160 Rsun (Pols et al. 1998, MNRAS 298, 525: ≈ 180 Rsun, ±30 %), red
 * supergiants near 3600–3900 K, and metal-poor giant branches ≈ 0.1 dex hotter at
 * [Fe/H] = −2 (from memory).
 *
 * @param luminosity Lsun
 * @param mass present mass, Msun
 * @param z metal fraction
 * @returns log10 Teff/K
 * @example 10 ** hayashiLogTeff(1e5, 15, 0.014) // ≈ 3850
 */
export function hayashiLogTeff(luminosity: number, mass: number, z: number): number {
  const x = Math.log10(luminosity);
  return 3.6975 - 0.01524 * x - 0.008494 * x * x + 0.15 * Math.log10(mass) - 0.045 * Math.log10(z / SOLAR_Z);
}

/**
 * Helium-flash mass: the highest initial mass whose helium core ignites degenerately,
 * ≈ 2 Msun at solar metallicity (Sweigart, Greggio & Renzini 1990, ApJ 364, 527), lower for
 * metal-poor stars (≈ 1.6 Msun at Z = 10⁻⁴; from memory).
 */
export function heliumFlashMass(z: number): number {
  return 2.0 + 0.2 * Math.log10(z / SOLAR_Z);
}

/**
 * Upper initial mass for white-dwarf formation, ≈ 8 Msun at solar metallicity (Weidemann &
 * Koester 1983; Smartt et al. 2009, MNRAS 395, 1409), slightly lower at low Z (from memory).
 */
export function whiteDwarfUpperMass(z: number): number {
  return 8.0 + 0.5 * Math.log10(z / SOLAR_Z);
}

/**
 * Core mass at the helium flash for stars below the helium-flash mass: 0.47–0.50 Msun for
 * low masses (Sweigart & Gross 1978, ApJS 36, 405), a little higher at low Z, falling toward
 * ≈ 0.33 Msun at the flash mass, where the core becomes non-degenerate (from memory).
 */
export function flashCoreMass(mass: number, z: number): number {
  const mf = heliumFlashMass(z);
  const base = 0.478 - 0.006 * Math.log10(z / SOLAR_Z);
  const x = Math.min(1, Math.max(0, (mass - 1.4) / (mf - 1.4)));
  return base - 0.14 * x * x;
}
