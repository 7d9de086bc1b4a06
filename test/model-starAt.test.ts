import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { starAt } from '../lib/model/starAt.js';
import { schwarzschildRadius } from '../lib/model/neutronStar.js';
import { PHASES } from '../lib/model/phases.js';
import { STATE_KEYS } from '../lib/model/starState.js';
import { MAX_AGE, SOLAR_Z } from '../lib/model/limits.js';

const GYR = 1e9;
const SEED = 20240515;

/** Arbitraries: initial mass log-uniform 0.01–150 Msun, z log-uniform 1e-4–0.03, age uniform and log-uniform over 0–100 Gyr. */
const massArb = fc.double({ min: Math.log10(0.01), max: Math.log10(150), noNaN: true }).map((x) => Math.min(150, Math.max(0.01, 10 ** x)));
const zArb = fc.double({ min: -4, max: Math.log10(0.03), noNaN: true }).map((x) => Math.min(0.03, Math.max(1e-4, 10 ** x)));
const ageArb = fc.oneof(
  fc.double({ min: 0, max: MAX_AGE, noNaN: true }),
  fc.double({ min: 3, max: 11, noNaN: true }).map((x) => Math.min(MAX_AGE, 10 ** x)),
);

describe('starAt(track, age) — the model Sun', () => {
  // IAU 2015 Resolution B3 nominal Sun (Prša et al. 2016, AJ 152, 41); log g 4.438 (Mamajek solar
  // table); solar age 4.57 Gyr (Bouvier & Wadhwa 2010: 4.5682 Gyr). Tolerances from REFERENCES.md.
  const sun = starAt(generateTrack(1, SOLAR_Z), 4.57 * GYR);
  test('is on the main sequence', () => expect(sun.phase).toBe('main-sequence'));
  test('has L = 1 Lsun ±5 % (IAU 2015 B3)', () => expect(Math.abs(sun.luminosity - 1)).toBeLessThanOrEqual(0.05));
  test('has Teff = 5772 K ±1.5 % (IAU 2015 B3)', () => expect(Math.abs(sun.teff / 5772 - 1)).toBeLessThanOrEqual(0.015));
  test('has R = 1 Rsun ±5 % (IAU 2015 B3)', () => expect(Math.abs(sun.radius - 1)).toBeLessThanOrEqual(0.05));
  // ±0.043 dex: what R ±5 % allows in log g = log(GM/R²)
  test('has log g = 4.438 ±0.043 dex (Mamajek solar table)', () => expect(Math.abs(sun.logg - 4.438)).toBeLessThanOrEqual(0.043));
  test('is of type G2V (Pecaut & Mamajek 2013, v2024.05.15: G2V at 5770 K)', () => expect(sun.spectralType).toBe('G2V'));
});

describe('starAt(track, age) — the Sun brightening on the main sequence', () => {
  // Gough 1981, Sol. Phys. 74, 21: L(t) = L☉ / [1 + 0.4 (1 − t/t☉)], t☉ = 4.57 Gyr, t counted from
  // the zero-age main sequence. The model's age counts from birth and its pre-main sequence lasts
  // ≈ 40 Myr, so Gough's t maps to model age t_ZAMS + t (the track's `zams` event).
  const track = generateTrack(1, SOLAR_Z);
  const tZams = track.events.find((e) => e.event === 'zams')!.age;
  test('the zams event of 1 Msun lies at 20–80 Myr (pre-main-sequence of ≈ 40 Myr, common practice)', () => {
    expect(tZams).toBeGreaterThan(20e6);
    expect(tZams).toBeLessThan(80e6);
  });
  test.each([
    { t: 0, want: 0.714 }, { t: 1, want: 0.762 }, { t: 2, want: 0.816 }, { t: 3, want: 0.879 }, { t: 4, want: 0.953 },
  ])('at Gough t = $t Gyr L = $want Lsun ±6 % (Gough 1981)', ({ t, want }) => {
    const s = starAt(track, tZams + t * GYR);
    expect(Math.abs(s.luminosity / want - 1)).toBeLessThanOrEqual(0.06);
  });
});

