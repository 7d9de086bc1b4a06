import type { Grid, GridRun, GridSlab } from '../tracks/grid.js';
import { AGE_BIN_MIN, AGE_BIN_STEP, AGE_BINS, REC, REC_STRIDE, REMNANT_CODES } from '../tracks/grid.js';

const INV_AGE_BIN_STEP = 1 / AGE_BIN_STEP;
import { findInterval } from './bisect.js';
import { exp10 } from './exp10.js';
import { log10 } from './log10.js';
import { createMassBlend, locateMass, type MassBlend, W_C00, W_C01, W_C10, W_C11, W_LA, W_LM, W_M, W_U } from './massBlend.js';
import { MAX_AGE } from '../model/limits.js';
import { PHASE_INDEX } from '../model/phases.js';
import type { StarState } from '../model/starState.js';
import { observeState } from '../model/observeState.js';
import { schwarzschildRadius } from '../model/neutronStar.js';

/** Numeric state columns of many stars (one entry per star); `status` 0 = computed. */
export interface StateColumns {
  phase: Uint8Array;
  mass: Float64Array;
  coreMass: Float64Array;
  luminosity: Float64Array;
  teff: Float64Array;
  radius: Float64Array;
  logg: Float64Array;
  msLifetime: Float64Array;
  remnantMass: Float64Array;
  /** index into REMNANT_CODES */
  remnant: Uint8Array;
  /** 0 computed; 1 initial mass, 2 z, 3 age outside the grid / model range (the row is zeros) */
  status: Uint8Array;
}

/** Inputs of a columnar query: initial mass (Msun), age (yr), metal fraction (array or one value). */
export interface QueryInput {
  initialMass: ArrayLike<number>;
  age: ArrayLike<number>;
  z: ArrayLike<number> | number;
}

/** An interpolator over a grid (see {@link createGridQuery}). */
export interface GridQuery {
  readonly grid: Grid;
  /** Full state of one star; throws RangeError naming the argument, value and the grid's range. */
  star(initialMass: number, age: number, z: number): StarState;
  /** Numeric state columns of many stars, into `out` when given (no per-star allocation). */
  columns(input: QueryInput, out?: StateColumns): StateColumns;
}

/** Allocates output columns for `n` stars. */
export function allocateStateColumns(n: number): StateColumns {
  return {
    phase: new Uint8Array(n), mass: new Float64Array(n), coreMass: new Float64Array(n), luminosity: new Float64Array(n),
    teff: new Float64Array(n), radius: new Float64Array(n), logg: new Float64Array(n), msLifetime: new Float64Array(n),
    remnantMass: new Float64Array(n), remnant: new Uint8Array(n), status: new Uint8Array(n),
  };
}

const TEFF_SUN = 5772;
const LOG_TEFF_SUN = Math.log10(TEFF_SUN);
/** log10 of GM☉/R☉² in cgs (IAU 2015 nominal values): log g = this + log M − 2 log R. */
const LOGG_SUN = Math.log10((1.3271244e20 / 6.957e8 ** 2) * 100);
const BLACK_HOLE = PHASE_INDEX['black-hole'];

/** The hot loop's blend scratch: the star's coordinates and mass weights (see MassBlend). */
const MB: MassBlend = createMassBlend();
const MW = MB.w;
/**
 * Where the star's z falls among the grid's metallicities (locateZ): ZK[0] the lower
 * slab, ZW[0] the weight of the upper one (0: the lower slab alone). Typed slots, not
 * arguments: see MassBlend.
 */
const ZK = new Int32Array(1);
const ZW = new Float64Array(1);
/**
 * The last star's result, left by evaluateStars: [0, 8) the answer (phase, mass, core mass,
 * log L, log Teff, log msLifetime, remnant mass, remnant code), [8, 16) the upper slab's
 * before the two were mixed.
 */
const RES = new Float64Array(16);

/**
 * Where log10 z `lz` falls among the grid's metallicities, into `k[at]` (the lower slab) and
 * `w[at]` (the weight of the upper one; 0: slab k alone — one slab, or at or past a node).
 */
