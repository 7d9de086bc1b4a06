import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import {
  agbLuminosity, flashCoreMass, hayashiLogTeff, heliumFlashMass, rgbLuminosity, whiteDwarfUpperMass,
} from '../lib/model/giantBranch.js';
import { PHASE_INDEX } from '../lib/model/phases.js';
import { SOLAR_Z } from '../lib/model/limits.js';
import type { Track } from '../lib/tracks/track.js';

/** Radius, Rsun, of track point i by Stefan–Boltzmann with the IAU 2015 nominal Sun. */
const radiusAt = (t: Track, i: number) => 10 ** (0.5 * t.logL[i] - 2 * (t.logTeff[i] - Math.log10(5772)));
const eep = (t: Track, name: string) => t.eeps.find((e) => e.name === name)!.index;
const hasEvent = (t: Track, name: string) => t.events.some((e) => e.event === name);

describe('rgbLuminosity(coreMass)', () => {
  // Refsdal & Weigert 1970 homology, fit as in Kippenhahn, Weigert & Weiss: L ≈ 2.3e5 (Mc)^6 Lsun (from memory), ±25 %
  test.each([0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.48])('rgbLuminosity(%s) is 2.3e5 Mc^6 Lsun ±25 %% (Refsdal & Weigert 1970, from memory)', (mc) => {
    expect(Math.abs(rgbLuminosity(mc) / (2.3e5 * mc ** 6) - 1)).toBeLessThanOrEqual(0.25);
  });

  test.each([0.8, 1.0, 1.2, 1.5])('the red-giant-branch points of generateTrack(%s) follow 2.3e5 Mc^6 Lsun ±25 %%', (m) => {
    const t = generateTrack(m);
    let count = 0;
    for (let i = 0; i < t.n; i++) {
      if (t.phase[i] !== PHASE_INDEX['red-giant-branch']) continue;
      count++;
      expect(Math.abs(10 ** t.logL[i] / (2.3e5 * t.coreMass[i] ** 6) - 1)).toBeLessThanOrEqual(0.25);
    }
    expect(count).toBeGreaterThan(10);
  });
});

describe('the red-giant tip of 1 Msun', () => {
  // Pols et al. 1998, MNRAS 298, 525 (from memory): L ≈ 2800 Lsun ±25 %, R ≈ 180 Rsun ±30 %;
  // core at the flash 0.47–0.50 Msun, Sweigart & Gross 1978, ApJS 36, 405 (from memory), tolerance 0.46–0.50.
  const t = generateTrack(1, SOLAR_Z);
  const tip = eep(t, 'he-ignition');
  test('sits at the helium flash, the end of the red giant branch', () => {
    expect(t.phase[tip]).toBe(PHASE_INDEX['red-giant-branch']);
    expect(hasEvent(t, 'helium-flash')).toBe(true);
  });
  test('has L ≈ 2800 Lsun ±25 % (Pols et al. 1998, from memory)', () => expect(Math.abs(10 ** t.logL[tip] / 2800 - 1)).toBeLessThanOrEqual(0.25));
  test('has R ≈ 180 Rsun ±30 % (Pols et al. 1998, from memory)', () => expect(Math.abs(radiusAt(t, tip) / 180 - 1)).toBeLessThanOrEqual(0.3));
  test('has a core of 0.46–0.50 Msun (Sweigart & Gross 1978, from memory)', () => {
    expect(t.coreMass[tip]).toBeGreaterThanOrEqual(0.46);
    expect(t.coreMass[tip]).toBeLessThanOrEqual(0.5);
  });
});

describe('flashCoreMass(mass, z)', () => {
  test.each([0.8, 1.0, 1.2, 1.4])('flashCoreMass(%s, 0.014) is 0.46–0.50 Msun (Sweigart & Gross 1978, from memory)', (m) => {
    expect(flashCoreMass(m, SOLAR_Z)).toBeGreaterThanOrEqual(0.46);
    expect(flashCoreMass(m, SOLAR_Z)).toBeLessThanOrEqual(0.5);
  });
});