describe('starAt(track, age) — a black hole', () => {
  const track = generateTrack(40, SOLAR_Z);
  const s = starAt(track, 10 * GYR);
  test('40 Msun ends as a black hole', () => expect(s.phase).toBe('black-hole'));
  test('has L = 0, Teff = 0 and the Schwarzschild radius 2GM/c² of its mass', () => {
    expect(s.luminosity).toBe(0);
    expect(s.teff).toBe(0);
    expect(s.radius).toBe(schwarzschildRadius(s.mass));
  });
  test('has no spectral type, colour or magnitudes (null)', () => {
    expect(s.spectralType).toBeNull();
    expect(s.bv).toBeNull();
    expect(s.mv).toBeNull();
    expect(s.mbol).toBeNull();
    expect(s.color).toBeNull();
  });
});

describe('starAt(track, age) — arguments', () => {
  const track = generateTrack(1);
  test.each([
    { name: 'negative', age: -1 },
    { name: 'NaN', age: NaN },
    { name: 'Infinity', age: Infinity },
    { name: 'beyond 100 Gyr', age: 1.0001e11 },
  ])('throws RangeError naming age for a $name age', ({ age }) => {
    expect(() => starAt(track, age)).toThrow(RangeError);
    expect(() => starAt(track, age)).toThrow(/age/);
  });
  test('accepts the ends 0 and 100 Gyr', () => {
    expect(starAt(track, 0).phase).toBe('pre-main-sequence');
    expect(Number.isFinite(starAt(track, MAX_AGE).luminosity)).toBe(true);
  });
});

describe('starAt(track, age) — properties', () => {
  test('returns every schema key, and every number finite, for any mass, z and age', () => {
    fc.assert(fc.property(massArb, zArb, ageArb, (m, z, age) => {
      const s = starAt(generateTrack(m, z), age);
      expect(Object.keys(s).sort()).toEqual([...STATE_KEYS].sort());
      for (const k of STATE_KEYS) {
        const v = s[k];
        if (typeof v === 'number') expect(Number.isFinite(v), `${k} = ${v} at M ${m}, z ${z}, age ${age}`).toBe(true);
      }
      expect(PHASES).toContain(s.phase);
      expect(s.coreMass).toBeLessThanOrEqual(s.mass);
      expect(s.mass).toBeLessThanOrEqual(m);
    }), { seed: SEED, numRuns: 300 });
  });

  test('keeps mass non-increasing, and the phase in life order, at increasing ages', () => {
    fc.assert(fc.property(massArb, zArb, fc.array(ageArb, { minLength: 2, maxLength: 40 }), (m, z, ages) => {
      const track = generateTrack(m, z);
      const sorted = ages.slice().sort((a, b) => a - b);
      let prev = starAt(track, sorted[0]);
      for (const a of sorted.slice(1)) {
        const s = starAt(track, a);
        expect(s.mass, `mass grows at ${a} yr for M ${m}, z ${z}`).toBeLessThanOrEqual(prev.mass * (1 + 1e-12));
        expect(PHASES.indexOf(s.phase)).toBeGreaterThanOrEqual(PHASES.indexOf(prev.phase));
        prev = s;
      }
    }), { seed: SEED, numRuns: 200 });
  });

  test('is continuous inside a phase: age and age + ε in one phase give close L and Teff', () => {
    // ε = 1e-4 of the local point spacing; a Steffen cubic's slope is at most 3× the neighbouring
    // secants, so log L and log Teff may move by ~1e-4 of one step: 1e-3 dex is ample (chosen here).
    fc.assert(fc.property(massArb, zArb, ageArb, (m, z, age) => {
      const track = generateTrack(m, z);
      const a = Math.min(age, track.age[track.n - 1]);
      let i = 0;
      while (i < track.n - 2 && track.age[i + 1] <= a) i++;
      const width = track.age[i + 1] - track.age[i];
      if (!(width > 0)) return;
      const eps = 1e-4 * width;
      const s0 = starAt(track, a);
      const s1 = starAt(track, Math.min(MAX_AGE, a + eps));
      if (s0.phase !== s1.phase || s0.phase === 'black-hole') return;
      expect(Math.abs(Math.log10(s1.luminosity / s0.luminosity))).toBeLessThanOrEqual(1e-3);
      expect(Math.abs(Math.log10(s1.teff / s0.teff))).toBeLessThanOrEqual(1e-3);
      expect(Math.abs(s1.mass - s0.mass)).toBeLessThanOrEqual(1e-3 * s0.mass);
    }), { seed: SEED, numRuns: 300 });
  });

  test('is deterministic: the same track and age give identical states', () => {
    fc.assert(fc.property(massArb, zArb, ageArb, (m, z, age) => {
      expect(starAt(generateTrack(m, z), age)).toEqual(starAt(generateTrack(m, z), age));
    }), { seed: SEED, numRuns: 100 });
  });
});
