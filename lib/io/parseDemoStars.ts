import { MASS_RANGE, MAX_AGE, Z_RANGE } from '../model/limits.js';

/** One named star of the demo scenario. */
export interface DemoStar {
  name: string;
  /** birth mass, Msun */
  initialMass: number;
  /** metal mass fraction */
  z: number;
  /** present age, yr */
  age: number;
  /** free text for the reader */
  note?: string;
}

/** The demo scenario: an invented region and its named stars. */
export interface DemoStars {
  region: string;
  description?: string;
  stars: DemoStar[];
}

const TOP_KEYS = new Set(['region', 'description', 'stars']);
const STAR_KEYS = new Set(['name', 'initialMass', 'z', 'age', 'note']);

/**
 * Reads and validates the demo scenario's star list (`tracks-demo/demo-stars.json`):
 * `{ "region", "description"?, "stars": [ { "name", "initialMass" (Msun), "z",
 * "age" (yr), "note"? } ] }`. Unknown keys are errors, not ignored; every range
 * is the model's (`MASS_RANGE`, `Z_RANGE`, age in (0, `MAX_AGE`]); names are
 * unique.
 *
 * @param text the file's content
 * @param source the file name, quoted in messages
 * @returns the validated scenario
 * @throws RangeError or TypeError naming the file, the star (index and name), the key, the value and the valid range
 * @example parseDemoStars('{"region":"R","stars":[{"name":"A","initialMass":1,"z":0.014,"age":4e9}]}', 'x.json').stars[0].age // 4e9
 */
export function parseDemoStars(text: string, source: string): DemoStars {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    throw new TypeError(`${source}: not valid JSON (${(error as Error).message})`);
  }
  if (!isObject(data)) throw new TypeError(`${source}: expected a JSON object with "region" and "stars"`);
  for (const key of Object.keys(data)) {
    if (!TOP_KEYS.has(key)) throw new TypeError(`${source}: unknown key "${key}"; allowed: ${[...TOP_KEYS].join(', ')}`);
  }
  const { region, description, stars } = data;
  if (typeof region !== 'string' || region === '') throw new TypeError(`${source}: "region" must be a non-empty string`);
  if (description !== undefined && typeof description !== 'string') {
    throw new TypeError(`${source}: "description" must be a string`);
  }
  if (!Array.isArray(stars) || stars.length === 0) throw new TypeError(`${source}: "stars" must be a non-empty array`);
  const names = new Set<string>();
  const out = stars.map((star: unknown, i): DemoStar => {
    const where = `${source}: stars[${i}]`;
    if (!isObject(star)) throw new TypeError(`${where}: expected an object`);
    for (const key of Object.keys(star)) {
      if (!STAR_KEYS.has(key)) throw new TypeError(`${where}: unknown key "${key}"; allowed: ${[...STAR_KEYS].join(', ')}`);
    }
    const { name, initialMass, z, age, note } = star;
    if (typeof name !== 'string' || name === '') throw new TypeError(`${where}: "name" must be a non-empty string`);
    if (names.has(name)) throw new RangeError(`${where} (${name}): the name is used twice`);
    names.add(name);
    const named = `${where} (${name})`;
    if (note !== undefined && typeof note !== 'string') throw new TypeError(`${named}: "note" must be a string`);
    checkNumber(initialMass, `${named}: initialMass`, MASS_RANGE.min, MASS_RANGE.max, `${MASS_RANGE.min}–${MASS_RANGE.max} Msun`);
    checkNumber(z, `${named}: z`, Z_RANGE.min, Z_RANGE.max, `${Z_RANGE.min}–${Z_RANGE.max}`);
    checkNumber(age, `${named}: age`, Number.MIN_VALUE, MAX_AGE, `(0, ${MAX_AGE}] yr`);
    const result: DemoStar = { name, initialMass, z, age };
    if (note !== undefined) result.note = note;
    return result;
  });
  const result: DemoStars = { region, stars: out };
  if (description !== undefined) result.description = description;
  return result;
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function checkNumber(value: unknown, what: string, min: number, max: number, range: string): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new TypeError(`${what} ${JSON.stringify(value)} is not a finite number; valid range ${range}`);
  }
  if (value < min || value > max) throw new RangeError(`${what} ${value} is outside the valid range ${range}`);
}
