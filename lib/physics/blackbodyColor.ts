import { assertInRange } from './assertInRange.js';
import { TEFF_MAX, TEFF_MIN } from './constants.js';
import { planckianXyz } from './planckianXyz.js';
import { srgbTransfer } from './srgbTransfer.js';
import { xyzToLinearSrgb } from './xyzToLinearSrgb.js';

const HEX: string[] = [];
for (let i = 0; i < 256; i++) HEX.push(i.toString(16).padStart(2, '0'));
const RGB = new Float64Array(3);
const XYZ = new Float64Array(3);

/**
 * The colour of a blackbody of the given temperature as seen, as an sRGB hex string
 * '#rrggbb'. Method: Planck spectrum × CIE 1931 2° colour-matching functions (Wyman, Sloan &
 * Shirley 2013 fit, red tail corrected, see {@link CMF_SAMPLES}) summed at 1 nm over
 * 360–830 nm → XYZ → linear sRGB (IEC 61966-2-1 matrix, D65 white) → negative components
 * (outside the sRGB gamut: cool bodies lack blue) clipped to 0 → scaled so the largest
 * channel is 1 (brightness is discarded: the hue as seen) → sRGB transfer → 8 bits, rounded.
 * Cool bodies tend to a deep red, the hottest to the Rayleigh–Jeans limit blue-white
 * (~#95b0ff).
 *
 * @param teff temperature, K, in [10, 1e9]
 * @returns '#rrggbb'
 * @throws {RangeError} when teff is not finite or outside [10, 1e9] K
 * @example
 * blackbodyColor(5772);  // '#fff0e9'
 * blackbodyColor(10000); // '#ced9ff'
 */
export function blackbodyColor(teff: number): string {
  assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
  planckianXyz(teff, XYZ);
  xyzToLinearSrgb(XYZ[0], XYZ[1], XYZ[2], RGB);
  const r = RGB[0] > 0 ? RGB[0] : 0;
  const g = RGB[1] > 0 ? RGB[1] : 0;
  const b = RGB[2] > 0 ? RGB[2] : 0;
  const m = r > g ? (r > b ? r : b) : g > b ? g : b;
  return '#' + HEX[Math.round(255 * srgbTransfer(r / m))] + HEX[Math.round(255 * srgbTransfer(g / m))] +
    HEX[Math.round(255 * srgbTransfer(b / m))];
}
