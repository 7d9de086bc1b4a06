import { describe, expect, test } from 'vitest';
import { fehFromZ, zFromFeh } from '../lib/model/zFromFeh.js';
import { composition } from '../lib/model/composition.js';

describe('zFromFeh(feh)', () => {
  test('zFromFeh(0) is the solar 0.014 (DESIGN.md default; relative 1e-12)', () => expect(Math.abs(zFromFeh(0) / 0.014 - 1)).toBeLessThan(1e-12));
  test('keeps Z/X = (Z/X)☉ 10^[Fe/H] (solar-scaled definition of [M/H])', () => {
    for (const feh of [-3, -2, -1, -0.5, 0.3]) {
      const z = zFromFeh(feh);
      const ratio = z / composition(z).x / (0.014 / composition(0.014).x);
      expect(Math.log10(ratio)).toBeCloseTo(feh, 10);
    }
  });
  test('gives ≈ 0.00146 at [Fe/H] = −1 (the doc example; ±1e-5)', () => expect(Math.abs(zFromFeh(-1) - 0.00146)).toBeLessThan(1e-5));
  test('is inverted by fehFromZ', () => {
    for (const feh of [-2.5, -1, 0, 0.25]) expect(fehFromZ(zFromFeh(feh))).toBeCloseTo(feh, 10);
  });
  test.each([NaN, Infinity, -Infinity])('throws RangeError naming feh for %s', (feh) => {
    expect(() => zFromFeh(feh)).toThrow(RangeError);
    expect(() => zFromFeh(feh)).toThrow(/feh/);
  });
});

describe('composition(z)', () => {
  test('sums to 1 and puts the Sun near Y = 0.27 (doc comment; ΔY/ΔZ = 1.6, common practice)', () => {
    const c = composition(0.014);
    expect(c.x + c.y + c.z).toBeCloseTo(1, 14);
    expect(Math.abs(c.y - 0.2694)).toBeLessThan(1e-4);
  });
});
