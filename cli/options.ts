import { InvalidArgumentError, Option } from 'commander';
import { MASS_RANGE, MAX_AGE, SOLAR_Z, UNIVERSE_AGE, Z_RANGE } from '../lib/model/limits.js';
import { fehFromZ, zFromFeh } from '../lib/model/zFromFeh.js';
import { formatAge } from '../lib/io/formatAge.js';
import { parseAge } from '../lib/io/parseAge.js';
import { parseNumber } from '../lib/io/parseNumber.js';

// Shared option parsers. Each checks its value at the edge and throws
// InvalidArgumentError with one sentence naming the option, the value as typed and
// the valid range; cli/main.ts turns that into one stderr line and exit code 2.

export const MASS_TEXT = `${MASS_RANGE.min}–${MASS_RANGE.max} Msun`;
export const Z_TEXT = `${Z_RANGE.min}–${Z_RANGE.max}`;
export const AGE_TEXT = `(0, ${MAX_AGE / 1e9} Gyr]`;
const FEH_MIN = fehFromZ(Z_RANGE.min);
const FEH_MAX = fehFromZ(Z_RANGE.max);
// Rounded inward so every value inside the printed range is accepted.
export const FEH_TEXT = `${(Math.ceil(FEH_MIN * 100) / 100).toFixed(2)} to +${(Math.floor(FEH_MAX * 100) / 100).toFixed(2)} dex`;

function number(option: string, text: string, range: string): number {
  try {
    return parseNumber(text);
  } catch {
    throw new InvalidArgumentError(`${option} '${text}' is not a number; valid range ${range}`);
  }
}

/** `--mass`: birth mass in Msun, within the model's MASS_RANGE. */
export function parseMass(text: string): number {
  const mass = number('--mass', text, MASS_TEXT);
  if (mass < MASS_RANGE.min || mass > MASS_RANGE.max) {
    throw new InvalidArgumentError(`--mass ${text} is outside the valid range ${MASS_TEXT}`);
  }
  return mass;
}

/** `--z`: metal mass fraction within Z_RANGE. */
export function parseZ(text: string): number {
  const z = number('--z', text, Z_TEXT);
  if (z < Z_RANGE.min || z > Z_RANGE.max) {
    throw new InvalidArgumentError(`--z ${text} is outside the valid range ${Z_TEXT}`);
  }
  return z;
}

/** `--feh`: [Fe/H] in dex, converted to z by `zFromFeh`; the range is the one that keeps z within Z_RANGE. */
export function parseFeh(text: string): number {
  const feh = number('--feh', text, FEH_TEXT);
  const z = zFromFeh(feh);
  if (!(z >= Z_RANGE.min && z <= Z_RANGE.max)) {
    throw new InvalidArgumentError(`--feh ${text} is outside the valid range ${FEH_TEXT} (z ${Z_TEXT})`);
  }
  return feh;
}

/** `--age`: an age with a unit (bare number = Gyr), in (0, MAX_AGE]; returns yr. */
export function parseAgeOption(text: string): number {
  let age: number;
  try {
    age = parseAge(text);
  } catch {
    throw new InvalidArgumentError(
      `--age '${text}' is not an age (a number with unit yr, kyr, Myr or Gyr; a bare number is Gyr); valid range ${AGE_TEXT}`,
    );
  }
  if (!(age > 0 && age <= MAX_AGE)) {
    throw new InvalidArgumentError(`--age ${text} is outside the valid range ${AGE_TEXT}`);
  }
  return age;
}

/** Warning text for ages beyond the age of the universe, or undefined. */
export function ageWarning(age: number): string | undefined {
  if (age <= UNIVERSE_AGE) return undefined;
  const shown = formatAge(age);
  return `warning: age ${shown.text} ${shown.unit} exceeds the age of the universe (${UNIVERSE_AGE / 1e9} Gyr); the model extrapolates`;
}

export const massOption = (): Option =>
  new Option('--mass <Msun>', `birth (initial) mass in Msun, ${MASS_TEXT}`).argParser(parseMass).makeOptionMandatory();

export const zOption = (): Option =>
  new Option('--z <Z>', `metal mass fraction, ${Z_TEXT} (default ${SOLAR_Z}, solar)`).argParser(parseZ).conflicts('feh');

export const fehOption = (): Option =>
  new Option('--feh <dex>', `iron abundance [Fe/H], ${FEH_TEXT}, converted to z (instead of --z)`)
    .argParser(parseFeh)
    .conflicts('z');

export const ageOption = (): Option =>
  new Option('--age <age>', `age since birth, e.g. 4.6Gyr, 300Myr, 12kyr, 5e9yr; a bare number is Gyr; ${AGE_TEXT}`)
    .argParser(parseAgeOption)
    .makeOptionMandatory();

export const jsonOption = (): Option => new Option('--json', 'print JSON instead of a table').conflicts('format');

