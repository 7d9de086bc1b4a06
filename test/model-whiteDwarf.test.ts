import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import {
  CHANDRASEKHAR_MASS, mestelCoolingAge, mestelLuminosity, nauenbergRadius, whiteDwarfIonMass,
} from '../lib/model/whiteDwarf.js';

describe('CHANDRASEKHAR_MASS', () => {
  test('is 5.83/μe² = 1.4575 Msun for μe = 2 (Chandrasekhar)', () => expect(CHANDRASEKHAR_MASS).toBeCloseTo(1.4575, 10));
});

describe('nauenbergRadius(mass)', () => {
  // Nauenberg 1972, ApJ 175, 417 (form confirmed, constants from memory): 0.6 Msun → 0.01258 Rsun, ±5 %
  test('nauenbergRadius(0.6) is 0.01258 Rsun ±5 % (Nauenberg 1972)', () => expect(Math.abs(nauenbergRadius(0.6) / 0.01258 - 1)).toBeLessThanOrEqual(0.05));
  test('shrinks with mass over 0.2–1.4 Msun', () => {
    for (let m = 0.2; m < 1.4; m += 0.05) expect(nauenbergRadius(m + 0.05)).toBeLessThan(nauenbergRadius(m));
  });
  test.each([0, -0.1, 1.454, 2, NaN])('throws RangeError naming the mass for %s', (m) => {
    expect(() => nauenbergRadius(m)).toThrow(RangeError);
    expect(() => nauenbergRadius(m)).toThrow(/mass/);
  });
});

describe('mestelLuminosity(coolingAge, mass)', () => {
  // Mestel 1952, MNRAS 112, 583: L ∝ t^(-7/5) at fixed mass (the shape; constants vary ×2)
  test.each([0.5, 0.6, 0.9])('falls as t^-7/5 at %s Msun (Mestel 1952)', (m) => {
    for (const t of [1e7, 1e8, 1e9, 1e10]) {
      expect(Math.log(mestelLuminosity(2 * t, m) / mestelLuminosity(t, m)) / Math.log(2)).toBeCloseTo(-1.4, 10);
    }
  });
  test('scales t_cool as M^(5/7) at fixed L and ion mass (Mestel 1952)', () => {
    expect(Math.log(mestelCoolingAge(1e-3, 0.9) / mestelCoolingAge(1e-3, 0.6)) / Math.log(1.5)).toBeCloseTo(5 / 7, 10);
  });
  test('mestelCoolingAge inverts mestelLuminosity (relative 1e-12)', () => {
    for (const t of [1e6, 3e8, 5e9]) expect(Math.abs(mestelCoolingAge(mestelLuminosity(t, 0.6), 0.6) / t - 1)).toBeLessThan(1e-12);
  });
  test('uses He, C/O and O/Ne ion masses by white-dwarf mass (common practice)', () => {
    expect([whiteDwarfIonMass(0.4), whiteDwarfIonMass(0.6), whiteDwarfIonMass(1.2)]).toEqual([4, 14, 18]);
  });
});

describe('white dwarfs of generateTrack', () => {
  // Fontaine, Brassard & Bergeron 2001, PASP 113, 409 (from memory): a 0.6 Msun white dwarf
  // reaches Teff 10 000 K after ≈ 0.6 Gyr of cooling; accept 0.4–0.8 Gyr. Measured on the track
  // from its remnant-birth event to its white-dwarf-10000K event, for the initial mass whose
  // white dwarf is closest to 0.6 Msun (1.2 Msun here; checked below to be 0.6 ± 0.03).
  test('a ≈ 0.6 Msun white dwarf reaches 10 000 K 0.4–0.8 Gyr after its birth (Fontaine et al. 2001, from memory)', () => {
    const t = generateTrack(1.2);
    expect(t.remnant).toBe('white-dwarf');
    expect(Math.abs(t.remnantMass - 0.6)).toBeLessThanOrEqual(0.03);
    const birth = t.events.find((e) => e.event === 'remnant-birth')!.age;
    const cool = t.events.find((e) => e.event === 'white-dwarf-10000K')!.age;
    expect(cool - birth).toBeGreaterThanOrEqual(0.4e9);
    expect(cool - birth).toBeLessThanOrEqual(0.8e9);
  });

  // Cummings et al. 2018, ApJ 866, 21 initial–final mass relation (slopes confirmed, intercepts
  // from memory): Mf = 0.080 Mi + 0.489 (0.83–2.85), 0.187 Mi + 0.184 (2.85–3.60),
  // 0.107 Mi + 0.471 (3.60–7.20); ±0.06 Msun.
  const cummings = (mi: number) => (mi < 2.85 ? 0.08 * mi + 0.489 : mi < 3.6 ? 0.187 * mi + 0.184 : 0.107 * mi + 0.471);
  test.each([0.9, 1.0, 1.25, 1.5, 1.75, 2.0, 2.25, 2.6, 3.0, 3.3, 3.8, 4.5, 5.0, 6.0, 7.0])(
    'generateTrack(%s).remnantMass follows Cummings et al. 2018 within 0.06 Msun', (mi) => {
      const t = generateTrack(mi);
      expect(t.remnant).toBe('white-dwarf');
      expect(Math.abs(t.remnantMass - cummings(mi))).toBeLessThanOrEqual(0.06);
    });

  test('no initial mass over 0.01–150 Msun leaves a white dwarf above the Chandrasekhar mass', () => {
    for (let m = 0.01; m <= 150; m *= 1.02) {
      for (const z of [1e-4, 0.014, 0.03]) {
        const t = generateTrack(m, z);
        if (t.remnant === 'white-dwarf') expect(t.remnantMass).toBeLessThan(CHANDRASEKHAR_MASS);
      }
    }
  });

  test('a white dwarf on the track cools: L falls and its radius is the Nauenberg radius', () => {
    const t = generateTrack(1.2);
    const b = t.eeps.find((e) => e.name === 'remnant-birth')!.index;
    for (let i = b + 1; i < t.n; i++) {
      expect(t.logL[i]).toBeLessThan(t.logL[i - 1]);
      const r = 10 ** (0.5 * t.logL[i] - 2 * (t.logTeff[i] - Math.log10(5772)));
      expect(Math.abs(r / nauenbergRadius(t.mass[i]) - 1)).toBeLessThan(1e-9);
    }
  });
});
