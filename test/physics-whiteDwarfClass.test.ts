import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { whiteDwarfClass } from '../lib/physics/whiteDwarfClass.js';

describe('whiteDwarfClass(teff)', () => {
  test.each([
    // Sion et al. 1983, ApJ 269, 253: index 50400/Teff (REFERENCES.md, C)
    { teff: 25200, cls: 'DA2.0' },
    { teff: 10080, cls: 'DA5.0' },
    // D: 50400/6000 = 8.4; 50400/4000 = 12.6, below 5000 K no lines (common practice: DC)
    { teff: 6000, cls: 'DA8.4' },
    { teff: 4000, cls: 'DC12.6' },
    { teff: 1e7, cls: 'DA0.1' }, // documented floor of the index
  ])('gives $cls at $teff K', ({ teff, cls }) => {
    expect(whiteDwarfClass(teff)).toBe(cls);
  });

  test('index parses back to 50400/Teff within 0.05 (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1000, max: 400000, noNaN: true }), (t) => {
      const m = /^D[AC](\d+\.\d)$/.exec(whiteDwarfClass(t));
      return m !== null && Math.abs(Number(m[1]) - 50400 / t) <= 0.05 + 1e-9;
    }));
  });

  test.each([{ teff: NaN }, { teff: -1 }])('throws RangeError for teff $teff', ({ teff }) => {
    expect(() => whiteDwarfClass(teff)).toThrow(RangeError);
  });
});
