import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { monotoneCubic } from '../lib/physics/monotoneCubic.js';

describe('monotoneCubic(xs, ys)', () => {
  test('passes through every knot exactly', () => {
    const xs = [0, 1, 2.5, 4, 7];
    const ys = [3, 1, 1, -2, 5];
    const f = monotoneCubic(xs, ys);
    xs.forEach((x, i) => expect(f(x)).toBe(ys[i]));
  });

  test('gives 0.6875 at 0.5 for knots (0,0),(1,1),(2,1) (hand-computed from Steffen 1990 slopes)', () => {
    expect(monotoneCubic([0, 1, 2], [0, 1, 1])(0.5)).toBeCloseTo(0.6875, 12);
  });

  test('reproduces a straight line exactly (Steffen 1990 slopes are exact for linear data)', () => {
    const f = monotoneCubic([0, 1, 3, 4], [1, 3, 7, 9]);
    for (const x of [0.3, 1.7, 2.2, 3.9]) expect(f(x)).toBeCloseTo(1 + 2 * x, 12);
  });

  test('stays monotone between monotone knots and never overshoots (property)', () => {
    fc.assert(fc.property(
      fc.array(fc.double({ min: 0.1, max: 10, noNaN: true }), { minLength: 3, maxLength: 8 }),
      fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: 8, maxLength: 8 }),
      (dx, dy) => {
        const xs: number[] = [0];
        const ys: number[] = [0];
        for (let i = 0; i < dx.length; i++) { xs.push(xs[i] + dx[i]); ys.push(ys[i] + dy[i]); }
        const f = monotoneCubic(xs, ys);
        let prev = -Infinity;
        for (let t = 0; t <= xs[xs.length - 1]; t += xs[xs.length - 1] / 200) {
          const v = f(t);
          if (v < prev - 1e-9 || v > ys[ys.length - 1] + 1e-9) return false;
          prev = v;
        }
        return true;
      },
    ));
  });

  test('clamps to the end knots outside the range', () => {
    const f = monotoneCubic([0, 1], [2, 4]);
    expect(f(-5)).toBe(2);
    expect(f(5)).toBe(4);
  });

  test.each([
    { xs: [0], ys: [0] },
    { xs: [0, 1], ys: [0] },
    { xs: [0, 0], ys: [0, 1] },
    { xs: [0, NaN], ys: [0, 1] },
  ])('throws RangeError for xs $xs, ys $ys', ({ xs, ys }) => {
    expect(() => monotoneCubic(xs, ys)).toThrow(RangeError);
  });
});
