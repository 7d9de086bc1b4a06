import type { StarFormationSpec } from './scenario.js';

/** A normalised distribution of birth times over [0, now] (yr since star formation began). */
export interface StarFormationHistory {
  /** yr */
  readonly now: number;
  /** fraction of all stars (those born by now) born at or before t */
  cdf(t: number): number;
  /** the birth time t with cdf(t) = u, 0 < u < 1: the exact inverse CDF */
  quantile(u: number): number;
  /** mean birth time, yr (exact integral) */
  readonly meanBirthTime: number;
}

/** Knots of a piecewise-linear rate inside [0, now], with cumulative integrals. */
interface Table {
  t: Float64Array;
  r: Float64Array;
  /** cumulative integral at each knot, normalised to 1 at the end */
  c: Float64Array;
  mean: number;
}

/** Clips the rate (linear between points, zero outside them) to [0, now] and integrates it. */
function buildTable(points: readonly (readonly [number, number])[], now: number): Table {
  const rateAt = (x: number) => {
    if (x < points[0][0] || x > points[points.length - 1][0]) return 0;
    let i = 0;
    while (i < points.length - 2 && x > points[i + 1][0]) i++;
    const [t0, r0] = points[i];
    const [t1, r1] = points[i + 1];
    return r0 + ((r1 - r0) * (x - t0)) / (t1 - t0);
  };
  const ts: number[] = [];
  const start = Math.max(0, points[0][0]);
  const end = Math.min(now, points[points.length - 1][0]);
  if (!(end > start)) throw new RangeError(`starFormation.points form no stars in [0, now] (now = ${now} yr)`);
  ts.push(start);
  for (const [t] of points) if (t > start && t < end) ts.push(t);
  ts.push(end);
  const n = ts.length;
  const t = Float64Array.from(ts);
  const r = Float64Array.from(ts, rateAt);
  const c = new Float64Array(n);
  let first = 0;
  for (let i = 0; i + 1 < n; i++) {
    const h = t[i + 1] - t[i];
    c[i + 1] = c[i] + 0.5 * (r[i] + r[i + 1]) * h;
    // ∫₀ʰ (t_i + s)(r_i + k s) ds with k = (r_{i+1} − r_i)/h
    const k = (r[i + 1] - r[i]) / h;
    first += t[i] * r[i] * h + 0.5 * (t[i] * k + r[i]) * h * h + (k * h * h * h) / 3;
  }
  const total = c[n - 1];
  if (!(total > 0)) throw new RangeError(`starFormation.points form no stars in [0, now] (now = ${now} yr)`);
  for (let i = 0; i < n; i++) c[i] /= total;
  c[n - 1] = 1;
  return { t, r, c, mean: first / total };
}

/**
 * Builds the distribution of birth times of a star-formation history over [0, now], with an
 * exact inverse CDF for sampling. Times are yr since star formation began; no star is born
 * after `now`.
 *
 * - `burst`: uniform over [0, d], d = min(duration, now) (all at 0 when d = 0);
 * - `constant`: uniform over [0, now];
 * - `exponential`: rate ∝ e^(−t/τ) over [0, now]; CDF (1 − e^(−t/τ))/(1 − e^(−now/τ)), inverted as
 *   t = −τ ln(1 + u·(e^(−now/τ) − 1)) with log1p/expm1; mean τ − now/(e^(now/τ) − 1);
 * - `table`: the rate linear between points, zero outside them, clipped to [0, now]; its CDF is
 *   piecewise quadratic, inverted exactly within a segment of rates r0 → r1 over length h: the
 *   offset s solving r0 s + (r1 − r0) s²/(2h) = target is s = 2·target / (r0 + √(r0² + 2(r1 − r0)·target/h)),
 *   the cancellation-free root (Press et al., Numerical Recipes §5.6).
 *
 * @param spec the history (from {@link parseScenario}; times in yr)
 * @param now yr, > 0
 * @returns the distribution
 * @throws RangeError when now is not positive and finite, or a table forms no stars in [0, now]
 * @example createStarFormationHistory({ kind: 'constant' }, 1e9).meanBirthTime // 5e8
 */
export function createStarFormationHistory(spec: StarFormationSpec, now: number): StarFormationHistory {
  if (!(now > 0 && Number.isFinite(now))) throw new RangeError(`now ${now} yr must be positive and finite`);
  const checkU = (u: number) => {
    if (!(u > 0 && u < 1)) throw new RangeError(`star-formation quantile: u ${u} must be strictly between 0 and 1`);
  };
  switch (spec.kind) {
    case 'burst':
    case 'constant': {
      const d = spec.kind === 'constant' ? now : Math.min(spec.duration, now);
      return {
        now,
        meanBirthTime: d / 2,
        cdf: (t) => (t < 0 ? 0 : t >= d ? 1 : t / d),
        quantile: (u) => {
          checkU(u);
          return u * d;
        },
      };
    }
    case 'exponential': {
      const tau = spec.tau;
      const x = now / tau;
      const em = Math.expm1(-x); // e^(−now/τ) − 1, in (−1, 0)
      // τ − now/(e^x − 1) cancels for small x = now/τ: there use its series now(½ − x/12 + x³/720)
      const mean = x < 1e-3 ? now * (0.5 - x / 12 + (x * x * x) / 720) : tau - now / Math.expm1(x);
      return {
        now,
        meanBirthTime: mean,
        cdf: (t) => (t <= 0 ? 0 : t >= now ? 1 : Math.expm1(-t / tau) / em),
        quantile: (u) => {
          checkU(u);
          const t = -tau * Math.log1p(u * em);
          return t > now ? now : t;
        },
      };
    }
    case 'table': {
      const { t, r, c, mean } = buildTable(spec.points, now);
      const n = t.length;
      return {
        now,
        meanBirthTime: mean,
        cdf: (x) => {
          if (x <= t[0]) return 0;
          if (x >= t[n - 1]) return 1;
          let i = 0;
          while (x > t[i + 1]) i++;
          const h = t[i + 1] - t[i];
          const s = x - t[i];
          // the segment's share of the normalised CDF times its quadratic fraction
          const seg = c[i + 1] - c[i];
          const area = 0.5 * (r[i] + r[i + 1]) * h;
          const partial = r[i] * s + ((r[i + 1] - r[i]) * s * s) / (2 * h);
          return c[i] + (area > 0 ? (seg * partial) / area : 0);
        },
        quantile: (u) => {
          checkU(u);
          let i = 0;
          while (i < n - 2 && u > c[i + 1]) i++;
          const h = t[i + 1] - t[i];
          const seg = c[i + 1] - c[i];
          const area = 0.5 * (r[i] + r[i + 1]) * h;
          // target area within the segment, in the rate's own units
          const target = seg > 0 ? ((u - c[i]) / seg) * area : 0;
          const r0 = r[i];
          const den = r0 + Math.sqrt(Math.max(0, r0 * r0 + (2 * (r[i + 1] - r0) * target) / h));
          let s = den > 0 ? (2 * target) / den : 0;
          if (s > h) s = h;
          if (s < 0) s = 0;
          return t[i] + s;
        },
      };
    }
    default:
      throw new RangeError(`starFormation.kind ${String((spec as { kind: unknown }).kind)} is not one of burst, constant, exponential, table`);
  }
}
