import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { createImf } from '../lib/population/createImf.js';
import { parseScenario } from '../lib/population/parseScenario.js';
import { samplePopulation } from '../lib/population/samplePopulation.js';
import type { ImfSpec } from '../lib/population/scenario.js';

/**
 * The IMFs written again here, independently of lib/population, from their papers
 * (unnormalised dN/dm) with their smooth segments, so their integrals can be taken by quadrature.
 */
const LOG10_MC = Math.log10(0.079);
const chabrierPerLog = (m: number) => 0.158 * Math.exp(-((Math.log10(m) - LOG10_MC) ** 2) / (2 * 0.69 ** 2));
const reference: Record<string, { xi: (m: number) => number; edges: number[] }> = {
  // Salpeter 1955, ApJ 121, 161
  salpeter: { xi: (m) => m ** -2.35, edges: [] },
  // Kroupa 2001, MNRAS 322, 231: α 0.3 / 1.3 / 2.3, continuous at 0.08 and 0.5 Msun
  kroupa: {
    xi: (m) => (m < 0.08 ? (m / 0.08) ** -0.3 : m < 0.5 ? (m / 0.08) ** -1.3 : (0.5 / 0.08) ** -1.3 * (m / 0.5) ** -2.3),
    edges: [0.08, 0.5],
  },
  // Chabrier 2003, PASP 115, 763 (single stars): per log m lognormal below 1 Msun, m^-1.3 above, continuous
  chabrier: {
    xi: (m) => (m <= 1 ? chabrierPerLog(m) : chabrierPerLog(1) * m ** -1.3) / (m * Math.LN10),
    edges: [1],
  },
  // this test's own power law: α 1 (the log case), 2 (the mass log case), 2.7
  'power-law': { xi: (m) => (m < 0.5 ? (m / 0.5) ** -1 : m < 2 ? (m / 0.5) ** -2 : (2 / 0.5) ** -2 * (m / 2) ** -2.7), edges: [0.5, 2] },
};

/** Composite Simpson rule in ln m on each smooth piece (2000 intervals each): ∫ f(m) ξ(m) dm over [a, b]. */
function integrate(name: string, f: (m: number) => number, a: number, b: number): number {
  const { xi, edges } = reference[name];
  const cuts = [a, ...edges.filter((e) => e > a && e < b), b];
  let total = 0;
  for (let k = 0; k + 1 < cuts.length; k++) {
    const x0 = Math.log(cuts[k]);
    const x1 = Math.log(cuts[k + 1]);
    const n = 2000;
    const h = (x1 - x0) / n;
    let s = 0;
    for (let i = 0; i <= n; i++) {
      const m = Math.exp(x0 + i * h);
      const w = i === 0 || i === n ? 1 : i % 2 ? 4 : 2;
      s += w * f(m) * xi(m) * m;
    }
    total += (s * h) / 3;
  }
  return total;
}

const specs: Record<string, ImfSpec> = {
  salpeter: { kind: 'salpeter', minMass: 0.08, maxMass: 120 },
  kroupa: { kind: 'kroupa', minMass: 0.01, maxMass: 150 },
  chabrier: { kind: 'chabrier', minMass: 0.01, maxMass: 120 },
  'power-law': { kind: 'power-law', minMass: 0.1, maxMass: 60, slopes: [1, 2, 2.7], breaks: [0.5, 2] },
};

/** Initial masses of stars 0…n−1 of a scenario with this IMF, sampled in chunks. */
function sampleMasses(imf: Record<string, unknown>, n: number, seed: number): Float64Array {
  const sc = parseScenario({ name: 'Test Reach', seed, size: n, imf, starFormation: { kind: 'constant' }, now: '1Gyr' });
  const out = new Float64Array(n);
  const chunk = 1_000_000;
  for (let start = 0; start < n; start += chunk) {
    out.set(samplePopulation(sc, { start, count: Math.min(chunk, n - start) }).initialMass, start);
  }
  return out;
}

/** χ² quantile by Wilson & Hilferty 1931 (PNAS 17, 684): df (1 − 2/(9df) + z √(2/(9df)))³. */
const chiSquareQuantile = (df: number, z: number) => df * (1 - 2 / (9 * df) + z * Math.sqrt(2 / (9 * df))) ** 3;
const Z_999 = 3.090232306167813; // standard normal quantile at 0.999 (from memory; see population-inverseNormal test)

