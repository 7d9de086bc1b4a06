import { AGE_FORMS, parseAge } from '../io/parseAge.js';
import { MAX_AGE, SOLAR_Z, Z_RANGE } from '../model/limits.js';
import { fehFromZ, zFromFeh } from '../model/zFromFeh.js';
import {
  DEFAULT_MAX_MASS, DEFAULT_MIN_MASS, IMF_MASS_LIMITS,
  type HistorySpec, type ImfSpec, type MetallicitySpec, type Scenario, type StarFormationSpec,
} from './scenario.js';

/** One problem found in a scenario: where (key path), the value found, and the full message. */
export interface ScenarioIssue {
  /** key path, e.g. `imf.slopes[1]`; `(scenario)` for the whole document */
  path: string;
  /** the offending value (undefined when the key is missing) */
  value: unknown;
  /** `<path>: <value> <problem>; allowed: <what is allowed>` */
  message: string;
}

const IMF_KINDS = ['salpeter', 'kroupa', 'chabrier', 'power-law'] as const;
const SF_KINDS = ['burst', 'constant', 'exponential', 'table'] as const;
const SPACINGS = ['log', 'linear'] as const;
const MAX_SIZE = 4294967295;
const MAX_STEPS = 10000;
const MAX_SPREAD = 1;
const SLOPE_LIMIT = 10;
const FEH_MIN = fehFromZ(Z_RANGE.min);
const FEH_MAX = fehFromZ(Z_RANGE.max);
const fmt = (x: number) => Number(x.toPrecision(4)).toString();

