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

// scratch result of one slab evaluation: phase, mass, coreMass, logL, logTeff, logMsLifetime, remnantMass, remnant
const R0 = new Float64Array(8);
const R1 = new Float64Array(8);
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
  const f = (lz - grid.logZ[lo]) / (grid.logZ[lo + 1] - grid.logZ[lo]);
  k[at] = f >= 1 ? lo + 1 : lo;
  w[at] = f > 0 && f < 1 ? f : 0;
}

/**
 * The state at log age `mb.w[W_LA]` of the star of initial mass `mb.w[W_M]` blended from a
 * run's tracks with the Hermite weights in `mb` (see locateMass), into `r` (phase, mass, core
 * mass, log L, log Teff, log msLifetime, remnant mass, remnant code); returns the EEP index
 * used. The EEP whose interpolated log age brackets the age asked is found by bisection in the
 * span the run's age index allows, and the state is blended linearly in log age between it
 * and the next EEP. `hint` is an EEP index to try first (a star's index at its previous age,
 * −1 for none): when the age moved little, the search is a comparison or two instead.
 */
export function blendRun(mb: MassBlend, hint: number, r: Float64Array): number {
  return blendAt(null, mb, hint, r);
}

/**
 * blendRun, after locating the star's mass in `slab` first (locateMass) when one is given: one
 * function for the whole per-star path, so that V8 compiles it as one piece with the mass
 * location inlined — a call per star and slab instead of two (measured in bench/run.ts).
 */
