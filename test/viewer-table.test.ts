import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { readStarTable } from '../lib/io/viewerPayloadTable.js';
import { ROOT } from './cli-run.js';

describe('readStarTable(text, options)', () => {
  test('reads a CSV with the age unit in the header, names and z', () => {
    const t = readStarTable('name,initialMass,age_Gyr,z\nWendhal,1,4.1,0.014\n"Korrund\'s Pyre, the second",18,0.014,0.02\n');
    expect(Array.from(t.initialMass)).toEqual([1, 18]);
    expect(Array.from(t.age)).toEqual([4.1e9, 0.014e9]);
    expect(Array.from(t.z)).toEqual([0.014, 0.02]);
    expect(t.name).toEqual(['Wendhal', "Korrund's Pyre, the second"]);
    expect(t.ageUnit).toEqual({ unit: 'Gyr', from: 'header' });
  });

  test.each([
    ['age_Gyr', 1e9], ['age (Myr)', 1e6], ['age [kyr]', 1e3], ['ageGyr', 1e9], ['age_yr', 1],
  ])('reads the unit of header %s', (header, scale) => {
    expect(readStarTable(`initialMass,${header.includes(',') ? `"${header}"` : header}\n1,2\n`).age[0]).toBe(2 * scale);
  });

  test('reads bare ages as yr (the schema unit) unless --age-unit says otherwise', () => {
    expect(readStarTable('initialMass,age\n1,4.6e9\n').age[0]).toBe(4.6e9);
    expect(readStarTable('initialMass,age\n1,4.6\n', { ageUnit: 'Gyr' }).age[0]).toBe(4.6e9);
    expect(readStarTable('initialMass,age\n1,4.6\n', { ageUnit: 'Gyr' }).ageUnit.from).toBe('option');
  });

  test('takes a value with its own unit as written', () => {
    expect(readStarTable('initialMass,age\n1,300Myr\n').age[0]).toBe(3e8);
  });

  test('prefers initialMass over the present mass of a batch output, and defaults z to solar', () => {
    const t = readStarTable('initialMass,z,age,phase,mass\n5,0.02,1e8,main-sequence,4.9\n2,,1e9,main-sequence,2\n');
    expect(Array.from(t.initialMass)).toEqual([5, 2]);
    expect(Array.from(t.z)).toEqual([0.02, 0.014]);
    expect(t.columns.mass).toBe('initialMass');
  });

  test('falls back to a mass column', () => {
    expect(readStarTable('mass,age\n0.8,1e9\n').columns.mass).toBe('mass');
  });

  test('reads CRLF, a byte-order mark and comment lines', () => {
    const t = readStarTable('\uFEFF# made by hand\r\nname,initialMass,age_Myr\r\nA,1,10\r\n');
    expect(t.name).toEqual(['A']);
    expect(t.age[0]).toBe(1e7);
  });

  test('reads NDJSON and a JSON array', () => {
    const nd = readStarTable('{"name":"a","initialMass":1,"age":1e9}\n\n{"name":"b","initialMass":2,"age":2e9,"z":0.01}\n');
    expect(nd.name).toEqual(['a', 'b']);
    expect(Array.from(nd.z)).toEqual([0.014, 0.01]);
    const arr = readStarTable('[{"initialMass":1,"age":"4.6Gyr"}]');
    expect(arr.age[0]).toBe(4.6e9);
    expect(arr.name).toBeNull();
  });

  test('reads the demo catalogue', () => {
    const t = readStarTable(readFileSync(join(ROOT, 'tracks-demo', 'orvel-catalogue.csv'), 'utf8'));
    expect(t.initialMass.length).toBeGreaterThan(10);
    expect(t.ageUnit.unit).toBe('Gyr');
  });

  test.each([
    ['no mass column', 'age\n1\n', /no birth-mass column \(initialMass or mass\) among: age/],
    ['no age column', 'initialMass\n1\n', /no age column/],
    ['two age columns', 'initialMass,age,age_Gyr\n1,1,1\n', /several age columns/],
    ['no rows', 'initialMass,age\n', /no rows/],
    ['a bad mass', 'initialMass,age\n1,1\nheavy,1\n', /line 3: initialMass 'heavy' is not a number/],
    ['a negative mass', 'initialMass,age\n-1,1\n', /line 2: initialMass -1 must be > 0 Msun/],
    ['a negative age', 'initialMass,age\n1,-5\n', /line 2: age '-5' must be a finite age ≥ 0/],
    ['an empty age', 'initialMass,age\n1,\n', /line 2: age is empty/],
    ['a zero z', 'initialMass,age,z\n1,1,0\n', /line 2: z 0 must be > 0/],
    ['a short row', 'initialMass,age\n1\n', /line 2: 1 fields, the header has 2/],
    ['an unclosed quote', 'initialMass,age\n"1,1\n', /line 2: field 1 opens a quote/],
    ['bad NDJSON', '{"initialMass":1,"age":1}\n{oops}\n', /line 2: not valid JSON/],
    ['a JSON array of numbers', '[1,2]', /line 1: expected an object/],
  ])('throws RangeError for %s, naming where', (_n, text, message) => {
    expect(() => readStarTable(text)).toThrow(message);
  });

  test('refuses an --age-unit that contradicts the header, and an unknown one', () => {
    expect(() => readStarTable('initialMass,age_Gyr\n1,1\n', { ageUnit: 'Myr' })).toThrow(/gives ages in Gyr, but --age-unit is Myr/);
    expect(() => readStarTable('initialMass,age\n1,1\n', { ageUnit: 'fortnight' })).toThrow(/not one of yr, kyr, Myr, Gyr/);
  });
});
