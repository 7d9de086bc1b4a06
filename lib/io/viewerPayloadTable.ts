import { gridFileRecords } from '../tracks/gridFileRecords.js';
import { SOLAR_Z } from '../model/limits.js';
import { parseAge } from './parseAge.js';
import { parseNumber } from './parseNumber.js';

/** Age units a table header or `--age-unit` may name, in yr. */
export const TABLE_AGE_UNITS: Readonly<Record<string, number>> = { yr: 1, kyr: 1e3, Myr: 1e6, Gyr: 1e9 };

/** A table of stars as columns: what the viewer needs from a `population` or `batch` output or any CSV. */
export interface StarTable {
  initialMass: Float64Array;
  /** yr, at the table's present */
  age: Float64Array;
  z: Float64Array;
  name: string[] | null;
  /** the columns used, as named in the header */
  columns: { mass: string; age: string; z: string | null; name: string | null };
  /** the age unit applied to bare numbers, and where it came from */
  ageUnit: { unit: string; from: 'header' | 'option' | 'default' };
}

// age, age_Gyr, age (Myr), age [kyr], ageGyr
const AGE_HEADER = /^age(?:\s*[_ ]?\s*[([]?\s*(yr|kyr|Myr|Gyr)\s*[)\]]?)?$/;
const BARE_NUMBER = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;

/**
 * Reads a table of stars for the viewer from CSV (RFC 4180, through gridFileRecords: quotes,
 * CRLF, a BOM, `#` comment lines), NDJSON (one JSON object per line) or a JSON array of objects.
 * Columns, by header name: birth mass `initialMass` (else `mass`) in Msun; `age` with its unit
 * in the header (`age_Gyr`, `age (Myr)`, `age [kyr]`) or given as `ageUnit`, else yr (the
 * schema's unit, as `population` and `batch` write it) — a value may also carry its own unit
 * (`4.6Gyr`); optional `z` (default 0.014, solar); optional `name`. Other columns are ignored.
 *
 * @param text the whole file
 * @param options `ageUnit`: unit of bare ages when the header names none (yr, kyr, Myr, Gyr)
 * @returns the columns
 * @throws RangeError naming the line (and column) for a missing column, an unreadable or
 *   non-positive mass or z, a negative or unreadable age, a header unit that contradicts
 *   `ageUnit`, or a file with no rows
 * @example readStarTable('name,initialMass,age_Gyr\nWendhal,1,4.1\n').age[0] // 4.1e9
 */
