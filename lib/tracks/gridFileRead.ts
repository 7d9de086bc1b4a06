import { PHASES, PHASE_INDEX, isRemnantPhase, type Phase, type RemnantKind } from '../model/phases.js';
import { MASS_RANGE, Z_RANGE } from '../model/limits.js';
import { generateTrack } from '../model/generateTrack.js';
import { parseNumber } from '../io/parseNumber.js';
import { PRIMARY_EEPS, type Eep, type EepName, type Track } from './track.js';
import {
  GRID_FILE_COLUMNS, GRID_FILE_FIRST_LINE, GRID_FILE_HEADER, GRID_FILE_RADIUS_TOLERANCE, GRID_FILE_TEFF_SUN,
  type GridProblem,
} from './gridFileFormat.js';
import { gridFileRecords } from './gridFileRecords.js';
import { gridFileEepSlots } from './gridFileEepSlots.js';

const EEP_SET: ReadonlySet<string> = new Set(PRIMARY_EEPS);
const PHASE_LIST = PHASES.join(', ');
const EEP_LIST = PRIMARY_EEPS.join(', ');
const MS = PHASE_INDEX['main-sequence'];
const BROWN_DWARF = PHASE_INDEX['brown-dwarf'];
/** What a primary EEP needs the track to contain, for messages about labels a track cannot have. */
const EEP_NEEDS: Readonly<Record<EepName, string>> = {
  'pms-start': 'any row',
  zams: 'main-sequence rows',
  'ms-mid': 'main-sequence rows',
  tams: 'main-sequence rows',
  'rgb-base': 'subgiant rows',
  'he-ignition': 'core-helium-burning rows',
  'cheb-start': 'core-helium-burning rows',
  'cheb-end': 'core-helium-burning rows',
  'first-thermal-pulse': 'asymptotic-giant-branch rows',
  'agb-end': 'asymptotic-giant-branch rows',
  'remnant-birth': 'white-dwarf, neutron-star or black-hole rows',
  'track-end': 'any row',
};

/** Column positions in the file, by name (the header may list the right names in another order). */
type ColumnIndex = Record<(typeof GRID_FILE_COLUMNS)[number], number>;

/** The rows of one run of equal (initialMass, z) as read, NaN / -1 where a value was bad. */
interface Run {
  key: string;
  initialMass: number;
  z: number;
  initialMassText: string;
  firstLine: number;
  lastLine: number;
  bad: boolean;
  /** rows are missing or repeated, so its EEP labels cannot be judged */
  unsure: boolean;
  lines: number[];
  age: number[];
  mass: number[];
  coreMass: number[];
  luminosity: number[];
  teff: number[];
  phase: number[];
  eep: (string[] | null)[];
}

/** Result of {@link gridFileRead}. */
export interface GridFileReadResult {
  tracks: Track[];
  problems: GridProblem[];
}

/**
 * Reads and validates a grid file in the open layout (gridFileFormat.ts), collecting every
 * problem. The shared engine of `parseGridFile` (with `buildTracks`) and `checkGridTracks`
 * (without, which skips the model calls that fill in remnants). See `parseGridFile` for
 * what is checked and how Track fields are filled.
 *
 * @param text the whole file
 * @param buildTracks false to only collect problems (tracks is then empty)
 * @returns the good tracks (when built) and every problem, sorted by row
 * @example gridFileRead('# starclock-grid v1\n', false).problems[0].message // 'missing header line …'
 */
