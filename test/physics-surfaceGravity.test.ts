import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { surfaceGravity } from '../lib/physics/surfaceGravity.js';

describe('surfaceGravity(mass, radius)', () => {
  test.each([
    // REFERENCES.md: model Sun log g = 4.438 (IAU 2015 B3 nominal GM☉, R☉); ±5e-4 dex
    { name: 'Sun', M: 1, R: 1, logg: 4.438, tol: 5e-4 },
    // D: REFERENCES.md dwarf table M0V row, 4.438 + log10(0.585) − 2 log10(0.588) = 4.6668
    { name: 'M0V row', M: 0.585, R: 0.588, logg: 4.6668, tol: 5e-4 },
    // D: 0.6 Msun, 0.01258 Rsun white dwarf (REFERENCES.md Nauenberg check value) → 8.0168
    { name: 'white dwarf', M: 0.6, R: 0.01258, logg: 8.0168, tol: 5e-4 },
  ])('gives log g $logg for the $name', ({ M, R, logg, tol }) => {
    expect(Math.abs(surfaceGravity(M, R) - logg)).toBeLessThan(tol);
  });

  test('is log g = log10(GM/R²) in cgs from GM☉ and R☉ (IAU 2015 B3), 1e-12 dex', () => {
    const g = (1.3271244e20 * 2) / (6.957e8 * 3) ** 2 * 100;
    expect(Math.abs(surfaceGravity(2, 3) - Math.log10(g))).toBeLessThan(1e-12);
  });

  test('is finite for all positive finite inputs (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: 1e-10, max: 1e10, noNaN: true }), fc.double({ min: 1e-10, max: 1e10, noNaN: true }),
      (m, r) => Number.isFinite(surfaceGravity(m, r)),
    ));
  });

  test.each([{ M: 0, R: 1 }, { M: 1, R: 0 }, { M: -1, R: 1 }, { M: NaN, R: 1 }, { M: 1, R: Infinity }])(
    'throws RangeError for mass $M, radius $R', ({ M, R }) => {
      expect(() => surfaceGravity(M, R)).toThrow(RangeError);
    },
  );
});