function blendAt(slab: GridSlab | null, mb: MassBlend, hint: number, r: Float64Array): number {
  if (slab !== null) locateMass(slab, mb);
  const run = mb.run;
  const b0 = mb.b0;
  const b1 = mb.b1;
  const i = mb.i;
  const w = mb.w;
  const c00 = w[W_C00], c01 = w[W_C01], c10 = w[W_C10], c11 = w[W_C11];
  const u = w[W_U];
  const m = w[W_M];
  const la = w[W_LA];
  const n = run.n;
  // last j with age(j) <= la; the log age and its slope open each EEP's record (REC.logAge = 0)
  const A = run.rec;
  const a0i = REC_STRIDE * b0;
  const a1i = REC_STRIDE * b1;
  // j: the last EEP whose blended log age is ≤ la — from the hint when it is near (walkFrom,
  // −1 when not), else searched; `young`: the star is younger than the first EEP
  let j = hint >= 0 && hint < n - 1 ? walkFrom(A, a0i, a1i, w, n, hint) : -1;
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
    if (bin === AGE_BINS - 2) hi = n - 1;
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
  // the fraction of the way in log age to the next EEP (0 at the first and the last)
  let phi = 0;
  if (!young && j < n - 1) {
    const x0 = a0i + REC_STRIDE * j;
    const x1 = a1i + REC_STRIDE * j;
    const aj = c00 * A[x0] + c10 * A[x0 + 1] + c01 * A[x1] + c11 * A[x1 + 1];
    const ak = c00 * A[x0 + REC_STRIDE] + c10 * A[x0 + REC_STRIDE + 1] + c01 * A[x1 + REC_STRIDE] + c11 * A[x1 + REC_STRIDE + 1];
    phi = ak > aj ? (la - aj) / (ak - aj) : 0;
    if (phi > 1) phi = 1;
  }
  r[0] = run.phase[j];
  const D = run.rec;
  const q0 = (b0 + j) * REC_STRIDE;
  const q1 = (b1 + j) * REC_STRIDE;
  // next EEP's records (the same ones when phi = 0, so no read past the run)
  const step = phi > 0 ? REC_STRIDE : 0;
  const psi = 1 - phi;
  const e0 = c00 * psi, e1 = c01 * psi, f0 = c10 * psi, f1 = c11 * psi;
  const g0 = c00 * phi, g1 = c01 * phi, h0 = c10 * phi, h1 = c11 * phi;
  // mass, core mass, log L, log Teff (REC offsets 2, 4, 6, 8) into r[1] … r[4]
  for (let c = REC.mass; c < REC_STRIDE; c += 2) {
    const x0 = q0 + c;
    const x1 = q1 + c;
    r[c >> 1] =
      e0 * D[x0] + f0 * D[x0 + 1] + e1 * D[x1] + f1 * D[x1 + 1] +
      g0 * D[x0 + step] + h0 * D[x0 + step + 1] + g1 * D[x1 + step] + h1 * D[x1 + step + 1];
  }
  // the grid holds masses as fractions of the initial mass; a star that has lost nothing
  // keeps its birth mass exactly (not m × 0.9999999999999999)
  r[1] = r[1] >= 1 - 1e-12 ? m : r[1] * m;
  r[2] *= m;
  const ti = i + u;
  const t0 = Math.floor(ti);
  const tf = ti - t0;
  const t1 = tf > 0 ? t0 + 1 : t0;
  r[5] = run.logMsLifetime[t0] * (1 - tf) + run.logMsLifetime[t1] * tf;
  r[6] = run.remnantMass[t0] * (1 - tf) + run.remnantMass[t1] * tf;
  r[7] = run.remnant;
  if (r[2] > r[1]) r[2] = r[1];
  return j;
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
 * Evaluates the grid at the star in MB and the metallicity position in ZK, ZW into R0: the
 * two slabs bracketing log Z are blended linearly in log Z when they agree on the phase, else
 * the nearer one answers.
 */
function evalGrid(grid: Grid): void {
  const slabs = grid.slabs;
  const k = ZK[0];
  const w = ZW[0];
  blendAt(slabs[k], MB, -1, R0);
  if (w === 0) return;
  blendAt(slabs[k + 1], MB, -1, R1);
  mixSlabs(R0, R1, w);
}

/**
 * Blends the results of the two slabs bracketing a star's log Z, `r0` (lower) and `r1`
 * (upper, weight `w`), into `r0`: linearly when they agree on the phase and the remnant, else
 * the nearer slab's answer whole — a star is never half in one phase and half in another.
 */
export function mixSlabs(r0: Float64Array, r1: Float64Array, w: number): void {
  if (r0[0] !== r1[0] || r0[7] !== r1[7]) {
    if (w >= 0.5) r0.set(r1);
    return;
  }
  const v = 1 - w;
  for (let c = 1; c <= 6; c++) r0[c] = v * r0[c] + w * r1[c];
  if (r0[2] > r0[1]) r0[2] = r0[1];
}

/** Row `s` of `o` for a star that cannot be computed: `status` (see StateColumns) and zeros. */
export function clearStateRow(o: StateColumns, s: number, status: number): void {
  o.status[s] = status;
  o.phase[s] = 0; o.mass[s] = 0; o.coreMass[s] = 0; o.luminosity[s] = 0; o.teff[s] = 0; o.radius[s] = 0;
  o.logg[s] = 0; o.msLifetime[s] = 0; o.remnantMass[s] = 0; o.remnant[s] = 0;
}

/**
 * Writes one star's numeric state from an evaluation result `r` (phase, mass, core mass,
 * log L, log Teff, log msLifetime, remnant mass, remnant code) and the star's MassBlend
 * scratch `w` (its initial mass and that mass's log10) into row `s` of `o`: L and
 * Teff from their logs, radius by Stefan–Boltzmann, log g from mass and radius, a black hole
 * with L = Teff = 0 and its Schwarzschild radius.
 */
export function writeStateRow(o: StateColumns, s: number, r: Float64Array, w: Float64Array): void {
  const ph = r[0];
  const mass = r[1];
  // a star that kept its birth mass has its log already (w: the star's MassBlend scratch)
  const logMass = mass === w[W_M] ? w[W_LM] : log10(mass);
  o.phase[s] = ph;
  o.mass[s] = mass;
  o.coreMass[s] = r[2];
  if (ph === BLACK_HOLE) {
    const rs = schwarzschildRadius(mass);
    o.luminosity[s] = 0;
    o.teff[s] = 0;
    o.radius[s] = rs;
    o.logg[s] = LOGG_SUN + logMass - 2 * log10(rs);
  } else {
    const logR = 0.5 * r[3] - 2 * (r[4] - LOG_TEFF_SUN);
    o.logg[s] = LOGG_SUN + logMass - 2 * logR;
    const L = exp10(r[3]);
    const T = exp10(r[4]);
    const f = TEFF_SUN / T;
    o.luminosity[s] = L;
    o.teff[s] = T;
    o.radius[s] = Math.sqrt(L) * f * f; // Stefan–Boltzmann, as logR
  }
  o.msLifetime[s] = r[5] === 0 ? 0 : exp10(r[5]);
  o.remnantMass[s] = r[6];
  o.remnant[s] = r[7];
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
  return {
    grid,
    star(initialMass: number, age: number, z: number): StarState {
      checkStar(initialMass, age, z);
      MW[W_M] = initialMass;
      MW[W_LM] = Math.log10(initialMass);
      MW[W_LA] = Math.log10(age);
      locateZ(grid, Math.log10(z), ZK, ZW, 0);
      evalGrid(grid);
      return observeState(
        initialMass, z, age, R0[0], R0[1], R0[2], R0[3], R0[4],
        R0[5] === 0 ? 0 : 10 ** R0[5], REMNANT_CODES[R0[7]], R0[6],
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
      const zScalar = typeof zs === 'number';
      if (zScalar) locateZ(grid, Math.log10(zs), ZK, ZW, 0);
      const mMin = massRange.min;
      const mMax = massRange.max;
      const zMin = zRange.min;
      const zMax = zRange.max;
      for (let s = 0; s < n; s++) {
        const m = input.initialMass[s];
        const age = input.age[s];
        const z = zScalar ? zs : zs[s];
        let bad = 0;
        if (!(m >= mMin && m <= mMax)) bad = 1;
        else if (!(z >= zMin && z <= zMax)) bad = 2;
        else if (!(age >= 0 && age <= MAX_AGE)) bad = 3;
        if (bad) {
          clearStateRow(o, s, bad);
          continue;
        }
        o.status[s] = 0;
        MW[W_M] = m;
        MW[W_LM] = log10(m);
        MW[W_LA] = log10(age);
        if (!zScalar) locateZ(grid, log10(z), ZK, ZW, 0);
        evalGrid(grid);
        writeStateRow(o, s, R0, MW);
      }
      return o;
    },
  };
}
