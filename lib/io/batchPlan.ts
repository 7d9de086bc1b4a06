import { STATE_KEYS, type StarState } from '../model/starState.js';

/** Table formats `batch` reads and writes. */
export type TableFormat = 'csv' | 'ndjson';

/** Computed columns written when `--columns` is not given: the state minus what the input already says. */
export const DEFAULT_BATCH_COLUMNS: readonly (keyof StarState)[] = [
  'phase', 'mass', 'coreMass', 'luminosity', 'teff', 'radius', 'logg', 'spectralType', 'bv', 'mbol', 'mv',
  'color', 'msLifetime', 'remnant', 'remnantMass',
];

/** Prefix of a computed column whose name an input column already has (`mass` → `sc_mass`). */
export const CLASH_PREFIX = 'sc_';

/** Years per age unit; units are matched without regard to case (`myr` is Myr). */
const AGE_UNITS: ReadonlyMap<string, { name: string; years: number }> = new Map([
  ['yr', { name: 'yr', years: 1 }],
  ['kyr', { name: 'kyr', years: 1e3 }],
  ['myr', { name: 'Myr', years: 1e6 }],
  ['gyr', { name: 'Gyr', years: 1e9 }],
]);
const MASS_UNITS = new Set(['msun', 'msol']);
const MASS_NAMES = ['initialmass', 'initial_mass', 'mass'];
const FEH_NAMES = new Set(['feh', '[fe/h]', 'fe/h', 'fe_h']);

/** How `batch` reads one table and what it writes: everything a block of rows needs, as plain data. */
export interface BatchPlan {
  input: TableFormat;
  output: TableFormat;
  /** headerless line filter (`--columns-in`): one output line per input line, no header */
  filter: boolean;
  /** input column names: CSV header fields, `--columns-in`, or the first NDJSON object's keys */
  names: string[];
  mass: { index: number; name: string };
  /** `years` per unit of the column, or null when every cell must carry its own unit (`4.6Gyr`) */
  age: { index: number; name: string; unit: string | null; years: number | null };
  /** z from a column, from an [Fe/H] column (converted), or one value for every row */
  z: { kind: 'column' | 'feh'; index: number; name: string } | { kind: 'constant'; value: number };
  /** computed state keys, in output order */
  computed: (keyof StarState)[];
  /** their output names: the key, or CLASH_PREFIX + key where the input already has that name */
  computedNames: string[];
  /** record terminator of the output */
  eol: '\n' | '\r\n';
  /** text written before the first row (CSV header line, or '' ) */
  header: string;
  /** text written first in the rejects file (CSV: its header line; NDJSON: '') */
  rejectsHeader: string;
}

/** What {@link planBatch} is told about the table and the command line. */
export interface BatchPlanRequest {
  input: TableFormat;
  output: TableFormat;
  filter: boolean;
  /** the input's column names (unquoted) */
  names: string[];
  /** the header record as written (CSV input), passed through unchanged; null to write `names` */
  headerRaw?: string | null;
  /** the input began with a UTF-8 byte-order mark (kept in CSV output) */
  bom?: boolean;
  eol?: '\n' | '\r\n';
  massCol?: string;
  ageCol?: string;
  zCol?: string;
  /** `--age-unit`: yr, kyr, Myr or Gyr */
  ageUnit?: string;
  /** `--z` */
  z?: number;
  /** default metal fraction when neither a column nor `z` gives one */
  defaultZ: number;
  /** `--columns`; default DEFAULT_BATCH_COLUMNS */
  columns?: readonly string[];
}

interface NamePart {
  base: string;
  unit: string | null;
}

// `age_Myr`, `age/Myr`, `age (Myr)`, `age[Myr]`, `age [Myr]`: a name and a unit.
const UNIT_FORM = /^\s*([^()[\]]*?)\s*(?:\(\s*([^()]*?)\s*\)|\[\s*([^[\]]*?)\s*\]|[_/]\s*([A-Za-z]+))\s*$/;

function nameParts(name: string): NamePart {
  const m = UNIT_FORM.exec(name);
  if (m === null || m[1] === '') return { base: name.trim().toLowerCase(), unit: null };
  return { base: m[1].toLowerCase(), unit: m[2] ?? m[3] ?? m[4] ?? null };
}