function show(value: unknown): string {
  if (value === undefined) return 'missing';
  let s: string;
  try {
    s = JSON.stringify(value) ?? String(value);
  } catch {
    s = String(value);
  }
  return s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

function typeName(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  return typeof value === 'object' ? 'an object' : `a ${typeof value}`;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Collects issues while reading; each check returns the value or undefined. */
class Reader {
  readonly issues: ScenarioIssue[] = [];

  fail(path: string, value: unknown, problem: string, allowed: string): undefined {
    this.issues.push({ path, value, message: `${path}: ${show(value)} ${problem}; allowed: ${allowed}` });
    return undefined;
  }

  missing(path: string, allowed: string): undefined {
    this.issues.push({ path, value: undefined, message: `${path}: missing; required: ${allowed}` });
    return undefined;
  }

  /** An object with only `keys`; unknown keys are reported. */
  object(path: string, value: unknown, keys: readonly string[]): Record<string, unknown> | undefined {
    if (!isObject(value)) return this.fail(path, value, `is ${typeName(value)}, not an object`, `an object with keys ${keys.join(', ')}`);
    for (const k of Object.keys(value)) {
      if (!keys.includes(k)) this.fail(join(path, k), value[k], 'is an unknown key', `keys ${keys.join(', ')}`);
    }
    return value;
  }

  number(path: string, value: unknown, min: number, max: number, allowed: string, opts: { integer?: boolean; minOpen?: boolean } = {}): number | undefined {
    if (typeof value !== 'number') return this.fail(path, value, `is ${typeName(value)}, not a number`, allowed);
    if (!Number.isFinite(value)) return this.fail(path, value, 'is not finite', allowed);
    if (opts.integer && !Number.isInteger(value)) return this.fail(path, value, 'is not an integer', allowed);
    if ((opts.minOpen ? !(value > min) : !(value >= min)) || !(value <= max)) return this.fail(path, value, 'is out of range', allowed);
    return value;
  }

  /** An age (string with unit, or number = Gyr) in yr, within [min, max] (min open when minOpen). */
  age(path: string, value: unknown, min: number, max: number, allowed: string, minOpen = false): number | undefined {
    let yr: number;
    if (typeof value === 'number') {
      if (!Number.isFinite(value)) return this.fail(path, value, 'is not finite', `${allowed}, as ${AGE_FORMS}`);
      yr = value * 1e9;
    } else if (typeof value === 'string') {
      try {
        yr = parseAge(value);
      } catch {
        return this.fail(path, value, 'is not an age', `${allowed}, as ${AGE_FORMS}`);
      }
    } else {
      return this.fail(path, value, `is ${typeName(value)}, not an age`, `${allowed}, as ${AGE_FORMS}`);
    }
    if ((minOpen ? !(yr > min) : !(yr >= min)) || !(yr <= max)) return this.fail(path, value, `(${yr} yr) is out of range`, allowed);
    return yr;
  }

  oneOf<T extends string>(path: string, value: unknown, options: readonly T[]): T | undefined {
    if (value === undefined) return this.missing(path, `one of ${options.join(', ')}`);
    if (typeof value !== 'string' || !(options as readonly string[]).includes(value)) {
      return this.fail(path, value, 'is not a known choice', `one of ${options.join(', ')}`);
    }
    return value as T;
  }

  array(path: string, value: unknown, minLength: number, allowed: string): unknown[] | undefined {
    if (!Array.isArray(value)) return this.fail(path, value, `is ${typeName(value)}, not an array`, allowed);
    if (value.length < minLength) return this.fail(path, value, `has ${value.length} entries, too few`, allowed);
    return value;
  }

  /**
   * An array of at least `minLength` pairs [x, y] with x strictly increasing; `first` and
   * `second` read a pair's parts (path, value); `words` are the messages: `notPair` for an entry
   * that is not a pair, `pair` what one is, `misplaced` for an x not above the previous one
   * (followed by that one's path), `increasing` what is allowed. Every problem is collected;
   * undefined if there is any.
   */
  increasingPairs(
    path: string, value: unknown, minLength: number, allowed: string,
    first: (path: string, v: unknown) => number | undefined, second: (path: string, v: unknown) => number | undefined,
    words: { notPair: string; pair: string; misplaced: string; increasing: string },
  ): [number, number][] | undefined {
    const a = this.array(path, value, minLength, allowed);
    if (!a) return undefined;
    const points: [number, number][] = [];
    let ok = true;
    a.forEach((p, i) => {
      const at = `${path}[${i}]`;
      if (!Array.isArray(p) || p.length !== 2) {
        this.fail(at, p, words.notPair, words.pair);
        ok = false;
        return;
      }
      const x = first(`${at}[0]`, p[0]);
      const y = second(`${at}[1]`, p[1]);
      if (x === undefined || y === undefined) {
        ok = false;
        return;
      }
      if (points.length === i && i > 0 && !(x > points[i - 1][0])) {
        this.fail(`${at}[0]`, p[0], `${words.misplaced} ${path}[${i - 1}][0]`, words.increasing);
        ok = false;
      }
      points.push([x, y]);
    });
    return ok ? points : undefined;
  }
}

/** Key path of `key` inside `path`; top-level keys have no prefix. */
const join = (path: string, key: string) => (path === ROOT ? key : `${path}.${key}`);
const ROOT = '(scenario)';

function readImf(r: Reader, v: unknown): ImfSpec | undefined {
  const o = r.object('imf', v, ['kind', 'minMass', 'maxMass', 'slopes', 'breaks']);
  if (!o) return undefined;
  const kind = r.oneOf('imf.kind', o.kind, IMF_KINDS);
  const massAllowed = `a mass in Msun, ${IMF_MASS_LIMITS.min}–${IMF_MASS_LIMITS.max}`;
  const minMass = o.minMass === undefined ? DEFAULT_MIN_MASS : r.number('imf.minMass', o.minMass, IMF_MASS_LIMITS.min, IMF_MASS_LIMITS.max, massAllowed);
  const maxMass = o.maxMass === undefined ? DEFAULT_MAX_MASS : r.number('imf.maxMass', o.maxMass, IMF_MASS_LIMITS.min, IMF_MASS_LIMITS.max, massAllowed);
  let limitsOk = minMass !== undefined && maxMass !== undefined;
  if (limitsOk && !(minMass! < maxMass!)) {
    r.fail('imf.maxMass', o.maxMass ?? maxMass, `is not above imf.minMass ${minMass}`, `a mass above minMass, up to ${IMF_MASS_LIMITS.max} Msun`);
    limitsOk = false;
  }
  if (kind !== 'power-law') {
    for (const k of ['slopes', 'breaks'] as const) {
      if (o[k] !== undefined) r.fail(`imf.${k}`, o[k], `is not used by imf.kind ${show(kind ?? o.kind)}`, 'slopes and breaks with kind power-law only');
    }
    return kind && limitsOk ? { kind, minMass: minMass!, maxMass: maxMass! } : undefined;
  }
  const slopesAllowed = `an array of at least one slope α (dN/dm ∝ m^-α), each a number in ${-SLOPE_LIMIT}–${SLOPE_LIMIT}`;
  let ok = limitsOk;
  const slopes: number[] = [];
  if (o.slopes === undefined) {
    r.missing('imf.slopes', slopesAllowed);
    ok = false;
  } else {
    const a = r.array('imf.slopes', o.slopes, 1, slopesAllowed);
    if (!a) ok = false;
    else a.forEach((s, i) => {
      const x = r.number(`imf.slopes[${i}]`, s, -SLOPE_LIMIT, SLOPE_LIMIT, `a number in ${-SLOPE_LIMIT}–${SLOPE_LIMIT}`);
      if (x === undefined) ok = false;
      else slopes.push(x);
    });
  }
  const breaks: number[] = [];
  const breaksAllowed = 'an array of masses (Msun), one fewer than slopes, strictly increasing, strictly inside minMass–maxMass';
  const rawBreaks = o.breaks === undefined ? [] : r.array('imf.breaks', o.breaks, 0, breaksAllowed);
  if (!rawBreaks) ok = false;
  else {
    rawBreaks.forEach((b, i) => {
      const p = `imf.breaks[${i}]`;
      const x = r.number(p, b, 0, IMF_MASS_LIMITS.max, `a mass in Msun strictly inside minMass–maxMass`, { minOpen: true });
      if (x === undefined) {
        ok = false;
        return;
      }
      if (limitsOk && !(x > minMass! && x < maxMass!)) {
        r.fail(p, b, 'is out of range', `a mass strictly inside minMass–maxMass (${minMass}–${maxMass} Msun)`);
        ok = false;
      } else if (i > 0 && breaks.length === i && !(x > breaks[i - 1])) {
        r.fail(p, b, `is not above imf.breaks[${i - 1}] ${breaks[i - 1]}`, 'strictly increasing masses');
        ok = false;
      }
      breaks.push(x);
    });
    if (Array.isArray(o.slopes) && rawBreaks.length !== o.slopes.length - 1) {
      r.fail('imf.breaks', o.breaks, `has ${rawBreaks.length} entries for ${o.slopes.length} slopes`, `exactly ${Math.max(0, o.slopes.length - 1)} breaks (one fewer than slopes)`);
      ok = false;
    }
  }
  return ok ? { kind: 'power-law', minMass: minMass!, maxMass: maxMass!, slopes, breaks } : undefined;
}

function readStarFormation(r: Reader, v: unknown, now: number | undefined): StarFormationSpec | undefined {
  const o = r.object('starFormation', v, ['kind', 'duration', 'tau', 'points']);
  if (!o) return undefined;
  const kind = r.oneOf('starFormation.kind', o.kind, SF_KINDS);
  const uses: Record<(typeof SF_KINDS)[number], string | undefined> = { burst: 'duration', constant: undefined, exponential: 'tau', table: 'points' };
  for (const k of ['duration', 'tau', 'points']) {
    if (o[k] !== undefined && kind !== undefined && uses[kind] !== k) {
      r.fail(`starFormation.${k}`, o[k], `is not used by starFormation.kind ${kind}`, `duration with burst, tau with exponential, points with table`);
    }
  }
  switch (kind) {
    case undefined:
      return undefined;
    case 'constant':
      return { kind };
    case 'burst': {
      if (o.duration === undefined) return r.missing('starFormation.duration', `an age ≥ 0 (${AGE_FORMS})`);
      const d = r.age('starFormation.duration', o.duration, 0, MAX_AGE, 'an age 0–100 Gyr');
      return d === undefined ? undefined : { kind, duration: d };
    }
    case 'exponential': {
      if (o.tau === undefined) return r.missing('starFormation.tau', `an age > 0 (${AGE_FORMS})`);
      const t = r.age('starFormation.tau', o.tau, 0, 1e12, 'an age > 0, up to 1000 Gyr', true);
      return t === undefined ? undefined : { kind, tau: t };
    }
    case 'table': {
      const allowed = 'an array of at least 2 [time, rate] pairs: times ages ≥ 0 strictly increasing, rates numbers ≥ 0';
      if (o.points === undefined) return r.missing('starFormation.points', allowed);
      const points = r.increasingPairs(
        'starFormation.points', o.points, 2, allowed,
        (path, v) => r.age(path, v, 0, MAX_AGE, 'a time 0–100 Gyr'),
        (path, v) => r.number(path, v, 0, Number.MAX_VALUE, 'a rate ≥ 0 (any unit)'),
        { notPair: 'is not a [time, rate] pair', pair: 'a pair [time, rate]', misplaced: 'is not after', increasing: 'strictly increasing times' },
      );
      if (!points) return undefined;
      if (now !== undefined && !formsStars(points, now)) {
        return r.fail('starFormation.points', o.points, `form no stars in [0, now] (now = ${now} yr)`, 'a positive rate somewhere between time 0 and now');
      }
      return { kind, points };
    }
  }
}

/** True when the piecewise-linear rate (zero outside the points) has a positive integral over [0, now]. */
function formsStars(points: [number, number][], now: number): boolean {
  for (let i = 0; i + 1 < points.length; i++) {
    const [t0, r0] = points[i];
    const [t1, r1] = points[i + 1];
    const end = t1 < now ? t1 : now;
    if (!(end > t0)) continue;
    const rEnd = r0 + ((r1 - r0) * (end - t0)) / (t1 - t0);
    if (r0 > 0 || rEnd > 0) return true;
  }
  return false;
}

function readMetallicity(r: Reader, v: unknown): MetallicitySpec | undefined {
  if (v === undefined) return { kind: 'fixed', z: SOLAR_Z };
  const o = r.object('metallicity', v, ['z', 'feh', 'spread', 'ageMetallicity']);
  if (!o) return undefined;
  const forms = '{ z }, { feh }, { feh, spread } or { ageMetallicity, spread? }';
  const zAllowed = `a metal mass fraction ${Z_RANGE.min}–${Z_RANGE.max}`;
  const fehAllowed = `[Fe/H] in dex, ${fmt(FEH_MIN)}–${fmt(FEH_MAX)} (Z ${Z_RANGE.min}–${Z_RANGE.max})`;
  const spreadAllowed = `a standard deviation of [Fe/H] in dex, > 0 and ≤ ${MAX_SPREAD}`;
  const given = (['z', 'feh', 'ageMetallicity'] as const).filter((k) => o[k] !== undefined);
  if (given.length !== 1) {
    return r.fail('metallicity', v, given.length === 0 ? 'gives none of z, feh, ageMetallicity' : `gives ${given.join(' and ')} together`, `exactly one of ${forms}`);
  }
  const spread = o.spread === undefined ? undefined : r.number('metallicity.spread', o.spread, 0, MAX_SPREAD, spreadAllowed, { minOpen: true });
  if (o.spread !== undefined && spread === undefined) return undefined;
  if (given[0] === 'z') {
    if (o.spread !== undefined) return r.fail('metallicity.spread', o.spread, 'is not used with z', `spread with feh or ageMetallicity (${forms})`);
    const z = r.number('metallicity.z', o.z, Z_RANGE.min, Z_RANGE.max, zAllowed);
    return z === undefined ? undefined : { kind: 'fixed', z };
  }
  if (given[0] === 'feh') {
    const feh = r.number('metallicity.feh', o.feh, FEH_MIN, FEH_MAX, fehAllowed);
    if (feh === undefined) return undefined;
    return spread === undefined ? { kind: 'fixed', z: clampZ(zFromFeh(feh)) } : { kind: 'spread', feh, spread };
  }
  const allowed = 'an array of at least one [age, feh] pair, ages ≥ 0 strictly increasing';
  const points = r.increasingPairs(
    'metallicity.ageMetallicity', o.ageMetallicity, 1, allowed,
    (path, v) => r.age(path, v, 0, MAX_AGE, 'an age 0–100 Gyr'),
    (path, v) => r.number(path, v, FEH_MIN, FEH_MAX, fehAllowed),
    { notPair: 'is not an [age, feh] pair', pair: 'a pair [age, feh]', misplaced: 'is not above', increasing: 'strictly increasing ages' },
  );
  return points ? { kind: 'ageMetallicity', points, spread: spread ?? 0 } : undefined;
}

/** zFromFeh at the range's own ends can round a hair outside it. */
const clampZ = (z: number) => (z < Z_RANGE.min ? Z_RANGE.min : z > Z_RANGE.max ? Z_RANGE.max : z);

function readHistory(r: Reader, v: unknown, now: number | undefined): HistorySpec | undefined {
  const defaultFrom = now === undefined ? 1e6 : now > 1e6 ? 1e6 : now / 100;
  if (v === undefined) return now === undefined ? undefined : { from: defaultFrom, to: now, steps: 60, spacing: 'log' };
  const o = r.object('history', v, ['from', 'to', 'steps', 'spacing']);
  if (!o) return undefined;
  const from = o.from === undefined ? defaultFrom : r.age('history.from', o.from, 0, MAX_AGE, 'an age > 0, up to 100 Gyr', true);
  const to = o.to === undefined ? now : r.age('history.to', o.to, 0, MAX_AGE, 'an age > 0, up to 100 Gyr', true);
  const steps = o.steps === undefined ? 60 : r.number('history.steps', o.steps, 2, MAX_STEPS, `an integer 2–${MAX_STEPS} (times, both ends included)`, { integer: true });
  const spacing = o.spacing === undefined ? 'log' : r.oneOf('history.spacing', o.spacing, SPACINGS);
  if (from === undefined || to === undefined || steps === undefined || spacing === undefined) return undefined;
  if (!(to > from)) {
    const which = o.to === undefined ? 'history.from' : 'history.to';
    return r.fail(which, o[which === 'history.to' ? 'to' : 'from'], `leaves no time between from (${from} yr) and to (${to} yr)`, 'history.to after history.from');
  }
  return { from, to, steps, spacing };
}

/**
 * Reads a scenario document (the layout of lib/population/scenario.ts): checks every key,
 * collects every problem, and builds the {@link Scenario} with defaults filled and times in yr.
 * Never throws: `scenario` is undefined when there is any issue.
 *
 * @param json the parsed JSON document
 * @returns the issues found (empty when valid) and the scenario when valid
 * @throws nothing
 * @example readScenario({ name: 'A', seed: 1, size: 10, imf: { kind: 'salpeter' },
 *   starFormation: { kind: 'constant' }, now: '1Gyr' }).scenario.imf.minMass // 0.08
 */
export function readScenario(json: unknown): { issues: ScenarioIssue[]; scenario: Scenario | undefined } {
  const r = new Reader();
  const o = r.object(ROOT, json, ['name', 'seed', 'size', 'imf', 'starFormation', 'metallicity', 'now', 'history']);
  if (!o) return { issues: r.issues, scenario: undefined };
  let name: string | undefined;
  if (o.name === undefined) r.missing('name', 'a non-empty string');
  else if (typeof o.name !== 'string' || o.name.trim() === '') r.fail('name', o.name, typeof o.name === 'string' ? 'is empty' : `is ${typeName(o.name)}, not a string`, 'a non-empty string');
  else name = o.name;
  const seedAllowed = `an integer 0–${Number.MAX_SAFE_INTEGER}`;
  const seed = o.seed === undefined ? r.missing('seed', seedAllowed) : r.number('seed', o.seed, 0, Number.MAX_SAFE_INTEGER, seedAllowed, { integer: true });
  const sizeAllowed = `an integer 1–${MAX_SIZE}`;
  const size = o.size === undefined ? r.missing('size', sizeAllowed) : r.number('size', o.size, 1, MAX_SIZE, sizeAllowed, { integer: true });
  const now = o.now === undefined ? r.missing('now', `an age > 0, up to 100 Gyr (${AGE_FORMS})`) : r.age('now', o.now, 0, MAX_AGE, 'an age > 0, up to 100 Gyr', true);
  const imf = o.imf === undefined ? r.missing('imf', `an object with kind one of ${IMF_KINDS.join(', ')}`) : readImf(r, o.imf);
  const starFormation = o.starFormation === undefined
    ? r.missing('starFormation', `an object with kind one of ${SF_KINDS.join(', ')}`)
    : readStarFormation(r, o.starFormation, now);
  const metallicity = readMetallicity(r, o.metallicity);
  const history = readHistory(r, o.history, now);
  if (r.issues.length > 0) return { issues: r.issues, scenario: undefined };
  return {
    issues: [],
    scenario: { name: name!, seed: seed!, size: size!, imf: imf!, starFormation: starFormation!, metallicity: metallicity!, now: now!, history: history! },
  };
}
