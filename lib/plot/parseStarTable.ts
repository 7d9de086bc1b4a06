import { gridFileRecords } from '../tracks/gridFileRecords.js';
import { MAX_AGE } from '../model/limits.js';

/** A table of stars as columns: what an HR diagram of them needs. */
export interface StarTable {
  /** Msun */
  initialMass: Float64Array;
  /** yr */
  age: Float64Array;
  z: Float64Array;
  /** the header of the age column used, or null when `options.age` gave every star's age */
  ageColumn: string | null;
  /** the header of the z column used, or null when `options.z` gave every star's z */
  zColumn: string | null;
}

/** Ranges and fallbacks for reading a star table. */
export interface StarTableOptions {
  /** Msun, the valid initial masses (the grid's) */
  massRange: { min: number; max: number };
  /** the valid metal fractions (the grid's) */
  zRange: { min: number; max: number };
  /** z of every star when the table has no z column */
  z: number;
  /** yr: when given, every star is shown at this age and the table's ages are not read */
  age?: number;
}

// Age columns and the factor to yr of each; `age` is the schema's key, in yr.
const AGE_COLUMNS: readonly [string, number][] = [['age', 1], ['age_yr', 1], ['age_kyr', 1e3], ['age_Myr', 1e6], ['age_Gyr', 1e9]];
const MASS_COLUMNS = ['initialMass', 'mass'];

/**
 * Reads a CSV table of stars (RFC 4180 as gridFileRecords reads it: quotes, CRLF, BOM, `#`
 * comment lines and blank lines skipped) with a header row naming its columns: the birth
 * mass in `initialMass` (or `mass`), Msun; the age in `age` (yr, the schema's unit) or in
 * `age_yr`, `age_kyr`, `age_Myr` or `age_Gyr`; and optionally `z`. Other columns (a name, a
 * note) are ignored. Every value is checked.
 *
 * @param text the file's content
 * @param source the file's name, for messages
 * @param options valid ranges, and the z (and optionally the age) of every star
 * @throws RangeError naming the file, line, column, value and valid range of the first bad
 *   value (and how many more lines are bad); or naming the missing column
 * @example parseStarTable('initialMass,age_Gyr\n1,4.6\n', 't.csv', { massRange: { min: 0.01, max: 150 }, zRange: { min: 1e-4, max: 0.03 }, z: 0.014 }).age[0] // 4.6e9
 */
export function parseStarTable(text: string, source: string, options: StarTableOptions): StarTable {
  const records = gridFileRecords(text).filter((r) => r.kind === 'row');
  if (records.length === 0 || records[0].kind !== 'row') throw new RangeError(`${source}: no header row; the table needs columns initialMass (Msun) and age (yr) or age_Gyr`);
  const header = records[0].fields.map((f) => f.trim());
  const find = (names: readonly string[]) => {
    for (const name of names) {
      const i = header.indexOf(name);
      if (i >= 0) return i;
    }
    return -1;
  };
  const massAt = find(MASS_COLUMNS);
  if (massAt < 0) throw new RangeError(`${source}: no initialMass (or mass) column; found ${header.join(', ')}`);
  let ageAt = -1;
  let ageFactor = 1;
  if (options.age === undefined) {
    for (const [name, factor] of AGE_COLUMNS) {
      const i = header.indexOf(name);
      if (i >= 0) {
        ageAt = i;
        ageFactor = factor;
        break;
      }
    }
    if (ageAt < 0) throw new RangeError(`${source}: no age column (age in yr, or age_kyr, age_Myr, age_Gyr); found ${header.join(', ')}; or give every star one age with --age`);
  }
  const zAt = header.indexOf('z');
  const rows = records.slice(1);
  const n = rows.length;
  if (n === 0) throw new RangeError(`${source}: the table has a header but no stars`);
  const initialMass = new Float64Array(n);
  const age = new Float64Array(n);
  const z = new Float64Array(n);
  let first: string | null = null;
  let bad = 0;
  const value = (fields: string[], at: number): number => {
    const t = (fields[at] ?? '').trim();
    return t === '' ? NaN : Number(t);
  };
  const massText = `${options.massRange.min}–${options.massRange.max} Msun`;
  const zText = `${options.zRange.min}–${options.zRange.max}`;
  rows.forEach((rec, k) => {
    if (rec.kind !== 'row') return;
    const problem = (column: string, raw: string | undefined, range: string) =>
      `${source}:${rec.line}: column ${column}: '${raw ?? ''}' is not in the valid range ${range}`;
    let p: string | null = rec.error === null ? null : `${source}:${rec.line}: ${rec.error}`;
    const m = value(rec.fields, massAt);
    if (p === null && !(m >= options.massRange.min && m <= options.massRange.max)) p = problem(header[massAt], rec.fields[massAt], massText);
    let a = options.age ?? NaN;
    if (ageAt >= 0) {
      a = value(rec.fields, ageAt) * ageFactor;
      if (p === null && !(a > 0 && a <= MAX_AGE)) p = problem(header[ageAt], rec.fields[ageAt], `(0, ${MAX_AGE / (ageFactor === 1 ? 1 : ageFactor)}] ${ageFactor === 1 ? 'yr' : header[ageAt].slice(4)}`);
    }
    let zz = options.z;
    if (zAt >= 0) {
      zz = value(rec.fields, zAt);
      if (p === null && !(zz >= options.zRange.min && zz <= options.zRange.max)) p = problem('z', rec.fields[zAt], zText);
    }
    if (p !== null) {
      bad++;
      first ??= p;
      return;
    }
    initialMass[k] = m;
    age[k] = a;
    z[k] = zz;
  });
  if (first !== null) throw new RangeError(bad > 1 ? `${first} (and ${bad - 1} more bad line${bad === 2 ? '' : 's'})` : first);
  return { initialMass, age, z, ageColumn: ageAt >= 0 ? header[ageAt] : null, zColumn: zAt >= 0 ? 'z' : null };
}
