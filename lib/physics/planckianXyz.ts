import { blackbodyXyz } from './blackbodyXyz.js';
import { C2_RADIATION, TEFF_MAX, TEFF_MIN } from './constants.js';

/*
 * Normalised XYZ of the Planckian locus on a log10 Teff grid (0.004 dex), so a lookup costs a
 * blend instead of 471 exponentials. Nodes are filled on first use (NaN marks an empty node),
 * so loading the module costs nothing. The linear interpolation error is below 3e-6 in
 * chromaticity (measured up to 2.2e-6 near 2800 K: test/physics-planckianXyz.test.ts).
 */
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

/**
 * CIE 1931 XYZ of a blackbody (blackbodyXyz: Planck × colour-matching functions), normalised
 * as blackbodyXyz normalises it, read from a lazily filled table in log10 Teff and blended
 * linearly — the shared fast path of blackbodyColor and of population colours.
 *
 * @param teff temperature, K, in [10, 1e9] (not checked here: callers check it)
 * @param out receives X, Y, Z
 * @example planckianXyz(5772, out) // out ≈ the normalised XYZ of the Sun's Teff
 */
export function planckianXyz(teff: number, out: Float64Array): Float64Array {
  const p = (Math.log10(teff) - LOG_MIN) / STEP;
  let i = Math.floor(p);
  if (i >= NG - 1) i = NG - 2;
  if (i < 0) i = 0;
  const u = p - i;
  node(i);
  node(i + 1);
  out[0] = GX[i] + u * (GX[i + 1] - GX[i]);
  out[1] = GY[i] + u * (GY[i + 1] - GY[i]);
  out[2] = GZ[i] + u * (GZ[i + 1] - GZ[i]);
  return out;
}
