import type { Grid, GridRun } from '../tracks/grid.js';
import { log10 } from './log10.js';
import { createMassBlend, locateMass, W_C00, W_C01, W_C10, W_C11, W_LM, W_U } from './massBlend.js';
import { allocateStateColumns, createStarJob, evaluateStars, locateZ, type LocatedStars, type StateColumns } from './gridQuery.js';

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
  const located: LocatedStars = {
    runs,
    rid: new Int32Array(2 * n),
    base: new Int32Array(6 * n),
    frac: new Float64Array(2 * n),
    wts: new Float64Array(8 * n),
    hint: new Int32Array(2 * n).fill(-1),
    zw: new Float64Array(n),
    logMass: new Float64Array(n),
  };
  const { rid, base, frac, wts } = located;
  const slab = new Int32Array(n); // the lower slab
  const mass = Float64Array.from(initialMass);
  const mb = createMassBlend();
  const mw = mb.w;
  const { massRange, zRange, source } = grid;
  for (let s = 0; s < n; s++) {
    const m = initialMass[s];
    const zs = typeof z === 'number' ? z : z[s];
    if (!(m >= massRange.min && m <= massRange.max)) throw new RangeError(`star ${s}: initialMass ${m} outside the ${source} grid's ${massRange.min}–${massRange.max} Msun`);
    if (!(zs >= zRange.min && zs <= zRange.max)) throw new RangeError(`star ${s}: z ${zs} outside the ${source} grid's ${zRange.min}–${zRange.max}`);
    // the same log of the mass as GridQuery.columns takes, so both give the same answers
    located.logMass[s] = log10(m);
    locateZ(grid, Math.log10(zs), slab, located.zw, s);
    mw[W_LM] = located.logMass[s];
    for (let side = 0; side < (located.zw[s] > 0 ? 2 : 1); side++) {
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
  const job = createStarJob(grid, allocateStateColumns(0));
  const idle = job.out;
  job.mass = mass;
  job.located = located;
  job.hrOnly = options.hrOnly === true;
  return {
    n,
    evaluate(age: ArrayLike<number>, out?: StateColumns): StateColumns {
      if (age.length !== n) throw new RangeError(`evaluate: ${age.length} ages for ${n} stars`);
      const o = out ?? allocateStateColumns(n);
      if (o.mass.length < n) throw new RangeError(`evaluate: output holds ${o.mass.length} stars, need ${n}`);
      job.n = n;
      job.age = age;
      job.out = o;
      try {
        evaluateStars(job);
      } finally {
        job.out = idle; // hold no reference to the caller's arrays
        job.age = mass;
      }
      return o;
    },
  };
}
