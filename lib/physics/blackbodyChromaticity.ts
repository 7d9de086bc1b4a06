import { assertInRange } from './assertInRange.js';
import { blackbodyXyz } from './blackbodyXyz.js';
import { C2_RADIATION, TEFF_MAX, TEFF_MIN } from './constants.js';

const XYZ = new Float64Array(3);

/**
 * CIE 1931 chromaticity (x, y) of a blackbody (a point of the Planckian locus): Planck
 * spectrum × CIE 1931 2° colour-matching functions (Wyman, Sloan & Shirley 2013 fit, see
 * {@link CMF_SAMPLES}), 1 nm over 360–830 nm; x = X/(X+Y+Z), y = Y/(X+Y+Z).
 * Agrees with the Kang et al. 2002 locus to ~8e-4 over 1667–25000 K and with CIE
 * illuminant A to ~1.5e-4 (see tests).
 *
 * @param teff temperature, K, in [10, 1e9]
 * @param c2 second radiation constant, m K (default CODATA 2018 h c / k_B; CIE illuminant A
 *   is defined with 1.435e-2)
 * @returns chromaticity { x, y }
 * @throws {RangeError} when teff is outside [10, 1e9] K or c2 is not positive and finite
 * @example
 * blackbodyChromaticity(2848, 1.435e-2); // ≈ { x: 0.4477, y: 0.4076 }
 */
export function blackbodyChromaticity(teff: number, c2: number = C2_RADIATION): { x: number; y: number } {
  assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
  assertInRange('c2', c2, 0, Infinity, 'm K', true);
  blackbodyXyz(teff, c2, XYZ);
  return { x: XYZ[0], y: XYZ[1] };
}
