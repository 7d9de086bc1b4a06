import { expect, test } from 'vitest';
import { DEFAULT_BATCH_COLUMNS, planBatch, type BatchPlanRequest } from '../lib/io/batchPlan.js';

const plan = (names: string[], more: Partial<BatchPlanRequest> = {}) =>
  planBatch({ input: 'csv', output: 'csv', filter: false, names, defaultZ: 0.014, ...more });

test.each([
  { name: 'initialMass before mass', names: ['mass', 'initialMass', 'age_Gyr'], mass: 1, age: 2, unit: 'Gyr' },
  { name: 'mass, any case', names: ['Name', 'MASS', 'Age (Myr)'], mass: 1, age: 2, unit: 'Myr' },
  { name: 'a mass with its unit', names: ['mass_Msun', 'age[yr]'], mass: 0, age: 1, unit: 'yr' },
  { name: 'age/kyr', names: ['initial_mass', 'age/kyr'], mass: 0, age: 1, unit: 'kyr' },
  { name: 'age [gyr] (unit without regard to case)', names: ['mass', 'age [gyr]'], mass: 0, age: 1, unit: 'Gyr' },
  { name: 'a bare age column (units then in the cells)', names: ['mass', 'age'], mass: 0, age: 1, unit: null },
])('planBatch(names) finds the columns: $name', ({ names, mass, age, unit }) => {
  const p = plan(names);
  expect(p.mass.index).toBe(mass);
  expect(p.age.index).toBe(age);
  expect(p.age.unit).toBe(unit);
});

test.each([
  { name: 'z column', names: ['mass', 'age_Gyr', 'Z'], want: { kind: 'column', index: 2, name: 'Z' } },
  { name: '[Fe/H] column', names: ['mass', 'age_Gyr', '[Fe/H]'], want: { kind: 'feh', index: 2, name: '[Fe/H]' } },
  { name: 'z wins over feh', names: ['feh', 'mass', 'age_Gyr', 'z'], want: { kind: 'column', index: 3, name: 'z' } },
  { name: 'no column: the default', names: ['mass', 'age_Gyr'], want: { kind: 'constant', value: 0.014 } },
])('planBatch(names) takes the metallicity from: $name', ({ names, want }) => {
  expect(plan(names).z).toEqual(want);
});

test('planBatch(names, { z }) uses --z for a table without a metallicity column', () => {
  expect(plan(['mass', 'age_Gyr'], { z: 0.002 }).z).toEqual({ kind: 'constant', value: 0.002 });
});

test('planBatch prefixes a computed column whose name the input has, and writes the header once', () => {
  const p = plan(['name', 'mass', 'Teff', 'age_Gyr'], { headerRaw: 'name,mass,Teff,age_Gyr' });
  expect(p.computed).toEqual(DEFAULT_BATCH_COLUMNS);
  expect(p.computedNames).toContain('sc_mass');
  expect(p.computedNames).toContain('sc_teff');
  expect(p.computedNames).toContain('phase');
  const header = p.header.trimEnd().split(',');
  expect(new Set(header.map((h) => h.toLowerCase())).size).toBe(header.length);
  expect(p.rejectsHeader).toBe('row,reason,name,mass,Teff,age_Gyr\n');
});

test('planBatch keeps a BOM and CRLF of the input header', () => {
  const p = plan(['m', 'age_Gyr'], { headerRaw: 'm,age_Gyr', bom: true, eol: '\r\n', massCol: 'm', columns: ['phase'] });
  expect(p.header).toBe('\uFEFFm,age_Gyr,phase\r\n');
});

test('planBatch with --columns-in (line filter) reads ages in yr by default and writes no header', () => {
  const p = plan(['id', 'mass', 'age', 'z'], { filter: true });
  expect(p.age).toMatchObject({ unit: 'yr', years: 1 });
  expect(p.header).toBe('');
});

test.each([
  { name: 'no mass column', names: ['name', 'age_Gyr'], more: {}, message: /no birth-mass column.*'name', 'age_Gyr'/ },
  { name: 'no age column', names: ['mass', 'when'], more: {}, message: /no age column/ },
  { name: 'two age columns', names: ['mass', 'age_Gyr', 'age_Myr'], more: {}, message: /more than one age column \('age_Gyr', 'age_Myr'\); pick one with --age-col/ },
  { name: 'an unknown age unit', names: ['mass', 'age_days'], more: {}, message: /column 'age_days': unknown age unit 'days'/ },
  { name: 'a mass unit other than Msun', names: ['mass (kg)', 'age_Gyr'], more: {}, message: /must be in Msun, not 'kg'/ },
  { name: '--age-unit against the header', names: ['mass', 'age_Gyr'], more: { ageUnit: 'Myr' }, message: /--age-unit Myr contradicts the unit in column 'age_Gyr' \(Gyr\)/ },
  { name: 'an unknown --age-unit', names: ['mass', 'age'], more: { ageUnit: 'days' }, message: /--age-unit 'days' is not one of yr, kyr, Myr, Gyr/ },
  { name: '--z with a z column', names: ['mass', 'age_Gyr', 'z'], more: { z: 0.02 }, message: /--z 0.02 given but the header has the metallicity column 'z'/ },
  { name: '--mass-col naming no column', names: ['mass', 'age_Gyr'], more: { massCol: 'm0' }, message: /--mass-col 'm0': no such column; the columns are 'mass', 'age_Gyr'/ },
  { name: 'an unknown --columns key', names: ['mass', 'age_Gyr'], more: { columns: ['teff', 'colour'] }, message: /--columns: 'colour' is not a state key; choose from initialMass, z, age, phase/ },
])('planBatch throws RangeError for $name', ({ names, more, message }) => {
  expect(() => plan(names, more)).toThrow(RangeError);
  expect(() => plan(names, more)).toThrow(message);
});
