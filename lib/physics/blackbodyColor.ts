import { assertInRange } from './assertInRange.js';
import { blackbodyXyz } from './blackbodyXyz.js';
import { C2_RADIATION, TEFF_MAX, TEFF_MIN } from './constants.js';
import { srgbTransfer } from './srgbTransfer.js';
import { xyzToLinearSrgb } from './xyzToLinearSrgb.js';

/** Normalised XYZ of the Planckian locus on a log10 Teff grid (0.004 dex), so a call costs
 * one lookup and a linear blend instead of 471 exponentials. Nodes are filled on first use
 * (NaN marks an empty node), so loading the module costs nothing. The linear interpolation
 * error is below 1e-6 in chromaticity (see tests). */
const LOG_MIN = Math.log10(TEFF_MIN);
const LOG_MAX = Math.log10(TEFF_MAX);
const STEP = 0.004;
const NG = Math.round((LOG_MAX - LOG_MIN) / STEP) + 1;
const GX = new Float64Array(NG).fill(NaN);
const GY = new Float64Array(NG);
const GZ = new Float64Array(NG);
const XYZ = new Float64Array(3);
function node(i: number): void {
  if (GX[i] === GX[i]) return;
  blackbodyXyz(10 ** (LOG_MIN + i * STEP), C2_RADIATION, XYZ);
  GX[i] = XYZ[0];
  GY[i] = XYZ[1];
  GZ[i] = XYZ[2];
}
const HEX: string[] = [];
for (let i = 0; i < 256; i++) HEX.push(i.toString(16).padStart(2, '0'));
const RGB = new Float64Array(3);

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
  const p = (Math.log10(teff) - LOG_MIN) / STEP;
  let i = Math.floor(p);
  if (i >= NG - 1) i = NG - 2;
  if (i < 0) i = 0;
  const u = p - i;
  node(i);
  node(i + 1);
  const X = GX[i] + u * (GX[i + 1] - GX[i]);
  const Y = GY[i] + u * (GY[i + 1] - GY[i]);
  const Z = GZ[i] + u * (GZ[i + 1] - GZ[i]);
  xyzToLinearSrgb(X, Y, Z, RGB);
  const r = RGB[0] > 0 ? RGB[0] : 0;
  const g = RGB[1] > 0 ? RGB[1] : 0;
  const b = RGB[2] > 0 ? RGB[2] : 0;
  const m = r > g ? (r > b ? r : b) : g > b ? g : b;
  return '#' + HEX[Math.round(255 * srgbTransfer(r / m))] + HEX[Math.round(255 * srgbTransfer(g / m))] +
    HEX[Math.round(255 * srgbTransfer(b / m))];
}
