import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { createStarFormationHistory } from '../lib/population/createStarFormationHistory.js';
import { parseScenario } from '../lib/population/parseScenario.js';
import { samplePopulation } from '../lib/population/samplePopulation.js';
import type { StarFormationSpec } from '../lib/population/scenario.js';

const NOW = 6e9;
/** Exact mean birth times, written here from each rate's integral (closed forms). */
const cases: { name: string; json: Record<string, unknown>; spec: StarFormationSpec; mean: number; variance: number }[] = [
  // uniform on [0, d]: mean d/2, variance d²/12
  { name: 'burst 5 Myr', json: { kind: 'burst', duration: '5Myr' }, spec: { kind: 'burst', duration: 5e6 }, mean: 2.5e6, variance: 25e12 / 12 },
  { name: 'burst longer than now (cut at now)', json: { kind: 'burst', duration: '8Gyr' }, spec: { kind: 'burst', duration: 8e9 }, mean: NOW / 2, variance: NOW ** 2 / 12 },
  { name: 'constant', json: { kind: 'constant' }, spec: { kind: 'constant' }, mean: NOW / 2, variance: NOW ** 2 / 12 },
  // truncated exponential on [0, T], x = T/τ: mean τ − T/(e^x − 1) (variance below)
  { name: 'exponential τ = 2 Gyr', json: { kind: 'exponential', tau: '2Gyr' }, spec: { kind: 'exponential', tau: 2e9 }, mean: 2e9 - NOW / Math.expm1(NOW / 2e9), variance: NaN },
  // table: rate 0 → 4 over 0–2 Gyr, 4 → 1 over 2–5 Gyr, 1 → 3 over 5–8 Gyr (cut at 6 Gyr)
  { name: 'table', json: { kind: 'table', points: [[0, 0], ['2Gyr', 4], ['5Gyr', 1], ['8Gyr', 3]] }, spec: { kind: 'table', points: [[0, 0], [2e9, 4], [5e9, 1], [8e9, 3]] }, mean: NaN, variance: NaN },
];
// exponential second moment: ∫₀ᵀ t² e^(−t/τ) dt / ∫₀ᵀ e^(−t/τ) dt = 2τ² − (T² + 2τT) e^(−x)/(1 − e^(−x))
{
  const tau = 2e9;
  const x = NOW / tau;
  const q = Math.exp(-x) / -Math.expm1(-x);
  cases[3].variance = 2 * tau * tau - (NOW * NOW + 2 * tau * NOW) * q - cases[3].mean ** 2;
}
// table moments, exactly per linear segment (rate r0 + k s on [a, a + h]), the last cut at 6 Gyr where the rate is 1 + 2·(1/3) = 5/3
{
  const segs: [number, number, number, number][] = [[0, 2e9, 0, 4], [2e9, 5e9, 4, 1], [5e9, 6e9, 1, 5 / 3]];
  let m0 = 0;
  let m1 = 0;
  let m2 = 0;
  for (const [a, b, r0, r1] of segs) {
    // ∫ t^p (r0 + (r1 − r0)(t − a)/(b − a)) dt, as polynomial integrals: rate = c0 + c1 t
    const c1 = (r1 - r0) / (b - a);
    const c0 = r0 - c1 * a;
    const P = (p: number) => (b ** (p + 1) - a ** (p + 1)) / (p + 1);
    m0 += c0 * P(0) + c1 * P(1);
    m1 += c0 * P(1) + c1 * P(2);
    m2 += c0 * P(2) + c1 * P(3);
  }
  cases[4].mean = m1 / m0;
  cases[4].variance = m2 / m0 - (m1 / m0) ** 2;
}

describe('createStarFormationHistory(spec, now)', () => {
  test.each(cases)('$name: meanBirthTime is the exact mean', ({ spec, mean }) => {
    expect(Math.abs(createStarFormationHistory(spec, NOW).meanBirthTime / mean - 1)).toBeLessThan(1e-12);
  });

  // 4e5 stars; tolerance 5 standard errors from the exact variance
  test.each(cases)('$name: the sampled mean birth time matches the exact mean within 5 standard errors', ({ json, mean, variance }) => {
    const n = 400_000;
    const sc = parseScenario({ name: 'Ashfall Drift', seed: 3, size: n, imf: { kind: 'kroupa' }, starFormation: json, now: '6Gyr' });
    const p = samplePopulation(sc);
    let s = 0;
    let bad = 0;
    for (let i = 0; i < n; i++) {
      const t = p.birthTime[i];
      if (!(t >= 0 && t <= NOW) || p.age[i] !== NOW - t) bad++;
      s += t;
    }
    expect(bad).toBe(0);
    expect(Math.abs(s / n - mean)).toBeLessThan(5 * Math.sqrt(variance / n));
  });

  test('table: the CDF is piecewise quadratic — cdf at the knots equals the trapezoid areas', () => {
    const h = createStarFormationHistory(cases[4].spec, NOW);
    // areas: 0–2 Gyr: 4 (×1e9), 2–5 Gyr: 7.5, 5–6 Gyr: 4/3; total 12.8333…
    const total = 4 + 7.5 + 4 / 3;
    expect(h.cdf(2e9)).toBeCloseTo(4 / total, 14);
    expect(h.cdf(5e9)).toBeCloseTo(11.5 / total, 14);
    expect(h.cdf(1e9)).toBeCloseTo(1 / total, 14); // ∫₀¹ 2t dt = 1
    expect(h.cdf(7e9)).toBe(1);
  });

  test('createStarFormationHistory(spec, now).quantile inverts cdf in [0, now] (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...cases), fc.double({ min: 1e-9, max: 1 - 1e-9, noNaN: true }), (c, u) => {
        const h = createStarFormationHistory(c.spec, NOW);
        const t = h.quantile(u);
        expect(t).toBeGreaterThanOrEqual(0);
        expect(t).toBeLessThanOrEqual(NOW);
        expect(Math.abs(h.cdf(t) - u)).toBeLessThan(1e-9);
      }),
      { numRuns: 1000 },
    );
  });

  test('a table whose rate is zero before a start time forms no stars before it', () => {
    const h = createStarFormationHistory({ kind: 'table', points: [[1e9, 0], [1e9 + 1, 1], [3e9, 1]] }, NOW);
    for (const u of [1e-9, 0.5, 1 - 1e-9]) expect(h.quantile(u)).toBeGreaterThanOrEqual(1e9);
  });

  test.each([
    { spec: { kind: 'constant' } as StarFormationSpec, now: 0, message: /now 0 yr must be positive/ },
    { spec: { kind: 'table', points: [[7e9, 1], [8e9, 1]] } as StarFormationSpec, now: NOW, message: /form no stars in \[0, now\]/ },
    { spec: { kind: 'table', points: [[0, 0], [1e9, 0]] } as StarFormationSpec, now: NOW, message: /form no stars/ },
  ])('createStarFormationHistory throws a RangeError: $message', ({ spec, now, message }) => {
    expect(() => createStarFormationHistory(spec, now)).toThrow(message);
  });
});
