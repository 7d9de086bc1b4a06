import { allocateStateColumns, createGridQuery, type GridQuery, type StateColumns } from '../../lib/interp/gridQuery.js';
import { createPopulationEvaluator } from '../../lib/interp/populationEvaluator.js';
import { PHASES } from '../../lib/model/phases.js';
import type { Grid } from '../../lib/tracks/grid.js';

/** Counter slots beyond the phases: stars not born yet, and stars the grid cannot answer. */
export const UNBORN = PHASES.length;
export const OUTSIDE = PHASES.length + 1;
export const COUNT_SLOTS = PHASES.length + 2;

/** The stars of a page, ready to be evaluated at any time. */
export interface Population {
  readonly n: number;
  readonly query: GridQuery;
  /** star columns in evaluation order (sorted by initial mass, for memory locality in the grid) */
  readonly initialMass: Float64Array;
  readonly birthTime: Float64Array;
  /** per star, or one value when all stars share it */
  readonly z: Float64Array | number;
  /** position of each evaluated star in the input (its name and number) */
  readonly inputIndex: Uint32Array;
  /** the latest evaluation */
  readonly columns: StateColumns;
  readonly age: Float64Array;
  /** earliest birth time, yr since the origin */
  readonly firstBirth: number;
  /**
   * Evaluates every star at time t (yr since the origin) through the grid query's columns, and
   * counts them per phase into `counts` (length COUNT_SLOTS): slot UNBORN for stars with
   * t < birthTime, OUTSIDE for stars the grid cannot answer (e.g. older than 100 Gyr).
   */
  evaluate(t: number, counts: Int32Array, columns?: StateColumns): void;
}

/**
 * Prepares the stars for evaluation: sorted by initial mass (the grid query then walks its
 * tracks in order, which halves its cost for 1e5 stars by keeping them in cache), with
 * reusable output columns so a frame allocates nothing.
 */
export function createPopulation(grid: Grid, stars: { initialMass: ArrayLike<number>; birthTime: ArrayLike<number>; z: ArrayLike<number> }): Population {
  const n = stars.initialMass.length;
  const order = new Uint32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  const m0 = stars.initialMass;
  order.sort((a, b) => m0[a] - m0[b] || a - b);
  const initialMass = new Float64Array(n);
  const birthTime = new Float64Array(n);
  const zs = new Float64Array(n);
  let sameZ = true;
  let firstBirth = Infinity;
  for (let k = 0; k < n; k++) {
    const i = order[k];
    initialMass[k] = m0[i];
    birthTime[k] = stars.birthTime[i];
    zs[k] = stars.z[i];
    if (zs[k] !== zs[0]) sameZ = false;
    if (birthTime[k] < firstBirth) firstBirth = birthTime[k];
  }
  const z = sameZ ? zs[0] : zs;
  const query = createGridQuery(grid);
  // the stars keep their mass and z while time runs: blends found once, EEPs followed frame to frame
  const evaluator = createPopulationEvaluator(grid, initialMass, z, { hrOnly: true }); // a frame draws phase, L and Teff
  const columns = allocateStateColumns(n);
  const age = new Float64Array(n);
  return {
    n, query, initialMass, birthTime, z, inputIndex: order, columns, age, firstBirth,
    evaluate(t: number, counts: Int32Array, out: StateColumns = columns): void {
      for (let k = 0; k < n; k++) age[k] = t - birthTime[k];
      evaluator.evaluate(age, out);
      counts.fill(0);
      const phase = out.phase;
      const status = out.status;
      for (let k = 0; k < n; k++) {
        if (status[k] === 0) counts[phase[k]]++;
        else if (age[k] < 0) counts[UNBORN]++;
        else counts[OUTSIDE]++;
      }
    },
  };
}
