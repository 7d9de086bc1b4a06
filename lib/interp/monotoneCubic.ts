import { findInterval } from './bisect.js';

/** Which rule derives the node slopes of a {@link monotoneCubic} interpolant. */
export type MonotoneCubicMethod = 'steffen' | 'fritsch-carlson';

/** Options of {@link monotoneCubic}. */
export interface MonotoneCubicOptions {
  /** Slope rule; default `'steffen'`. */
  method?: MonotoneCubicMethod;
}

/**
 * A shape-preserving piecewise cubic Hermite interpolant: call it with a position to get
 * the value there. Outside `[x[0], x[n-1]]` it holds the end values (and its derivative
 * is 0). The array properties are copies made at construction: reading them is free,
 * writing to them does not change the interpolant.
 */
export interface MonotoneCubic {
  /** Value at `xq` (unit of `y`). Throws RangeError if `xq` is NaN. */
  (xq: number): number;
  /** Node positions, strictly increasing. */
  readonly x: Float64Array;
  /** Node values. */
  readonly y: Float64Array;
  /** dy/dx at each node, as chosen by the slope rule. */
  readonly slopes: Float64Array;
  /** The slope rule used. */
  readonly method: MonotoneCubicMethod;
  /** dy/dx at `xq`; 0 outside `[x[0], x[n-1]]`. Throws RangeError if `xq` is NaN. */
  derivative(xq: number): number;
}

/**
 * Builds a monotonicity-preserving piecewise cubic Hermite interpolant through `(x[i], y[i])`.
 * The factory validates the nodes and derives the node slopes once; each evaluation then
 * costs one interval search (a cached-interval check, else a bisection) and one cubic in
 * Horner form, with no allocation.
 *
 * On every interval the curve is the cubic Hermite polynomial matching the two node values
 * and the two node slopes, so it passes through every node exactly and is C¹ (value and first
 * derivative continuous). The slope rules guarantee that on monotone data the curve is
 * monotone and never leaves `[min(y[i], y[i+1]), max(y[i], y[i+1])]` on any interval:
 *
 * - `'steffen'` (default) — M. Steffen 1990, "A simple method for monotonic interpolation in
 *   one dimension", A&A 239, 443. Interior slope: with secants `s[i] = (y[i+1]-y[i])/h[i]` and
 *   the centred parabolic estimate `p[i] = (s[i-1] h[i] + s[i] h[i-1]) / (h[i-1] + h[i])`,
 *   `y'[i] = (sign s[i-1] + sign s[i]) · min(|s[i-1]|, |s[i]|, |p[i]|/2)` (his eq. 11).
 *   End slopes: the slope of the parabola through the first (last) three points, set to 0 if
 *   it disagrees in sign with the end secant and capped at twice the end secant (his
 *   eqs. 26–27). Any extremum sits exactly at a node; the curve is local (a node's slope
 *   depends on its two neighbours only).
 * - `'fritsch-carlson'` — F. N. Fritsch & R. E. Carlson 1980, "Monotone piecewise cubic
 *   interpolation", SIAM J. Numer. Anal. 17, 238: the original algorithm with the
 *   α² + β² ≤ 9 limiter (not the later harmonic-mean one-pass variant). Step 1: initial
 *   slopes by the three-point (parabolic) formula — `p[i]` above inside, the end-parabola
 *   slope at the ends. Step 2: a slope is set to 0 at a local extremum or flat stretch of the
 *   data (`s[i-1] s[i] <= 0`), and an end slope is set to 0 if it disagrees in sign with its
 *   secant. Step 3: left to right over the intervals, with `α = y'[i]/s[i]` and
 *   `β = y'[i+1]/s[i]`, if `α² + β² > 9` both are scaled by `τ = 3/√(α² + β²)`; scaling only
 *   shrinks slopes, so intervals already treated stay inside the circle.
 *
 * Two nodes give the straight line through them (both rules). Linear data are reproduced
 * exactly up to rounding.
 *
 * Out of range: a query below `x[0]` returns `y[0]` and a query above `x[n-1]` returns
 * `y[n-1]` (constant extension, no extrapolation); ±Infinity are accepted and clamp the
 * same way. The derivative is 0 there.
 *
 * Sequential queries: the interpolant remembers the last interval used and tries it (and the
 * next one) before bisecting, so sweeps in ascending order cost O(1) per call. Results never
 * depend on that cache.
 *
 * @param x node positions (any unit, e.g. yr), strictly increasing, finite, length ≥ 2;
 *   copied into a Float64Array
 * @param y node values (any unit), finite, same length as `x`; copied into a Float64Array
 * @param options `method`: `'steffen'` (default) or `'fritsch-carlson'`
 * @returns the interpolant, callable as `f(xq)`, with `x`, `y`, `slopes`, `method` and
 *   `derivative(xq)`
 * @throws {TypeError} if `x` or `y` is not array-like, or an entry is not a number
 * @throws {RangeError} on fewer than 2 nodes, unequal lengths, a non-finite entry (naming its
 *   index), `x` not strictly increasing (naming the index and both values), an interval whose
 *   width, secant or cubic coefficients overflow double precision (naming the interval), or
 *   an unknown `method`
 * @example
 * const f = monotoneCubic([0, 1, 2], [0, 1, 1]);
 * f.slopes;          // Float64Array [1.5, 0, 0]
 * f(0.5);            // 0.6875
 * f(3);              // 1  (clamped to the last value)
 * f.derivative(0.5); // 1.125
 */
