/*
 * Mass-loss prescriptions, each in Msun/yr with L in Lsun, R in Rsun, M in Msun.
 */

/**
 * Reimers 1975 (Mém. Soc. R. Sci. Liège 8, 369) red-giant wind: Ṁ = 4×10⁻¹³ η L R / M,
 * with η = 0.5 (REFERENCES.md).
 * @example reimersRate(2800, 180, 0.8) // ≈ 1.26e-7
 */
export function reimersRate(luminosity: number, radius: number, mass: number, eta = 0.5): number {
  return (4e-13 * eta * luminosity * radius) / mass;
}

/**
 * Nieuwenhuijzen & de Jager 1990 (A&A 231, 134) parametrisation of hot- and cool-star
 * winds over the HR diagram: log Ṁ = −14.02 + 1.24 log L + 0.16 log M + 0.81 log R (from
 * memory), scaled with metallicity as (Z/Z☉)^0.5 for line-driven winds (Kudritzki, Pauldrach &
 * Puls 1987, A&A 173, 293; common practice).
 * @example nieuwenhuijzenDeJagerRate(1e5, 10, 20, 1) // ≈ 1.58e-7 (example corrected from ≈ 1.2e-7 by the test)
 */
export function nieuwenhuijzenDeJagerRate(luminosity: number, radius: number, mass: number, zRatio: number): number {
  return 10 ** (-14.02 + 1.24 * Math.log10(luminosity) + 0.16 * Math.log10(mass) + 0.81 * Math.log10(radius)) * Math.sqrt(zRatio);
}

/**
 * Wolf–Rayet (helium-star) wind, Ṁ = 10⁻¹³ L^1.5 (Hamann, Koesterke & Wessolowski 1995,
 * A&A 299, 151, reduced by a factor ≈ 10 for wind clumping; from memory).
 */
export function wolfRayetRate(luminosity: number): number {
  return 1e-13 * luminosity ** 1.5;
}

/**
 * Luminous-blue-variable eruptions beyond the Humphreys–Davidson limit (Humphreys &
 * Davidson 1994, PASP 106, 1025): stars with L > 6×10⁵ Lsun and R > 10⁻⁵ L^½ Rsun shed
 * ~10⁻⁴ Msun/yr (common practice: 1.5×10⁻⁴).
 */
export function luminousBlueVariableRate(luminosity: number, radius: number): number {
  return luminosity > 6e5 && radius * Math.sqrt(luminosity) * 1e-5 > 1 ? 1.5e-4 : 0;
}

/**
 * Vassiliadis & Wood 1993 (ApJ 413, 641) asymptotic-giant-branch wind driven by Mira
 * pulsation: period log P[d] = −2.07 + 1.94 log R − 0.9 log M; log Ṁ = −11.4 + 0.0123 P′ with
 * P′ = P − 100 (M − 2.5) above 2.5 Msun; capped by the radiation-pressure superwind
 * Ṁ = L/(c v_exp), v_exp = −13.5 + 0.056 P km/s within 3–15 km/s (from memory).
 * @example vassiliadisWoodRate(5000, 300, 0.7) // ≈ 6.8e-6 (superwind)
 */
export function vassiliadisWoodRate(luminosity: number, radius: number, mass: number): number {
  const period = 10 ** (-2.07 + 1.94 * Math.log10(radius) - 0.9 * Math.log10(mass));
  const shifted = period - 100 * Math.max(0, mass - 2.5);
  const pulsation = 10 ** (-11.4 + 0.0123 * Math.min(shifted, 1500));
  const vExp = Math.min(15, Math.max(3, -13.5 + 0.056 * period)) * 1e3;
  // L/(c v) in kg/s → Msun/yr
  const superwind = ((luminosity * 3.828e26) / (299792458 * vExp)) * (365.25 * 86400) / 1.98841e30;
  return Math.min(pulsation, superwind);
}
