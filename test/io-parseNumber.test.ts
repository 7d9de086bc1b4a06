import { describe, expect, test } from 'vitest';
import { parseNumber } from '../lib/io/parseNumber.js';

describe('parseNumber(text)', () => {
  test.each([
    { text: '1', x: 1 },
    { text: '-0.5', x: -0.5 },
    { text: '+2', x: 2 },
    { text: '1e-4', x: 1e-4 },
    { text: '1.5E3', x: 1500 },
    { text: '.25', x: 0.25 },
    { text: '3.', x: 3 },
    { text: ' 7 ', x: 7 },
  ])('parseNumber($text) is $x', ({ text, x }) => {
    expect(parseNumber(text)).toBe(x);
  });

  test.each(['', ' ', 'NaN', 'Infinity', '-Infinity', '0x10', '12abc', '1,5', '1e', 'e5', '1e999', '--1'])(
    "parseNumber('%s') throws RangeError quoting the text",
    (text) => {
      expect(() => parseNumber(text)).toThrow(RangeError);
      expect(() => parseNumber(text)).toThrow(`'${text}'`);
    },
  );
});
