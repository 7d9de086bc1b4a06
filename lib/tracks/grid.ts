import type { RemnantKind } from '../model/phases.js';
import type { EepTrack } from './eepTrack.js';
import { steffenSlopes } from '../interp/monotoneCubic.js';

/** Remnant kinds by code, as stored per track in a grid. */
export const REMNANT_CODES: readonly RemnantKind[] = ['white-dwarf', 'neutron-star', 'black-hole', 'brown-dwarf'];

/** Values per EEP in {@link GridRun.rec}: each column followed by its slope in log M. */
export const REC_STRIDE = 10;
/** Offsets inside one EEP record of {@link GridRun.rec}. */
export const REC = { logAge: 0, mass: 2, coreMass: 4, logL: 6, logTeff: 8 } as const;

/**
 * A run of tracks of one metallicity that share an EEP layout and are adjacent in mass:
 * present mass and core mass are stored as fractions of the track's initial mass.
 * the unit the interpolator blends within. The hot loop decides the memory layout: `rec`
 * holds one record of REC_STRIDE numbers per EEP, track-major — log age, mass, core mass,
 * log L, log Teff, each followed by its Steffen slope with respect to log10 initial mass — so
 * the age search and the blend that follows read the same two adjacent records per track
 * instead of ten scattered columns (measured in bench/: see README).
 */
export interface GridRun {
  layout: string;
  /** EEPs per track */
  n: number;
  /** tracks in the run */
  count: number;
  /** phase code per EEP (the same for every track of the layout) */
  phase: Uint8Array;
  logM: Float64Array;
  /**
   * the stored values, column-major: VALUE_COLUMNS[c] of track k at EEP j is
   * `values[(c·count + k)·n + j]` (masses as fractions of the initial mass)
   */
  values: Float64Array;
  /** [(track·n + eep)·REC_STRIDE + REC.x] = column x, [+1] = its slope (empty until prepareRun) */
  rec: Float64Array;
  /**
   * Age index, [track·AGE_BINS + b] = the last EEP whose log age is ≤ AGE_BIN_MIN + b·AGE_BIN_STEP
   * (0 when none): narrows the age search to a few EEPs (see indexRunAges). Empty until the
   * run is first used when the grid was loaded from its cache (the interpolator builds it).
   */
  ageIndex: Int16Array;
  /** per track: log10 msLifetime/yr (0 where the track has no main sequence) */
  logMsLifetime: Float64Array;
  remnantMass: Float64Array;
  remnant: number;
  /**
   * Reads the run's stored arrays (phase, logM, values, logMsLifetime, remnantMass) when the
   * grid was opened from its cache without them (openGridCache); null once they are in.
   */
  load: (() => void) | null;
}

/** Age bins of {@link GridRun.ageIndex}: log10 age/yr from 2 to 12.5 in steps of 0.01 dex. */
export const AGE_BIN_MIN = 2;
export const AGE_BIN_STEP = 0.01;
export const AGE_BINS = 1051;

/**
 * Builds a run's age index: for every track and age bin, the last EEP at or below the bin's
 * lower edge. Because the monotone (Steffen) cubic in mass never leaves the range of its two
 * nodes, an interpolated star's EEP for a log age in bin b lies between the smaller of its two
 * tracks' entries at b and the larger at b + 1 — the age search then bisects only that span.
 */
export function indexRunAges(rec: Float64Array, n: number, count: number): Int16Array {
  const idx = new Int16Array(count * AGE_BINS);
  for (let k = 0; k < count; k++) {
    let j = 0;
    for (let b = 0; b < AGE_BINS; b++) {
      const edge = AGE_BIN_MIN + b * AGE_BIN_STEP;
      while (j + 1 < n && rec[(k * n + j + 1) * REC_STRIDE + REC.logAge] <= edge) j++;
      idx[k * AGE_BINS + b] = j;
    }
  }
  return idx;
}

/** Bins of a slab's mass index. */
export const MASS_BINS = 4096;

/**
 * A slab's mass index: MASS_BINS equal bins in log M over the slab's range, each holding the
 * last track at or below its lower edge, so that locating a mass costs a lookup and a step or
 * two instead of a bisection.
 */