export function gridFileRead(text: string, buildTracks: boolean): GridFileReadResult {
  const problems: GridProblem[] = [];
  const problem = (row: number, column: string | null, value: string | null, message: string) =>
    problems.push({ row, column, value, message });
  const records = gridFileRecords(text);
  let r = 0;

  // first line
  const first = records[0];
  if (!first) {
    problem(1, null, null, `the file is empty; its first line must be exactly '${GRID_FILE_FIRST_LINE}'`);
    return { tracks: [], problems };
  }
  if (first.kind === 'comment' && first.text === GRID_FILE_FIRST_LINE) {
    r = 1;
  } else if (first.kind === 'comment' && /^#\s*starclock-grid\b/.test(first.text)) {
    problem(1, null, first.text, `unsupported layout '${first.text}': this reader reads '${GRID_FILE_FIRST_LINE}' only`);
    r = 1;
  } else {
    const seen = first.kind === 'comment' ? first.text : first.kind === 'blank' ? '' : first.fields.join(',');
    problem(1, null, seen, `the first line must be exactly '${GRID_FILE_FIRST_LINE}'`);
    r = first.kind === 'row' ? 0 : 1; // a row may be the header itself
  }

  // header
  while (r < records.length && records[r].kind !== 'row') r++;
  const head = records[r];
  if (!head || head.kind !== 'row') {
    const line = records.length > 0 ? records[records.length - 1].line + 1 : 2;
    problem(line, null, null, `missing header line; expected '${GRID_FILE_HEADER}'`);
    return { tracks: [], problems: sortProblems(problems) };
  }
  r++;
  const col = headerColumns(head.fields, head.line, problem);
  if (!col) return { tracks: [], problems: sortProblems(problems) };
  const headerLine = head.line;

  // rows
  const done: { run: Run; track: Track | null }[] = [];
  const seenKeys = new Map<string, Run>();
  const duplicated = new Set<string>();
  let run: Run | null = null;
  const finish = () => {
    if (run) done.push({ run, track: finishRun(run, buildTracks, problem) });
  };
  let rows = 0;

  for (; r < records.length; r++) {
    const rec = records[r];
    if (rec.kind !== 'row') continue;
    rows++;
    const line = rec.line;
    const f = rec.fields;
    if (rec.error) problem(line, null, null, rec.error);
    if (f.length !== GRID_FILE_COLUMNS.length) {
      problem(line, null, `${f.length} fields`, `the row has ${f.length} fields; the layout has ${GRID_FILE_COLUMNS.length}: ${GRID_FILE_HEADER}`);
    }
    const cell = (name: keyof ColumnIndex): string | undefined => f[col[name]];
    // key first: it decides which track the row belongs to
    const im = numberCell(cell('initialMass'), line, 'initialMass', 'Msun', (x) => x > 0, '> 0', problem);
    const z = numberCell(cell('z'), line, 'z', '', (x) => x > 0 && x < 1, 'between 0 and 1 (exclusive)', problem);
    const keyOk = !Number.isNaN(im) && !Number.isNaN(z);
    const key = keyOk ? `${im},${z}` : (run?.key ?? '?');
    if (!run || key !== run.key) {
      finish();
      run = newRun(key, im, z, cell('initialMass') ?? '', line);
      const before = seenKeys.get(key);
      if (before && keyOk) {
        problem(line, 'initialMass', cell('initialMass') ?? '',
          `the track initialMass ${im} Msun, z ${z} appears again (first on rows ${before.firstLine}–${before.lastLine}); ` +
          'each (initialMass, z) must be one run of consecutive rows');
        duplicated.add(key);
        run.unsure = true;
      } else if (keyOk) seenKeys.set(key, run);
    }
    run.lastLine = line;
    if (!keyOk || rec.error || f.length !== GRID_FILE_COLUMNS.length) run.bad = true;
    if (!keyOk || f.length !== GRID_FILE_COLUMNS.length) run.unsure = true;
    if (f.length !== GRID_FILE_COLUMNS.length) continue;

    const age = numberCell(cell('age'), line, 'age', 'yr', (x) => x >= 0, '≥ 0', problem);
    const mass = numberCell(cell('mass'), line, 'mass', 'Msun', (x) => x > 0, '> 0', problem);
    let coreMass = numberCell(cell('coreMass'), line, 'coreMass', 'Msun', (x) => x >= 0, '≥ 0', problem);
    if (!Number.isNaN(coreMass) && !Number.isNaN(mass) && coreMass > mass) {
      problem(line, 'coreMass', cell('coreMass')!, `coreMass ${coreMass} Msun is more than the row's mass ${mass} Msun; it must be ≤ mass`);
      coreMass = NaN;
    }
    const luminosity = numberCell(cell('luminosity'), line, 'luminosity', 'Lsun', (x) => x > 0, '> 0', problem);
    const teff = numberCell(cell('teff'), line, 'teff', 'K', (x) => x > 0, '> 0', problem);
    let radius = numberCell(cell('radius'), line, 'radius', 'Rsun', (x) => x > 0, '> 0', problem);
    if (!Number.isNaN(luminosity) && !Number.isNaN(teff) && !Number.isNaN(radius)) {
      const t = teff / GRID_FILE_TEFF_SUN;
      const expected = Math.sqrt(luminosity) / (t * t);
      const off = Math.abs(radius / expected - 1);
      if (!(off <= GRID_FILE_RADIUS_TOLERANCE)) {
        problem(line, 'radius', cell('radius')!,
          `radius ${radius} Rsun disagrees by ${(off * 100).toPrecision(3)} % with ${expected.toPrecision(6)} Rsun, the Stefan–Boltzmann radius ` +
          `of luminosity ${luminosity} Lsun and teff ${teff} K (R = √L / (Teff / 5772 K)²); at most ${GRID_FILE_RADIUS_TOLERANCE * 100} % is allowed`);
        radius = NaN;
      }
    }
    const phaseText = (cell('phase') ?? '').trim();
    const phase = Object.hasOwn(PHASE_INDEX, phaseText) ? PHASE_INDEX[phaseText as Phase] : -1;
    if (phase < 0) {
      problem(line, 'phase', cell('phase') ?? '', `'${phaseText}' is not a phase; phases are: ${PHASE_LIST}`);
    }
    const eep = eepCell(cell('eep') ?? '', line, problem);
    const bad = [age, mass, coreMass, luminosity, teff, radius].some(Number.isNaN) || phase < 0 || eep === undefined;
    if (bad) run.bad = true;
    if (eep === undefined) run.unsure = true; // a bad label: which EEPs the track meant is unknown
    addPoint(run, line, age, mass, coreMass, luminosity, teff, phase, eep ?? null, cell('age')!, cell('mass')!, problem);
  }
  finish();
  if (rows === 0) problem(headerLine, null, null, 'the file holds no track rows after the header');

  const tracks: Track[] = [];
  for (const { run: done1, track } of done) {
    if (track && !duplicated.has(done1.key)) tracks.push(track);
  }
  return { tracks, problems: sortProblems(problems) };
}

