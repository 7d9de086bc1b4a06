import { describe, expect, test } from 'vitest';
import { createMetallicityModel } from '../lib/population/createMetallicityModel.js';
import { parseScenario } from '../lib/population/parseScenario.js';
import { samplePopulation } from '../lib/population/samplePopulation.js';
import { fehFromZ, zFromFeh } from '../lib/model/zFromFeh.js';
import { Z_RANGE } from '../lib/model/limits.js';

const base = { name: 'Copper Shoal', seed: 11, size: 200_000, imf: { kind: 'kroupa' }, starFormation: { kind: 'constant' }, now: '12Gyr' };
const fehOf = (z: Float64Array) => Float64Array.from(z, fehFromZ);
const moments = (x: Float64Array) => {
  let s = 0;
  for (const v of x) s += v;
  const mean = s / x.length;
  let s2 = 0;
  for (const v of x) s2 += (v - mean) ** 2;
  return { mean, sd: Math.sqrt(s2 / (x.length - 1)) };
};
const phi = (x: number) => Math.exp(-0.5 * x * x) / Math.sqrt(2 * Math.PI);

describe('createMetallicityModel(spec)', () => {
  test('a fixed z or feh gives every star that Z', () => {
    const p = samplePopulation(parseScenario({ ...base, size: 1000, metallicity: { z: 0.006 } }));
    expect(p.z.every((z) => z === 0.006)).toBe(true);
    const q = samplePopulation(parseScenario({ ...base, size: 1000, metallicity: { feh: -0.5 } }));
    expect(q.z.every((z) => z === zFromFeh(-0.5))).toBe(true);
  });

  // spread far from the range ends (−0.3 ± 0.1 dex, edges ≥ 6σ away): sample sd of [Fe/H] is σ;
  // standard error of a normal sd σ/√(2N) = 1.6e-4 dex for 2e5 stars; tolerance 1 % of σ (6 SE)
  test('a spread of 0.1 dex about [Fe/H] −0.3 gives a sample standard deviation of 0.1 dex and mean −0.3', () => {
    const p = samplePopulation(parseScenario({ ...base, metallicity: { feh: -0.3, spread: 0.1 } }));
    const { mean, sd } = moments(fehOf(p.z));
    expect(Math.abs(sd / 0.1 - 1)).toBeLessThan(0.01);
    expect(Math.abs(mean + 0.3)).toBeLessThan(5 * 0.1 / Math.sqrt(p.z.length));
  });

  // near the upper end (Z 0.03): the truncated normal's exact mean and sd (Johnson, Kotz &
  // Balakrishnan 1994, Continuous Univariate Distributions, §10.1): with α, β the ends in
  // standard scores and D = Φ(β) − Φ(α): mean μ + σ(φ(α) − φ(β))/D,
  // variance σ²[1 + (αφ(α) − βφ(β))/D − ((φ(α) − φ(β))/D)²]. No pile-up at the edge (redraw, not clip).
  test('a spread that reaches past Z 0.03 is truncated by redraw: exact truncated-normal mean and sd, nothing at the edge', () => {
    const mu = 0.2;
    const sigma = 0.3;
    const p = samplePopulation(parseScenario({ ...base, metallicity: { feh: mu, spread: sigma } }));
    const feh = fehOf(p.z);
    const a = (fehFromZ(Z_RANGE.min) - mu) / sigma;
    const b = (fehFromZ(Z_RANGE.max) - mu) / sigma;
    // Φ by the test's own Simpson integral of φ from −12
    const Phi = (x: number) => {
      const n = 20000;
      const lo = -12;
      const h = (x - lo) / n;
      let s = 0;
      for (let i = 0; i <= n; i++) s += (i === 0 || i === n ? 1 : i % 2 ? 4 : 2) * phi(lo + i * h);
      return (s * h) / 3;
    };
    const D = Phi(b) - Phi(a);
    const tmean = mu + (sigma * (phi(a) - phi(b))) / D;
    const tsd = sigma * Math.sqrt(1 + (a * phi(a) - b * phi(b)) / D - ((phi(a) - phi(b)) / D) ** 2);
    const { mean, sd } = moments(feh);
    expect(Math.abs(mean - tmean)).toBeLessThan(5 * tsd / Math.sqrt(feh.length));
    expect(Math.abs(sd / tsd - 1)).toBeLessThan(0.01);
    let atEdge = 0;
    let outside = 0;
    for (const z of p.z) {
      if (!(z >= Z_RANGE.min && z <= Z_RANGE.max)) outside++;
      if (z === Z_RANGE.max) atEdge++;
    }
    expect(outside).toBe(0);
    expect(atEdge).toBeLessThan(3); // clipping would put Φ(−β)·N ≈ 30 % of the stars exactly there
  });

  test('an age–metallicity relation without spread gives each star the [Fe/H] linear in its age', () => {
    const pts = [[0, 0.1], ['5Gyr', -0.3], ['10Gyr', -1]];
    const p = samplePopulation(parseScenario({ ...base, size: 5000, metallicity: { ageMetallicity: pts } }));
    for (let i = 0; i < p.z.length; i++) {
      const age = p.age[i];
      // hand-written interpolation: 0.1 → −0.3 over 0–5 Gyr, −0.3 → −1 over 5–10, −1 beyond
      const expected = age <= 5e9 ? 0.1 - 0.4 * (age / 5e9) : age <= 1e10 ? -0.3 - 0.7 * ((age - 5e9) / 5e9) : -1;
      expect(fehFromZ(p.z[i])).toBeCloseTo(expected, 10);
    }
  });

  test('an age–metallicity relation with spread 0.15 dex: residuals about the relation have sd 0.15 and mean 0 in every age bin', () => {
    const pts: [number, number][] = [[0, 0.0], [5e9, -0.4], [1e10, -1.0]];
    const model = createMetallicityModel({ kind: 'ageMetallicity', points: pts, spread: 0.15 });
    const p = samplePopulation(parseScenario({ ...base, metallicity: { ageMetallicity: [[0, 0], ['5Gyr', -0.4], ['10Gyr', -1]], spread: 0.15 } }));
    const bins = [[0, 4e9], [4e9, 8e9], [8e9, 12e9]];
    for (const [lo, hi] of bins) {
      const r: number[] = [];
      for (let i = 0; i < p.z.length; i++) if (p.age[i] >= lo && p.age[i] < hi) r.push(fehFromZ(p.z[i]) - model.meanFeh(p.age[i]));
      const { mean, sd } = moments(Float64Array.from(r));
      expect(Math.abs(mean)).toBeLessThan((5 * 0.15) / Math.sqrt(r.length));
      expect(Math.abs(sd / 0.15 - 1)).toBeLessThan(0.02);
    }
  });

  test('meanFeh holds the end values outside the relation\'s ages', () => {
    const m = createMetallicityModel({ kind: 'ageMetallicity', points: [[1e9, 0.1], [2e9, -0.2]], spread: 0 });
    expect(m.meanFeh(0)).toBe(0.1);
    expect(m.meanFeh(5e9)).toBe(-0.2);
    expect(m.meanFeh(1.5e9)).toBeCloseTo(-0.05, 14);
  });

  test.each([
    { spec: { kind: 'fixed', z: 0.05 }, message: /metallicity.z 0.05 outside/ },
    { spec: { kind: 'spread', feh: 1, spread: 0.1 }, message: /metallicity.feh 1 outside/ },
    { spec: { kind: 'spread', feh: 0, spread: -1 }, message: /metallicity.spread -1/ },
    { spec: { kind: 'ageMetallicity', points: [[1e9, 0], [1e9, 0]], spread: 0 }, message: /ageMetallicity\[1\]\[0\]/ },
  ])('createMetallicityModel($spec) throws a RangeError naming the key', ({ spec, message }) => {
    expect(() => createMetallicityModel(spec as never)).toThrow(message);
  });
});
