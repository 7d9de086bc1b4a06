/**
 * The interval of an ascending sequence that holds a query: the index `i` with
 * `x[i] <= xq < x[i + 1]`, clamped to `[0, n - 2]` so it always names a real interval.
 *
 * Method: binary search for the right insertion point (the "bisect right" convention —
 * a query equal to a node belongs to the interval that starts there), Knuth, *The Art of
 * Computer Programming* vol. 3, §6.2.1 (Algorithm B). O(log n), no allocation.
 *
 * Queries below `x[0]` give 0 and queries at or above `x[n - 1]` give `n - 2`, so the
 * caller can extrapolate or clamp with the end interval as it sees fit.
 *
 * `x` must be ascending; that is not checked here (it would cost O(n) per call) — the
 * factories that call this validate their nodes once.
 *
 * @param x ascending node positions (any unit), length ≥ 2
 * @param xq query position, same unit as `x`; ±Infinity allowed (they clamp)
 * @returns interval index in `[0, x.length - 2]`
 * @throws {TypeError} if `x` is not array-like or `xq` is not a number
 * @throws {RangeError} if `x` has fewer than 2 entries or `xq` is NaN
 * @example
 * findInterval([0, 1, 2, 3], 1.5); // 1
 * findInterval([0, 1, 2, 3], 1);   // 1  (a node starts its interval)
 * findInterval([0, 1, 2, 3], 3);   // 2  (clamped to the last interval)
 * findInterval([0, 1, 2, 3], -5);  // 0  (clamped to the first interval)
 */
export function findInterval(x: ArrayLike<number>, xq: number): number {
  if (x == null || typeof x.length !== 'number') {
    throw new TypeError(`findInterval: x must be an array-like of numbers, got ${String(x)}`);
  }
  const n = x.length;
  if (n < 2) {
    throw new RangeError(`findInterval: x has length ${n}; need at least 2 nodes`);
  }
  if (typeof xq !== 'number') {
    throw new TypeError(`findInterval: xq must be a number, got ${typeof xq}`);
  }
  if (xq !== xq) {
    throw new RangeError(`findInterval: xq is NaN; need a number (±Infinity clamps to the end intervals)`);
  }
  // Search the interior nodes x[1..n-2] for the first one greater than xq; the interval
  // starts one before it. Restricting to the interior gives the clamping for free.
  let lo = 1;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (x[mid] <= xq) lo = mid + 1;
    else hi = mid;
  }
  return lo - 1;
}