export const formatOption = (): Option =>
  new Option('--format <kind>', 'output format').choices(['table', 'json']).default('table');

/** The z a command uses: --z, else --feh converted, else solar. */
export function resolveZ(options: { z?: number; feh?: number }): number {
  if (options.z !== undefined) return options.z;
  if (options.feh !== undefined) return zFromFeh(options.feh);
  return SOLAR_Z;
}

/** True when the command should print JSON (--json or --format json). */
export function wantsJson(options: { json?: boolean; format?: string }): boolean {
  return options.json === true || options.format === 'json';
}

// ── Options of the grid-backed commands (star, track, isochrone, grid) ──────────────────────

/** `--mass` for commands that may use a user grid: any number here; the range is checked by checkMass. */
export function parseMassNumber(text: string): number {
  return number('--mass', text, `${MASS_TEXT}, or the --grid file's range`);
}

/** `--z` for commands that may use a user grid: any number here; the range is checked by checkZ. */
export function parseZNumber(text: string): number {
  return number('--z', text, `${Z_TEXT}, or the --grid file's range`);
}

/** A mass or metallicity range with the words that name it in messages. */
export interface NamedRange {
  min: number;
  max: number;
  /** e.g. "the valid range" or "the range of grid mygrid.csv" */
  name: string;
}

/** Shortest text of a range end (the built-in grid's upper mass is 150.00000000000003 as a double). */
export const rangeEnd = (x: number): string => String(Number(x.toPrecision(6)));

/** The option values as typed, for messages (filled by the parsers of gridMassOption and gridZOption). */
export type TypedValues = Record<string, string>;

/** Throws RangeError naming --mass, its value as typed and `range` when the mass is outside it. */
export function checkMass(mass: number, typed: TypedValues, range: NamedRange): void {
  if (!(mass >= range.min && mass <= range.max)) {
    throw new RangeError(`--mass ${typed.mass ?? mass} is outside ${range.name} ${rangeEnd(range.min)}–${rangeEnd(range.max)} Msun`);
  }
}

/** Throws RangeError naming the z (or the --feh it came from), its value as typed and `range` when z is outside it. */
export function checkZ(z: number, options: { z?: number; feh?: number }, typed: TypedValues, range: NamedRange): void {
  if (z >= range.min && z <= range.max) return;
  const what = options.z === undefined && options.feh !== undefined ? `--feh ${options.feh} (z ${rangeEnd(z)})` : `--z ${typed.z ?? z}`;
  const span = range.min === range.max ? `${rangeEnd(range.min)} only` : `${rangeEnd(range.min)}–${rangeEnd(range.max)}`;
  throw new RangeError(`${what} is outside ${range.name} ${span}`);
}

/** `--count`: a whole number of stars, 2–100000. */
export function parseCount(text: string): number {
  const n = number('--count', text, '2–100000');
  if (!Number.isInteger(n) || n < 2 || n > 100000) {
    throw new InvalidArgumentError(`--count ${text} must be a whole number in the valid range 2–100000`);
  }
  return n;
}

/** `--z` of `grid export`: one metal fraction or several separated by commas. */
export function parseZList(text: string): number[] {
  const parts = text.split(',').map((s) => s.trim());
  return parts.map((part) => {
    try {
      return parseNumber(part);
    } catch {
      throw new InvalidArgumentError(`--z '${part}' is not a number; give built-in metallicities separated by commas, e.g. 0.014,0.004`);
    }
  });
}

/** `--mass` whose range depends on --grid; the text as typed is kept in `typed.mass` for checkMass. */
export const gridMassOption = (typed: TypedValues): Option =>
  new Option('--mass <Msun>', `birth (initial) mass in Msun, ${MASS_TEXT} (with --grid: the grid's mass range)`)
    .argParser((text: string) => {
      typed.mass = text;
      return parseMassNumber(text);
    })
    .makeOptionMandatory();

/** `--z` whose range depends on --grid; the text as typed is kept in `typed.z` for checkZ. */
export const gridZOption = (typed: TypedValues): Option =>
  new Option('--z <Z>', `metal mass fraction, ${Z_TEXT} (default ${SOLAR_Z}, solar; with --grid: the grid's range)`)
    .argParser((text: string) => {
      typed.z = text;
      return parseZNumber(text);
    })
    .conflicts('feh');

export const gridOption = (): Option =>
  new Option('--grid <file>', 'interpolate in the track grid in FILE (open layout; see `starclock grid check --help`) instead of the built-in grid');

export const exactOption = (): Option =>
  new Option('--exact', 'build the track for exactly this mass and z with the analytic model instead of interpolating in a grid').conflicts('grid');

export const dataFormatOption = (): Option =>
  new Option('--format <kind>', 'output format').choices(['table', 'csv', 'json']).default('table');

export const countOption = (): Option =>
  new Option('--count <N>', 'number of log-spaced initial masses, 2–100000 (more are added near the turnoff)')
    .argParser(parseCount)
    .default(300);