export function indexSlabMasses(logM: Float64Array): { massIndex: Int32Array; massIndexMin: number; massIndexScale: number } {
  const n = logM.length;
  const lo = logM[0];
  const scale = n > 1 ? MASS_BINS / (logM[n - 1] - lo) : 0;
  const massIndex = new Int32Array(MASS_BINS + 1);
  // track k (at most n − 2) holds the bins from the first whose lower edge reaches logM[k] up
  // to the next track's first: one fill per track, so a freshly loaded grid indexes its slabs
  // in a fraction of a millisecond, even before the JIT has warmed up
  const edge = (b: number) => lo + b / scale;
  const firstBin = (k: number) => {
    let b = Math.max(0, Math.min(MASS_BINS + 1, Math.ceil((logM[k] - lo) * scale)));
    while (b > 0 && edge(b - 1) >= logM[k]) b--;
    while (b <= MASS_BINS && edge(b) < logM[k]) b++;
    return b;
  };
  const last = Math.max(0, n - 2);
  let from = 0;
  for (let k = 0; k < last; k++) {
    const to = firstBin(k + 1);
    if (to > from) massIndex.fill(k, from, to);
    from = Math.max(from, to);
  }
  massIndex.fill(last, from);
  return { massIndex, massIndexMin: lo, massIndexScale: scale };
}

/** All tracks of one metallicity, sorted by initial mass. */
export interface GridSlab {
  z: number;
  logZ: number;
  /** log10 initial mass of every track */
  logM: Float64Array;
  /** mass index: [b] = the last track whose log M ≤ the lower edge of bin b (see indexSlabMasses) */
  massIndex: Int32Array;
  massIndexMin: number;
  massIndexScale: number;
  /** run index and position in the run of every track */
  runOf: Int32Array;
  indexInRun: Int32Array;
  runs: GridRun[];
}

/** A track grid ready for interpolation. */
export interface Grid {
  slabs: GridSlab[];
  logZ: Float64Array;
  massRange: { min: number; max: number };
  zRange: { min: number; max: number };
  /** where the grid came from, for messages ("built-in", a file name) */
  source: string;
}

/**
 * Builds an interpolation grid from EEP tracks: groups them by metallicity, sorts each
 * group by mass, cuts it into runs of one EEP layout, and precomputes the Steffen (1990,
 * A&A 239, 443) slopes of every column across the masses of each run, EEP by EEP, so a
 * query costs a bisection and Hermite blends only.
 *
 * @param tracks EEP tracks (resampleEeps); two tracks with the same mass and z are an error
 * @param source a name for messages
 * @throws RangeError for an empty list or duplicate tracks
 */
export function buildGrid(tracks: readonly EepTrack[], source: string): Grid {
  if (tracks.length === 0) throw new RangeError(`grid ${source} has no tracks`);
  const byZ = new Map<number, EepTrack[]>();
  for (const t of tracks) {
    const list = byZ.get(t.z) ?? [];
    list.push(t);
    byZ.set(t.z, list);
  }
  const zs = [...byZ.keys()].sort((a, b) => a - b);
  return gridOfSlabs(zs.map((z) => buildSlab(z, byZ.get(z)!, source)), source);
}

/**
 * A grid made of ready slabs (sorted by z): the log Z nodes and the mass and z ranges
 * derived from them. The initial masses of the whole slabs, min to max, are the mass range.
 */
export function gridOfSlabs(slabs: GridSlab[], source: string): Grid {
  let mmin = Infinity;
  let mmax = -Infinity;
  for (const s of slabs) {
    mmin = Math.min(mmin, 10 ** s.logM[0]);
    mmax = Math.max(mmax, 10 ** s.logM[s.logM.length - 1]);
  }
  // 10 ** log10(m) can miss m by an ulp (150 → 150.00000000000003); the range is reported and
  // compared, so round it to 12 digits, inward, which keeps every query inside the tracks
  mmin = Number(mmin.toPrecision(12));
  mmax = Number(mmax.toPrecision(12));
  if (slabs.some((s) => Math.log10(mmin) < s.logM[0])) mmin = Number((mmin * (1 + 1e-12)).toPrecision(12));
  if (slabs.some((s) => Math.log10(mmax) > s.logM[s.logM.length - 1])) mmax = Number((mmax * (1 - 1e-12)).toPrecision(12));
  return {
    slabs,
    logZ: Float64Array.from(slabs.map((s) => s.logZ)),
    massRange: { min: mmin, max: mmax },
    zRange: { min: slabs[0].z, max: slabs[slabs.length - 1].z },
    source,
  };
}

