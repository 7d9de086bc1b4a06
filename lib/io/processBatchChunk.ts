import type { GridQuery, StateColumns } from '../interp/gridQuery.js';
import { allocateStateColumns } from '../interp/gridQuery.js';
import { MAX_AGE, UNIVERSE_AGE } from '../model/limits.js';
import { PHASES } from '../model/phases.js';
import { zFromFeh } from '../model/zFromFeh.js';
import { observe, type ObservedKind, type Observables } from '../physics/observe.js';
import { REMNANT_CODES } from '../tracks/grid.js';
import { surfaceGravity } from '../physics/surfaceGravity.js';
import type { BatchPlan } from './batchPlan.js';
import { emptyCsvRecord, nextCsvRecord } from './nextCsvRecord.js';
import { parseAge } from './parseAge.js';

/** One row `batch` could not compute. */
export interface BatchReject {
  /** record number within the chunk, from 1 (the caller adds the records before the chunk) */
  row: number;
  /** what is wrong: the column, the value as written and the valid range */
  reason: string;
  /** the record as written, terminator excluded */
  raw: string;
}

/** What one chunk of records gave. */
export interface BatchChunkResult {
  /** output of the chunk's rows, each with its terminator, as UTF-8 */
  out: Uint8Array;
  /** records in the chunk, blank lines included (for row numbers) */
  records: number;
  /** data rows read (blank lines skipped, except in the line filter) */
  read: number;
  /** rows computed and written */
  written: number;
  rejects: BatchReject[];
  /** rows older than the universe (computed; the model extrapolates) */
  beyondUniverse: number;
  /** chunk-relative row of the first data row, 0 if none */
  firstDataRow: number;
  /** chunk-relative row of the first age written without a unit while the column has none, 0 if none */
  firstBareAge: number;
}

/** Rows per call of GridQuery.columns: big enough to amortise the call, small enough for the cache. */
const BLOCK = 8192;

const OBSERVED = new Set(['spectralType', 'bv', 'mbol', 'mv', 'color']);
// output codes of the state keys
const CODE: Readonly<Record<string, number>> = {
  initialMass: 0, z: 1, age: 2, phase: 3, mass: 4, coreMass: 5, luminosity: 6, teff: 7, radius: 8, logg: 9,
  spectralType: 10, bv: 11, mbol: 12, mv: 13, color: 14, msLifetime: 15, remnant: 16, remnantMass: 17,
};
const KIND: readonly ObservedKind[] = PHASES.map((p) =>
  p === 'white-dwarf' || p === 'neutron-star' || p === 'black-hole' || p === 'brown-dwarf' ? p : 'star',
);
const BLACK_HOLE = PHASES.indexOf('black-hole');
const NUMBER = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
const HAS_LETTER = /[A-Za-z]/;
const ENCODER = new TextEncoder();
const EMPTY = new Uint8Array(0);
/** Characters of output gathered before they are encoded. */
const SPILL = 1 << 14;

interface Scratch {
  m: Float64Array;
  a: Float64Array;
  z: Float64Array;
  rel: Int32Array;
  raw: string[];
  reason: (string | null)[];
  fields: (string[] | null)[];
  objects: (Record<string, unknown> | null)[];
  cols: StateColumns;
}

let scratch: Scratch | undefined;

const fmtRange = (x: number) => String(Number(x.toPrecision(6)));

/**
 * Computes one chunk of a `batch` table: reads its records (CSV after RFC 4180, or NDJSON
 * lines), takes birth mass, age and z from the columns the plan names, checks them against
 * the grid's ranges, computes the state in blocks of 8192 rows with `query.columns` and the
 * observables (B−V, magnitudes, spectral type, colour) per row with lib/physics/observe only
 * when the plan asks for them, and writes each row: the input record as written, then the
 * computed columns. Numbers are written with `String(x)`, the shortest text that reads back to
 * the same double, so the output is deterministic and loses no digit. Rows that cannot be
 * computed are returned as rejects (in the line filter they are also written, with empty
 * computed fields, so no line goes missing). Pure apart from reusing module scratch buffers:
 * the same chunk, plan and grid give the same result in any thread.
 *
 * @param text whole records (the chunk must end at a record boundary, createRecordCutter)
 * @param plan from planBatch
 * @param query the grid interpolator
 * @example processBatchChunk('Vesk,1,4.6\n', plan, query).out // 'Vesk,1,4.6,main-sequence,…\n'
 */
