import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { srgbTransfer } from '../lib/physics/srgbTransfer.js';

describe('srgbTransfer(c)', () => {
  test.each([
    // IEC 61966-2-1: 12.92 c below 0.0031308, 1.055 c^(1/2.4) − 0.055 above (D values)
    { c: 0, e: 0 },
    { c: 0.002, e: 0.02584 },
    { c: 0.5, e: 0.735357 },
    { c: 1, e: 1 },
    { c: -0.5, e: -0.735357 },
  ])('maps $c to $e within 1e-6', ({ c, e }) => {
    expect(Math.abs(srgbTransfer(c) - e)).toBeLessThan(1e-6);
  });

  test('is continuous at the 0.0031308 knee within 1e-6', () => {
    expect(Math.abs(srgbTransfer(0.0031308 - 1e-12) - srgbTransfer(0.0031308 + 1e-12))).toBeLessThan(1e-6);
  });

  test('is increasing (property)', () => {
    fc.assert(fc.property(fc.double({ min: -2, max: 2, noNaN: true }), (c) => srgbTransfer(c + 1e-6) > srgbTransfer(c)));
  });
});
