import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { bvColor } from '../lib/physics/bvColor.js';
import { DWARF_TABLE } from '../lib/physics/dwarfTable.js';

/** Ballesteros 2012, EPL 97, 34008: T(B−V) forward formula, to test our inverse against. */
const ballesteros = (bv: number) => 4600 * (1 / (0.92 * bv + 1.7) + 1 / (0.92 * bv + 0.62));

describe('bvColor(teff)', () => {
  test('gives B−V 0.650 at 5778.4 K, the Ballesteros 2012 point (REFERENCES.md, D), ±1e-4', () => {
    expect(Math.abs(bvColor(5778.4) - 0.65)).toBeLessThan(1e-4);
  });

  test('inverts Ballesteros 2012 exactly where it is used alone (4150–9000 K), ±1e-9 mag', () => {
    for (const bv of [0.15, 0.3, 0.5, 0.65, 0.8, 1.0, 1.2]) {
      expect(Math.abs(bvColor(ballesteros(bv)) - bv)).toBeLessThan(1e-9);
    }
  });

  // Pecaut & Mamajek 2013 dwarf table v2024.05.15 (REFERENCES.md). Tolerance ±0.05 mag:
  // between 4150 and 9000 K the Ballesteros relation is used, which is good to ~5 % in Teff
  // for A0–M0 dwarfs (its paper); 5 % in Teff is ≈ 0.05–0.1 mag in B−V for F–K stars, and at
  // these rows it differs from the table by at most 0.045 mag (F0V).
  test.each(Array.from(DWARF_TABLE.type, (type, i) => ({ type, teff: DWARF_TABLE.teff[i], bv: DWARF_TABLE.bv[i] })))(
    'matches the dwarf-table row $type ($teff K, B−V $bv) within 0.05 mag', ({ teff, bv }) => {
      expect(Math.abs(bvColor(teff) - bv)).toBeLessThan(0.05);
    },
  );

  test('tends to the blackbody Rayleigh–Jeans limit −0.434 mag at 1e8 K (derived), ±0.002', () => {
    expect(Math.abs(bvColor(1e8) - -0.434)).toBeLessThan(0.002);
  });

  test('is strictly decreasing in Teff over 10 K – 1e9 K (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 8.49, noNaN: true }), fc.double({ min: 1e-4, max: 0.5, noNaN: true }),
      (lt, d) => bvColor(10 ** (lt + d)) < bvColor(10 ** lt)));
  });

  test('is finite over 300 K – 1e8 K (property)', () => {
    fc.assert(fc.property(fc.double({ min: Math.log10(300), max: 8, noNaN: true }),
      (lt) => Number.isFinite(bvColor(10 ** lt))));
  });

  test('is continuous across every join (steps < 0.002 mag for 1e-5 dex)', () => {
    for (const t of [3210, 3850, 4150, 9000, 9700, 33300]) {
      expect(Math.abs(bvColor(t * (1 - 2.3e-5)) - bvColor(t * (1 + 2.3e-5)))).toBeLessThan(0.002);
    }
  });

  test.each([{ teff: 0 }, { teff: NaN }, { teff: 1e10 }])('throws RangeError for teff $teff', ({ teff }) => {
    expect(() => bvColor(teff)).toThrow(RangeError);
  });
});
