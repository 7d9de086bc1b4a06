import type { Grid, GridRun } from '../tracks/grid.js';
import { findInterval } from './bisect.js';
import { exp10 } from './exp10.js';
import { log10 } from './log10.js';
import { createMassBlend, locateMass, W_C00, W_C01, W_C10, W_C11, W_LA, W_LM, W_M, W_U } from './massBlend.js';
import { blendRun, writeStateRow, allocateStateColumns, type StateColumns } from './gridQuery.js';
import { MAX_AGE } from '../model/limits.js';
import { PHASE_INDEX } from '../model/phases.js';

const BLACK_HOLE = PHASE_INDEX['black-hole'];

/** A fixed set of stars evaluated at many ages (see {@link createPopulationEvaluator}). */
export interface PopulationEvaluator {
  readonly n: number;
  /**
   * The numeric state of every star at its age `age[s]` (yr), into `out` (the columns of
   * GridQuery.columns, `status` 3 for an age outside 0–100 Gyr). Allocates nothing.
   */
  evaluate(age: ArrayLike<number>, out?: StateColumns): StateColumns;
}


/**
 * Precompute, then evaluate: for a population whose stars keep their birth mass and
 * metallicity while time runs (a cluster ageing in the viewer, a history over many times), the
 * mass blend of every star — which tracks, which Hermite weights (locateMass), which two
 * metallicity slabs and their log-Z weight — is found once, and each star remembers the EEP
 * it was last found at, so that a small step in age costs a comparison or two instead of a
 * search. Each evaluation gives what GridQuery.columns gives for the same stars, to about
 * 1e-9 relative (where a remembered EEP and a fresh search meet a bracket from either side).
 *
 * @param grid the grid (built-in or a user's)
 * @param initialMass Msun per star, inside the grid's mass range
 * @param z metal fraction per star (or one for all), inside the grid's z range
 * @param options `hrOnly`: write only phase, mass, luminosity and teff (what an HR diagram
 *   draws; the other columns are left as they were), skipping the rest of the arithmetic
 * @throws RangeError naming the star, its value and the grid's range
 * @example createPopulationEvaluator(grid, masses, 0.014).evaluate(ages, out)
 */