describe('agbLuminosity(coreMass)', () => {
  // Paczyński 1970, Acta Astron. 20, 47: L = 59250 (Mc − 0.522) Lsun (from memory), ±20 %
  test.each([0.55, 0.6, 0.7, 0.8, 1.0, 1.2])('agbLuminosity(%s) is 59250 (Mc − 0.522) Lsun ±20 %% (Paczyński 1970)', (mc) => {
    expect(Math.abs(agbLuminosity(mc) / (59250 * (mc - 0.522)) - 1)).toBeLessThanOrEqual(0.2);
  });
  test('agbLuminosity stays positive and continuous below 0.54 Msun', () => {
    expect(agbLuminosity(0.3)).toBeGreaterThan(0);
    expect(Math.abs(agbLuminosity(0.54 - 1e-9) / agbLuminosity(0.54) - 1)).toBeLessThan(1e-6);
  });
  test.each([1, 1.5, 2, 3, 4, 5, 6])('the thermally pulsing AGB points of generateTrack(%s) follow Paczyński 1970 ±20 %%', (m) => {
    const t = generateTrack(m);
    const start = eep(t, 'first-thermal-pulse');
    let count = 0;
    for (let i = start; i < t.n && t.phase[i] === PHASE_INDEX['asymptotic-giant-branch']; i++) {
      if (t.coreMass[i] < 0.54) continue; // below the law's validity (see agbLuminosity)
      count++;
      expect(Math.abs(10 ** t.logL[i] / (59250 * (t.coreMass[i] - 0.522)) - 1)).toBeLessThanOrEqual(0.2);
    }
    expect(count).toBeGreaterThan(0);
  });
});

describe('heliumFlashMass(z)', () => {
  // Sweigart, Greggio & Renzini 1990, ApJ 364, 527: ≈ 2 Msun (1.7–2.5) at solar metallicity
  test('heliumFlashMass(0.014) lies in 1.7–2.5 Msun (Sweigart, Greggio & Renzini 1990)', () => {
    expect(heliumFlashMass(SOLAR_Z)).toBeGreaterThanOrEqual(1.7);
    expect(heliumFlashMass(SOLAR_Z)).toBeLessThanOrEqual(2.5);
  });
  test.each([1e-4, 0.001, 0.014, 0.03])('tracks ignite helium in a flash 2 %% below heliumFlashMass(%s) and quietly 2 %% above', (z) => {
    const mf = heliumFlashMass(z);
    const below = generateTrack(0.98 * mf, z);
    const above = generateTrack(1.02 * mf, z);
    expect(hasEvent(below, 'helium-flash')).toBe(true);
    expect(hasEvent(below, 'helium-ignition')).toBe(false);
    expect(hasEvent(above, 'helium-ignition')).toBe(true);
    expect(hasEvent(above, 'helium-flash')).toBe(false);
  });
});

describe('whiteDwarfUpperMass(z)', () => {
  // Weidemann & Koester 1983; Smartt et al. 2009, MNRAS 395, 1409: ≈ 8 Msun (6.5–10)
  test('whiteDwarfUpperMass(0.014) lies in 6.5–10 Msun (Weidemann & Koester 1983; Smartt et al. 2009)', () => {
    expect(whiteDwarfUpperMass(SOLAR_Z)).toBeGreaterThanOrEqual(6.5);
    expect(whiteDwarfUpperMass(SOLAR_Z)).toBeLessThanOrEqual(10);
  });
  test.each([1e-4, 0.001, 0.014, 0.03])('tracks end as white dwarfs 2 %% below whiteDwarfUpperMass(%s) and as neutron stars 2 %% above', (z) => {
    const mu = whiteDwarfUpperMass(z);
    expect(generateTrack(0.98 * mu, z).remnant).toBe('white-dwarf');
    expect(generateTrack(1.02 * mu, z).remnant).toBe('neutron-star');
  });
});

describe('hayashiLogTeff(luminosity, mass, z)', () => {
  test('puts red supergiants near 3600–3900 K (the doc comment\'s calibration, from memory)', () => {
    const t = 10 ** hayashiLogTeff(1e5, 15, SOLAR_Z);
    expect(t).toBeGreaterThan(3600);
    expect(t).toBeLessThan(3900);
  });
  test('makes giant branches cooler as they climb and hotter at low z', () => {
    expect(hayashiLogTeff(1000, 1, SOLAR_Z)).toBeLessThan(hayashiLogTeff(10, 1, SOLAR_Z));
    expect(hayashiLogTeff(100, 1, 1.4e-4)).toBeGreaterThan(hayashiLogTeff(100, 1, SOLAR_Z));
  });
});
