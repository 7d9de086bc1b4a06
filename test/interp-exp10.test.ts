import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { exp10 } from '../lib/interp/exp10.js';

// The reference is the engine's own `10 ** x` (V8's pow), itself within an ulp or two of the
// exact value; agreement within 1e-15 relative is what the module's comment promises.
describe('exp10 (table-driven, Tang 1989)', () => {
  test('agrees with 10 ** x within 1e-15 relative over −300 < x < 300 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -299.999, max: 299.999, noNaN: true }), (x) => {
        const want = 10 ** x;
        expect(Math.abs(exp10(x) / want - 1)).toBeLessThan(1e-15);
      }),
      { numRuns: 20000 },
    );
  });

  test('agrees over the interpolator\'s working range, −8 … 14, on a dense sweep', () => {
    let worst = 0;
    for (let i = 0; i <= 220000; i++) {
      const x = -8 + i * 1e-4;
      worst = Math.max(worst, Math.abs(exp10(x) / 10 ** x - 1));
    }
    expect(worst).toBeLessThan(1e-15);
  });

  test('is within an ulp of the whole powers of ten that doubles hold exactly (10^0 … 10^22)', () => {
    for (let e = 0; e <= 22; e++) expect(Math.abs(exp10(e) - 10 ** e)).toBeLessThanOrEqual(2 ** (Math.floor(Math.log2(10 ** e)) - 52));
  });

  test('the split constant: L_HI + L_LO is log10(2)/64 (checked against 2^(1/64) = 10^(L))', () => {
    expect(Math.abs(exp10(Math.log10(2) / 64) / 2 ** (1 / 64) - 1)).toBeLessThan(4e-16);
  });

  test('is continuous across table steps: no jump at the rounding boundaries of k', () => {
    const step = Math.log10(2) / 64;
    for (let k = -500; k <= 500; k++) {
      const x = (k + 0.5) * step;
      const below = exp10(x - 1e-13);
      const above = exp10(x + 1e-13);
      expect(above).toBeGreaterThan(below);
      expect(above / below - 1).toBeLessThan(1e-11);
    }
  });

  test('hands the edges to 10 ** x: NaN, ±Infinity, |x| ≥ 300', () => {
    expect(exp10(NaN)).toBeNaN();
    expect(exp10(Infinity)).toBe(Infinity);
    expect(exp10(-Infinity)).toBe(0);
    expect(exp10(300)).toBe(10 ** 300);
    expect(exp10(-300)).toBe(10 ** -300);
    expect(exp10(400)).toBe(Infinity);
    expect(exp10(-400)).toBe(0);
  });
});