function sortProblems(problems: GridProblem[]): GridProblem[] {
  return problems.sort((a, b) => a.row - b.row); // stable: same-row problems keep column order
}

/** Checks the header; returns the column positions, or null when rows cannot be read by it. */
function headerColumns(
  fields: string[], line: number, problem: (row: number, column: string | null, value: string | null, message: string) => void,
): ColumnIndex | null {
  const names = fields.map((s) => s.trim());
  const expected = GRID_FILE_COLUMNS as readonly string[];
  if (names.length === expected.length && names.every((s, i) => s === expected[i])) {
    return Object.fromEntries(expected.map((s, i) => [s, i])) as ColumnIndex;
  }
  const written = fields.join(',');
  const missing = expected.filter((s) => !names.includes(s));
  const unknown = names.filter((s) => !expected.includes(s));
  const repeated = names.filter((s, i) => names.indexOf(s) !== i);
  if (missing.length === 0 && unknown.length === 0 && repeated.length === 0) {
    problem(line, null, written, `the header lists the columns in another order; the layout's header is exactly '${GRID_FILE_HEADER}' (rows were read by column name)`);
    return Object.fromEntries(expected.map((s) => [s, names.indexOf(s)])) as ColumnIndex;
  }
  const parts = [
    missing.length ? `missing ${missing.join(', ')}` : '',
    unknown.length ? `unknown ${unknown.map((s) => `'${s}'`).join(', ')}` : '',
    repeated.length ? `repeated ${repeated.join(', ')}` : '',
  ].filter(Boolean);
  problem(line, null, written, `wrong header (${parts.join('; ')}); the header line must be exactly '${GRID_FILE_HEADER}' (rows not checked)`);
  return null;
}

/** Parses a numeric cell; reports and returns NaN when it is not a finite number passing `ok`. */
function numberCell(
  text: string | undefined, line: number, column: string, unit: string, ok: (x: number) => boolean, allowed: string,
  problem: (row: number, column: string | null, value: string | null, message: string) => void,
): number {
  if (text === undefined) return NaN; // wrong field count, already reported
  const u = unit ? ` ${unit}` : '';
  let x: number;
  try {
    x = parseNumber(text);
  } catch {
    problem(line, column, text, `${column} '${text}' is not a number; it must be a finite decimal number ${allowed}${u}`);
    return NaN;
  }
  if (!ok(x)) {
    problem(line, column, text, `${column} ${text}${u} is out of range; it must be ${allowed}${u}`);
    return NaN;
  }
  return x;
}

