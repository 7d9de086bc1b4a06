import { CMF_SAMPLES } from './cmfSamples.js';
import { C2_RADIATION } from './constants.js';
import { logPlanckLambda } from './logPlanckLambda.js';

const N = CMF_SAMPLES.lambda.length;
const LAMBDA_M = Float64Array.from(CMF_SAMPLES.lambda, (l) => l * 1e-9);
const LN_B = new Float64Array(N);

/**
 * Tristimulus values X, Y, Z of a blackbody, normalised to X + Y + Z = 1: the Planck spectrum
 * (Planck 1901) times the CIE 1931 2° colour-matching functions ({@link CMF_SAMPLES}),
 * summed at 1 nm over 360–830 nm (rectangle rule, as CIE 15:2004 prescribes for 1 nm data).
 * Works in log space, scaled by the largest term, so it is finite for any Teff > 0.
 * Writes into `out` (no allocation); not re-entrant (module scratch buffer).
 *
 * @param teff temperature, K (> 0; not validated here — callers do)
 * @param c2 second radiation constant, m K
 * @param out array of length ≥ 3 receiving X, Y, Z
 * @returns out
 * @throws nothing
 * @example
 * blackbodyXyz(6504, 1.438777e-2, new Float64Array(3)); // ≈ [0.314, 0.323, 0.363]
 */
export function blackbodyXyz(teff: number, c2: number = C2_RADIATION, out: Float64Array | number[]): Float64Array | number[] {
  let max = -Infinity;
  for (let i = 0; i < N; i++) {
    const v = logPlanckLambda(LAMBDA_M[i], teff, c2);
    LN_B[i] = v;
    if (v > max) max = v;
  }
  let X = 0;
  let Y = 0;
  let Z = 0;
  const cx = CMF_SAMPLES.x;
  const cy = CMF_SAMPLES.y;
  const cz = CMF_SAMPLES.z;
  for (let i = 0; i < N; i++) {
    const b = Math.exp(LN_B[i] - max);
    X += b * cx[i];
    Y += b * cy[i];
    Z += b * cz[i];
  }
  const s = X + Y + Z;
  out[0] = X / s;
  out[1] = Y / s;
  out[2] = Z / s;
  return out;
}
