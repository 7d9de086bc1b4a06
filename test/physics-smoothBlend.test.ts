import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { smoothBlend } from '../lib/physics/smoothBlend.js';

describe('smoothBlend(t, a, b)', () => {
  test.each([
    { t: -1, w: 0 }, { t: 0, w: 0 }, { t: 0.25, w: 0.15625 }, { t: 0.5, w: 0.5 }, { t: 1, w: 1 }, { t: 2, w: 1 },
  ])('gives $w at $t on [0, 1] (3u² − 2u³, common practice)', ({ t, w }) => {
    expect(smoothBlend(t, 0, 1)).toBeCloseTo(w, 12);
  });

  test('is non-decreasing and within [0, 1] (property)', () => {
    fc.assert(fc.property(fc.double({ min: -2, max: 3, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }),
      (t, d) => {
        const w = smoothBlend(t, 0, 1);
        return w >= 0 && w <= 1 && smoothBlend(t + d, 0, 1) >= w;
      }));
  });
});
