import { assertInRange } from './assertInRange.js';

/**
 * Piecewise monotone cubic Hermite interpolant through (x, y) knots, with the slopes of
 * Steffen 1990 (A&A 239, 443, eqs. 11–13): no overshoot between knots, monotone wherever
 * the data are, continuous first derivative. Setup once; each call is a bisection and one
 * cubic. Outside [x0, xn] the end cubic is NOT extrapolated: the value is clamped to the
 * end knot (callers extend with their own documented rules).
 *
 * @param xs strictly increasing abscissae (any unit), at least 2
 * @param ys ordinates (same length)
 * @returns evaluator f(x)
 * @throws {RangeError} when lengths differ, fewer than 2 knots, xs not strictly increasing,
 *   or any value non-finite
 * @example
 * const f = monotoneCubic([0, 1, 2], [0, 1, 1]);
 * f(0.5); // 0.6875 — and f stays exactly 1 on [1, 2]
 */
export function monotoneCubic(xs: ArrayLike<number>, ys: ArrayLike<number>): (x: number) => number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) {
    throw new RangeError(`monotoneCubic needs ≥ 2 knots and equal lengths, got ${n} and ${ys.length}`);
  }
  const x = Float64Array.from(xs);
  const y = Float64Array.from(ys);
  for (let i = 0; i < n; i++) {
    assertInRange(`xs[${i}]`, x[i], -Infinity, Infinity, '');
    assertInRange(`ys[${i}]`, y[i], -Infinity, Infinity, '');
    if (i > 0 && !(x[i] > x[i - 1])) {
      throw new RangeError(`xs[${i}] ${x[i]} must be greater than xs[${i - 1}] ${x[i - 1]}`);
    }
  }
  const h = new Float64Array(n - 1);
  const s = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    h[i] = x[i + 1] - x[i];
    s[i] = (y[i + 1] - y[i]) / h[i];
  }
  const d = new Float64Array(n);
  if (n === 2) {
    d[0] = d[1] = s[0];
  } else {
    for (let i = 1; i < n - 1; i++) {
      const p = (s[i - 1] * h[i] + s[i] * h[i - 1]) / (h[i - 1] + h[i]);
      d[i] = (Math.sign(s[i - 1]) + Math.sign(s[i])) *
        Math.min(Math.abs(s[i - 1]), Math.abs(s[i]), 0.5 * Math.abs(p));
    }
    // Steffen's one-sided end slopes (eq. 26-27 style): parabola through the first three
    // knots, limited so the end interval stays monotone.
    const p0 = s[0] * (1 + h[0] / (h[0] + h[1])) - s[1] * (h[0] / (h[0] + h[1]));
    d[0] = p0 * s[0] <= 0 ? 0 : Math.abs(p0) > 2 * Math.abs(s[0]) ? 2 * s[0] : p0;
    const m = n - 2;
    const pn = s[m] * (1 + h[m] / (h[m] + h[m - 1])) - s[m - 1] * (h[m] / (h[m] + h[m - 1]));
    d[n - 1] = pn * s[m] <= 0 ? 0 : Math.abs(pn) > 2 * Math.abs(s[m]) ? 2 * s[m] : pn;
  }
  const x0 = x[0];
  const xn = x[n - 1];
  return (t: number): number => {
    if (!(t > x0)) return t <= x0 ? y[0] : NaN;
    if (t >= xn) return y[n - 1];
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (x[mid] <= t) lo = mid;
      else hi = mid;
    }
    const hh = h[lo];
    const u = (t - x[lo]) / hh;
    const u2 = u * u;
    const u3 = u2 * u;
    return (2 * u3 - 3 * u2 + 1) * y[lo] + (u3 - 2 * u2 + u) * hh * d[lo] +
      (-2 * u3 + 3 * u2) * y[lo + 1] + (u3 - u2) * hh * d[lo + 1];
  };
}
