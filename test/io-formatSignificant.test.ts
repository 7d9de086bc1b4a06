import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { formatSignificant } from '../lib/io/formatSignificant.js';

describe('formatSignificant(x, digits, trim)', () => {
  test.each([
    { x: 5772.4, digits: 4, trim: false, text: '5772' },
    { x: 1, digits: 4, trim: false, text: '1.000' },
    { x: 1, digits: 4, trim: true, text: '1' },
    { x: 0.014, digits: 3, trim: true, text: '0.014' },
    { x: 0.0123456, digits: 3, trim: false, text: '0.0123' },
    { x: 0.001, digits: 2, trim: false, text: '0.0010' },
    { x: 0.0001234, digits: 3, trim: false, text: '1.23e-4' },
    { x: 123456, digits: 4, trim: false, text: '123500' },
    { x: 999999, digits: 4, trim: false, text: '1.000e6' },
    { x: 2.5e7, digits: 3, trim: true, text: '2.5e7' },
    { x: -3.14159, digits: 3, trim: false, text: '-3.14' },
    { x: 0, digits: 4, trim: false, text: '0' },
    { x: 9.9996, digits: 4, trim: false, text: '10.00' },
    { x: Number.NaN, digits: 4, trim: false, text: 'NaN' },
    { x: Number.POSITIVE_INFINITY, digits: 4, trim: false, text: 'Infinity' },
  ])('formatSignificant($x, $digits, $trim) is $text', ({ x, digits, trim, text }) => {
    expect(formatSignificant(x, digits, trim)).toBe(text);
  });

  test.each([0, 18, 2.5, Number.NaN])('formatSignificant(1, %s) throws RangeError', (digits) => {
    expect(() => formatSignificant(1, digits)).toThrow(RangeError);
  });

  test('reads back within half a unit of the last significant digit (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e12, max: 1e12, noNaN: true }).filter((x) => Math.abs(x) > 1e-12),
        fc.integer({ min: 1, max: 8 }),
        fc.boolean(),
        (x, digits, trim) => {
          const back = Number(formatSignificant(x, digits, trim));
          const unit = 10 ** (Math.floor(Math.log10(Math.abs(x))) - digits + 1);
          expect(Math.abs(back - x)).toBeLessThanOrEqual(unit * 0.5 * (1 + 1e-9) + Math.abs(x) * 1e-15);
        },
      ),
    );
  });
});
