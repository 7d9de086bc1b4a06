import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { DWARF_TABLE } from '../lib/physics/dwarfTable.js';
import { spectralType } from '../lib/physics/spectralType.js';

const FORM = /^([OBAFGKMLTY])([0-9])(Ia|Ib|II|III|IV|V)$/;
const index = (t: string) => {
  const m = FORM.exec(t);
  if (!m) throw new Error(`bad type ${t}`);
  return 'OBAFGKMLTY'.indexOf(m[1]) * 10 + Number(m[2]);
};
/** log g = 4.438 + log M − 2 log R (IAU 2015 B3), from the table's own M and R. */
const rowLogg = (i: number) => 4.438 + Math.log10(DWARF_TABLE.mass[i]) - 2 * Math.log10(DWARF_TABLE.radius[i]);

describe('spectralType(teff, logg)', () => {
  // Pecaut & Mamajek 2013 dwarf table v2024.05.15 (REFERENCES.md): ±1 subtype and class V.
  test.each(Array.from(DWARF_TABLE.type, (type, i) => ({ type, teff: DWARF_TABLE.teff[i], logg: rowLogg(i) })))(
    'gives $type within ±1 subtype, class V, at $teff K', ({ type, teff, logg }) => {
      const got = spectralType(teff, logg);
      expect(Math.abs(index(got) - index(type))).toBeLessThanOrEqual(1);
      expect(got.endsWith('V') && !got.endsWith('IV')).toBe(true);
    },
  );

  test.each([
    { teff: 5772, logg: 4.438, type: 'G2V', src: 'the Sun, IAU 2015 B3' },
    // Typical class log g values (from memory; common practice): red-clump giant, subgiant,
    // red supergiant, A supergiant, B giant
    { teff: 4800, logg: 2.5, type: 'K3III', src: 'red-clump giant (from memory)' },
    { teff: 5300, logg: 3.8, type: 'K0IV', src: 'subgiant (from memory)' },
    { teff: 3600, logg: -0.8, type: 'M2Ia', src: 'red supergiant (from memory)' },
    { teff: 8500, logg: 1.1, type: 'A3Ia', src: 'A supergiant (from memory)' },
    { teff: 20000, logg: 3.3, type: 'B2III', src: 'B giant (from memory)' },
    // Brown dwarfs, Teff scale from memory of the Pecaut & Mamajek table
    { teff: 1710, logg: 5.0, type: 'L5V', src: 'from memory' },
    { teff: 1060, logg: 5.0, type: 'T5V', src: 'from memory' },
    { teff: 450, logg: 4.5, type: 'Y0V', src: 'from memory' },
  ])('gives $type at $teff K, log g $logg ($src)', ({ teff, logg, type }) => {
    expect(spectralType(teff, logg)).toBe(type);
  });

  test('clamps to O3 above 44900 K and Y2 below 350 K (documented limits)', () => {
    expect(spectralType(1e6, 8)).toBe('O3V');
    expect(spectralType(100, 5)).toBe('Y2V');
  });

  test('always returns one of the allowed forms over 10 K – 1e9 K (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 9, noNaN: true }), fc.double({ min: -3, max: 10, noNaN: true }),
      (lt, g) => FORM.test(spectralType(10 ** lt, g))));
  });

  test('gets later (never earlier) as Teff falls at fixed log g (property)', () => {
    fc.assert(fc.property(fc.double({ min: 2, max: 5, noNaN: true }), fc.double({ min: 1e-3, max: 0.5, noNaN: true }),
      (lt, d) => index(spectralType(10 ** (lt - d), 4.5)) >= index(spectralType(10 ** lt, 4.5))));
  });

  test.each([{ teff: 5772, logg: NaN }, { teff: 5772, logg: 11 }, { teff: 0, logg: 4 }])(
    'throws RangeError for teff $teff, logg $logg', ({ teff, logg }) => {
      expect(() => spectralType(teff, logg)).toThrow(RangeError);
    },
  );
});
