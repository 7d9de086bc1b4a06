import type { HrDomain } from './hrFrame.js';
import { niceDomain } from './niceDomain.js';

/**
 * The HR-diagram ranges that show every given point with a margin: the extent of the finite
 * values, widened by 3 % of the span on each side (a span of at least 0.2 dex in Teff and
 * 0.5 dex in L, centred, when the points nearly coincide), then to whole tick steps
 * (niceDomain, 6 intervals across and 8 up — the counts hrFrame uses).
 *
 * @param series point sets, each `{ logTeff, logL }` columns of equal length
 * @throws RangeError when no point at all is finite
 * @example hrDomainOf([{ logTeff: [3.76], logL: [0] }]).logL // [-0.3, 0.3]
 */
export function hrDomainOf(series: readonly { logTeff: ArrayLike<number>; logL: ArrayLike<number> }[]): HrDomain {
  let t0 = Infinity, t1 = -Infinity, l0 = Infinity, l1 = -Infinity;
  for (const s of series) {
    for (let i = 0; i < s.logTeff.length; i++) {
      const t = s.logTeff[i];
      const l = s.logL[i];
      if (!(Number.isFinite(t) && Number.isFinite(l))) continue;
      if (t < t0) t0 = t;
      if (t > t1) t1 = t;
      if (l < l0) l0 = l;
      if (l > l1) l1 = l;
    }
  }
  if (!(t0 <= t1)) throw new RangeError('nothing to draw: no point has a finite log Teff and log L');
  const widen = (lo: number, hi: number, minSpan: number, count: number): [number, number] => {
    const span = Math.max(hi - lo, minSpan);
    const mid = (lo + hi) / 2;
    const a = Math.min(lo, mid - span / 2) - 0.03 * span;
    const b = Math.max(hi, mid + span / 2) + 0.03 * span;
    return niceDomain(a, b, count);
  };
  return { logTeff: widen(t0, t1, 0.2, 6), logL: widen(l0, l1, 0.5, 8) };
}