export function locateZ(grid: Grid, lz: number, k: Int32Array, w: Float64Array, at: number): void {
  if (grid.slabs.length === 1) {
    k[at] = 0;
    w[at] = 0;
    return;
  }
  const lo = findInterval(grid.logZ, lz);
  let f = (lz - grid.logZ[lo]) / (grid.logZ[lo + 1] - grid.logZ[lo]);
  // a z at a node, its log rounded either way (a table log10, a log of a decimal), is the node:
  // one slab answers instead of two blended with a weight of 1e-16
  if (f < 1e-12) f = 0;
  else if (f > 1 - 1e-12) f = 1;
  k[at] = f >= 1 ? lo + 1 : lo;
  w[at] = f > 0 && f < 1 ? f : 0;
}

/**
 * Stars located in mass and metallicity once, to be evaluated at many ages (the population
 * evaluator): per star s and side t (0: the lower metallicity slab, 1: the upper), at p = 2s + t,
 * the run (`runs[rid[p]]`), the first EEP index of the lower and upper track and the lower
 * track's position in the run (`base[3p …]`, as MassBlend b0, b1, i), the fraction u
 * (`frac[p]`) and the Hermite weights c00, c01, c10, c11 (`wts[4p …]`) of locateMass, and the
 * EEP the star was last found at (`hint[p]`, −1 for none); per star the upper slab's weight
 * `zw[s]` (0: the lower slab alone) and log10 of the initial mass `logMass[s]`.
 */
export interface LocatedStars {
  runs: GridRun[];
  rid: Int32Array;
  base: Int32Array;
  frac: Float64Array;
  wts: Float64Array;
  hint: Int32Array;
  zw: Float64Array;
  logMass: Float64Array;
}

/**
 * One call of evaluateStars: `n` stars of initial masses `mass` (Msun) at ages `age` (yr),
 * into `out`. Either `located` is given (stars found in mass and z ahead of time, already
 * checked against the grid's ranges) or the stars are located here: their z per star in `z`,
 * or, when `z` is null, all at the metallicity position `zk`, `zw` (see locateZ; `zk` −1: one
 * z for all, outside the grid's range). `hrOnly`: write only phase, mass, luminosity and teff.
 * One object shape for every caller keeps the loop's property reads monomorphic.
 */
export interface StarJob {
  grid: Grid;
  n: number;
  mass: ArrayLike<number>;
  age: ArrayLike<number>;
  z: ArrayLike<number> | null;
  zk: number;
  zw: number;
  located: LocatedStars | null;
  hrOnly: boolean;
  out: StateColumns;
}

/** A StarJob to be filled in by its caller. */
export function createStarJob(grid: Grid, out: StateColumns): StarJob {
  return { grid, n: 0, mass: EMPTY, age: EMPTY, z: null, zk: 0, zw: 0, located: null, hrOnly: false, out };
}
const EMPTY = new Float64Array(0);

/**
 * The interpolator's one hot loop, shared by GridQuery.columns, GridQuery.star and the
 * population evaluator. For each star: check its mass, z and age against the grid's ranges
 * (status 1, 2, 3 and a row of zeros when outside); find its tracks in each metallicity slab it
 * needs (locateMass, or the located stars' stored blend); find the EEP whose interpolated log
 * age brackets the age asked — from the star's last EEP when it is near (walkFrom), else by
 * bisection in the span the run's age index allows — and blend the state linearly in log age
 * between that EEP and the next, each EEP's values being the Hermite blend in log M of the two
 * tracks; mix the two slabs linearly in log Z when they agree on phase and remnant (else the
 * nearer slab answers whole: a star is never half in one phase and half in another); write L
 * and Teff from their logs, the radius by Stefan–Boltzmann, log g from mass and radius, and a
 * black hole with L = Teff = 0 at its Schwarzschild radius.
 *
 * It runs over blocks of BLOCK stars, each through three loops in functions of their own —
 * logsOf (the log ages and masses), blendBlock (everything up to the logs of the answer),
 * finishBlock (the powers of ten) — none of which is called per star: no double is boxed on
 * its way through a call, no per-star callee can be left behind in a slower tier while the
 * rest is optimised (a large one had once stayed in V8's baseline tier for a whole run, one
 * run in forty, at a fifth of the speed), and log10 and exp10 each have one call site in a
 * small function, within V8's inlining budget (measured in bench/run.ts).
 */
