import { describe, expect, test } from 'vitest';
import {
  luminousBlueVariableRate, nieuwenhuijzenDeJagerRate, reimersRate, vassiliadisWoodRate, wolfRayetRate,
} from '../lib/model/massLoss.js';

describe('reimersRate(luminosity, radius, mass, eta)', () => {
  // Reimers 1975: Ṁ = 4e-13 η L R / M Msun/yr, η = 0.5 (REFERENCES.md, formula, confirmed)
  test.each([
    { L: 2800, R: 180, M: 0.8, eta: 0.5, want: (4e-13 * 0.5 * 2800 * 180) / 0.8 },
    { L: 100, R: 10, M: 1, eta: 0.5, want: 2e-10 },
    { L: 5000, R: 300, M: 2, eta: 0.3, want: (4e-13 * 0.3 * 5000 * 300) / 2 },
  ])('is 4e-13 η L R / M exactly (relative 1e-14): L $L, R $R, M $M, η $eta (Reimers 1975)', ({ L, R, M, eta, want }) => {
    expect(Math.abs(reimersRate(L, R, M, eta) / want - 1)).toBeLessThan(1e-14);
  });
  test('uses η = 0.5 by default (REFERENCES.md)', () => expect(reimersRate(2800, 180, 0.8)).toBe(reimersRate(2800, 180, 0.8, 0.5)));
});

describe('nieuwenhuijzenDeJagerRate(luminosity, radius, mass, zRatio)', () => {
  test('is 10^(−14.02 + 1.24 log L + 0.16 log M + 0.81 log R) at solar Z (Nieuwenhuijzen & de Jager 1990, from memory): 1.58e-7 Msun/yr at 1e5 Lsun, 10 Rsun, 20 Msun', () => {
    const want = 10 ** (-14.02 + 1.24 * 5 + 0.16 * Math.log10(20) + 0.81 * 1); // = 1.578e-7
    expect(Math.abs(nieuwenhuijzenDeJagerRate(1e5, 10, 20, 1) / want - 1)).toBeLessThan(1e-12);
    expect(nieuwenhuijzenDeJagerRate(1e5, 10, 20, 1)).toBeCloseTo(1.578e-7, 9);
  });
  test('scales as (Z/Z☉)^0.5 (Kudritzki, Pauldrach & Puls 1987; common practice)', () => {
    expect(nieuwenhuijzenDeJagerRate(1e5, 10, 20, 0.25) / nieuwenhuijzenDeJagerRate(1e5, 10, 20, 1)).toBeCloseTo(0.5, 12);
  });
});

describe('wolfRayetRate(luminosity)', () => {
  test('is 1e-13 L^1.5 (Hamann et al. 1995 reduced for clumping, from memory): 1e-4 Msun/yr at 1e6 Lsun', () => {
    expect(wolfRayetRate(1e6)).toBeCloseTo(1e-4, 12);
  });
});

describe('luminousBlueVariableRate(luminosity, radius)', () => {
  test('is zero below the Humphreys–Davidson limit and 1.5e-4 Msun/yr beyond it (Humphreys & Davidson 1994; common practice)', () => {
    expect(luminousBlueVariableRate(1e5, 1000)).toBe(0);
    expect(luminousBlueVariableRate(1e6, 10)).toBe(0); // compact: R below 1e5 L^-½ Rsun
    expect(luminousBlueVariableRate(1e6, 200)).toBe(1.5e-4);
  });
});

describe('vassiliadisWoodRate(luminosity, radius, mass)', () => {
  test('is the doc example ≈ 6.8e-6 Msun/yr (superwind) at 5000 Lsun, 300 Rsun, 0.7 Msun (Vassiliadis & Wood 1993, from memory; ±10 %)', () => {
    expect(Math.abs(vassiliadisWoodRate(5000, 300, 0.7) / 6.8e-6 - 1)).toBeLessThan(0.1);
  });
  test('never exceeds the radiation-pressure limit L/(c v_exp) with v_exp ≥ 3 km/s', () => {
    for (const [L, R, M] of [[3000, 200, 1], [1e4, 500, 1.5], [3e4, 800, 4]]) {
      const cap = ((L * 3.828e26) / (299792458 * 3e3)) * (365.25 * 86400) / 1.98841e30;
      expect(vassiliadisWoodRate(L, R, M)).toBeLessThanOrEqual(cap);
      expect(vassiliadisWoodRate(L, R, M)).toBeGreaterThan(0);
    }
  });
});
