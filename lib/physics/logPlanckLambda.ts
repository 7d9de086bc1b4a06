import { C2_RADIATION } from './constants.js';

/**
 * Natural logarithm of the Planck spectral radiance per unit wavelength without its
 * constant factor 2hc²: ln[λ⁻⁵ / (exp(c2/(λT)) − 1)], λ in m (Planck 1901). Evaluated in log
 * space so it neither overflows nor underflows for any λT > 0: for large x = c2/(λT),
 * ln(eˣ − 1) = x + ln(1 − e⁻ˣ).
 *
 * @param lambda wavelength, m (> 0)
 * @param teff temperature, K (> 0)
 * @param c2 second radiation constant, m K (default CODATA 2018 h c / k_B ≈ 1.438777e-2)
 * @returns ln of the relative radiance (dimensionless up to the dropped 2hc² factor)
 * @throws nothing; callers validate their inputs
 * @example
 * logPlanckLambda(550e-9, 5772); // ≈ 67.26
 */
export function logPlanckLambda(lambda: number, teff: number, c2: number = C2_RADIATION): number {
  const x = c2 / (lambda * teff);
  const lnDen = x > 1 ? x + Math.log1p(-Math.exp(-x)) : Math.log(Math.expm1(x));
  return -5 * Math.log(lambda) - lnDen;
}
