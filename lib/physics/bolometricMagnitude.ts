import { assertInRange } from './assertInRange.js';
import { L0_BOL, L_SUN } from './constants.js';

/** −2.5 log10(L☉/L0): the Sun's absolute bolometric magnitude, ≈ 4.74 (IAU 2015 B2). */
const MBOL_SUN = -2.5 * Math.log10(L_SUN / L0_BOL);

/**
 * Absolute bolometric magnitude M_bol = −2.5 log10(L / L0) with the IAU 2015 Resolution B2
 * zero point L0 = 3.0128e28 W and L☉ = 3.828e26 W (IAU 2015 B3).
 *
 * @param luminosity bolometric luminosity, Lsun (> 0, finite)
 * @returns absolute bolometric magnitude, mag
 * @throws {RangeError} when luminosity is not positive and finite
 * @example
 * bolometricMagnitude(1); // ≈ 4.7400
 */
export function bolometricMagnitude(luminosity: number): number {
  assertInRange('luminosity', luminosity, 0, Infinity, 'Lsun', true);
  return MBOL_SUN - 2.5 * Math.log10(luminosity);
}