function buildSlab(z: number, list: EepTrack[], source: string): GridSlab {
  const tracks = list.slice().sort((a, b) => a.initialMass - b.initialMass);
  for (let i = 1; i < tracks.length; i++) {
    if (tracks[i].initialMass === tracks[i - 1].initialMass) {
      throw new RangeError(`grid ${source}: two tracks of ${tracks[i].initialMass} Msun at z ${z}`);
    }
  }
  const runOf = new Int32Array(tracks.length);
  const indexInRun = new Int32Array(tracks.length);
  const runs: GridRun[] = [];
  let start = 0;
  for (let i = 1; i <= tracks.length; i++) {
    if (i === tracks.length || tracks[i].layout !== tracks[start].layout) {
      const members = tracks.slice(start, i);
      for (let k = 0; k < members.length; k++) {
        runOf[start + k] = runs.length;
        indexInRun[start + k] = k;
      }
      runs.push(buildRun(members));
      start = i;
    }
  }
  const logM = Float64Array.from(tracks.map((t) => Math.log10(t.initialMass)));
  return { z, logZ: Math.log10(z), logM, ...indexSlabMasses(logM), runOf, indexInRun, runs };
}

function buildRun(members: EepTrack[]): GridRun {
  const n = members[0].n;
  const count = members.length;
  const logM = Float64Array.from(members.map((t) => Math.log10(t.initialMass)));
  const values = new Float64Array(VALUE_COLUMNS.length * count * n);
  VALUE_COLUMNS.forEach((c, ci) => {
    const off = ci * count * n;
    for (let k = 0; k < count; k++) {
      const col = members[k][c];
      // masses are blended as fractions of the initial mass: smooth across tracks, and the
      // monotone cubic keeps a fraction ≤ 1 — a star never comes out heavier than at birth
      const scale = c === 'mass' || c === 'coreMass' ? 1 / members[k].initialMass : 1;
      for (let j = 0; j < n; j++) values[off + k * n + j] = col[j] * scale;
    }
  });
  const run: GridRun = {
    layout: members[0].layout,
    n,
    count,
    phase: members[0].phase.slice(),
    logM,
    values,
    rec: new Float64Array(0),
    ageIndex: new Int16Array(0),
    logMsLifetime: Float64Array.from(members.map((t) => (t.msLifetime > 0 ? Math.log10(t.msLifetime) : 0))),
    remnantMass: Float64Array.from(members.map((t) => t.remnantMass)),
    remnant: REMNANT_CODES.indexOf(members[0].remnant),
    load: null,
  };
  prepareRun(run);
  return run;
}

/** Makes sure a run's stored arrays are in memory (GridRun.load). */
export function loadRun(run: GridRun): void {
  const load = run.load;
  if (load === null) return;
  load();
  run.load = null;
}

/** The columns a run stores, in the order of {@link GridRun.values}. */
export const VALUE_COLUMNS = ['logAge', 'mass', 'coreMass', 'logL', 'logTeff'] as const;

/**
 * Makes a run ready for interpolation from its stored values: the Steffen slopes of every
 * column across the run's masses (runSlopes), interleaved with the values into `rec` in the
 * layout the hot loop reads, and the age index (indexRunAges). The grid cache
 * stores values only, so a loaded run is prepared on its first use (locateMass calls this),
 * and loading stays a file read. Does nothing for a prepared run.
 */
export function prepareRun(run: GridRun): void {
  if (run.ageIndex.length !== 0) return;
  loadRun(run);
  const { n, count, logM, values } = run;
  const cn = count * n;
  const rec = new Float64Array(cn * REC_STRIDE);
  const slope = new Float64Array(cn);
  VALUE_COLUMNS.forEach((c, ci) => {
    const value = values.subarray(ci * cn, (ci + 1) * cn);
    runSlopes(logM, n, value, slope);
    const off = REC[c];
    for (let p = 0; p < cn; p++) {
      rec[p * REC_STRIDE + off] = value[p];
      rec[p * REC_STRIDE + off + 1] = slope[p];
    }
  });
  run.rec = rec;
  run.ageIndex = indexRunAges(rec, n, count);
}

/**
 * Steffen 1990 slopes (steffenSlopes: eqs. 11, 26–27) across the masses `logM` of one
 * column `y` (track-major, n EEPs per track), EEP by EEP, into `d`. Two tracks: the
 * secant; one: zero.
 */
export function runSlopes(logM: Float64Array, n: number, y: Float64Array, d: Float64Array): void {
  const count = logM.length;
  d.fill(0);
  if (count < 2) return;
  const h = new Float64Array(count - 1);
  for (let k = 0; k < count - 1; k++) h[k] = logM[k + 1] - logM[k];
  const sec = new Float64Array(count - 1);
  for (let j = 0; j < n; j++) {
    for (let k = 0; k < count - 1; k++) sec[k] = (y[(k + 1) * n + j] - y[k * n + j]) / h[k];
    const m = steffenSlopes(h, sec);
    for (let k = 0; k < count; k++) d[k * n + j] = m[k];
  }
}
