import { describe, expect, test } from 'vitest';
import { blackbodyXyz } from '../lib/physics/blackbodyXyz.js';

describe('blackbodyXyz(teff, c2, out)', () => {
  test('gives near-D65 chromaticity at 6504 K (CIE D65 x 0.3127, y 0.3290; from memory), ±0.01', () => {
    // D65 is a daylight spectrum, not a blackbody; the 6504 K Planckian point lies ~0.005 from it.
    const [x, y] = blackbodyXyz(6504, undefined, [0, 0, 0]);
    expect(Math.abs(x - 0.3127)).toBeLessThan(0.01);
    expect(Math.abs(y - 0.329)).toBeLessThan(0.01);
  });

  test('is normalised to X + Y + Z = 1 and finite from 10 K to 1e9 K', () => {
    for (const t of [10, 300, 5772, 1e5, 1e9]) {
      const v = blackbodyXyz(t, undefined, new Float64Array(3));
      expect(v[0] + v[1] + v[2]).toBeCloseTo(1, 12);
      expect(Array.from(v).every(Number.isFinite)).toBe(true);
    }
  });

  test('writes into and returns the given buffer', () => {
    const out = new Float64Array(3);
    expect(blackbodyXyz(3000, undefined, out)).toBe(out);
  });
});
