import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { bolometricMagnitude } from '../lib/physics/bolometricMagnitude.js';

describe('bolometricMagnitude(luminosity)', () => {
  test.each([
    // IAU 2015 Resolution B2: M_bol☉ = 4.74 (REFERENCES.md, 1e-4 mag)
    { L: 1, mbol: 4.74, tol: 1e-4 },
    // IAU 2015 B2: M_bol = 0 at L0 = 3.0128e28 W = 78.7043 Lsun (D)
    { L: 3.0128e28 / 3.828e26, mbol: 0, tol: 1e-12 },
    // D: five magnitudes per factor 100
    { L: 100, mbol: 4.74 - 5, tol: 1e-4 },
  ])('gives M_bol $mbol for L $L Lsun', ({ L, mbol, tol }) => {
    expect(Math.abs(bolometricMagnitude(L) - mbol)).toBeLessThan(tol);
  });

  test('is strictly decreasing in luminosity (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-8, max: 1e8, noNaN: true }),
      (L) => bolometricMagnitude(L * 1.001) < bolometricMagnitude(L)));
  });

  test.each([{ L: 0 }, { L: -1 }, { L: NaN }, { L: Infinity }])('throws RangeError for L $L', ({ L }) => {
    expect(() => bolometricMagnitude(L)).toThrow(/luminosity/);
    expect(() => bolometricMagnitude(L)).toThrow(RangeError);
  });
});
