import { assertInRange } from './assertInRange.js';
import { TEFF_SUN } from './constants.js';

/**
 * Stellar radius from luminosity and effective temperature by the Stefan–Boltzmann law,
 * L = 4π R² σ Teff⁴, in solar units with the IAU 2015 B3 nominal values:
 * R/R☉ = sqrt(L/L☉) / (Teff/5772 K)².
 *
 * @param luminosity bolometric luminosity, Lsun (≥ 0, finite)
 * @param teff effective temperature, K (> 0, finite)
 * @returns radius, Rsun
 * @throws {RangeError} when luminosity is negative or not finite, or teff is not positive and finite
 * @example
 * radiusFromLuminosity(23.064, 4000); // ≈ 10.000
 */
export function radiusFromLuminosity(luminosity: number, teff: number): number {
  assertInRange('luminosity', luminosity, 0, Infinity, 'Lsun');
  assertInRange('teff', teff, 0, Infinity, 'K', true);
  const t = teff / TEFF_SUN;
  return Math.sqrt(luminosity) / (t * t);
}
