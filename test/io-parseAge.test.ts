import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { parseAge } from '../lib/io/parseAge.js';

// Units as defined by the project (DESIGN.md, "The star state"): 1 kyr = 1e3 yr,
// 1 Myr = 1e6 yr, 1 Gyr = 1e9 yr; a bare number is Gyr.
describe('parseAge(text) accepts a number with a unit', () => {
  test.each([
    { text: '4.6Gyr', years: 4.6e9 },
    { text: '300Myr', years: 3e8 },
    { text: '12kyr', years: 1.2e4 },
    { text: '5e9yr', years: 5e9 },
    { text: '5e9 yr', years: 5e9 },
    { text: '1.2e3Myr', years: 1.2e9 },
    { text: '0.5Gyr', years: 5e8 },
    { text: '.5Gyr', years: 5e8 },
    { text: '4.57 Gyr', years: 4.57e9 },
    { text: '1E6yr', years: 1e6 },
    { text: '2.5e-3Gyr', years: 2.5e6 },
    { text: ' 7Myr ', years: 7e6 },
    { text: '+3Gyr', years: 3e9 },
    { text: '2', years: 2e9 },
    { text: '13.8', years: 1.38e10 },
    { text: '1e1', years: 1e10 },
  ])('parseAge($text) is $years yr', ({ text, years }) => {
    expect(parseAge(text)).toBe(years);
  });

  test.each([
    { text: '0', years: 0 },
    { text: '0Myr', years: 0 },
    { text: '-1Gyr', years: -1e9 },
    { text: '-5', years: -5e9 },
  ])('parseAge($text) returns zero and negative values for the caller to check ($years)', ({ text, years }) => {
    expect(parseAge(text)).toBe(years);
  });
});

describe('parseAge(text) rejects anything else, quoting the text and the accepted forms', () => {
  test.each([
    { name: 'empty', text: '' },
    { name: 'blank', text: '   ' },
    { name: 'words', text: 'old' },
    { name: 'NaN', text: 'NaN' },
    { name: 'Infinity', text: 'Infinity' },
    { name: 'Infinity with unit', text: 'InfinityGyr' },
    { name: 'overflow', text: '1e999Gyr' },
    { name: 'two units', text: '5GyrMyr' },
    { name: 'two units with blank', text: '5 Gyr Myr' },
    { name: 'unit in wrong case', text: '5gyr' },
    { name: 'unit in capitals', text: '5GYR' },
    { name: 'unit Ga', text: '5Ga' },
    { name: 'unit only', text: 'Gyr' },
    { name: 'seconds', text: '5s' },
    { name: 'comma decimal', text: '4,6Gyr' },
    { name: 'two numbers', text: '4 5Gyr' },
    { name: 'hex', text: '0x10' },
    { name: 'dangling exponent', text: '5eGyr' },
  ])('parseAge(\'$text\') throws RangeError ($name)', ({ text }) => {
    expect(() => parseAge(text)).toThrow(RangeError);
    try {
      parseAge(text);
    } catch (error) {
      const message = (error as Error).message;
      expect(message).toContain(`'${text}'`);
      expect(message).toContain('yr, kyr, Myr or Gyr');
      expect(message).toContain('bare number is Gyr');
    }
  });

  test('parseAge(non-string) throws TypeError', () => {
    expect(() => parseAge(5 as unknown as string)).toThrow(TypeError);
  });
});

describe('parseAge(text) properties', () => {
  const units = [
    { unit: 'yr', scale: 1 },
    { unit: 'kyr', scale: 1e3 },
    { unit: 'Myr', scale: 1e6 },
    { unit: 'Gyr', scale: 1e9 },
  ] as const;

  test('parseAge(String(x) + unit) equals x times the unit within one rounding', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        fc.constantFrom(...units),
        fc.boolean(),
        (x, { unit, scale }, blank) => {
          const years = parseAge(`${x}${blank ? ' ' : ''}${unit}`);
          expect(years).toBeCloseTo(x * scale, -Math.floor(Math.log10(x * scale)) + 12);
        },
      ),
    );
  });

  test('a bare number reads the same as the number with Gyr', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e3, max: 1e3, noNaN: true }), (x) => {
        expect(parseAge(String(x))).toBe(parseAge(`${x}Gyr`));
      }),
    );
  });

  test('the result is finite or the call throws, never NaN', () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        let years: number;
        try {
          years = parseAge(text);
        } catch (error) {
          expect(error).toBeInstanceOf(RangeError);
          return;
        }
        expect(Number.isFinite(years)).toBe(true);
      }),
    );
  });
});
