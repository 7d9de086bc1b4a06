import { describe, expect, test } from 'vitest';
import { normalCdf } from '../lib/population/normalCdf.js';

describe('normalCdf(x)', () => {
  // Φ values to 16 digits (from memory; standard normal tables, e.g. Abramowitz & Stegun 1964
  // Table 26.1, and erfc(1) = 0.157299207050285…): tolerance 1e-14 relative
  test.each([
    { x: 0, p: 0.5 },
    { x: 1, p: 0.8413447460685429 },
    { x: -1, p: 0.15865525393145705 },
    { x: -1.959963984540054, p: 0.025 },
    { x: -3, p: 0.0013498980316300946 },
    { x: 2, p: 0.9772498680518208 },
    { x: -5, p: 2.866515718791939e-7 },
    { x: -10, p: 7.619853024160527e-24 },
  ])('normalCdf($x) is $p', ({ x, p }) => {
    expect(Math.abs(normalCdf(x) / p - 1)).toBeLessThan(1e-14);
  });

  test('normalCdf(x) + normalCdf(−x) is 1 and normalCdf is increasing', () => {
    let last = 0;
    for (let x = -8; x <= 8; x += 0.01) {
      const p = normalCdf(x);
      expect(Math.abs(p + normalCdf(-x) - 1)).toBeLessThan(2e-16 * 4);
      expect(p).toBeGreaterThanOrEqual(last);
      last = p;
    }
  });

  test('normalCdf(x) derivative is the normal density (finite difference, exact identity)', () => {
    for (const x of [-4, -2.1, -1.49, -1.51, 0.3, 1.7]) {
      const h = 1e-5;
      const d = (normalCdf(x + h) - normalCdf(x - h)) / (2 * h);
      const phi = Math.exp(-0.5 * x * x) / Math.sqrt(2 * Math.PI);
      expect(Math.abs(d / phi - 1)).toBeLessThan(1e-8);
    }
  });

  test('normalCdf(±Infinity) is 1 and 0; normalCdf(NaN) throws', () => {
    expect(normalCdf(Infinity)).toBe(1);
    expect(normalCdf(-Infinity)).toBe(0);
    expect(() => normalCdf(NaN)).toThrow(RangeError);
  });
});
