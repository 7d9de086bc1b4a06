import { describe, expect, test } from 'vitest';
import { NEUTRON_STAR_RADIUS, neutronStarTeff, schwarzschildRadius } from '../lib/model/neutronStar.js';

describe('schwarzschildRadius(mass)', () => {
  // 2GM/c² with (GM)☉ = 1.3271244e20 m³ s⁻² and R☉ = 6.957e8 m (IAU 2015 B3): 10 Msun → 29.53 km = 4.2447e-5 Rsun (D)
  test('is 2GM/c² in Rsun: 10 Msun → 4.2447e-5 Rsun (IAU 2015 B3, derived; relative 1e-4)', () => {
    expect(Math.abs(schwarzschildRadius(10) / 4.2447e-5 - 1)).toBeLessThan(1e-4);
  });
  test('grows linearly with mass', () => expect(schwarzschildRadius(20) / schwarzschildRadius(10)).toBeCloseTo(2, 12));
});

describe('NEUTRON_STAR_RADIUS', () => {
  test('is 12 km, inside 10–13 km (Özel & Freire 2016)', () => expect(NEUTRON_STAR_RADIUS * 6.957e5).toBeCloseTo(12, 9));
});

describe('neutronStarTeff(coolingAge)', () => {
  test('is 1e6 K at 1e5 yr and continuous there (standard cooling curves, Yakovlev & Pethick 2004; common practice)', () => {
    expect(neutronStarTeff(1e5)).toBeCloseTo(1e6, 6);
    expect(Math.abs(neutronStarTeff(1e5 * (1 + 1e-9)) / neutronStarTeff(1e5) - 1)).toBeLessThan(1e-8);
  });
  test('falls with age and is held below 10 yr', () => {
    let prev = Infinity;
    for (let lt = 1; lt <= 11; lt += 0.5) {
      const t = neutronStarTeff(10 ** lt);
      expect(t).toBeLessThan(prev);
      prev = t;
    }
    expect(neutronStarTeff(1)).toBe(neutronStarTeff(10));
  });
});
