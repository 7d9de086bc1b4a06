import { normalCdf } from './normalCdf.js';

// Acklam's rational approximation (P. J. Acklam, "An algorithm for computing the inverse normal
// cumulative distribution function", 2003; relative error below 1.15e-9 before refinement).
const A = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
const B = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
const C = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const D = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
const P_LOW = 0.02425;
const SQRT_2PI = Math.sqrt(2 * Math.PI);

/** Acklam's approximation alone, before refinement. */
function acklam(p: number): number {
  if (p < P_LOW) {
    const q = Math.sqrt(-2 * Math.log(p));
    return (((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) /
      ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  }
  if (p > 1 - P_LOW) {
    const q = Math.sqrt(-2 * Math.log1p(-p));
    return -(((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) /
      ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  }
  const q = p - 0.5;
  const r = q * q;
  return ((((((A[0] * r + A[1]) * r + A[2]) * r + A[3]) * r + A[4]) * r + A[5]) * q) /
    (((((B[0] * r + B[1]) * r + B[2]) * r + B[3]) * r + B[4]) * r + 1);
}

/**
 * The standard normal quantile Φ⁻¹(p): the x with Φ(x) = p.
 *
 * Method: Acklam's rational approximation (2003; relative error < 1.15e-9), then one step of
 * Halley's method on Φ(x) − p with the accurate {@link normalCdf}, as Acklam recommends, which
 * brings Φ(x) back to p within 2e-14·(1 + x²) relative over 1e-300 ≤ p < 1 — the
 * conditioning of Φ itself (see the tests). In the upper half
 * the step works on the complement 1 − p so the far upper tail keeps its accuracy.
 *
 * @param p probability, 0 < p < 1
 * @returns x
 * @throws RangeError when p is not strictly between 0 and 1
 * @example inverseNormal(0.975) // 1.959963984540054
 */
export function inverseNormal(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`inverseNormal: p ${p} must be strictly between 0 and 1`);
  const x = acklam(p);
  // Halley step; in the upper half use the complement so that e keeps relative accuracy
  const e = p <= 0.5 ? normalCdf(x) - p : (1 - p) - normalCdf(-x);
  const u = e * SQRT_2PI * Math.exp(0.5 * x * x);
  return x - u / (1 + 0.5 * x * u);
}