export function monotoneCubic(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  options?: MonotoneCubicOptions,
): MonotoneCubic {
  const method: MonotoneCubicMethod = options?.method ?? 'steffen';
  if (method !== 'steffen' && method !== 'fritsch-carlson') {
    throw new RangeError(
      `monotoneCubic: method ${JSON.stringify(method)} is unknown; valid: 'steffen', 'fritsch-carlson'`,
    );
  }
  const xs = copyColumn('x', x);
  const ys = copyColumn('y', y);
  const n = xs.length;
  if (ys.length !== n) {
    throw new RangeError(`monotoneCubic: x has length ${n} but y has length ${ys.length}; they must be equal`);
  }
  if (n < 2) {
    throw new RangeError(`monotoneCubic: ${n} node(s) given; need at least 2`);
  }

  // Interval widths and secant slopes.
  const h = new Float64Array(n - 1);
  const s = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    const w = xs[i + 1] - xs[i];
    if (!(w > 0)) {
      throw new RangeError(
        `monotoneCubic: x must be strictly increasing, but x[${i + 1}] = ${xs[i + 1]} <= x[${i}] = ${xs[i]}`,
      );
    }
    const si = (ys[i + 1] - ys[i]) / w;
    if (!Number.isFinite(w) || !Number.isFinite(si)) {
      throw new RangeError(
        `monotoneCubic: the secant on interval ${i} (x ${xs[i]}..${xs[i + 1]}, y ${ys[i]}..${ys[i + 1]}) overflows; rescale the data`,
      );
    }
    h[i] = w;
    s[i] = si;
  }

  const m = method === 'steffen' ? steffenSlopes(h, s) : fritschCarlsonSlopes(h, s);

  // Per-interval cubic in Horner form, in the unit parameter t = d/h with d = xq − x[i]:
  // f = y[i] + d·(m[i] + t·(c2[i] + t·c3[i])). Keeping the coefficients in slope units (no
  // division by h²) means very narrow or very wide intervals cannot overflow them.
  const c2 = new Float64Array(n - 1);
  const c3 = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    const a = 3 * s[i] - 2 * m[i] - m[i + 1];
    const b = m[i] + m[i + 1] - 2 * s[i];
    // The correction term d·(…) is bounded by h·(|m| + |c2| + |c3|); it must stay finite.
    const bound = h[i] * (Math.abs(m[i]) + Math.abs(a) + Math.abs(b));
    if (!Number.isFinite(bound)) {
      throw new RangeError(
        `monotoneCubic: the cubic on interval ${i} (x ${xs[i]}..${xs[i + 1]}, y ${ys[i]}..${ys[i + 1]}) overflows; rescale the data`,
      );
    }
    c2[i] = a;
    c3[i] = b;
  }

  const x0 = xs[0];
  const xn = xs[n - 1];
  const y0 = ys[0];
  const yn = ys[n - 1];
  const last = n - 2;
  let cursor = 0;

  // Cached interval, then its successor, then bisection. Only called for x0 <= xq < xn.
  function locate(xq: number): number {
    let k = cursor;
    if (xq >= xs[k] && xq < xs[k + 1]) return k;
    if (k < last && xq >= xs[k + 1] && xq < xs[k + 2]) {
      cursor = k + 1;
      return k + 1;
    }
    k = findInterval(xs, xq);
    cursor = k;
    return k;
  }

  function checkQuery(xq: number, what: string): void {
    if (typeof xq !== 'number') {
      throw new TypeError(`monotoneCubic ${what}: xq must be a number, got ${typeof xq}`);
    }
    if (xq !== xq) {
      throw new RangeError(
        `monotoneCubic ${what}: xq is NaN; need a number (outside [${x0}, ${xn}] the end values are held)`,
      );
    }
  }

  const f = function monotoneCubicValue(xq: number): number {
    if (typeof xq !== 'number' || !(xq > x0 && xq < xn)) {
      checkQuery(xq, 'value');
      if (xq <= x0) return y0;
      return yn;
    }
    const i = locate(xq);
    const d = xq - xs[i];
    const t = d / h[i];
    return ys[i] + d * (m[i] + t * (c2[i] + t * c3[i]));
  } as MonotoneCubic;

  function derivative(xq: number): number {
    if (typeof xq !== 'number' || !(xq >= x0 && xq <= xn)) {
      checkQuery(xq, 'derivative');
      return 0;
    }
    if (xq === xn) return m[n - 1];
    const i = locate(xq);
    const t = (xq - xs[i]) / h[i];
    return m[i] + t * (2 * c2[i] + 3 * t * c3[i]);
  }

  Object.defineProperties(f, {
    x: { value: Float64Array.from(xs), enumerable: true },
    y: { value: Float64Array.from(ys), enumerable: true },
    slopes: { value: Float64Array.from(m), enumerable: true },
    method: { value: method, enumerable: true },
    derivative: { value: derivative, enumerable: true },
  });
  return f;
}