export function evaluateStars(job: StarJob): void {
  const n = job.n;
  const L = job.located;
  for (let from = 0; from < n; from += BLOCK) {
    const count = Math.min(BLOCK, n - from);
    logsOf(job.age, from, count, LA);
    if (L === null) logsOf(job.mass, from, count, LM);
    else LM.set(L.logMass.subarray(from, from + count));
    blendBlock(job, from, count);
    finishBlock(job.out, from, count, job.hrOnly);
  }
}

/**
 * Stars per block of evaluateStars: the logs going in and the rows' kinds (FIN) are scratch
 * columns of a block, small enough to stay in cache.
 */
const BLOCK = 1024;
/** log10 of the block's ages and initial masses (logsOf) */
const LA = new Float64Array(BLOCK);
const LM = new Float64Array(BLOCK);
/**
 * What finishBlock does with a row of the block: ROW_DONE nothing (a refused star), ROW_KEPT
 * the star kept its birth mass (log g complete), ROW_LOST it lost mass (log g still needs
 * log10 of the present mass), ROW_HOLE a black hole (log g from its mass and Schwarzschild
 * radius, L = Teff = 0).
 */
const FIN = new Uint8Array(BLOCK);
const ROW_DONE = 0;
const ROW_KEPT = 1;
const ROW_LOST = 2;
const ROW_HOLE = 3;

/** `out[q] = log10(x[from + q])` for q < count (see log10; NaN and the like go through). */
function logsOf(x: ArrayLike<number>, from: number, count: number, out: Float64Array): void {
  for (let q = 0; q < count; q++) out[q] = log10(x[from + q]);
}

/**
 * Completes the block's rows from the logs blendBlock left in them: L, Teff and msLifetime from
 * their logs, the radius by Stefan–Boltzmann, log g with the present mass's log; a black hole
 * gets L = Teff = 0, its Schwarzschild radius and log g = log g☉ + log(M / R²) in solar units.
 * One call site each for exp10 and log10, so that V8 inlines them here.
 */
function finishBlock(o: StateColumns, from: number, count: number, hrOnly: boolean): void {
  for (let q = 0; q < count; q++) {
    const f = FIN[q];
    if (f === ROW_DONE) continue;
    const s = from + q;
    const hole = f === ROW_HOLE;
    const lum = hole ? 0 : exp10(o.luminosity[s]);
    const T = hole ? 0 : exp10(o.teff[s]);
    o.luminosity[s] = lum;
    o.teff[s] = T;
    if (hrOnly) continue;
    const lms = o.msLifetime[s];
    o.msLifetime[s] = lms === 0 ? 0 : exp10(lms);
    if (!hole) {
      const x = TEFF_SUN / T;
      o.radius[s] = Math.sqrt(lum) * x * x; // Stefan–Boltzmann, as log R
    }
    if (f === ROW_KEPT) continue;
    const mass = o.mass[s];
    if (hole) {
      const rs = schwarzschildRadius(mass);
      o.radius[s] = rs;
      o.logg[s] = LOGG_SUN + log10(mass / (rs * rs));
    } else o.logg[s] += log10(mass);
  }
}

/**
 * The block [from, from + count) of evaluateStars up to the logs: every column final but L,
 * Teff and msLifetime (their logs), the radius and log g (see FIN) — what finishBlock completes.
 */
