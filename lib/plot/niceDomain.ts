import { niceStep } from './niceStep.js';

/**
 * Widens [lo, hi] outwards to multiples of its nice tick step, so the axis starts and ends on a
 * tick. Repeated until stable (widening can change the step), at most a few times.
 *
 * @param lo domain start
 * @param hi domain end, ≥ lo
 * @param count wanted number of intervals (default 6)
 * @returns the widened domain; a degenerate domain is first opened to lo − 0.5, hi + 0.5
 * @throws RangeError as niceStep
 * @example niceDomain(3.42, 4.71, 6) // [3.4, 4.8]
 */
export function niceDomain(lo: number, hi: number, count = 6): [number, number] {
  let a = lo;
  let b = hi;
  if (a === b) {
    a -= 0.5;
    b += 0.5;
  }
  for (let i = 0; i < 4; i++) {
    const step = niceStep(a, b, count);
    const inverse = step < 1 ? Math.round(1 / step) : 0;
    // Exact floor and ceil (no tolerance): the widened domain must hold the input, so a
    // rounding that lands a hair inside moves one step further out.
    const down = (k: number) => (inverse > 0 ? k / inverse : k * step);
    let ka = Math.floor(inverse > 0 ? a * inverse : a / step);
    if (down(ka) > a) ka -= 1;
    let kb = Math.ceil(inverse > 0 ? b * inverse : b / step);
    if (down(kb) < b) kb += 1;
    const na = down(ka) || 0; // no -0
    const nb = down(kb) || 0;
    if (na === a && nb === b) break;
    a = na;
    b = nb;
  }
  return [a, b];
}
