import { assertInRange } from './assertInRange.js';
import { TEFF_SUN } from './constants.js';

/**
 * Bolometric luminosity from radius and effective temperature by the Stefan–Boltzmann law,
 * L = 4π R² σ Teff⁴, in solar units with the IAU 2015 B3 nominal values:
 * L/L☉ = (R/R☉)² (Teff/5772 K)⁴.
 *
 * @param radius radius, Rsun (≥ 0, finite)
 * @param teff effective temperature, K (> 0, finite)
 * @returns luminosity, Lsun
 * @throws {RangeError} when radius is negative or not finite, or teff is not positive and finite
 * @example
 * luminosityFromRadius(10, 4000); // ≈ 23.064
 */
export function luminosityFromRadius(radius: number, teff: number): number {
  assertInRange('radius', radius, 0, Infinity, 'Rsun');
  assertInRange('teff', teff, 0, Infinity, 'K', true);
  const t = teff / TEFF_SUN;
  const t2 = t * t;
  return radius * radius * t2 * t2;
}