describe('createImf(spec)', () => {
  // REFERENCES.md (D, derived there from Salpeter 1955): over 0.1–100 Msun the mean mass is
  // 0.3514 Msun and 4.46 % of stars lie above 1 Msun; tolerance ±0.5 % (relative, for both).
  // Sample 1e7 stars: the relative standard error of the mean is σ_m/(⟨m⟩√N) = 3.72/√N = 0.12 %
  // and of the fraction √((1−p)/(pN)) = 0.15 %, so ±0.5 % is over 3σ for both — and the seed is fixed.
  test('Salpeter over 0.1–100 Msun: mean mass 0.3514 and 4.46 % above 1 Msun (REFERENCES.md), exact and sampled', () => {
    const imf = createImf({ kind: 'salpeter', minMass: 0.1, maxMass: 100 });
    expect(imf.meanMass).toBeCloseTo(0.3514, 4);
    expect(1 - imf.cdf(1)).toBeCloseTo(0.0446, 4);
    const n = 10_000_000;
    const m = sampleMasses({ kind: 'salpeter', minMass: 0.1, maxMass: 100 }, n, 20250101);
    let sum = 0;
    let above = 0;
    for (let i = 0; i < n; i++) {
      sum += m[i];
      if (m[i] > 1) above++;
    }
    expect(Math.abs(sum / n / 0.3514 - 1)).toBeLessThan(0.005);
    expect(Math.abs(above / n / 0.0446 - 1)).toBeLessThan(0.005);
  }, 120_000);

  // Tolerance 1e-9: the Simpson rule with 2000 intervals per piece is good to ~1e-11 here.
  test.each(Object.keys(specs))('%s: meanMass, cdf and pdf equal the IMF integrals by quadrature in the test', (name) => {
    const spec = specs[name];
    const imf = createImf(spec);
    const total = integrate(name, () => 1, spec.minMass, spec.maxMass);
    const mean = integrate(name, (m) => m, spec.minMass, spec.maxMass) / total;
    expect(Math.abs(imf.meanMass / mean - 1)).toBeLessThan(1e-9);
    for (const m of [0.02, 0.05, 0.08, 0.2, 0.5, 0.9, 1, 1.3, 3, 10, 50]) {
      if (m <= spec.minMass || m >= spec.maxMass) continue;
      expect(Math.abs(imf.cdf(m) - integrate(name, () => 1, spec.minMass, m) / total)).toBeLessThan(1e-9);
      expect(Math.abs(imf.pdf(m) - reference[name].xi(m) / total) / imf.pdf(m)).toBeLessThan(1e-9);
    }
  });

  // Sample of 2e6 stars per IMF: mean mass and fraction above 1 Msun against the test's exact
  // integrals. Tolerance 5 standard errors, computed from the exact second moment (mean) and
  // the binomial variance (fraction); they are 0.1–0.35 % relative here, so the tolerances are
  // 0.5–1.8 %.
  // χ²: 30 bins equal in log m over the limits, adjacent bins merged until each expects ≥ 5 stars;
  // expected probabilities from imf.cdf; threshold the χ² quantile at p = 0.001 with df = bins − 1.
  test.each(Object.keys(specs))('%s: a sampled population matches the exact mean, fraction above 1 Msun and binned distribution', (name) => {
    const spec = specs[name];
    const imf = createImf(spec);
    const n = 2_000_000;
    const masses = sampleMasses(spec as unknown as Record<string, unknown>, n, 99);
    const total = integrate(name, () => 1, spec.minMass, spec.maxMass);
    const mean = integrate(name, (m) => m, spec.minMass, spec.maxMass) / total;
    const second = integrate(name, (m) => m * m, spec.minMass, spec.maxMass) / total;
    const fracAbove = integrate(name, () => 1, 1, spec.maxMass) / total;
    const seMean = Math.sqrt((second - mean * mean) / n) / mean;
    const seFrac = Math.sqrt((1 - fracAbove) / (fracAbove * n));
    expect(seMean).toBeLessThan(0.004);
    expect(seFrac).toBeLessThan(0.004);
    let sum = 0;
    let above = 0;
    for (const m of masses) {
      sum += m;
      if (m > 1) above++;
    }
    expect(Math.abs(sum / n / mean - 1)).toBeLessThan(5 * seMean);
    expect(Math.abs(above / n / fracAbove - 1)).toBeLessThan(5 * seFrac);

    const bins = 30;
    const l0 = Math.log(spec.minMass);
    const l1 = Math.log(spec.maxMass);
    const observed = new Array<number>(bins).fill(0);
    for (const m of masses) observed[Math.min(bins - 1, Math.floor(((Math.log(m) - l0) / (l1 - l0)) * bins))]++;
    const edges = Array.from({ length: bins + 1 }, (_, k) => Math.exp(l0 + ((l1 - l0) * k) / bins));
    const expected = observed.map((_, k) => n * (imf.cdf(edges[k + 1]) - imf.cdf(edges[k])));
    // merge from the top (the sparse high-mass end) until every bin expects ≥ 5
    const mo: number[] = [];
    const me: number[] = [];
    let o = 0;
    let e = 0;
    for (let k = bins - 1; k >= 0; k--) {
      o += observed[k];
      e += expected[k];
      if (e >= 5) {
        mo.push(o);
        me.push(e);
        o = 0;
        e = 0;
      }
    }
    if (e > 0) {
      mo[mo.length - 1] += o;
      me[me.length - 1] += e;
    }
    const chi2 = mo.reduce((s, ob, k) => s + (ob - me[k]) ** 2 / me[k], 0);
    const df = mo.length - 1;
    expect(df).toBeGreaterThanOrEqual(20);
    expect(chi2).toBeLessThan(chiSquareQuantile(df, Z_999));
  }, 120_000);

  test('the χ² threshold formula agrees with the tabulated 0.999 quantile for 29 degrees of freedom (58.30, from memory)', () => {
    expect(Math.abs(chiSquareQuantile(29, Z_999) / 58.301 - 1)).toBeLessThan(0.003);
  });

  test('createImf(spec).quantile inverts cdf and stays within the limits (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...Object.keys(specs)), fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), (name, u) => {
        const imf = createImf(specs[name]);
        const m = imf.quantile(u);
        expect(Number.isFinite(m)).toBe(true);
        expect(m).toBeGreaterThanOrEqual(imf.minMass);
        expect(m).toBeLessThanOrEqual(imf.maxMass);
        expect(Math.abs(imf.cdf(m) - u)).toBeLessThan(1e-12);
      }),
      { numRuns: 2000 },
    );
  });

  test('createImf: a power-law slope of exactly 1 and near 1 give the same masses (the log case is continuous)', () => {
    const exact = createImf({ kind: 'power-law', minMass: 0.1, maxMass: 10, slopes: [1], breaks: [] });
    const near = createImf({ kind: 'power-law', minMass: 0.1, maxMass: 10, slopes: [1 + 1e-9], breaks: [] });
    for (const u of [0.1, 0.5, 0.9]) {
      expect(exact.quantile(u)).toBeCloseTo(0.1 * 100 ** u, 12); // m = m0 (m1/m0)^u for dN/dm ∝ 1/m (exact)
      expect(Math.abs(near.quantile(u) / exact.quantile(u) - 1)).toBeLessThan(1e-8);
    }
  });

  test('createImf: Chabrier above 1 Msun only is a pure m^-2.3 power law; below, a lognormal centred on log 0.079', () => {
    const tail = createImf({ kind: 'chabrier', minMass: 1, maxMass: 100 });
    const pl = createImf({ kind: 'power-law', minMass: 1, maxMass: 100, slopes: [2.3], breaks: [] });
    for (const u of [0.01, 0.3, 0.99]) expect(tail.quantile(u)).toBeCloseTo(pl.quantile(u), 12);
    // the median of a lognormal truncated symmetrically is its centre: pick limits symmetric in log m about 0.079
    const sym = createImf({ kind: 'chabrier', minMass: 0.079 / 5, maxMass: 0.079 * 5 });
    expect(sym.quantile(0.5)).toBeCloseTo(0.079, 12);
  });

  test.each([
    { spec: { kind: 'salpeter', minMass: 1, maxMass: 1 }, message: /imf limits 1–1 Msun/ },
    { spec: { kind: 'power-law', minMass: 0.1, maxMass: 10, slopes: [1, 2], breaks: [] }, message: /2 slopes need 1 breaks/ },
    { spec: { kind: 'power-law', minMass: 0.1, maxMass: 10, slopes: [1, 2], breaks: [20] }, message: /imf.breaks\[0\] 20/ },
    { spec: { kind: 'lognormal', minMass: 0.1, maxMass: 10 }, message: /imf.kind lognormal/ },
  ])('createImf($spec) throws a RangeError naming the problem', ({ spec, message }) => {
    expect(() => createImf(spec as ImfSpec)).toThrow(message);
  });

  test('createImf(spec).quantile(u) throws for u outside (0, 1)', () => {
    expect(() => createImf(specs.kroupa).quantile(1)).toThrow(/u 1 must be strictly between 0 and 1/);
  });
});