function blendBlock(job: StarJob, from: number, count: number): void {
  const grid = job.grid;
  const slabs = grid.slabs;
  const masses = job.mass;
  const ages = job.age;
  const zs = job.z;
  const L = job.located;
  const hrOnly = job.hrOnly;
  const o = job.out;
  const mMin = grid.massRange.min;
  const mMax = grid.massRange.max;
  const zMin = grid.zRange.min;
  const zMax = grid.zRange.max;
  const zk0 = job.zk;
  const zw0 = job.zw;
  const w = MW;
  const R = RES;
  for (let q = 0; q < count; q++) {
    const s = from + q;
    const age = ages[s];
    const m = masses[s];
    let bad = 0;
    let k = zk0;
    let zw = zw0;
    if (L === null) {
      if (!(m >= mMin && m <= mMax)) bad = 1;
      else if (zs !== null) {
        const z = zs[s];
        if (!(z >= zMin && z <= zMax)) bad = 2;
        else {
          locateZ(grid, Math.log10(z), ZK, ZW, 0);
          k = ZK[0];
          zw = ZW[0];
        }
      } else if (k < 0) bad = 2;
    } else zw = L.zw[s];
    if (bad === 0 && !(age >= 0 && age <= MAX_AGE)) bad = 3;
    if (bad !== 0) {
      o.status[s] = bad;
      o.phase[s] = 0; o.mass[s] = 0; o.coreMass[s] = 0; o.luminosity[s] = 0; o.teff[s] = 0; o.radius[s] = 0;
      o.logg[s] = 0; o.msLifetime[s] = 0; o.remnantMass[s] = 0; o.remnant[s] = 0;
      FIN[q] = ROW_DONE;
      continue;
    }
    o.status[s] = 0;
    const la = LA[q];
    const lm = LM[q];
    w[W_M] = m;
    w[W_LM] = lm;
    w[W_LA] = la;
    const sides = zw > 0 ? 2 : 1;
    for (let t = 0; t < sides; t++) {
      // the star's tracks in this slab: run, first EEP of each track, weights in w
      let run: GridRun;
      let b0: number;
      let b1: number;
      let i: number;
      let hint = -1;
      if (L === null) {
        locateMass(slabs[k + t], MB);
        run = MB.run;
        b0 = MB.b0;
        b1 = MB.b1;
        i = MB.i;
      } else {
        const p = 2 * s + t;
        run = L.runs[L.rid[p]];
        b0 = L.base[3 * p];
        b1 = L.base[3 * p + 1];
        i = L.base[3 * p + 2];
        w[W_U] = L.frac[p];
        w[W_C00] = L.wts[4 * p];
        w[W_C01] = L.wts[4 * p + 1];
        w[W_C10] = L.wts[4 * p + 2];
        w[W_C11] = L.wts[4 * p + 3];
        hint = L.hint[p];
      }
      const c00 = w[W_C00], c01 = w[W_C01], c10 = w[W_C10], c11 = w[W_C11];
      const u = w[W_U];
      const ne = run.n;
      // the log age and its slope open each EEP's record (REC.logAge = 0)
      const A = run.rec;
      const a0i = REC_STRIDE * b0;
      const a1i = REC_STRIDE * b1;
      // j: the last EEP whose blended log age is ≤ la — from the hint when it is near
      // (walkFrom, −1 when not), else searched; `young`: the star is younger than the first EEP
      let j = hint >= 0 && hint < ne - 1 ? walkFrom(A, a0i, a1i, w, ne, hint) : -1;
      let young = false;
      if (j < 0) {
        // narrow the search with the run's age index (see indexRunAges), then bisect
        let bin = Math.floor((la - AGE_BIN_MIN) * INV_AGE_BIN_STEP);
        const below = !(bin >= 0); // younger than the index's first edge (or age 0: la = −∞)
        if (below) bin = 0;
        else if (bin > AGE_BINS - 2) bin = AGE_BINS - 2;
        const I = run.ageIndex;
        const r0 = i * AGE_BINS + bin;
        const r1 = u > 0 ? r0 + AGE_BINS : r0;
        let lo = below ? 0 : I[r0] < I[r1] ? I[r0] : I[r1];
        let hi = I[r0 + 1] > I[r1 + 1] ? I[r0 + 1] : I[r1 + 1];
        if (bin === AGE_BINS - 2) hi = ne - 1;
        // when the index puts both tracks past their first EEP at the bin's lower edge (≤ la),
        // the blended first EEP is too (the monotone cubic stays between its nodes): only
        // otherwise is the star's age compared with the first EEP's, to catch the youngest
        if (lo === 0 && !(la > c00 * A[a0i] + c10 * A[a0i + 1] + c01 * A[a1i] + c11 * A[a1i + 1])) young = true;
        else {
          while (lo < hi) {
            const mid = (lo + hi + 1) >> 1;
            const x0 = a0i + REC_STRIDE * mid;
            const x1 = a1i + REC_STRIDE * mid;
            if (c00 * A[x0] + c10 * A[x0 + 1] + c01 * A[x1] + c11 * A[x1 + 1] <= la) lo = mid;
            else hi = mid - 1;
          }
        }
        j = lo;
      }
      if (L !== null) L.hint[2 * s + t] = j;
      // the fraction of the way in log age to the next EEP (0 at the first and the last)
      let phi = 0;
      if (!young && j < ne - 1) {
        const x0 = a0i + REC_STRIDE * j;
        const x1 = a1i + REC_STRIDE * j;
        const aj = c00 * A[x0] + c10 * A[x0 + 1] + c01 * A[x1] + c11 * A[x1 + 1];
        const ak = c00 * A[x0 + REC_STRIDE] + c10 * A[x0 + REC_STRIDE + 1] + c01 * A[x1 + REC_STRIDE] + c11 * A[x1 + REC_STRIDE + 1];
        phi = ak > aj ? (la - aj) / (ak - aj) : 0;
        if (phi > 1) phi = 1;
      }
      const r = 8 * t;
      R[r] = run.phase[j];
      const q0 = (b0 + j) * REC_STRIDE;
      const q1 = (b1 + j) * REC_STRIDE;
      // next EEP's records (the same ones when phi = 0, so no read past the run)
      const step = phi > 0 ? REC_STRIDE : 0;
      const psi = 1 - phi;
      const e0 = c00 * psi, e1 = c01 * psi, f0 = c10 * psi, f1 = c11 * psi;
      const g0 = c00 * phi, g1 = c01 * phi, h0 = c10 * phi, h1 = c11 * phi;
      // mass, core mass, log L, log Teff (REC offsets 2, 4, 6, 8) into R[r + 1] … R[r + 4]
      for (let c = REC.mass; c < REC_STRIDE; c += 2) {
        const x0 = q0 + c;
        const x1 = q1 + c;
        R[r + (c >> 1)] =
          e0 * A[x0] + f0 * A[x0 + 1] + e1 * A[x1] + f1 * A[x1 + 1] +
          g0 * A[x0 + step] + h0 * A[x0 + step + 1] + g1 * A[x1 + step] + h1 * A[x1 + step + 1];
      }
      // the grid holds masses as fractions of the initial mass; a star that has lost nothing
      // keeps its birth mass exactly (not m × 0.9999999999999999)
      R[r + 1] = R[r + 1] >= 1 - 1e-12 ? m : R[r + 1] * m;
      R[r + 2] *= m;
      const ti = i + u;
      const t0 = Math.floor(ti);
      const tf = ti - t0;
      const t1 = tf > 0 ? t0 + 1 : t0;
      R[r + 5] = run.logMsLifetime[t0] * (1 - tf) + run.logMsLifetime[t1] * tf;
      R[r + 6] = run.remnantMass[t0] * (1 - tf) + run.remnantMass[t1] * tf;
      R[r + 7] = run.remnant;
      if (R[r + 2] > R[r + 1]) R[r + 2] = R[r + 1];
    }
    if (sides === 2) {
      // two slabs: linearly in log Z when they agree on phase and remnant, else the nearer
      if (R[0] !== R[8] || R[7] !== R[15]) {
        if (zw >= 0.5) for (let c = 0; c < 8; c++) R[c] = R[c + 8];
      } else {
        const v = 1 - zw;
        for (let c = 1; c <= 6; c++) R[c] = v * R[c] + zw * R[c + 8];
        if (R[2] > R[1]) R[2] = R[1];
      }
    }
    const ph = R[0];
    const mass = R[1];
    o.phase[s] = ph;
    o.mass[s] = mass;
    o.luminosity[s] = R[3];
    o.teff[s] = R[4];
    const hole = ph === BLACK_HOLE;
    const kept = mass === m;
    FIN[q] = hole ? ROW_HOLE : kept ? ROW_KEPT : ROW_LOST;
    if (hrOnly) continue;
    if (!hole) {
      // log g = log g☉ + log M − 2 log R; a star that kept its birth mass has log M already
      const logR = 0.5 * R[3] - 2 * (R[4] - LOG_TEFF_SUN);
      o.logg[s] = LOGG_SUN + (kept ? lm : 0) - 2 * logR;
    }
    o.msLifetime[s] = R[5];
    o.coreMass[s] = R[2];
    o.remnantMass[s] = R[6];
    o.remnant[s] = R[7];
  }
}

