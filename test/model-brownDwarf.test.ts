import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { starAt } from '../lib/model/starAt.js';
import { brownDwarfCooling, HYDROGEN_BURNING_LIMIT, brownDwarfRadius } from '../lib/model/brownDwarf.js';

const GYR = 1e9;

describe('HYDROGEN_BURNING_LIMIT', () => {
  // Chabrier & Baraffe 1997/2000: ≈ 0.075 Msun (0.07–0.09)
  test('is 0.07–0.09 Msun (Chabrier & Baraffe 2000)', () => {
    expect(HYDROGEN_BURNING_LIMIT).toBeGreaterThanOrEqual(0.07);
    expect(HYDROGEN_BURNING_LIMIT).toBeLessThanOrEqual(0.09);
  });
  test.each([
    { m: 0.07, phase: 'brown-dwarf' },
    { m: 0.08, phase: 'main-sequence' },
  ])('starAt(generateTrack($m), 5 Gyr) is $phase (Chabrier & Baraffe 2000)', ({ m, phase }) => {
    expect(starAt(generateTrack(m), 5 * GYR).phase).toBe(phase);
  });
});

describe('brownDwarfCooling(age, mass, zRatio)', () => {
  test('gives the Burrows et al. 2001 pivot values 4e-5 Lsun and 1550 K at 1 Gyr and 0.05 Msun (from memory)', () => {
    const c = brownDwarfCooling(1e9, 0.05, 1);
    expect(c.luminosity).toBeCloseTo(4e-5, 12);
    expect(c.teff).toBeCloseTo(1550, 9);
  });
  test.each([0.013, 0.03, 0.05, 0.07])('dims and cools with age at %s Msun', (m) => {
    const track = generateTrack(m);
    let prev = starAt(track, 1e7);
    for (const a of [3e7, 1e8, 1e9, 3e9, 1e10, 5e10]) {
      const s = starAt(track, a);
      expect(s.luminosity).toBeLessThan(prev.luminosity);
      expect(s.teff).toBeLessThan(prev.teff);
      prev = s;
    }
  });
});

describe('brown dwarfs of generateTrack: radius near a Jupiter radius', () => {
  // Jupiter's radius is ≈ 0.10 Rsun (IAU 2015 B2 nominal 7.1492e7 m). Old brown dwarfs keep
  // R ≈ 0.1 Rsun nearly independent of mass, shrinking slowly with age (Chabrier & Baraffe
  // 2000, ARA&A 38, 337; from memory): accepted here within ±30 %, 0.07–0.13 Rsun.
  const all = [0.013, 0.02, 0.03, 0.04, 0.05, 0.06, 0.065, 0.07].flatMap((m) => [1, 3, 10].map((t) => ({ m, t, name: `${m} Msun at ${t} Gyr` })));
  test.each(all)('starAt(generateTrack(M), t).radius is 0.07–0.13 Rsun: $name', ({ m, t }) => {
    const s = starAt(generateTrack(m), t * GYR);
    expect(s.phase).toBe('brown-dwarf');
    expect(s.radius).toBeGreaterThanOrEqual(0.07);
    expect(s.radius).toBeLessThanOrEqual(0.13);
  });
});

describe('brownDwarfRadius(age, mass)', () => {
  test('brownDwarfRadius is 0.1 Rsun at 0.05 Msun and 1 Gyr, flat in mass and shrinking with age', () => {
    expect(brownDwarfRadius(1e9, 0.05)).toBeCloseTo(0.1, 12);
    // nearly independent of mass: within ±20 % over 0.013–0.07 Msun (Chabrier & Baraffe 2000; from memory)
    expect(brownDwarfRadius(1e9, 0.013) / brownDwarfRadius(1e9, 0.07)).toBeLessThan(1.3);
    expect(brownDwarfRadius(1e10, 0.03)).toBeLessThan(brownDwarfRadius(1e9, 0.03));
  });
});
