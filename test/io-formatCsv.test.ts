import { describe, expect, test } from 'vitest';
import { formatCsv } from '../lib/io/formatCsv.js';

// Quoting rules of RFC 4180 (Shafranovich 2005), §2.
describe('formatCsv(header, rows)', () => {
  test('writes plain fields as they are and null/undefined as empty', () => {
    expect(formatCsv(['name', 'mass', 'bv'], [['Vesk A', 1, null], ['Vesk B', 0.25, undefined]])).toBe(
      'name,mass,bv\nVesk A,1,\nVesk B,0.25,\n',
    );
  });

  test.each([
    { cell: 'a,b', field: '"a,b"' },
    { cell: 'say "hi"', field: '"say ""hi"""' },
    { cell: 'two\nlines', field: '"two\nlines"' },
    { cell: 'cr\r', field: '"cr\r"' },
    { cell: "Pellin's Coal", field: "Pellin's Coal" },
  ])('quotes $cell as $field', ({ cell, field }) => {
    expect(formatCsv(['x'], [[cell]])).toBe(`x\n${field}\n`);
  });

  test('writes numbers so they read back exactly', () => {
    const x = 0.1 + 0.2;
    const text = formatCsv(['x'], [[x]]);
    expect(Number(text.split('\n')[1])).toBe(x);
  });

  test('throws RangeError naming row and column for a non-finite number', () => {
    expect(() => formatCsv(['a', 'teff'], [[1, 2], [3, Number.NaN]])).toThrow(/row 2, column 2 \(teff\): NaN/);
  });

  test('throws RangeError for a row of the wrong length', () => {
    expect(() => formatCsv(['a', 'b'], [[1]])).toThrow(/row 1 has 1 cells, expected 2/);
  });
});