/** Validates one input column and copies it into a Float64Array. */
function copyColumn(name: 'x' | 'y', a: ArrayLike<number>): Float64Array {
  if (a == null || typeof a.length !== 'number') {
    throw new TypeError(`monotoneCubic: ${name} must be an array-like of numbers, got ${String(a)}`);
  }
  const n = a.length;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = a[i];
    if (typeof v !== 'number') {
      throw new TypeError(`monotoneCubic: ${name}[${i}] must be a number, got ${typeof v} ${String(v)}`);
    }
    if (!Number.isFinite(v)) {
      throw new RangeError(`monotoneCubic: ${name}[${i}] = ${v}; every entry must be finite`);
    }
    out[i] = v;
  }
  return out;
}

/**
 * Slope of the parabola through three consecutive nodes, taken at the outer node on the side
 * of the interval with width `hNear` and secant `sNear` (`sFar`, `hFar` belong to the other
 * interval). Steffen 1990 eq. 26; Fritsch & Carlson's three-point end formula.
 */
function endParabolaSlope(sNear: number, hNear: number, sFar: number, hFar: number): number {
  const w = 1 / (1 + hFar / hNear); // = hNear/(hNear + hFar), without overflowing the sum
  return sNear * (1 + w) - sFar * w;
}

/**
 * Node slopes by Steffen 1990 (A&A 239, 443), eqs. 11 and 26–27, from the interval widths
 * `h` and secant slopes `s` (length n − 1 each); returns n slopes. Exported for the grid,
 * which precomputes slopes across tracks once.
 * @example steffenSlopes(Float64Array.of(1, 1), Float64Array.of(1, 0)) // [1.5, 0, 0]
 */
