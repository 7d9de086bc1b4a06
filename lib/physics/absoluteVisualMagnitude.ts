import { bolometricCorrection } from './bolometricCorrection.js';
import { bolometricMagnitude } from './bolometricMagnitude.js';

/**
 * Absolute visual magnitude M_V = M_bol − BC_V, with M_bol on the IAU 2015 B2 scale
 * ({@link bolometricMagnitude}) and BC_V from {@link bolometricCorrection} (Torres 2010 /
 * Pecaut & Mamajek 2013 dwarf table, blackbody-extended).
 *
 * @param luminosity bolometric luminosity, Lsun (> 0, finite)
 * @param teff effective temperature, K, in [10, 1e9]
 * @returns M_V, mag
 * @throws {RangeError} when luminosity is not positive and finite, or teff is outside [10, 1e9] K
 * @example
 * absoluteVisualMagnitude(1, 5772); // ≈ 4.821
 */
export function absoluteVisualMagnitude(luminosity: number, teff: number): number {
  return bolometricMagnitude(luminosity) - bolometricCorrection(teff);
}
