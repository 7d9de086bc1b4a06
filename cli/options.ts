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