function quoteList(names: readonly string[]): string {
  return names.map((n) => `'${n}'`).join(', ');
}

function csvQuote(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

// The column named by an option: exact text first, then without regard to case.
function named(names: readonly string[], wanted: string, option: string): number {
  let i = names.indexOf(wanted);
  if (i < 0) i = names.findIndex((n) => n.trim().toLowerCase() === wanted.trim().toLowerCase());
  if (i < 0) throw new RangeError(`${option} '${wanted}': no such column; the columns are ${quoteList(names)}`);
  return i;
}

/**
 * Decides how `batch` reads a table and what it writes, from the input's column names and
 * the options, before any row is read, so that a table that cannot be used fails at once.
 *
 * Columns are found by name, without regard to case: the birth mass in `initialMass` (or
 * `initial_mass`), else `mass`; the age in `age`; the metal fraction in `z`, else [Fe/H] in
 * `feh`, `[Fe/H]`, `fe/h` or `fe_h` (converted by zFromFeh), else `z` of the request. A name may
 * carry a unit as `age_Myr`, `age/Myr`, `age (Myr)`, `age[Myr]` or `age [Myr]` (ages: yr, kyr,
 * Myr, Gyr; masses: Msun). `massCol`, `ageCol` and `zCol` name the columns instead.
 * Computed columns whose names an input column already uses get CLASH_PREFIX.
 *
 * @throws RangeError naming the column or option and what is accepted when the mass or age
 *   column is missing or ambiguous, a unit is unknown or contradicts `ageUnit`, `z` is given
 *   while the table has a metallicity column, or `columns` names an unknown key
 * @example planBatch({ input: 'csv', output: 'csv', filter: false, names: ['name', 'mass', 'age_Gyr'], defaultZ: 0.014 })
 *   // mass index 1, age index 2 in Gyr, z constant 0.014, computedNames ['phase', 'sc_mass', …]
 */
export function planBatch(request: BatchPlanRequest): BatchPlan {
  const { names } = request;
  const parts = names.map(nameParts);
  const lower = names.map((n) => n.trim().toLowerCase());
  const where = request.filter ? '--columns-in' : request.input === 'csv' ? 'the header' : 'the first line';

  // birth mass
  let massIndex: number;
  if (request.massCol !== undefined) massIndex = named(names, request.massCol, '--mass-col');
  else {
    massIndex = -1;
    for (const base of MASS_NAMES) {
      const hits = names.flatMap((_, i) => (lower[i] === base || parts[i].base === base ? [i] : []));
      if (hits.length > 1) {
        throw new RangeError(`${where} has more than one birth-mass column (${quoteList(hits.map((i) => names[i]))}); pick one with --mass-col`);
      }
      if (hits.length === 1) {
        massIndex = hits[0];
        break;
      }
    }
    if (massIndex < 0) {
      throw new RangeError(
        `${where} has no birth-mass column: name one 'initialMass' or 'mass' (optionally with a unit, e.g. 'mass_Msun'), or pass --mass-col; the columns are ${quoteList(names)}`,
      );
    }
  }
  const massUnit = MASS_NAMES.includes(lower[massIndex]) ? null : parts[massIndex].unit;
  if (massUnit !== null && !MASS_UNITS.has(massUnit.toLowerCase()) && request.massCol === undefined) {
    throw new RangeError(`column '${names[massIndex]}': birth masses must be in Msun, not '${massUnit}'`);
  }

  // age
  let ageIndex: number;
  if (request.ageCol !== undefined) ageIndex = named(names, request.ageCol, '--age-col');
  else {
    const hits = parts.flatMap((p, i) => (p.base === 'age' ? [i] : []));
    if (hits.length === 0) {
      throw new RangeError(
        `${where} has no age column: name one 'age' with its unit (e.g. 'age_Gyr', 'age (Myr)', 'age[yr]'), or pass --age-col; the columns are ${quoteList(names)}`,
      );
    }
    if (hits.length > 1) throw new RangeError(`${where} has more than one age column (${quoteList(hits.map((i) => names[i]))}); pick one with --age-col`);
    ageIndex = hits[0];
  }
  const ageName = names[ageIndex];
  const headerUnitText = parts[ageIndex].unit;
  let headerUnit: { name: string; years: number } | null = null;
  if (headerUnitText !== null) {
    headerUnit = AGE_UNITS.get(headerUnitText.toLowerCase()) ?? null;
    if (headerUnit === null && request.ageCol === undefined) {
      throw new RangeError(`column '${ageName}': unknown age unit '${headerUnitText}'; use yr, kyr, Myr or Gyr`);
    }
  }
  let optionUnit: { name: string; years: number } | null = null;
  if (request.ageUnit !== undefined) {
    optionUnit = AGE_UNITS.get(request.ageUnit.toLowerCase()) ?? null;
    if (optionUnit === null) throw new RangeError(`--age-unit '${request.ageUnit}' is not one of yr, kyr, Myr, Gyr`);
  }
  if (headerUnit !== null && optionUnit !== null && headerUnit.years !== optionUnit.years) {
    throw new RangeError(`--age-unit ${optionUnit.name} contradicts the unit in column '${ageName}' (${headerUnit.name}); drop one`);
  }
  let unit = optionUnit ?? headerUnit;
  // In the line filter ages are plain numbers of years unless said otherwise.
  if (unit === null && request.filter) unit = AGE_UNITS.get('yr')!;

  // metallicity
  let z: BatchPlan['z'];
  if (request.zCol !== undefined) {
    const i = named(names, request.zCol, '--z-col');
    if (request.z !== undefined) throw new RangeError(`--z and --z-col both given; use one`);
    z = { kind: 'column', index: i, name: names[i] };
  } else {
    const zi = lower.findIndex((n) => n === 'z');
    const fi = lower.findIndex((n) => FEH_NAMES.has(n));
    const found = zi >= 0 ? { kind: 'column' as const, index: zi, name: names[zi] } : fi >= 0 ? { kind: 'feh' as const, index: fi, name: names[fi] } : null;
    if (found !== null && request.z !== undefined) {
      throw new RangeError(`--z ${request.z} given but ${where} has the metallicity column '${found.name}'; drop --z, or rename the column`);
    }
    z = found ?? { kind: 'constant', value: request.z ?? request.defaultZ };
  }

  // computed columns
  const valid = new Set<string>(STATE_KEYS);
  const computed = (request.columns ?? DEFAULT_BATCH_COLUMNS).map((c) => c.trim());
  if (computed.length === 0) throw new RangeError(`--columns is empty; choose from ${STATE_KEYS.join(', ')}`);
  for (const c of computed) {
    if (!valid.has(c)) throw new RangeError(`--columns: '${c}' is not a state key; choose from ${STATE_KEYS.join(', ')}`);
  }
  const dup = computed.find((c, i) => computed.indexOf(c) !== i);
  if (dup !== undefined) throw new RangeError(`--columns names '${dup}' twice`);
  const taken = new Set(lower);
  const computedNames = computed.map((c) => {
    let name = c;
    while (taken.has(name.toLowerCase())) name = CLASH_PREFIX + name;
    taken.add(name.toLowerCase());
    return name;
  });

  const eol = request.eol ?? '\n';
  let header = '';
  let rejectsHeader = '';
  if (!request.filter && request.output === 'csv') {
    const inputHeader = request.headerRaw ?? names.map(csvQuote).join(',');
    header = (request.bom ? '\uFEFF' : '') + [inputHeader, ...computedNames].join(',') + eol;
  }
  if (request.input === 'csv') {
    const rowName = taken.has('row') ? CLASH_PREFIX + 'row' : 'row';
    const reasonName = taken.has('reason') ? CLASH_PREFIX + 'reason' : 'reason';
    const inputHeader = request.headerRaw ?? names.map(csvQuote).join(',');
    rejectsHeader = (request.bom ? '\uFEFF' : '') + `${rowName},${reasonName},${inputHeader}${eol}`;
  }

  return {
    input: request.input,
    output: request.output,
    filter: request.filter,
    names,
    mass: { index: massIndex, name: names[massIndex] },
    age: { index: ageIndex, name: ageName, unit: unit?.name ?? null, years: unit?.years ?? null },
    z,
    computed: computed as (keyof StarState)[],
    computedNames,
    eol,
    header,
    rejectsHeader,
  };
}
