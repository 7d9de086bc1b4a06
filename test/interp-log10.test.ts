import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { log10 } from '../lib/interp/log10.js';

// The reference is the engine's Math.log10 (V8's port of fdlibm, within an ulp of the exact
// value); the module promises agreement within 2.5e-16 · max(1, |log10 x|).
const tolerance = (x: number) => 2.5e-16 * Math.max(1, Math.abs(Math.log10(x)));

describe('log10 (table-driven, Tang 1990)', () => {
  test('agrees with Math.log10 over the positive normal doubles (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 2.2250738585072014e-308, max: Number.MAX_VALUE, noNaN: true }), (x) => {
        expect(Math.abs(log10(x) - Math.log10(x))).toBeLessThanOrEqual(tolerance(x));
      }),
      { numRuns: 20000 },
    );
  });

  test('agrees on a dense sweep of the interpolator\'s inputs: masses 0.01–150, ages 1 yr – 100 Gyr', () => {
    let worst = 0;
    for (let i = 0; i <= 300000; i++) {
      const x = 10 ** (-2 + (13 * i) / 300000);
      worst = Math.max(worst, Math.abs(log10(x) - Math.log10(x)) / tolerance(x));
    }
    expect(worst).toBeLessThanOrEqual(1);
  });

  test('is exact at powers of two and ten where Math.log10 is (1, 2^k, 10^k)', () => {
    expect(log10(1)).toBe(0);
    for (let k = 1; k <= 22; k++) expect(Math.abs(log10(10 ** k) - k)).toBeLessThanOrEqual(tolerance(10 ** k));
    for (let k = -60; k <= 60; k++) expect(Math.abs(log10(2 ** k) - k * Math.log10(2))).toBeLessThanOrEqual(tolerance(2 ** k));
  });

  test('is monotone across the table nodes and the binade edges', () => {
    for (let k = 0; k < 256 * 4; k++) {
      const c = 2 ** Math.floor(k / 256) * (1 + (k % 256) / 256);
      expect(log10(c * (1 + 2e-16))).toBeGreaterThanOrEqual(log10(c));
      expect(log10(c)).toBeGreaterThanOrEqual(log10(c * (1 - 2e-16)));
    }
  });

  test('hands the edges to Math.log10: 0, negatives, subnormals, Infinity, NaN', () => {
    expect(log10(0)).toBe(-Infinity);
    expect(log10(-1)).toBeNaN();
    expect(log10(5e-324)).toBe(Math.log10(5e-324));
    expect(log10(Infinity)).toBe(Infinity);
    expect(log10(NaN)).toBeNaN();
  });
});
