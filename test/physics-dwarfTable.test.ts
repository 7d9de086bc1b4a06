import { describe, expect, test } from 'vitest';
import { DWARF_TABLE } from '../lib/physics/dwarfTable.js';

describe('DWARF_TABLE', () => {
  test('pins Pecaut & Mamajek 2013 table version v2024.05.15', () => {
    expect(DWARF_TABLE.version).toMatch(/v2024\.05\.15/);
  });

  test('has parallel columns in order of decreasing Teff', () => {
    const n = DWARF_TABLE.type.length;
    for (const col of [DWARF_TABLE.bv, DWARF_TABLE.bcv, DWARF_TABLE.mv, DWARF_TABLE.logL, DWARF_TABLE.radius, DWARF_TABLE.mass]) {
      expect(col.length).toBe(n);
    }
    for (let i = 1; i < n; i++) expect(DWARF_TABLE.teff[i]).toBeLessThan(DWARF_TABLE.teff[i - 1]);
  });

  // Internal consistency of the transcribed rows: Stefan–Boltzmann L = R² (T/5772)⁴ (IAU 2015 B3)
  // against the table's log L. ±0.03 dex: the table rounds R to 3 significant figures.
  test.each(Array.from(DWARF_TABLE.type, (type, i) => ({ type, i })))('row $type obeys Stefan–Boltzmann within 0.03 dex', ({ i }) => {
    const logL = Math.log10(DWARF_TABLE.radius[i] ** 2 * (DWARF_TABLE.teff[i] / 5772) ** 4);
    expect(Math.abs(logL - DWARF_TABLE.logL[i])).toBeLessThan(0.03);
  });
});