export function processBatchChunk(text: string, plan: BatchPlan, query: GridQuery): BatchChunkResult {
  const S = (scratch ??= {
    m: new Float64Array(BLOCK), a: new Float64Array(BLOCK), z: new Float64Array(BLOCK), rel: new Int32Array(BLOCK),
    raw: new Array<string>(BLOCK).fill(''), reason: new Array<string | null>(BLOCK).fill(null),
    fields: new Array<string[] | null>(BLOCK).fill(null), objects: new Array<Record<string, unknown> | null>(BLOCK).fill(null),
    cols: allocateStateColumns(BLOCK),
  });
  const res: BatchChunkResult = { out: EMPTY, records: 0, read: 0, written: 0, rejects: [], beyondUniverse: 0, firstDataRow: 0, firstBareAge: 0 };
  const { massRange, zRange } = query.grid;
  const massText = `${fmtRange(massRange.min)}–${fmtRange(massRange.max)} Msun`;
  const zText = `${fmtRange(zRange.min)}–${fmtRange(zRange.max)}`;
  const ageText = `0–${MAX_AGE / 1e9} Gyr`;
  const csvIn = plan.input === 'csv';
  const filter = plan.filter;
  const nNames = plan.names.length;
  const mi = plan.mass.index, ai = plan.age.index;
  const mName = plan.mass.name, aName = plan.age.name;
  const ageYears = plan.age.years;
  const zPlan = plan.z;
  const zConst = zPlan.kind === 'constant' ? zPlan.value : 0;
  const zi = zPlan.kind === 'constant' ? -1 : zPlan.index;
  const zName = zPlan.kind === 'constant' ? '' : zPlan.name;
  const zFeh = zPlan.kind === 'feh';
  const wantNdjson = plan.output === 'ndjson';
  const keepFields = csvIn && wantNdjson;
  const keepObjects = !csvIn;
  const record = emptyCsvRecord();
  // Output is gathered in short strings and encoded into one byte buffer: a chunk-long string
  // would live long enough to reach the old generation, and collecting it dominated the run.
  let bytes = new Uint8Array(text.length * 8 + 65536);
  let used = 0;
  let out = '';
  const spill = (): void => {
    if (used + 3 * out.length > bytes.length) {
      const bigger = new Uint8Array(Math.max(2 * bytes.length, used + 3 * out.length));
      bigger.set(bytes.subarray(0, used));
      bytes = bigger;
    }
    used += ENCODER.encodeInto(out, bytes.subarray(used)).written;
    out = '';
  };
  let k = 0;
  let why: string | null = null;

  // Cell readers: a number, or NaN with `why` saying what is wrong.
  const readMass = (v: unknown): number => {
    let x: number;
    if (typeof v === 'number') x = v;
    else if (typeof v === 'string') {
      if (v.trim() === '') {
        why = `column '${mName}' is empty; expected a birth mass in Msun, ${massText}`;
        return NaN;
      }
      x = NUMBER.test(v) ? Number(v) : NaN;
      if (!Number.isFinite(x)) {
        why = `column '${mName}': '${v}' is not a number; expected a birth mass in Msun, ${massText}`;
        return NaN;
      }
    } else {
      why = v === undefined ? `key '${mName}' is missing` : `key '${mName}': ${JSON.stringify(v)} is not a number`;
      return NaN;
    }
    if (!(x >= massRange.min && x <= massRange.max)) {
      why = `column '${mName}': ${String(v)} is outside the valid range ${massText}`;
      return NaN;
    }
    return x;
  };
  const readAge = (v: unknown, rel: number): number => {
    let x: number;
    if (typeof v === 'number' || (typeof v === 'string' && NUMBER.test(v))) {
      if (ageYears === null) {
        if (res.firstBareAge === 0) res.firstBareAge = rel;
        why = `column '${aName}': '${String(v)}' has no unit, and neither the header nor --age-unit gives one; write e.g. 4.6Gyr`;
        return NaN;
      }
      x = Number(v) * ageYears;
    } else if (typeof v === 'string') {
      if (v.trim() === '') {
        why = `column '${aName}' is empty; expected an age, ${ageText}`;
        return NaN;
      }
      if (!HAS_LETTER.test(v)) {
        why = `column '${aName}': '${v}' is not an age; expected a number${ageYears === null ? ' with a unit yr, kyr, Myr or Gyr' : ''}, ${ageText}`;
        return NaN;
      }
      try {
        x = parseAge(v);
      } catch {
        why = `column '${aName}': '${v}' is not an age; expected a number with an optional unit yr, kyr, Myr or Gyr (e.g. 4.6Gyr), ${ageText}`;
        return NaN;
      }
    } else {
      why = v === undefined ? `key '${aName}' is missing` : `key '${aName}': ${JSON.stringify(v)} is not an age`;
      return NaN;
    }
    if (!(x >= 0 && x <= MAX_AGE)) {
      const shown = typeof v === 'string' ? `'${v}'` : String(v);
      why = `column '${aName}': ${shown}${plan.age.unit !== null && plan.age.unit !== 'yr' && (typeof v === 'number' || NUMBER.test(v as string)) ? ` ${plan.age.unit}` : ''} (${x} yr) is outside the valid range ${ageText}`;
      return NaN;
    }
    return x;
  };
  const readZ = (v: unknown): number => {
    let x: number;
    if (typeof v === 'number') x = v;
    else if (typeof v === 'string' && v.trim() !== '' && NUMBER.test(v)) x = Number(v);
    else {
      why = v === undefined ? `key '${zName}' is missing`
        : typeof v === 'string' && v.trim() === '' ? `column '${zName}' is empty; expected ${zFeh ? '[Fe/H] in dex' : `a metal fraction, ${zText}`}`
        : `column '${zName}': ${typeof v === 'string' ? `'${v}'` : JSON.stringify(v)} is not a number; expected ${zFeh ? '[Fe/H] in dex' : `a metal fraction, ${zText}`}`;
      return NaN;
    }
    const z = zFeh ? zFromFeh(x) : x;
    if (!(z >= zRange.min && z <= zRange.max)) {
      why = zFeh
        ? `column '${zName}': [Fe/H] ${String(v)} gives z ${fmtRange(z)}, outside the valid range ${zText}`
        : `column '${zName}': ${String(v)} is outside the valid range ${zText}`;
      return NaN;
    }
    return z;
  };

  const flush = (): void => {
    if (k === 0) return;
    const n = k;
    k = 0;
    const o = S.cols;
    query.columns(
      { initialMass: S.m.subarray(0, n), age: S.a.subarray(0, n), z: zi < 0 ? zConst : S.z.subarray(0, n) },
      o,
    );
    const codes = plan.computed.map((c) => CODE[c]);
    const names = plan.computedNames;
    const nc = codes.length;
    const wantObs = plan.computed.some((c) => OBSERVED.has(c));
    const eol = plan.eol;
    const cells: (string | number | null)[] = new Array(nc);
    for (let s = 0; s < n; s++) {
      let reason = S.reason[s];
      const raw = S.raw[s];
      if (reason === null && o.status[s] !== 0) reason = `internal: the grid refused this row (status ${o.status[s]})`;
      let obs: Observables | null = null;
      if (reason === null && wantObs && o.phase[s] !== BLACK_HOLE) {
        try {
          obs = observe(KIND[o.phase[s]], o.luminosity[s], o.teff[s], o.radius[s], o.mass[s]);
        } catch (error) {
          reason = `the model's state has no observables: ${(error as Error).message}`;
        }
      }
      if (reason !== null) {
        res.rejects.push({ row: S.rel[s], reason, raw });
        if (filter) {
          out += rejectedLine(s, raw, nc) + eol;
          if (out.length > SPILL) spill();
        }
        continue;
      }
      res.written++;
      if (S.a[s] > UNIVERSE_AGE) res.beyondUniverse++;
      for (let c = 0; c < nc; c++) {
        switch (codes[c]) {
          case 0: cells[c] = S.m[s]; break;
          case 1: cells[c] = zi < 0 ? zConst : S.z[s]; break;
          case 2: cells[c] = S.a[s]; break;
          case 3: cells[c] = PHASES[o.phase[s]]; break;
          case 4: cells[c] = o.mass[s]; break;
          case 5: cells[c] = o.coreMass[s]; break;
          case 6: cells[c] = o.luminosity[s]; break;
          case 7: cells[c] = o.teff[s]; break;
          case 8: cells[c] = o.radius[s]; break;
          // columns() derives a black hole's log g from L and Teff; star() from its Schwarzschild radius
          case 9: cells[c] = o.phase[s] === BLACK_HOLE ? surfaceGravity(o.mass[s], o.radius[s]) : o.logg[s]; break;
          case 10: cells[c] = obs === null ? null : obs.spectralType; break;
          case 11: cells[c] = obs === null ? null : obs.bv; break;
          case 12: cells[c] = obs === null ? null : obs.mbol; break;
          case 13: cells[c] = obs === null ? null : obs.mv; break;
          case 14: cells[c] = obs === null ? null : obs.color; break;
          case 15: cells[c] = o.msLifetime[s]; break;
          case 16: cells[c] = REMNANT_CODES[o.remnant[s]]; break;
          default: cells[c] = o.remnantMass[s];
        }
      }
      if (!wantNdjson) {
        let line = raw;
        for (let c = 0; c < nc; c++) {
          const v = cells[c];
          line += v === null ? ',' : ',' + v;
        }
        out += line + eol;
      } else {
        out += jsonLine(s, raw, names, cells) + '\n';
      }
      if (out.length > SPILL) spill();
    }
  };

  // A rejected row in the line filter: the input with empty computed fields.
  const rejectedLine = (s: number, raw: string, nc: number): string => {
    if (!wantNdjson) return raw + ','.repeat(nc);
    const cells = new Array<null>(nc).fill(null);
    return S.objects[s] === null && !csvIn ? raw : jsonLine(s, raw, plan.computedNames, cells);
  };

  const jsonLine = (s: number, raw: string, names: readonly string[], cells: readonly (string | number | null)[]): string => {
    let line: string;
    let sep: string;
    if (csvIn) {
      const fields = S.fields[s]!;
      line = '{';
      sep = '';
      for (let i = 0; i < nNames; i++) {
        line += sep + JSON.stringify(plan.names[i]) + ':' + JSON.stringify(fields[i] ?? '');
        sep = ',';
      }
    } else {
      const trimmed = raw.trimEnd();
      line = trimmed.slice(0, -1).trimEnd();
      sep = line.endsWith('{') ? '' : ',';
    }
    const obj = S.objects[s];
    for (let c = 0; c < names.length; c++) {
      let name = names[c];
      if (obj !== null) while (Object.hasOwn(obj, name)) name = 'sc_' + name;
      const v = cells[c];
      line += sep + JSON.stringify(name) + ':' + (v === null ? 'null' : typeof v === 'number' ? String(v) : JSON.stringify(v));
      sep = ',';
    }
    return line + '}';
  };

  const n = text.length;
  let pos = 0;
  let rel = 0;
  while (pos < n) {
    const start = pos;
    rel++;
    let raw: string;
    let reason: string | null = null;
    let m = NaN, a = NaN, z = zConst;
    why = null;
    if (csvIn) {
      pos = nextCsvRecord(text, start, filter, record);
      raw = text.slice(start, record.rawEnd);
      if (raw.length === 0 && !filter) continue;
      const f = record.fields;
      if (record.error !== null) reason = `malformed CSV: ${record.error}`;
      else if (f.length !== nNames) {
        reason = `${f.length} field${f.length === 1 ? '' : 's'}, but ${filter ? '--columns-in names' : 'the header has'} ${nNames}`;
      } else {
        m = readMass(f[mi]);
        if (why === null) a = readAge(f[ai], rel);
        if (why === null && zi >= 0) z = readZ(f[zi]);
        reason = why;
      }
      if (keepFields) S.fields[k] = f;
    } else {
      const nl = text.indexOf('\n', start);
      const end = nl < 0 ? n : nl;
      pos = nl < 0 ? n : nl + 1;
      raw = text.slice(start, end > start && text.charCodeAt(end - 1) === 13 ? end - 1 : end);
      let obj: Record<string, unknown> | null = null;
      if (raw.trim() === '') {
        if (!filter) continue;
        reason = 'blank line';
      } else {
        let value: unknown;
        try {
          value = JSON.parse(raw);
        } catch (error) {
          reason = `not valid JSON: ${(error as Error).message}`;
        }
        if (reason === null) {
          if (value === null || typeof value !== 'object' || Array.isArray(value)) reason = 'not a JSON object';
          else {
            obj = value as Record<string, unknown>;
            m = readMass(obj[mName]);
            if (why === null) a = readAge(obj[aName], rel);
            if (why === null && zi >= 0) z = readZ(obj[zName]);
            reason = why;
          }
        }
      }
      S.objects[k] = obj;
    }
    res.read++;
    if (res.firstDataRow === 0) res.firstDataRow = rel;
    if (reason !== null) m = NaN;
    S.m[k] = m;
    S.a[k] = a;
    S.z[k] = z;
    S.rel[k] = rel;
    S.raw[k] = raw;
    S.reason[k] = reason;
    if (++k === BLOCK) flush();
  }
  flush();
  spill();
  res.records = rel;
  res.out = bytes.subarray(0, used);
  // drop references so a finished chunk's text can be collected
  S.raw.fill('');
  S.fields.fill(null);
  S.objects.fill(null);
  return res;
}