export function readStarTable(text: string, options: { ageUnit?: string } = {}): StarTable {
  if (options.ageUnit !== undefined && !(options.ageUnit in TABLE_AGE_UNITS)) {
    throw new RangeError(`--age-unit '${options.ageUnit}' is not one of yr, kyr, Myr, Gyr`);
  }
  const first = text.replace(/^\uFEFF/, '').trimStart();
  const rows: { line: number; get(key: string): string | undefined }[] = [];
  let header: string[];
  if (first.startsWith('[') || first.startsWith('{')) {
    const objects: { line: number; value: unknown }[] = [];
    if (first.startsWith('[')) {
      let value: unknown;
      try {
        value = JSON.parse(first);
      } catch (error) {
        throw new RangeError(`table: not valid JSON: ${(error as Error).message}`);
      }
      if (!Array.isArray(value)) throw new RangeError('table: a JSON table must be an array of objects');
      value.forEach((v, i) => objects.push({ line: i + 1, value: v }));
    } else {
      text.replace(/^\uFEFF/, '').split('\n').forEach((raw, i) => {
        const s = raw.trim();
        if (s === '') return;
        try {
          objects.push({ line: i + 1, value: JSON.parse(s) });
        } catch (error) {
          throw new RangeError(`table line ${i + 1}: not valid JSON: ${(error as Error).message}`);
        }
      });
    }
    const keys = new Set<string>();
    for (const o of objects) {
      if (o.value === null || typeof o.value !== 'object' || Array.isArray(o.value)) {
        throw new RangeError(`table line ${o.line}: expected an object with initialMass and age`);
      }
      for (const k of Object.keys(o.value)) keys.add(k);
    }
    header = [...keys];
    for (const o of objects) {
      const v = o.value as Record<string, unknown>;
      rows.push({
        line: o.line,
        get: (k) => (v[k] === undefined || v[k] === null ? undefined : String(v[k])),
      });
    }
  } else {
    const records = gridFileRecords(text).filter((r) => r.kind === 'row');
    if (records.length === 0) throw new RangeError('table: no header row (expected a CSV header with initialMass and age)');
    const head = records[0];
    if (head.kind !== 'row') throw new Error('unreachable');
    if (head.error) throw new RangeError(`table line ${head.line}: ${head.error}`);
    header = head.fields.map((f) => f.trim());
    const at = new Map(header.map((h, i) => [h, i]));
    for (const r of records.slice(1)) {
      if (r.kind !== 'row') continue;
      if (r.error) throw new RangeError(`table line ${r.line}: ${r.error}`);
      if (r.fields.length !== header.length) {
        throw new RangeError(`table line ${r.line}: ${r.fields.length} fields, the header has ${header.length}`);
      }
      const fields = r.fields;
      rows.push({ line: r.line, get: (k) => { const i = at.get(k); return i === undefined ? undefined : fields[i]; } });
    }
  }
  const massKey = header.includes('initialMass') ? 'initialMass' : header.includes('mass') ? 'mass' : null;
  if (massKey === null) throw new RangeError(`table: no birth-mass column (initialMass or mass) among: ${header.join(', ') || '(none)'}`);
  const ageKeys = header.filter((h) => AGE_HEADER.test(h));
  if (ageKeys.length === 0) throw new RangeError(`table: no age column (age, age_Gyr, age (Myr), …) among: ${header.join(', ')}`);
  if (ageKeys.length > 1) throw new RangeError(`table: several age columns (${ageKeys.join(', ')}); keep one`);
  const ageKey = ageKeys[0];
  const headerUnit = AGE_HEADER.exec(ageKey)?.[1];
  if (headerUnit && options.ageUnit && headerUnit !== options.ageUnit) {
    throw new RangeError(`table: the header '${ageKey}' gives ages in ${headerUnit}, but --age-unit is ${options.ageUnit}`);
  }
  const unit = headerUnit ?? options.ageUnit ?? 'yr';
  const from: StarTable['ageUnit']['from'] = headerUnit ? 'header' : options.ageUnit ? 'option' : 'default';
  const zKey = header.includes('z') ? 'z' : null;
  const nameKey = header.includes('name') ? 'name' : null;
  const n = rows.length;
  if (n === 0) throw new RangeError('table: no rows of stars');
  const initialMass = new Float64Array(n);
  const age = new Float64Array(n);
  const z = new Float64Array(n);
  const name: string[] | null = nameKey ? [] : null;
  const num = (row: (typeof rows)[number], key: string, what: string): number => {
    const v = row.get(key);
    if (v === undefined || v.trim() === '') throw new RangeError(`table line ${row.line}: ${key} is empty; need ${what}`);
    try {
      return parseNumber(v);
    } catch {
      throw new RangeError(`table line ${row.line}: ${key} '${v}' is not a number; need ${what}`);
    }
  };
  rows.forEach((row, i) => {
    const m = num(row, massKey, 'a birth mass in Msun');
    if (!(m > 0)) throw new RangeError(`table line ${row.line}: ${massKey} ${m} must be > 0 Msun`);
    initialMass[i] = m;
    const a = row.get(ageKey);
    if (a === undefined || a.trim() === '') throw new RangeError(`table line ${row.line}: ${ageKey} is empty; need an age`);
    let years: number;
    // a bare number takes the column's unit, applied to the decimal text (exact, as parseAge does)
    if (BARE_NUMBER.test(a)) years = parseAge(`${a.trim()}${unit}`);
    else {
      try {
        years = parseAge(a);
      } catch {
        throw new RangeError(`table line ${row.line}: ${ageKey} '${a}' is not an age; expected a number (in ${unit}) or a number with a unit yr, kyr, Myr or Gyr (e.g. 4.6Gyr)`);
      }
    }
    if (!(years >= 0) || !Number.isFinite(years)) throw new RangeError(`table line ${row.line}: ${ageKey} '${a}' must be a finite age ≥ 0`);
    age[i] = years;
    if (zKey && row.get(zKey) !== undefined && row.get(zKey)!.trim() !== '') {
      const zv = num(row, zKey, 'a metal mass fraction');
      if (!(zv > 0)) throw new RangeError(`table line ${row.line}: z ${zv} must be > 0`);
      z[i] = zv;
    } else z[i] = SOLAR_Z;
    if (name) name.push(row.get(nameKey as string) ?? '');
  });
  return { initialMass, age, z, name, columns: { mass: massKey, age: ageKey, z: zKey, name: nameKey }, ageUnit: { unit, from } };
}
