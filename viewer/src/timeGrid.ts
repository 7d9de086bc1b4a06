import { formatAge } from '../../lib/io/formatAge.js';
import type { ViewerTime } from '../../lib/io/viewerPayload.js';

/** The page's time axis: grid times, slider fractions, steps and labels. */
export interface TimeGrid {
  readonly times: Float64Array;
  readonly from: number;
  readonly to: number;
  /** time (yr since the origin) at slider fraction f ∈ [0, 1]: log or linear between from and to */
  atFraction(f: number): number;
  fraction(t: number): number;
  /** the next grid time after t (dir 1) or before it (dir −1), held at the ends */
  step(t: number, dir: 1 | -1): number;
  /** the page's clock reading of t: elapsed, or offset from now (negative is the past), yr */
  clock(t: number): number;
  /** time since the origin of a clock reading */
  fromClock(c: number): number;
  /** the clock reading written for humans, e.g. `650 Myr` or `now − 1.2 Gyr` */
  label(t: number): string;
}

/** Builds the time axis of a payload's time grid (both ends included, `steps` times). */
export function createTimeGrid(time: ViewerTime): TimeGrid {
  const { from, to, steps, spacing, now, clock } = time;
  const log = spacing === 'log';
  const l0 = log ? Math.log10(from) : from;
  const l1 = log ? Math.log10(to) : to;
  const times = new Float64Array(steps);
  // the same times as populationHistory (the history command), both ends exact
  for (let i = 0; i < steps; i++) {
    const f = i / (steps - 1);
    times[i] = i === 0 ? from : i === steps - 1 ? to : log ? from * (to / from) ** f : from + (to - from) * f;
  }
  const clamp = (t: number) => (t < from ? from : t > to ? to : t);
  const offset = clock === 'offset';
  const fmt = (yr: number) => {
    const a = formatAge(Math.abs(yr), 4);
    return `${a.text} ${a.unit}`;
  };
  return {
    times, from, to,
    atFraction(f: number): number {
      const g = f < 0 ? 0 : f > 1 ? 1 : f;
      if (g === 0) return from;
      if (g === 1) return to;
      const v = l0 + (l1 - l0) * g;
      return log ? 10 ** v : v;
    },
    fraction(t: number): number {
      const c = clamp(t);
      return ((log ? Math.log10(c) : c) - l0) / (l1 - l0);
    },
    step(t: number, dir: 1 | -1): number {
      // relative slack, so a time set to a grid value steps to the next one, not itself
      const eps = 1e-9 * Math.max(Math.abs(t), 1);
      if (dir > 0) {
        for (let i = 0; i < steps; i++) if (times[i] > t + eps) return times[i];
        return to;
      }
      for (let i = steps - 1; i >= 0; i--) if (times[i] < t - eps) return times[i];
      return from;
    },
    clock: (t: number) => (offset ? t - now : t),
    fromClock: (c: number) => (offset ? c + now : c),
    label(t: number): string {
      if (!offset) return fmt(t);
      const d = t - now;
      if (Math.abs(d) < 1e-9 * Math.max(now, 1)) return 'now';
      return `now ${d < 0 ? '−' : '+'} ${fmt(d)}`;
    },
  };
}
