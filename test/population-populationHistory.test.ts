import { beforeAll, describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { createGridQuery, type GridQuery } from '../lib/interp/gridQuery.js';
import { isochrone } from '../lib/interp/isochrone.js';
import { PHASES } from '../lib/model/phases.js';
import { blackbodyColor } from '../lib/physics/blackbodyColor.js';
import { parseScenario } from '../lib/population/parseScenario.js';
import { populationHistory } from '../lib/population/populationHistory.js';
import { samplePopulation, type PopulationSample } from '../lib/population/samplePopulation.js';

let q: GridQuery;
beforeAll(() => {
  q = createGridQuery(loadBuiltinGrid());
});

const burst = (extra: Record<string, unknown> = {}) =>
  parseScenario({
    name: 'Saltgate Cluster', seed: 5, size: 4000, imf: { kind: 'kroupa' },
    starFormation: { kind: 'burst', duration: '5Myr' }, metallicity: { feh: -0.1, spread: 0.1 }, now: '2Gyr',
    history: { from: '1Myr', to: '2Gyr', steps: 25 }, ...extra,
  });
const cumulative = (x: number[]) => x.map(((s) => (v: number) => (s += v))(0));

/** A birth table written by hand. */
function handSample(masses: number[], births: number[], now: number, z = 0.014): PopulationSample {
  return {
    index: Uint32Array.from(masses, (_, i) => i),
    birthTime: Float64Array.from(births),
    initialMass: Float64Array.from(masses),
    age: Float64Array.from(births, (b) => now - b),
    z: Float64Array.from(masses, () => z),
  };
}

describe('populationHistory(scenario, query)', () => {
  test('populationHistory: counts per phase sum to the stars born by each time; remnant and supernova tallies add up to the remnants present', () => {
    const sc = burst();
    const sample = samplePopulation(sc);
    const h = populationHistory(sc, q, { sample });
    expect(h.times.length).toBe(25);
    expect(h.times[0]).toBe(1e6);
    expect(h.times[24]).toBe(2e9);
    const remnantsSoFar = cumulative(h.remnantsBorn);
    const collapsesSoFar = cumulative(h.supernovae);
    h.times.forEach((t, k) => {
      const born = sample.birthTime.filter((b) => b <= t).length;
      expect(PHASES.reduce((s, p) => s + h.counts[p][k], 0)).toBe(born);
      expect(collapsesSoFar[k]).toBe(h.counts['neutron-star'][k] + h.counts['black-hole'][k]);
      expect(remnantsSoFar[k]).toBe(h.counts['white-dwarf'][k] + h.counts['neutron-star'][k] + h.counts['black-hole'][k]);
      expect(h.luminosity[k]).toBeGreaterThan(0);
      expect(Number.isFinite(h.bv[k])).toBe(true);
      expect(h.color[k]).toMatch(/^#[0-9a-f]{6}$/);
    });
    // a Kroupa burst of 4000 stars above 0.08 Msun has ~ 0.6 % above 8 Msun: some supernovae, all before ~50 Myr
    expect(collapsesSoFar[24]).toBeGreaterThan(5);
    h.times.forEach((t, k) => {
      if (t > 1e8) expect(h.supernovae[k]).toBe(0);
    });
    expect(h.counts['white-dwarf'][24]).toBeGreaterThan(0);
  });

  test('populationHistory: supernovae are exactly the stars whose phase crosses into neutron-star or black-hole between steps (recounted star by star)', () => {
    const sc = burst({ size: 800 });
    const sample = samplePopulation(sc);
    const h = populationHistory(sc, q, { sample });
    let prev = new Array<string>(sample.initialMass.length).fill('unborn');
    h.times.forEach((t, k) => {
      let sn = 0;
      let rem = 0;
      const now = prev.slice();
      for (let i = 0; i < sample.initialMass.length; i++) {
        if (sample.birthTime[i] > t) continue;
        const p = q.star(sample.initialMass[i], t - sample.birthTime[i], sample.z[i]).phase;
        const was = prev[i];
        const wasRemnant = was === 'white-dwarf' || was === 'neutron-star' || was === 'black-hole';
        if (!wasRemnant && (p === 'white-dwarf' || p === 'neutron-star' || p === 'black-hole')) {
          rem++;
          if (p !== 'white-dwarf') sn++;
        }
        now[i] = p;
      }
      prev = now;
      expect(h.supernovae[k]).toBe(sn);
      expect(h.remnantsBorn[k]).toBe(rem);
    });
  });

  test('populationHistory: for a single burst the turnoff mass falls with time and equals the isochrone turnoff of the oldest stars', () => {
    const sc = burst({ starFormation: { kind: 'burst', duration: 0 }, metallicity: { z: 0.014 }, size: 500 });
    const h = populationHistory(sc, q);
    const t = h.turnoffMass as number[];
    for (let k = 1; k < t.length; k++) expect(t[k]).toBeLessThanOrEqual(t[k - 1]);
    expect(t[t.length - 1]).toBeLessThan(0.5 * t[0]);
    // REFERENCES.md main-sequence lifetimes (from memory there): 2.0 Msun lives 0.9–1.5 Gyr, so at 2 Gyr the turnoff is below 2 Msun
    expect(t[t.length - 1]).toBeLessThan(2);
    expect(t[12]).toBe(isochrone(q, h.times[12], 0.014, { count: 2, minMass: 0.08, maxMass: 120 }).turnoffMass);
  });

  // Hand-checkable: 1 Msun and 20 Msun born at 0, 5 Msun born at 50 Myr; times 1, 50.5, 100 Myr.
  // Expected phases from REFERENCES.md lifetimes (from memory there): 15 Msun leaves the main
  // sequence by 9.5–14 Myr, so 20 Msun is a remnant by 50 Myr, and above ≈ 8 Msun that remnant is
  // a neutron star or black hole; 5 Msun lives 80–120 Myr on the main sequence, so it is there
  // at ages 0.5 and 50 Myr; a 1 Msun star contracts for tens of Myr before the main sequence
  // (common practice), so it is pre-main-sequence at 1 Myr and on the main sequence at 50 Myr.
  test('populationHistory of three hand-placed stars: phases, one supernova, summed light and colour by hand', () => {
    const sc = parseScenario({
      name: 'Three Lamps', seed: 1, size: 3, imf: { kind: 'kroupa' }, starFormation: { kind: 'constant' },
      now: '100Myr', history: { from: '1Myr', to: '100Myr', steps: 3, spacing: 'linear' },
    });
    const masses = [1, 20, 5];
    const births = [0, 0, 5e7];
    const h = populationHistory(sc, q, { sample: handSample(masses, births, 1e8) });
    expect(h.times).toEqual([1e6, 5.05e7, 1e8]);
    expect(h.counts['pre-main-sequence']).toEqual([1, 0, 0]);
    expect(h.counts['main-sequence']).toEqual([1, 2, 2]);
    expect(h.counts['neutron-star'][1] + h.counts['black-hole'][1]).toBe(1);
    expect(h.remnantsBorn).toEqual([0, 1, 0]);
    expect(h.supernovae).toEqual([0, 1, 0]);
    // light by hand from each star's own state: ΣL, and B−V = −2.5 log10(Σ10^(−0.4(M_V + B−V)) / Σ10^(−0.4 M_V))
    h.times.forEach((t, k) => {
      const stars = masses.map((m, i) => (births[i] <= t ? q.star(m, t - births[i], 0.014) : null)).filter((s) => s !== null);
      const L = stars.reduce((s, st) => s + st.luminosity, 0);
      expect(h.luminosity[k] / L - 1).toBeCloseTo(0, 10);
      const lit = stars.filter((st) => st.mv !== null && st.bv !== null);
      const fV = lit.reduce((s, st) => s + 10 ** (-0.4 * st.mv!), 0);
      const fB = lit.reduce((s, st) => s + 10 ** (-0.4 * (st.mv! + st.bv!)), 0);
      expect(h.bv[k]).toBeCloseTo(-2.5 * Math.log10(fB / fV), 8);
    });
    // the 20 Msun star dominates the light at 1 Myr, so the integrated colour is blue (B−V < 0)
    expect(h.bv[0]).toBeLessThan(0);
  });

  test('populationHistory of one star: the integrated colour is that star\'s blackbody colour (±1 level)', () => {
    const sc = parseScenario({
      name: 'Lone Beacon', seed: 1, size: 1, imf: { kind: 'kroupa' }, starFormation: { kind: 'constant' },
      now: '4.57Gyr', history: { from: '1Gyr', to: '4.57Gyr', steps: 2 },
    });
    const h = populationHistory(sc, q, { sample: handSample([1], [0], 4.57e9) });
    const expected = blackbodyColor(q.star(1, 4.57e9, 0.014).teff);
    const level = (hex: string, c: number) => parseInt(hex.slice(1 + 2 * c, 3 + 2 * c), 16);
    for (let c = 0; c < 3; c++) expect(Math.abs(level(h.color[1]!, c) - level(expected, c))).toBeLessThanOrEqual(1);
    expect(h.bv[1]).toBeCloseTo(q.star(1, 4.57e9, 0.014).bv!, 10);
  });

  test('populationHistory before any star is born: zero counts and light, null colour and turnoff', () => {
    const sc = parseScenario({
      name: 'Late Spring', seed: 2, size: 200, imf: { kind: 'kroupa' },
      starFormation: { kind: 'table', points: [['300Myr', 1], ['1Gyr', 1]] }, now: '1Gyr',
      history: { from: '10Myr', to: '1Gyr', steps: 10 },
    });
    const h = populationHistory(sc, q);
    expect(h.times[0]).toBe(1e7);
    expect(PHASES.every((p) => h.counts[p][0] === 0)).toBe(true);
    expect(h.luminosity[0]).toBe(0);
    expect(h.bv[0]).toBeNull();
    expect(h.color[0]).toBeNull();
    expect(h.turnoffMass[0]).toBeNull();
    expect(h.luminosity[9]).toBeGreaterThan(0);
  });

  test('populationHistory outputs are finite and deterministic for any seed (property)', () => {
    fc.assert(
      fc.property(fc.maxSafeNat(), (seed) => {
        const sc = burst({ seed, size: 60, history: { from: '1Myr', to: '2Gyr', steps: 4 } });
        const a = populationHistory(sc, q);
        expect(populationHistory(sc, q)).toEqual(a);
        for (const v of [...a.luminosity, ...a.remnantsBorn, ...a.supernovae]) expect(Number.isFinite(v)).toBe(true);
        for (const v of [...a.bv, ...a.turnoffMass]) expect(v === null || Number.isFinite(v)).toBe(true);
      }),
      { numRuns: 8 },
    );
  });

  test('populationHistory throws a RangeError naming a star outside the grid', () => {
    const sc = burst({ size: 2 });
    const bad = handSample([1, 200], [0, 0], 2e9);
    expect(() => populationHistory(sc, q, { sample: bad })).toThrow(/star 1: initialMass 200 outside the built-in grid's 0\.01–150/);
  });
});
