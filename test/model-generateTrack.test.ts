import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { starAt } from '../lib/model/starAt.js';
import { PHASE_INDEX, PHASES } from '../lib/model/phases.js';
import { CHANDRASEKHAR_MASS } from '../lib/model/whiteDwarf.js';
import { SOLAR_Z } from '../lib/model/limits.js';

const GYR = 1e9;
const SEED = 20240515;
const massArb = fc.double({ min: Math.log10(0.01), max: Math.log10(150), noNaN: true }).map((x) => Math.min(150, Math.max(0.01, 10 ** x)));
const zArb = fc.double({ min: -4, max: Math.log10(0.03), noNaN: true }).map((x) => Math.min(0.03, Math.max(1e-4, 10 ** x)));

describe('generateTrack(initialMass, z) — structure (properties)', () => {
  test('gives equal-length finite columns with ages non-decreasing, mass non-increasing and coreMass ≤ mass', () => {
    fc.assert(fc.property(massArb, zArb, (m, z) => {
      const t = generateTrack(m, z);
      for (const c of [t.age, t.mass, t.coreMass, t.logL, t.logTeff, t.phase]) expect(c.length).toBe(t.n);
      for (let i = 0; i < t.n; i++) {
        for (const c of [t.age, t.mass, t.coreMass, t.logL, t.logTeff]) expect(Number.isFinite(c[i])).toBe(true);
        expect(t.coreMass[i]).toBeLessThanOrEqual(t.mass[i]);
        if (i > 0) {
          expect(t.age[i]).toBeGreaterThanOrEqual(t.age[i - 1]);
          expect(t.mass[i], `mass grows at point ${i} of ${m} Msun, z ${z}`).toBeLessThanOrEqual(t.mass[i - 1]);
        }
      }
      expect(t.mass[0]).toBeLessThanOrEqual(m);
    }), { seed: SEED, numRuns: 300 });
  });

  test('passes through phases in life order; brown dwarfs only as brown-dwarf', () => {
    fc.assert(fc.property(massArb, zArb, (m, z) => {
      const t = generateTrack(m, z);
      const bd = PHASE_INDEX['brown-dwarf'];
      for (let i = 0; i < t.n; i++) {
        expect(t.phase[i]).toBeLessThan(PHASES.length);
        if (m < 0.07) expect(t.phase[i]).toBe(bd);
        if (m > 0.08) expect(t.phase[i]).not.toBe(bd);
        if (i > 0) expect(t.phase[i]).toBeGreaterThanOrEqual(t.phase[i - 1]);
      }
    }), { seed: SEED, numRuns: 300 });
  });

  test('marks EEPs in order on valid points, ends with track-end, and records events in age order', () => {
    fc.assert(fc.property(massArb, zArb, (m, z) => {
      const t = generateTrack(m, z);
      for (let k = 1; k < t.eeps.length; k++) expect(t.eeps[k].index).toBeGreaterThanOrEqual(t.eeps[k - 1].index);
      for (const e of t.eeps) expect(e.index).toBeLessThan(t.n);
      expect(t.eeps[t.eeps.length - 1]).toEqual({ name: 'track-end', index: t.n - 1 });
      for (let k = 1; k < t.events.length; k++) expect(t.events[k].age).toBeGreaterThanOrEqual(t.events[k - 1].age);
    }), { seed: SEED, numRuns: 200 });
  });

  test('leaves a remnant lighter than the initial mass, and no white dwarf above the Chandrasekhar mass', () => {
    fc.assert(fc.property(massArb, zArb, (m, z) => {
      const t = generateTrack(m, z);
      if (t.remnant === 'brown-dwarf') expect(t.remnantMass).toBe(m);
      else expect(t.remnantMass).toBeLessThan(m);
      if (t.remnant === 'white-dwarf') expect(t.remnantMass).toBeLessThan(CHANDRASEKHAR_MASS); // 1.4575 Msun (Chandrasekhar 1931)
      for (let i = 0; i < t.n; i++) if (t.phase[i] === PHASE_INDEX['white-dwarf']) expect(t.mass[i]).toBeLessThan(CHANDRASEKHAR_MASS);
    }), { seed: SEED, numRuns: 300 });
  });

  test('is deterministic: the same input gives an identical track', () => {
    fc.assert(fc.property(massArb, zArb, (m, z) => {
      expect(generateTrack(m, z)).toEqual(generateTrack(m, z));
    }), { seed: SEED, numRuns: 100 });
  });
});

describe('generateTrack(initialMass, z) — arguments', () => {
  test.each([
    { name: 'mass below 0.01', m: 0.005, z: 0.014, word: 'initialMass' },
    { name: 'mass above 150', m: 151, z: 0.014, word: 'initialMass' },
    { name: 'mass NaN', m: NaN, z: 0.014, word: 'initialMass' },
    { name: 'z below 1e-4', m: 1, z: 5e-5, word: 'z' },
    { name: 'z above 0.03', m: 1, z: 0.05, word: 'z' },
    { name: 'z NaN', m: 1, z: NaN, word: 'z' },
  ])('throws RangeError naming $word for $name', ({ m, z, word }) => {
    expect(() => generateTrack(m, z)).toThrow(RangeError);
    expect(() => generateTrack(m, z)).toThrow(new RegExp(`^${word} `));
  });
  test('defaults z to the solar 0.014', () => expect(generateTrack(1).z).toBe(SOLAR_Z));
});

describe('generateTrack(initialMass, z) — metallicity', () => {
  // Lower Z → hotter, bluer, shorter-lived at fixed mass (direction of detailed metal-poor
  // models; mainSequence.ts). 1 Msun at 4 Gyr, on the main sequence at every Z below.
  const zs = [0.03, 0.014, 0.001, 0.0001];
  const states = zs.map((z) => ({ z, s: starAt(generateTrack(1, z), 4 * GYR), t: generateTrack(1, z) }));
  test.each(states.slice(1).map((cur, i) => ({ name: `${states[i].z} → ${cur.z}`, prev: states[i], cur })))(
    '1 Msun at 4 Gyr is hotter, bluer and shorter-lived as z drops: $name', ({ prev, cur }) => {
      expect(cur.s.phase).toBe('main-sequence');
      expect(cur.s.teff).toBeGreaterThan(prev.s.teff);
      expect(cur.s.bv!).toBeLessThan(prev.s.bv!);
      expect(cur.t.msLifetime).toBeLessThan(prev.t.msLifetime);
    });
});
