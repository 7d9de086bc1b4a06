import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { formatAge } from '../lib/io/formatAge.js';
import { parseAge } from '../lib/io/parseAge.js';

describe('formatAge(years, digits)', () => {
  test.each([
    { years: 4.57e9, digits: 4, text: '4.57', unit: 'Gyr' },
    { years: 1.23e7, digits: 3, text: '12.3', unit: 'Myr' },
    { years: 9.9996e8, digits: 4, text: '1', unit: 'Gyr' },
    { years: 999.4e6, digits: 4, text: '999.4', unit: 'Myr' },
    { years: 12000, digits: 4, text: '12', unit: 'kyr' },
    { years: 500, digits: 4, text: '500', unit: 'yr' },
    { years: 0, digits: 4, text: '0', unit: 'yr' },
    { years: 1e11, digits: 4, text: '100', unit: 'Gyr' },
    { years: 1.8e13, digits: 3, text: '18000', unit: 'Gyr' },
  ])('formatAge($years, $digits) is $text $unit', ({ years, digits, text, unit }) => {
    expect(formatAge(years, digits)).toEqual({ text, unit });
  });

  test('its text and unit read back through parseAge within the shown precision (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e11, noNaN: true }), (years) => {
        const { text, unit } = formatAge(years, 4);
        const back = parseAge(`${text}${unit}`);
        expect(Math.abs(back / years - 1)).toBeLessThanOrEqual(5e-4);
      }),
    );
  });
});