/**
 * From EEP `hint`, steps up or down (at most 6 steps) to the last EEP whose interpolated log
 * age is ≤ the age asked (w[W_LA]); −1 when it is further away (the caller then searches).
 */
function walkFrom(A: Float64Array, a0i: number, a1i: number, w: Float64Array, n: number, hint: number): number {
  const c00 = w[W_C00], c01 = w[W_C01], c10 = w[W_C10], c11 = w[W_C11];
  const la = w[W_LA];
  let j = hint;
  let x0 = a0i + REC_STRIDE * j;
  let x1 = a1i + REC_STRIDE * j;
  if (c00 * A[x0] + c10 * A[x0 + 1] + c01 * A[x1] + c11 * A[x1 + 1] <= la) {
    for (let s = 0; s < 6; s++) {
      if (j >= n - 1) return j;
      x0 += REC_STRIDE;
      x1 += REC_STRIDE;
      if (c00 * A[x0] + c10 * A[x0 + 1] + c01 * A[x1] + c11 * A[x1 + 1] > la) return j;
      j++;
    }
    return -1;
  }
  for (let s = 0; s < 6; s++) {
    if (j <= 0) return -1;
    j--;
    x0 -= REC_STRIDE;
    x1 -= REC_STRIDE;
    if (c00 * A[x0] + c10 * A[x0 + 1] + c01 * A[x1] + c11 * A[x1 + 1] <= la) return j;
  }
  return -1;
}