export function createPopulationEvaluator(
  grid: Grid, initialMass: ArrayLike<number>, z: ArrayLike<number> | number, options: { hrOnly?: boolean } = {},
): PopulationEvaluator {
  const hrOnly = options.hrOnly === true;
  const n = initialMass.length;
  const runs: GridRun[] = [];
  const runId = new Map<GridRun, number>();
  const idOf = (r: GridRun) => {
    let k = runId.get(r);
    if (k === undefined) {
      k = runs.length;
      runs.push(r);
      runId.set(r, k);
    }
    return k;
  };
  // per star and side (0: lower slab, 1: upper slab): run id, b0, b1, i and the weights
  const rid = new Int32Array(2 * n);
  const base = new Int32Array(4 * n); // b0, b1 per side
  const track = new Float64Array(4 * n); // i, u per side
  const wts = new Float64Array(8 * n); // c00, c01, c10, c11 per side
  const hint = new Int32Array(2 * n).fill(-1);
  const zw = new Float64Array(n); // weight of the upper slab (0: lower only)
  const mass = Float64Array.from(initialMass);
  const logMass = mass.map(Math.log10);
  const mb = createMassBlend();
  const mw = mb.w;
  const { massRange, zRange, source } = grid;
  for (let s = 0; s < n; s++) {
    const m = initialMass[s];
    const zs = typeof z === 'number' ? z : z[s];
    if (!(m >= massRange.min && m <= massRange.max)) throw new RangeError(`star ${s}: initialMass ${m} outside the ${source} grid's ${massRange.min}–${massRange.max} Msun`);
    if (!(zs >= zRange.min && zs <= zRange.max)) throw new RangeError(`star ${s}: z ${zs} outside the ${source} grid's ${zRange.min}–${zRange.max}`);
    let k = 0;
    let w = 0;
    if (grid.slabs.length > 1) {
      const lz = Math.log10(zs);
      k = findInterval(grid.logZ, lz);
      w = (lz - grid.logZ[k]) / (grid.logZ[k + 1] - grid.logZ[k]);
      if (w <= 0) w = 0;
      else if (w >= 1) {
        k += 1;
        w = 0;
      }
    }
    zw[s] = w;
    mw[W_LM] = Math.log10(m);
    for (let side = 0; side < (w > 0 ? 2 : 1); side++) {
      locateMass(grid.slabs[k + side], mb);
      const p = 2 * s + side;
      rid[p] = idOf(mb.run);
      base[2 * p] = mb.b0;
      base[2 * p + 1] = mb.b1;
      track[2 * p] = mb.i;
      track[2 * p + 1] = mw[W_U];
      wts[4 * p] = mw[W_C00];
      wts[4 * p + 1] = mw[W_C01];
      wts[4 * p + 2] = mw[W_C10];
      wts[4 * p + 3] = mw[W_C11];
    }
  }
  const R0 = new Float64Array(8);
  const R1 = new Float64Array(8);
  // one side of star p's blend, at the mass and log age already in mw (doubles go through
  // the typed scratch, not arguments: see MassBlend)
  const side = (p: number, r: Float64Array) => {
    mb.run = runs[rid[p]];
    mb.b0 = base[2 * p];
    mb.b1 = base[2 * p + 1];
    mb.i = track[2 * p] | 0; // an integer, kept a small integer in the shared MassBlend shape
    mw[W_U] = track[2 * p + 1];
    mw[W_C00] = wts[4 * p];
    mw[W_C01] = wts[4 * p + 1];
    mw[W_C10] = wts[4 * p + 2];
    mw[W_C11] = wts[4 * p + 3];
    hint[p] = blendRun(mb, hint[p], r);
  };
  return {
    n,
    evaluate(age: ArrayLike<number>, out?: StateColumns): StateColumns {
      if (age.length !== n) throw new RangeError(`evaluate: ${age.length} ages for ${n} stars`);
      const o = out ?? allocateStateColumns(n);
      if (o.mass.length < n) throw new RangeError(`evaluate: output holds ${o.mass.length} stars, need ${n}`);
      for (let s = 0; s < n; s++) {
        const a = age[s];
        if (!(a >= 0 && a <= MAX_AGE)) {
          o.status[s] = 3;
          o.phase[s] = 0; o.mass[s] = 0; o.coreMass[s] = 0; o.luminosity[s] = 0; o.teff[s] = 0; o.radius[s] = 0;
          o.logg[s] = 0; o.msLifetime[s] = 0; o.remnantMass[s] = 0; o.remnant[s] = 0;
          continue;
        }
        o.status[s] = 0;
        mw[W_LA] = log10(a);
        mw[W_M] = mass[s];
        side(2 * s, R0);
        const w = zw[s];
        if (w > 0) {
          side(2 * s + 1, R1);
          if (R0[0] === R1[0] && R0[7] === R1[7]) {
            const v = 1 - w;
            for (let c = 1; c <= 6; c++) R0[c] = v * R0[c] + w * R1[c];
            if (R0[2] > R0[1]) R0[2] = R0[1];
          } else if (w >= 0.5) R0.set(R1);
        }
        if (hrOnly) {
          o.phase[s] = R0[0];
          o.mass[s] = R0[1];
          const black = R0[0] === BLACK_HOLE;
          o.luminosity[s] = black ? 0 : exp10(R0[3]);
          o.teff[s] = black ? 0 : exp10(R0[4]);
        } else {
          mw[W_LM] = logMass[s];
          writeStateRow(o, s, R0, mw);
        }
      }
      return o;
    },
  };
}
