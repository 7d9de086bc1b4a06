import type { Grid, GridRun } from '../tracks/grid.js';
import { exp10 } from './exp10.js';
import { log10 } from './log10.js';
import { createMassBlend, locateMass, W_C00, W_C01, W_C10, W_C11, W_LA, W_LM, W_M, W_U } from './massBlend.js';
import { blendRun, clearStateRow, locateZ, mixSlabs, writeStateRow, allocateStateColumns, type StateColumns } from './gridQuery.js';
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
  const base = new Int32Array(6 * n); // b0, b1, i per side
  const frac = new Float64Array(2 * n); // u per side
  const wts = new Float64Array(8 * n); // c00, c01, c10, c11 per side
  const hint = new Int32Array(2 * n).fill(-1);
  const slab = new Int32Array(n); // the lower slab
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
    locateZ(grid, Math.log10(zs), slab, zw, s);
    mw[W_LM] = logMass[s];
    for (let side = 0; side < (zw[s] > 0 ? 2 : 1); side++) {
      locateMass(grid.slabs[slab[s] + side], mb);
      const p = 2 * s + side;
      rid[p] = idOf(mb.run);
      base[3 * p] = mb.b0;
      base[3 * p + 1] = mb.b1;
      base[3 * p + 2] = mb.i;
      frac[p] = mw[W_U];
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
    mb.b0 = base[3 * p];
    mb.b1 = base[3 * p + 1];
    mb.i = base[3 * p + 2];
    mw[W_U] = frac[p];
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
          clearStateRow(o, s, 3);
          continue;
        }
        o.status[s] = 0;
        mw[W_LA] = log10(a);
        mw[W_M] = mass[s];
        side(2 * s, R0);
        const w = zw[s];
        if (w > 0) {
          side(2 * s + 1, R1);
          mixSlabs(R0, R1, w);
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
