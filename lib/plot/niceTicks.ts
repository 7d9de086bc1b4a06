import { niceStep } from './niceStep.js';

/**
 * Tick values for an axis over [lo, hi]: every multiple of the nice step (niceStep: 1, 2 or
 * 5 × 10^k, about `count` intervals) that lies inside the domain, in increasing order. Values
 * are computed as k × step (or k / (1/step) for steps below 1) so that they print exactly
 * (0.3, not 0.30000000000000004).
 *
 * @param lo domain start
 * @param hi domain end, ≥ lo
 * @param count wanted number of intervals (default 6); the step is 0.63–1.59 × (hi − lo) / count
 * @returns the ticks; `[lo]` when lo = hi
 * @throws RangeError as niceStep
 * @example niceTicks(3.42, 4.71, 6) // [3.6, 3.8, 4, 4.2, 4.4, 4.6]
 */
export function niceTicks(lo: number, hi: number, count = 6): number[] {
  const step = niceStep(lo, hi, count);
  if (step === 0) return [lo];
  const inverse = step < 1 ? Math.round(1 / step) : 0;
  const at = (k: number) => (inverse > 0 ? k / inverse : k * step);
  // A margin of 1e-9 steps keeps ends that are multiples of the step despite rounding of lo and hi.
  const k0 = Math.ceil((inverse > 0 ? lo * inverse : lo / step) - 1e-9);
  const k1 = Math.floor((inverse > 0 ? hi * inverse : hi / step) + 1e-9);
  const ticks: number[] = [];
  for (let k = k0; k <= k1; k++) {
    const v = at(k);
    ticks.push(v === 0 ? 0 : v); // no -0
  }
  return ticks;
}
