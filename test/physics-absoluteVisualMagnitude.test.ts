import { describe, expect, test } from 'vitest';
import { absoluteVisualMagnitude } from '../lib/physics/absoluteVisualMagnitude.js';
import { DWARF_TABLE } from '../lib/physics/dwarfTable.js';

describe('absoluteVisualMagnitude(luminosity, teff)', () => {
  test.each([
    { ref: 4.81, src: 'Willmer 2018, ApJS 236, 47' },
    { ref: 4.83, src: 'Mamajek 2012' },
  ])('gives the Sun M_V $ref ($src) within 0.05 mag', ({ ref }) => {
    expect(Math.abs(absoluteVisualMagnitude(1, 5772) - ref)).toBeLessThan(0.05);
  });

  // Pecaut & Mamajek 2013 dwarf table v2024.05.15 (REFERENCES.md): M_V from its own log L and
  // Teff. Tolerance 0.06 mag: the table's log L is given to 0.001 dex (0.0025 mag) and our BC_V
  // differs from the table's by ≤ 0.05 mag where Torres is used.
  test.each(Array.from(DWARF_TABLE.type, (type, i) => ({
    type, L: 10 ** DWARF_TABLE.logL[i], teff: DWARF_TABLE.teff[i], mv: DWARF_TABLE.mv[i],
  })))('matches the dwarf-table row $type (M_V $mv) within 0.06 mag', ({ L, teff, mv }) => {
    expect(Math.abs(absoluteVisualMagnitude(L, teff) - mv)).toBeLessThan(0.06);
  });

  test.each([{ L: 0, teff: 5772 }, { L: 1, teff: 5 }])('throws RangeError for L $L, teff $teff', ({ L, teff }) => {
    expect(() => absoluteVisualMagnitude(L, teff)).toThrow(RangeError);
  });
});
