import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { luminosityFromRadius } from '../lib/physics/luminosityFromRadius.js';

describe('luminosityFromRadius(radius, teff)', () => {
  test.each([
    // REFERENCES.md (D): L/L☉ = (R/R☉)² (Teff/5772)⁴, IAU 2015 B3 nominal values; 1e-5 relative
    { R: 10, teff: 4000, L: 23.064 },
    { R: 0.0125, teff: 25000, L: 0.054989 },
    { R: 1, teff: 5772, L: 1 }, // IAU 2015 B3
  ])('gives L $L Lsun for R $R Rsun at $teff K', ({ R, teff, L }) => {
    expect(Math.abs(luminosityFromRadius(R, teff) / L - 1)).toBeLessThan(1e-5);
  });

  test('agrees with 4πR²σT⁴ in SI units (CODATA 2018 σ, IAU 2015 B3 R☉, L☉), 1e-12', async () => {
    const { SIGMA_SB, R_SUN, L_SUN } = await import('../lib/physics/constants.js');
    // The nominal L☉ is not exactly 4πR☉²σ(5772)⁴ (IAU 2015 B3 notes this); compare ratios.
    const si = (r: number, t: number) => 4 * Math.PI * (r * R_SUN) ** 2 * SIGMA_SB * t ** 4;
    const ratio = si(3, 8000) / si(1, 5772);
    expect(Math.abs(luminosityFromRadius(3, 8000) / ratio - 1)).toBeLessThan(1e-12);
    expect(Math.abs(si(1, 5772) / L_SUN - 1)).toBeLessThan(1e-3); // IAU 2015 B3: consistent to 0.01 %
  });

  test('is increasing in teff and radius (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: 1e-3, max: 1e3, noNaN: true }), fc.double({ min: 100, max: 1e6, noNaN: true }),
      (r, t) => luminosityFromRadius(r, t * 1.01) > luminosityFromRadius(r, t) &&
        luminosityFromRadius(r * 1.01, t) > luminosityFromRadius(r, t),
    ));
  });

  test.each([{ R: -1, teff: 5000 }, { R: 1, teff: -5 }, { R: NaN, teff: 5000 }])(
    'throws RangeError for radius $R, teff $teff', ({ R, teff }) => {
      expect(() => luminosityFromRadius(R, teff)).toThrow(RangeError);
    },
  );
});