export function steffenSlopes(h: Float64Array, s: Float64Array): Float64Array {
  const k = s.length; // intervals
  const m = new Float64Array(k + 1);
  if (k === 1) {
    m[0] = s[0];
    m[1] = s[0];
    return m;
  }
  for (let i = 1; i < k; i++) {
    const a = s[i - 1];
    const b = s[i];
    const p = centredSlope(a, h[i - 1], b, h[i]);
    const lim = Math.min(Math.abs(a), Math.abs(b), 0.5 * Math.abs(p));
    m[i] = (Math.sign(a) + Math.sign(b)) * lim;
  }
  m[0] = limitEndSlope(endParabolaSlope(s[0], h[0], s[1], h[1]), s[0]);
  m[k] = limitEndSlope(endParabolaSlope(s[k - 1], h[k - 1], s[k - 2], h[k - 2]), s[k - 1]);
  return m;
}

/** Steffen 1990 eq. 27: zero if against the end secant, at most twice the end secant. */
function limitEndSlope(p: number, sEnd: number): number {
  if (!sameSign(p, sEnd)) return 0;
  if (Math.abs(p) > 2 * Math.abs(sEnd)) return 2 * sEnd;
  return p;
}

/**
 * Node slopes by Fritsch & Carlson 1980 (SIAM J. Numer. Anal. 17, 238): three-point initial
 * slopes, zeroed at extrema and flats, then the α² + β² ≤ 9 limiter swept left to right.
 */
function fritschCarlsonSlopes(h: Float64Array, s: Float64Array): Float64Array {
  const k = s.length;
  const m = new Float64Array(k + 1);
  if (k === 1) {
    m[0] = s[0];
    m[1] = s[0];
    return m;
  }
  for (let i = 1; i < k; i++) {
    const a = s[i - 1];
    const b = s[i];
    m[i] = sameSign(a, b) ? centredSlope(a, h[i - 1], b, h[i]) : 0;
  }
  const p0 = endParabolaSlope(s[0], h[0], s[1], h[1]);
  m[0] = sameSign(p0, s[0]) ? p0 : 0;
  const pk = endParabolaSlope(s[k - 1], h[k - 1], s[k - 2], h[k - 2]);
  m[k] = sameSign(pk, s[k - 1]) ? pk : 0;
  // α² + β² > 9 with α = m[i]/s[i], β = m[i+1]/s[i] is |(m[i], m[i+1])| > 3|s[i]|, and
  // τα·s[i] = m[i]·3|s[i]|/|(m[i], m[i+1])|. Written on the slopes themselves (hypot), so a
  // tiny secant cannot overflow α and β.
  for (let i = 0; i < k; i++) {
    const r = Math.hypot(m[i], m[i + 1]);
    const cap = 3 * Math.abs(s[i]);
    if (r > cap) {
      const tau = cap / r;
      m[i] *= tau;
      m[i + 1] *= tau;
    }
  }
  return m;
}

/** True when a and b are both > 0 or both < 0 (no product, so no underflow to 0). */
function sameSign(a: number, b: number): boolean {
  return (a > 0 && b > 0) || (a < 0 && b < 0);
}

/**
 * Derivative at the middle node of the parabola through three nodes, from the secants `a`
 * (width `ha`) and `b` (width `hb`) on either side: `(a·hb + b·ha)/(ha + hb)`, written as a
 * convex combination so it never overflows.
 */
function centredSlope(a: number, ha: number, b: number, hb: number): number {
  const wa = 1 / (1 + ha / hb); // = hb/(ha + hb)
  return a * wa + b * (1 - wa);
}
