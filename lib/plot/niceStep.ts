/**
 * The "nice" tick step for about `count` intervals across [lo, hi]: of 1, 2, 5 × 10^k the one
 * nearest to (hi − lo) / count on a log scale (thresholds √2, √10, √50 between them) — the
 * 1-2-5 rule of axis labelling (common practice; Heckbert 1990, "Nice numbers for graph
 * labels", Graphics Gems I). The step lies within 0.63–1.59 × (hi − lo) / count.
 *
 * @param lo domain start
 * @param hi domain end, ≥ lo
 * @param count wanted number of intervals, an integer ≥ 1
 * @returns the step (> 0); 0 when lo = hi
 * @throws RangeError for a non-finite end, hi < lo or a bad count
 * @example niceStep(3.42, 4.71, 6) // 0.2
 */
export function niceStep(lo: number, hi: number, count: number): number {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new RangeError(`axis domain [${lo}, ${hi}] must be finite`);
  if (hi < lo) throw new RangeError(`axis domain [${lo}, ${hi}] must not be reversed (hi ≥ lo)`);
  if (!(Number.isInteger(count) && count >= 1 && count <= 1000)) throw new RangeError(`tick count ${count} must be an integer in 1–1000`);
  if (hi === lo) return 0;
  const raw = (hi - lo) / count;
  const power = Math.floor(Math.log10(raw));
  // Decimal steps below 1 are built by division so that 0.1 is 1 / 10, not 10^-1 with its error.
  const scale = power >= 0 ? 10 ** power : 1 / 10 ** -power;
  const norm = raw / scale;
  const f = norm >= Math.SQRT2 * Math.sqrt(25) ? 10 : norm >= Math.sqrt(10) ? 5 : norm >= Math.SQRT2 ? 2 : 1;
  return power >= 0 ? f * 10 ** power : f / 10 ** -power;
}