/**
 * Creates the interpolator of a grid: `star(initialMass, age, z)` answers one star with the
 * full schema state; `columns(input, out)` answers many through typed arrays with no
 * per-star allocation. Between metallicities it interpolates in log Z.
 *
 * @param grid from buildGrid (built-in or a user's grid file)
 * @example createGridQuery(builtinGrid()).star(1, 4.57e9, 0.014).teff // ≈ 5770
 */
export function createGridQuery(grid: Grid): GridQuery {
  const { massRange, zRange } = grid;
  const checkStar = (m: number, age: number, z: number) => {
    if (!Number.isFinite(m) || m < massRange.min || m > massRange.max) {
      throw new RangeError(`initialMass ${m} outside the ${grid.source} grid's ${massRange.min}–${massRange.max} Msun`);
    }
    if (!Number.isFinite(z) || z < zRange.min || z > zRange.max) {
      throw new RangeError(`z ${z} outside the ${grid.source} grid's ${zRange.min}–${zRange.max}`);
    }
    if (!Number.isFinite(age) || age < 0 || age > MAX_AGE) {
      throw new RangeError(`age ${age} yr outside 0–${MAX_AGE} yr (0–100 Gyr)`);
    }
  };
  // one star's scratch for star(): its inputs and a row of output columns
  const one = { m: new Float64Array(1), age: new Float64Array(1), z: new Float64Array(1) };
  const oneJob = createStarJob(grid, allocateStateColumns(1));
  const job = createStarJob(grid, oneJob.out);
  return {
    grid,
    star(initialMass: number, age: number, z: number): StarState {
      checkStar(initialMass, age, z);
      one.m[0] = initialMass;
      one.age[0] = age;
      one.z[0] = z;
      oneJob.n = 1;
      oneJob.mass = one.m;
      oneJob.age = one.age;
      oneJob.z = one.z;
      evaluateStars(oneJob);
      return observeState(
        initialMass, z, age, RES[0], RES[1], RES[2], RES[3], RES[4],
        RES[5] === 0 ? 0 : 10 ** RES[5], REMNANT_CODES[RES[7]], RES[6],
      );
    },
    columns(input: QueryInput, out?: StateColumns): StateColumns {
      const n = input.initialMass.length;
      if (input.age.length !== n || (typeof input.z !== 'number' && input.z.length !== n)) {
        throw new RangeError(`columns: initialMass, age and z must have the same length (${n}, ${input.age.length}, ${typeof input.z === 'number' ? 'scalar' : input.z.length})`);
      }
      const o = out ?? allocateStateColumns(n);
      if (o.mass.length < n) throw new RangeError(`columns: output holds ${o.mass.length} stars, need ${n}`);
      const zs = input.z;
      job.n = n;
      job.mass = input.initialMass;
      job.age = input.age;
      job.out = o;
      if (typeof zs === 'number') {
        job.z = null;
        if (!(zs >= zRange.min && zs <= zRange.max)) {
          // every star is outside the grid's metallicities: status 2 for each (its mass first)
          job.zk = -1;
          job.zw = 0;
        } else {
          locateZ(grid, Math.log10(zs), ZK, ZW, 0);
          job.zk = ZK[0];
          job.zw = ZW[0];
        }
      } else job.z = zs;
      try {
        evaluateStars(job);
      } finally {
        job.out = oneJob.out; // hold no reference to the caller's arrays
        job.mass = job.age = EMPTY;
        job.z = null;
      }
      return o;
    },
  };
}
