import { describe, expect, test } from 'vitest';
import { toJson } from '../lib/io/toJson.js';

describe('toJson(value, indent)', () => {
  test('writes what JSON.stringify writes when every number is finite and nothing is undefined', () => {
    const value = { teff: 5772, bv: null, phases: [{ phase: 'main-sequence', age: 0 }] };
    expect(toJson(value)).toBe(JSON.stringify(value));
    expect(toJson(value, 2)).toBe(JSON.stringify(value, null, 2));
  });

  test.each([
    { name: 'NaN', value: { teff: Number.NaN }, path: '$.teff' },
    { name: 'Infinity in an array', value: { xs: [1, Number.POSITIVE_INFINITY] }, path: '$.xs[1]' },
    { name: 'undefined property', value: { a: { b: undefined } }, path: '$.a.b' },
  ])('refuses $name, naming $path', ({ value, path }) => {
    expect(() => toJson(value)).toThrow(path);
  });
});
