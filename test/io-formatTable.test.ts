import { describe, expect, test } from 'vitest';
import { formatTable } from '../lib/io/formatTable.js';

describe('formatTable(header, rows, align)', () => {
  test('pads columns to the widest cell, first left and the rest right by default', () => {
    expect(formatTable(['key', 'value'], [['teff', '5772'], ['luminosity', '1.000']])).toBe(
      'key         value\n' + '----------  -----\n' + 'teff         5772\n' + 'luminosity  1.000\n',
    );
  });

  test('counts code points, so arrows and dashes take one column', () => {
    const out = formatTable(['a', 'b'], [['—', '1 → 2']], ['left', 'left']);
    expect(out.split('\n')[2]).toBe('—  1 → 2');
  });

  test('removes trailing blanks', () => {
    const out = formatTable(['name', 'unit'], [['z', '']], ['left', 'left']);
    expect(out.split('\n').every((line) => line === line.trimEnd())).toBe(true);
  });

  test('throws RangeError naming the row when a row has the wrong length', () => {
    expect(() => formatTable(['a', 'b'], [['1', '2'], ['3']])).toThrow(/row 2 has 1 cells, expected 2/);
  });
});
