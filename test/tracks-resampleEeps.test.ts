import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { resampleEeps, SECONDARY_EEPS } from '../lib/tracks/resampleEeps.js';
import { starAt } from '../lib/model/starAt.js';
import { PHASES } from '../lib/model/phases.js';

const masses = [0.03, 0.2, 0.6, 1.0, 1.5, 3.0, 6.0, 15, 40];

describe('resampleEeps(track) — Dotter 2016 EEP resampling', () => {
  test.each(masses)('resampleEeps(generateTrack(%s)) keeps every primary EEP at its own state', (m) => {
    const t = generateTrack(m, 0.014, { fullLife: true });
    const e = resampleEeps(t);
    expect(e.primary.map((p) => p.name)).toEqual(t.eeps.map((p) => p.name));
    for (let k = 0; k < t.eeps.length; k++) {
      const raw = t.eeps[k].index;
      const j = e.primary[k].index;
      expect(e.logAge[j]).toBeCloseTo(Math.log10(t.age[raw]), 12);
      expect(e.logL[j]).toBeCloseTo(t.logL[raw], 12);
      expect(e.logTeff[j]).toBeCloseTo(t.logTeff[raw], 12);
      expect(e.phase[j]).toBe(t.phase[raw]);
    }
  });

  test.each(masses)('resampleEeps(generateTrack(%s)) has non-decreasing ages and phases in life order', (m) => {
    const e = resampleEeps(generateTrack(m, 0.014, { fullLife: true }));
    for (let j = 1; j < e.n; j++) {
      expect(e.logAge[j]).toBeGreaterThanOrEqual(e.logAge[j - 1]);
      expect(e.phase[j]).toBeGreaterThanOrEqual(e.phase[j - 1]);
      // a phase changes only at one age (the two points of a boundary)
      if (e.phase[j] !== e.phase[j - 1]) expect(e.logAge[j]).toBe(e.logAge[j - 1]);
    }
  });

  test.each(masses)('resampleEeps(generateTrack(%s)) puts secondary EEPs on the track itself', (m) => {
    const t = generateTrack(m, 0.014);
    const e = resampleEeps(t);
    // tolerance 1e-7 dex: the EEP state comes from the same monotone cubics starAt uses; the
    // rest is the log/exp round trip of the age on steep stretches
    for (let j = 1; j < e.n - 1; j += 7) {
      if (e.phase[j] !== e.phase[j - 1] || e.phase[j] !== e.phase[j + 1]) continue;
      const s = starAt(t, 10 ** e.logAge[j]);
      if (s.phase !== PHASES[e.phase[j]] || s.phase === 'black-hole') continue;
      expect(Math.log10(s.luminosity)).toBeCloseTo(e.logL[j], 7);
      expect(Math.log10(s.teff)).toBeCloseTo(e.logTeff[j], 7);
    }
  });

  test('resampleEeps gives tracks of one layout the same EEP count, and spaces secondaries by phase', () => {
    const a = resampleEeps(generateTrack(1.0, 0.014, { fullLife: true }));
    const b = resampleEeps(generateTrack(1.1, 0.014, { fullLife: true }));
    expect(a.layout).toBe(b.layout);
    expect(a.n).toBe(b.n);
    // the main sequence of a 1 Msun star: two stretches (ZAMS→mid, mid→TAMS)
    const ms = PHASES.indexOf('main-sequence');
    const msPoints = Array.from(a.phase).filter((p) => p === ms).length;
    expect(msPoints).toBe(2 * SECONDARY_EEPS['main-sequence'] + 3);
  });

  test('resampleEeps separates layouts either side of the helium-flash and white-dwarf limits', () => {
    const layout = (m: number) => resampleEeps(generateTrack(m, 0.014, { fullLife: true })).layout;
    expect(layout(1.9)).not.toBe(layout(2.1)); // helium flash ≈ 2 Msun (Sweigart, Greggio & Renzini 1990)
    expect(layout(7.8)).not.toBe(layout(8.2)); // white dwarf / neutron star ≈ 8 Msun
    expect(layout(0.5)).not.toBe(layout(0.02)); // star / brown dwarf
  });

  test('resampleEeps throws RangeError for a track starting at age 0', () => {
    const t = generateTrack(1);
    const bad = { ...t, age: Float64Array.from(t.age, (a, i) => (i === 0 ? 0 : a)) };
    expect(() => resampleEeps(bad)).toThrow(/first age 0/);
  });
});
