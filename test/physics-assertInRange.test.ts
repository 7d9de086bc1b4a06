import { describe, expect, test } from 'vitest';
import { assertInRange } from '../lib/physics/assertInRange.js';

describe('assertInRange(name, value, min, max, unit, exclusiveMin)', () => {
  test.each([
    { value: 5, min: 0, max: 10, excl: false },
    { value: 0, min: 0, max: 10, excl: false },
    { value: 10, min: 0, max: 10, excl: false },
    { value: 1e300, min: 0, max: Infinity, excl: true },
  ])('returns $value inside [$min, $max]', ({ value, min, max, excl }) => {
    expect(assertInRange('v', value, min, max, 'K', excl)).toBe(value);
  });

  test.each([
    { value: NaN, msg: /teff NaN outside the valid range \[10, 1000\] K/ },
    { value: Infinity, msg: /teff Infinity outside/ },
    { value: 9, msg: /teff 9 outside the valid range \[10, 1000\] K/ },
    { value: 1001, msg: /teff 1001 outside/ },
  ])('throws RangeError naming teff and its range for $value', ({ value, msg }) => {
    expect(() => assertInRange('teff', value, 10, 1000, 'K')).toThrow(RangeError);
    expect(() => assertInRange('teff', value, 10, 1000, 'K')).toThrow(msg);
  });

  test('throws RangeError for the excluded lower bound with "> 0" in the message', () => {
    expect(() => assertInRange('mass', 0, 0, Infinity, 'Msun', true)).toThrow(/mass 0 outside the valid range > 0 Msun/);
  });

  test('throws TypeError for a non-number', () => {
    expect(() => assertInRange('mass', '1' as unknown as number, 0, 1, '')).toThrow(TypeError);
  });
});
