/** Layout name and version of the data a viewer page carries. */
export const VIEWER_PAYLOAD_FORMAT = 'starclock-viewer-data';
/** See {@link VIEWER_PAYLOAD_FORMAT}. */
export const VIEWER_PAYLOAD_VERSION = 1;

/**
 * How the page's clock reads: `elapsed` — time since star formation began (a scenario);
 * `offset` — time relative to a table's present, `now` (negative is the past).
 */
export type ViewerClock = 'elapsed' | 'offset';

/** The time grid of the page; every time is yr since the population's origin (≥ 0). */
export interface ViewerTime {
  from: number;
  to: number;
  /** number of grid times, both ends included (≥ 2) */
  steps: number;
  spacing: 'log' | 'linear';
  /** yr since the origin that is "today": a scenario's `now`, a table's oldest age */
  now: number;
  /** where the slider starts, yr since the origin */
  start: number;
  clock: ViewerClock;
}

/** Everything a viewer page shows, in one JSON-ready object. */
export interface ViewerPayload {
  format: typeof VIEWER_PAYLOAD_FORMAT;
  version: typeof VIEWER_PAYLOAD_VERSION;
  /** the population's name (scenario name, or the table's file name) */
  title: string;
  /** what it came from: `scenario` or `table` */
  source: 'scenario' | 'table';
  time: ViewerTime;
  stars: {
    /** Msun */
    initialMass: number[];
    /** yr since the origin; a star's age at time t is t − birthTime */
    birthTime: number[];
    /** metal mass fraction */
    z: number[];
    /** one per star, or null when the input had no names */
    name: string[] | null;
  };
  /** the metallicity of the isochrone overlay and turnoff mass: the population's median z */
  isochroneZ: number;
  /** Msun: the masses the isochrone and turnoff search span (a scenario's IMF limits, a table's extremes) */
  massLimits: { min: number; max: number };
  /** the grid slabs the stars need (serializeGrid of subsetGrid), gzip-compressed, base64 */
  grid: { encoding: 'gzip-base64'; bytes: number; data: string };
}

/** What {@link viewerPayload} is built from. */
export interface ViewerPayloadInput {
  title: string;
  source: 'scenario' | 'table';
  time: ViewerTime;
  initialMass: ArrayLike<number>;
  birthTime: ArrayLike<number>;
  z: ArrayLike<number>;
  name?: readonly string[] | null;
  /** Msun; default: the smallest and largest initial mass of the stars */
  massLimits?: { min: number; max: number };
  grid: { bytes: number; data: string };
}

const positive = (x: number) => Number.isFinite(x) && x > 0;

/**
 * Assembles and checks the data of a viewer page: star columns as plain arrays (JSON-ready,
 * shortest round-trip numbers), the time grid, the encoded grid, and the isochrone's
 * metallicity (the median z of the stars). Pure and browser-safe; the grid is encoded by the
 * caller (lib/io/viewerPayloadGrid.ts in Node).
 *
 * @throws RangeError naming the field, the star's position (0-based) and the value when a
 *   column has the wrong length, a mass or z is not positive and finite, a birth time is not
 *   finite, a name is not a string, or the time grid is inconsistent (from < to, steps ≥ 2,
 *   log spacing needs from > 0, start and now finite)
 * @example viewerPayload({ title: 'Tessel Cluster', source: 'scenario', time, initialMass: [1],
 *   birthTime: [0], z: [0.014], grid }).isochroneZ // 0.014
 */
export function viewerPayload(input: ViewerPayloadInput): ViewerPayload {
  const n = input.initialMass.length;
  if (n < 1) throw new RangeError('viewer: the population has no stars; need at least 1');
  for (const key of ['birthTime', 'z'] as const) {
    if (input[key].length !== n) throw new RangeError(`viewer: ${key} has ${input[key].length} values for ${n} stars`);
  }
  const initialMass = Array.from(input.initialMass);
  const birthTime = Array.from(input.birthTime);
  const z = Array.from(input.z);
  for (let i = 0; i < n; i++) {
    if (!positive(initialMass[i])) throw new RangeError(`viewer: star ${i} initialMass ${initialMass[i]} must be a positive number (Msun)`);
    if (!positive(z[i])) throw new RangeError(`viewer: star ${i} z ${z[i]} must be a positive number`);
    if (!Number.isFinite(birthTime[i])) throw new RangeError(`viewer: star ${i} birthTime ${birthTime[i]} must be a finite number of yr`);
  }
  let name: string[] | null = null;
  if (input.name) {
    if (input.name.length !== n) throw new RangeError(`viewer: name has ${input.name.length} values for ${n} stars`);
    name = input.name.map((s, i) => {
      if (typeof s !== 'string') throw new RangeError(`viewer: star ${i} name must be a string, got ${typeof s}`);
      return s;
    });
  }
  const t = input.time;
  if (!(Number.isFinite(t.from) && Number.isFinite(t.to) && t.from < t.to)) {
    throw new RangeError(`viewer: time grid from ${t.from} to ${t.to} yr must have from < to, both finite`);
  }
  if (t.from < 0) throw new RangeError(`viewer: time grid from ${t.from} yr must be ≥ 0 (yr since the origin)`);
  if (t.spacing === 'log' && !(t.from > 0)) throw new RangeError(`viewer: a log time grid needs from > 0, got ${t.from} yr`);
  if (t.spacing !== 'log' && t.spacing !== 'linear') throw new RangeError(`viewer: time spacing '${String(t.spacing)}' must be log or linear`);
  if (!(Number.isInteger(t.steps) && t.steps >= 2)) throw new RangeError(`viewer: time steps ${t.steps} must be an integer ≥ 2`);
  if (!Number.isFinite(t.now) || !Number.isFinite(t.start)) throw new RangeError(`viewer: now ${t.now} and start ${t.start} must be finite (yr)`);
  if (t.clock !== 'elapsed' && t.clock !== 'offset') throw new RangeError(`viewer: clock '${String(t.clock)}' must be elapsed or offset`);
  // the median as populationHistory takes it (mean of the middle two for an even count)
  const sorted = z.slice().sort((a, b) => a - b);
  const isochroneZ = n % 2 ? sorted[(n - 1) >> 1] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
  let lo = Infinity;
  let hi = -Infinity;
  for (const m of initialMass) {
    if (m < lo) lo = m;
    if (m > hi) hi = m;
  }
  const limits = input.massLimits ?? { min: lo, max: hi };
  if (!(positive(limits.min) && positive(limits.max) && limits.min <= limits.max)) {
    throw new RangeError(`viewer: mass limits ${limits.min}–${limits.max} Msun must be positive with min ≤ max`);
  }
  return {
    format: VIEWER_PAYLOAD_FORMAT,
    version: VIEWER_PAYLOAD_VERSION,
    title: String(input.title),
    source: input.source,
    time: { from: t.from, to: t.to, steps: t.steps, spacing: t.spacing, now: t.now, start: Math.min(t.to, Math.max(t.from, t.start)), clock: t.clock },
    stars: { initialMass, birthTime, z, name },
    isochroneZ,
    massLimits: { min: limits.min, max: limits.max },
    grid: { encoding: 'gzip-base64', bytes: input.grid.bytes, data: input.grid.data },
  };
}
