import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { parseScenario } from '../lib/population/parseScenario.js';
import { samplePopulation, type PopulationSample } from '../lib/population/samplePopulation.js';
import { shardRange } from '../lib/population/shardRange.js';
import { createImf } from '../lib/population/createImf.js';
import { rng } from '../lib/population/rng.js';

const kinds = [
  { imf: { kind: 'kroupa' }, starFormation: { kind: 'burst', duration: '5Myr' }, metallicity: { z: 0.014 } },
  { imf: { kind: 'chabrier', minMass: 0.01 }, starFormation: { kind: 'exponential', tau: '3Gyr' }, metallicity: { feh: -0.2, spread: 0.3 } },
  { imf: { kind: 'power-law', slopes: [1, 2.5], breaks: [1] }, starFormation: { kind: 'table', points: [[0, 0], ['4Gyr', 2], ['9Gyr', 1]] }, metallicity: { ageMetallicity: [[0, 0.1], ['8Gyr', -0.8]], spread: 0.1 } },
  { imf: { kind: 'salpeter' }, starFormation: { kind: 'constant' }, metallicity: { feh: 0.1 } },
];
const scenario = (seed: number, size: number, k: number) =>
  parseScenario({ name: 'Glassmoor', seed, size, now: '10Gyr', ...kinds[k] });
const columns = ['index', 'birthTime', 'initialMass', 'age', 'z'] as const;
function concat(parts: PopulationSample[]): Record<string, number[]> {
  return Object.fromEntries(columns.map((c) => [c, parts.flatMap((p) => Array.from(p[c]))]));
}
const asArrays = (p: PopulationSample) => concat([p]);

describe('samplePopulation(scenario, { start, count })', () => {
  test('samplePopulation gives columns of the asked length, index start…start+count−1, all finite and inside their ranges (property)', () => {
    fc.assert(
      fc.property(fc.maxSafeNat(), fc.integer({ min: 1, max: 300 }), fc.nat({ max: 3 }), (seed, size, k) => {
        const sc = scenario(seed, size, k);
        const start = Math.floor(size / 3);
        const p = samplePopulation(sc, { start });
        expect(p.index).toBeInstanceOf(Uint32Array);
        expect(p.index.length).toBe(size - start);
        for (let j = 0; j < p.index.length; j++) {
          expect(p.index[j]).toBe(start + j);
          expect(p.initialMass[j] >= sc.imf.minMass && p.initialMass[j] <= sc.imf.maxMass).toBe(true);
          expect(p.birthTime[j] >= 0 && p.birthTime[j] <= sc.now).toBe(true);
          expect(p.age[j]).toBe(sc.now - p.birthTime[j]);
          expect(p.z[j] >= 1e-4 && p.z[j] <= 0.03).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
  });

  test('samplePopulation is deterministic: the same seed gives identical columns (property)', () => {
    fc.assert(
      fc.property(fc.maxSafeNat(), fc.integer({ min: 1, max: 200 }), fc.nat({ max: 3 }), (seed, size, k) => {
        expect(asArrays(samplePopulation(scenario(seed, size, k)))).toEqual(asArrays(samplePopulation(scenario(seed, size, k))));
      }),
      { numRuns: 60 },
    );
  });

  test('samplePopulation depends on the seed: another seed changes every star (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 52 }), fc.integer({ min: 1, max: 2 ** 20 }), fc.nat({ max: 3 }), (seed, delta, k) => {
        const a = samplePopulation(scenario(seed, 50, k));
        const b = samplePopulation(scenario(seed + delta, 50, k));
        let same = 0;
        for (let j = 0; j < 50; j++) if (a.initialMass[j] === b.initialMass[j]) same++;
        expect(same).toBe(0);
      }),
      { numRuns: 60 },
    );
  });

  test('samplePopulation: shards 0…n−1 concatenated equal the whole run, for several n (property)', () => {
    fc.assert(
      fc.property(fc.maxSafeNat(), fc.integer({ min: 0, max: 400 }), fc.integer({ min: 1, max: 17 }), fc.nat({ max: 3 }), (seed, size0, n, k) => {
        const size = Math.max(1, size0);
        const sc = scenario(seed, size, k);
        const parts = Array.from({ length: n }, (_, i) => samplePopulation(sc, shardRange(size, i, n)));
        expect(concat(parts)).toEqual(asArrays(samplePopulation(sc)));
      }),
      { numRuns: 80 },
    );
  });

  test('samplePopulation: star i is the IMF quantile of the first uniform of rng(seed, i)', () => {
    const sc = scenario(42, 1000, 0);
    const p = samplePopulation(sc, { start: 990, count: 10 });
    const imf = createImf(sc.imf);
    for (let j = 0; j < 10; j++) expect(p.initialMass[j]).toBe(imf.quantile(rng(42, 990 + j).uniform()));
  });

  test.each([
    { range: { start: -1 }, message: /start -1 must be an integer 0–10/ },
    { range: { start: 11 }, message: /start 11/ },
    { range: { start: 5, count: 6 }, message: /count 6 must be an integer 0–5/ },
    { range: { count: 1.5 }, message: /count 1.5/ },
  ])('samplePopulation(scenario, $range) throws a RangeError naming the bound', ({ range, message }) => {
    expect(() => samplePopulation(scenario(1, 10, 0), range)).toThrow(message);
  });
});