/** Parses the eep cell: [] when empty, the names, or undefined after reporting a bad one. */
function eepCell(
  text: string, line: number, problem: (row: number, column: string | null, value: string | null, message: string) => void,
): string[] | undefined {
  const t = text.trim();
  if (t === '') return [];
  const names = t.split(/\s+/);
  let ok = true;
  names.forEach((name, i) => {
    if (!EEP_SET.has(name)) {
      problem(line, 'eep', text, `'${name}' is not a primary EEP; the names are: ${EEP_LIST} (several on one row are separated by a space)`);
      ok = false;
    } else if (names.indexOf(name) !== i) {
      problem(line, 'eep', text, `'${name}' is written twice on this row; each primary EEP goes on one row once`);
      ok = false;
    }
  });
  return ok ? names : undefined;
}

function newRun(key: string, initialMass: number, z: number, initialMassText: string, line: number): Run {
  return {
    key, initialMass, z, initialMassText, firstLine: line, lastLine: line, bad: false, unsure: false,
    lines: [], age: [], mass: [], coreMass: [], luminosity: [], teff: [], phase: [], eep: [],
  };
}

/** Appends a row to its run, checking order against the row before (ages, masses, phases). */
function addPoint(
  run: Run, line: number, age: number, mass: number, coreMass: number, luminosity: number, teff: number, phase: number,
  eep: string[] | null, ageText: string, massText: string,
  problem: (row: number, column: string | null, value: string | null, message: string) => void,
): void {
  const k = run.lines.length;
  if (k > 0) {
    const pAge = run.age[k - 1];
    const pPhase = run.phase[k - 1];
    const pLine = run.lines[k - 1];
    const restart = age < pAge && age <= run.age[0] && phase === run.phase[0];
    if (restart) {
      problem(line, 'age', ageText,
        `the track initialMass ${run.initialMass} Msun, z ${run.z} starts again here (it began on row ${run.firstLine}); ` +
        'each (initialMass, z) must appear once');
      run.bad = true;
      run.unsure = true;
    } else {
      if (age < pAge) {
        problem(line, 'age', ageText, `age ${age} yr is before row ${pLine}'s ${pAge} yr; ages must not decrease along a track`);
        run.bad = true;
      } else if (age === pAge && phase === pPhase && phase >= 0) {
        problem(line, 'age', ageText,
          `age ${age} yr repeats row ${pLine}'s within phase ${PHASES[phase]}; ages must increase strictly within a phase ` +
          '(two rows may share an age only where one phase ends and the next begins)');
        run.bad = true;
      }
      if (mass > run.mass[k - 1]) {
        problem(line, 'mass', massText, `mass ${mass} Msun is more than row ${pLine}'s ${run.mass[k - 1]} Msun; mass must not grow along a track`);
        run.bad = true;
      }
      if (phase >= 0 && pPhase >= 0) {
        if (phase < pPhase) {
          problem(line, 'phase', PHASES[phase],
            `phase ${PHASES[phase]} comes after ${PHASES[pPhase]} (row ${pLine}); phases must follow life order: ${PHASE_LIST}`);
          run.bad = true;
        } else if (phase !== pPhase && isRemnantPhase(PHASES[pPhase] as Phase)) {
          problem(line, 'phase', PHASES[phase],
            `phase ${PHASES[phase]} follows the remnant phase ${PHASES[pPhase]} (row ${pLine}); a track ends in one remnant`);
          run.bad = true;
        }
      }
    }
  }
  run.lines.push(line);
  run.age.push(age);
  run.mass.push(mass);
  run.coreMass.push(coreMass);
  run.luminosity.push(luminosity);
  run.teff.push(teff);
  run.phase.push(phase);
  run.eep.push(eep);
}

