import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { luminosityFromRadius } from '../lib/physics/luminosityFromRadius.js';
import { radiusFromLuminosity } from '../lib/physics/radiusFromLuminosity.js';

const REL = 1e-5; // REFERENCES.md tolerance for the Stefan–Boltzmann checks

describe('radiusFromLuminosity(luminosity, teff)', () => {
  test.each([
    // REFERENCES.md (D): Stefan–Boltzmann with IAU 2015 B3 nominal values
    { L: 23.064, teff: 4000, R: 10 },
    { L: 0.054989, teff: 25000, R: 0.0125 },
    { L: 1, teff: 5772, R: 1 }, // IAU 2015 B3: the nominal Sun
  ])('gives R $R Rsun for L $L Lsun at $teff K', ({ L, teff, R }) => {
    expect(Math.abs(radiusFromLuminosity(L, teff) / R - 1)).toBeLessThan(REL);
  });

  test('inverts luminosityFromRadius (property, relative 1e-12)', () => {
    fc.assert(fc.property(
      fc.double({ min: 1e-6, max: 1e4, noNaN: true }), fc.double({ min: 10, max: 1e9, noNaN: true }),
      (r, t) => Math.abs(radiusFromLuminosity(luminosityFromRadius(r, t), t) / r - 1) < 1e-12,
    ));
  });

  test.each([
    { L: -1, teff: 5772, msg: /luminosity -1/ },
    { L: NaN, teff: 5772, msg: /luminosity NaN/ },
    { L: 1, teff: 0, msg: /teff 0/ },
    { L: 1, teff: Infinity, msg: /teff Infinity/ },
  ])('throws RangeError for L $L, teff $teff', ({ L, teff, msg }) => {
    expect(() => radiusFromLuminosity(L, teff)).toThrow(RangeError);
    expect(() => radiusFromLuminosity(L, teff)).toThrow(msg);
  });
});