/** Checks a run's EEP labels (or places them) and builds its Track; null when the run has problems. */
function finishRun(
  run: Run, build: boolean, problem: (row: number, column: string | null, value: string | null, message: string) => void,
): Track | null {
  const n = run.lines.length;
  if (n === 0 || run.unsure) return null;
  if (run.phase.some((p) => p < 0) || run.age.some(Number.isNaN)) return null; // EEPs cannot be judged
  const phase = Uint8Array.from(run.phase);
  const age = Float64Array.from(run.age);
  const slots = gridFileEepSlots(phase, age);
  let eeps: Eep[];
  const labelled = run.eep.some((e) => e !== null && e.length > 0);
  if (!labelled) {
    eeps = slots.map((s): Eep => ({ name: s.name, index: s.index })).sort((a, b) => a.index - b.index);
  } else {
    eeps = [];
    const found = new Map<string, number>();
    const allowed = slots.map((s) => s.name).join(', ');
    for (let i = 0; i < n; i++) {
      for (const name of run.eep[i] ?? []) {
        const line = run.lines[i];
        const cellText = (run.eep[i] ?? []).join(' ');
        const prev = found.get(name);
        if (prev !== undefined) {
          problem(line, 'eep', cellText, `primary EEP '${name}' appears again (first on row ${run.lines[prev]}); each marks one row of a track`);
          run.bad = true;
          continue;
        }
        found.set(name, i);
        const slot = slots.find((s) => s.name === name);
        if (!slot) {
          problem(line, 'eep', cellText,
            `primary EEP '${name}' needs ${EEP_NEEDS[name as EepName]}, which this track does not have; its EEPs are: ${allowed}`);
          run.bad = true;
        } else if (i < slot.lo || i > slot.hi) {
          const rows = slot.lo === slot.hi ? `row ${run.lines[slot.index]}` : `rows ${run.lines[slot.lo]}–${run.lines[slot.hi]}`;
          problem(line, 'eep', cellText, `primary EEP '${name}' goes on ${slot.where} (${rows}), not on this row`);
          run.bad = true;
        } else {
          eeps.push({ name: slot.name, index: i });
        }
      }
    }
    for (const slot of slots) {
      if (!found.has(slot.name) && !slot.optional) {
        problem(run.lines[slot.index], 'eep', null,
          `missing primary EEP '${slot.name}': the track's rows carry EEP labels, so it must mark ${slot.where} (row ${run.lines[slot.index]}) with '${slot.name}'`);
        run.bad = true;
      }
    }
    const order = (name: EepName) => PRIMARY_EEPS.indexOf(name);
    eeps.sort((a, b) => a.index - b.index || order(a.name) - order(b.name));
  }
  if (run.bad || !build) return null;
  return buildTrack(run, phase, age, eeps);
}

function buildTrack(run: Run, phase: Uint8Array, age: Float64Array, eeps: Eep[]): Track {
  const n = run.lines.length;
  const logL = new Float64Array(n);
  const logTeff = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    logL[i] = Math.log10(run.luminosity[i]);
    logTeff[i] = Math.log10(run.teff[i]);
  }
  const mass = Float64Array.from(run.mass);
  const coreMass = Float64Array.from(run.coreMass);
  const { initialMass, z } = run;
  let model: Track | null | undefined; // generated on first need
  const predicted = () => {
    if (model === undefined) {
      model = null;
      if (initialMass >= MASS_RANGE.min && initialMass <= MASS_RANGE.max && z >= Z_RANGE.min && z <= Z_RANGE.max) {
        try {
          model = generateTrack(initialMass, z);
        } catch {
          model = null; // the model cannot make this track; fall back as out of range
        }
      }
    }
    return model;
  };

  let msLifetime = 0;
  const zams = eeps.find((e) => e.name === 'zams');
  const tams = eeps.find((e) => e.name === 'tams');
  if (zams && tams) msLifetime = age[tams.index] - age[zams.index];
  else if (zams) {
    // a labelled track cut on the main sequence: the span in the file is only a lower bound
    let lastMs = zams.index;
    for (let i = zams.index; i < n; i++) if (phase[i] === MS) lastMs = i;
    msLifetime = predicted()?.msLifetime ?? age[lastMs] - age[zams.index];
  }

  const lastPhase = PHASES[phase[n - 1]];
  let remnant: RemnantKind;
  let remnantMass: number;
  if (isRemnantPhase(lastPhase)) {
    remnant = lastPhase as RemnantKind;
    remnantMass = mass[n - 1];
  } else if (phase.every((p) => p === BROWN_DWARF)) {
    remnant = 'brown-dwarf';
    remnantMass = mass[n - 1];
  } else {
    const m = predicted();
    remnant = m ? m.remnant : 'white-dwarf';
    remnantMass = m ? m.remnantMass : coreMass[n - 1] > 0 ? coreMass[n - 1] : mass[n - 1];
  }
  return { initialMass, z, n, age, mass, coreMass, logL, logTeff, phase, eeps, events: [], msLifetime, remnant, remnantMass };
}
