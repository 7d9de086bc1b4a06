import type { GridQuery } from './gridQuery.js';
import type { StarState } from '../model/starState.js';

/** Stars of one age across the mass range and the main-sequence turnoff. */
export interface Isochrone {
  /** yr */
  age: number;
  z: number;
  /** Msun: the largest initial mass still on the main sequence at this age (Msun) */
  turnoffMass: number;
  /** states in increasing initial mass */
  points: StarState[];
}

/**
 * The isochrone of age `age` (yr) and metal fraction `z`: the states of stars of every
 * initial mass at that one age (an isochrone in the sense of population synthesis, e.g.
 * Dotter 2016, ApJS 222, 8, §5), from the grid's point query on `count` log-spaced masses
 * across [minMass, maxMass], refined near the turnoff. The turnoff mass — where the main
 * sequence ends at this age — is found by bisection on the phase to 1e-6 dex; when every mass
 * is still on (or before) the main sequence it is the upper mass limit.
 *
 * @param query a grid interpolator (createGridQuery)
 * @param age yr, 0 < age ≤ 1e11
 * @param z metal fraction within the grid
 * @param options count of masses (default 300); mass limits (default: the grid's)
 * @throws RangeError for an age, z or mass limit out of range
 * @example isochrone(q, 1e10, 0.014).turnoffMass // ≈ 1.0
 */
export function isochrone(
  query: GridQuery, age: number, z: number,
  options: { count?: number; minMass?: number; maxMass?: number } = {},
): Isochrone {
  const { grid } = query;
  const minMass = options.minMass ?? grid.massRange.min;
  const maxMass = options.maxMass ?? grid.massRange.max;
  const count = options.count ?? 300;
  if (!(age > 0)) throw new RangeError(`age ${age} yr must be > 0`);
  if (!(minMass < maxMass)) throw new RangeError(`minMass ${minMass} must be below maxMass ${maxMass}`);
  if (!(Number.isInteger(count) && count >= 2)) throw new RangeError(`count ${count} must be an integer ≥ 2`);
  const l0 = Math.log10(minMass);
  const l1 = Math.log10(maxMass);
  const clamp = (m: number) => Math.min(maxMass, Math.max(minMass, m));
  const onOrBeforeMs = (m: number) => {
    const p = query.star(clamp(m), age, z).phase;
    return p === 'main-sequence' || p === 'pre-main-sequence' || p === 'brown-dwarf';
  };
  // turnoff: highest mass on the main sequence; search down from the top for the first MS mass
  let turnoffMass = maxMass;
  if (!onOrBeforeMs(maxMass)) {
    let lo = l0;
    let hi = l1;
    if (!onOrBeforeMs(minMass)) turnoffMass = minMass;
    else {
      // the phase sequence in mass is monotone only piecewise; scan coarse, then bisect the last transition
      const steps = 400;
      let last = lo;
      for (let i = 1; i <= steps; i++) {
        const lm = l0 + ((l1 - l0) * i) / steps;
        if (onOrBeforeMs(10 ** lm)) last = lm;
        else if (lm > last) {
          lo = last;
          hi = lm;
          break;
        }
      }
      while (hi - lo > 1e-6) {
        const mid = 0.5 * (lo + hi);
        if (onOrBeforeMs(10 ** mid)) lo = mid;
        else hi = mid;
      }
      turnoffMass = clamp(10 ** lo);
    }
  }
  const masses: number[] = [];
  // log-spaced, with the ends exactly at the limits (10 ** log10(m) can miss m by an ulp)
  for (let i = 0; i < count; i++) masses.push(i === 0 ? minMass : i === count - 1 ? maxMass : 10 ** (l0 + ((l1 - l0) * i) / (count - 1)));
  // refine around the turnoff, where the isochrone turns fastest
  const lt = Math.log10(turnoffMass);
  for (let i = -20; i <= 20; i++) {
    const m = 10 ** (lt + i * 0.0015);
    if (m > minMass && m < maxMass) masses.push(m);
  }
  masses.sort((a, b) => a - b);
  const points = masses.filter((m, i) => i === 0 || m > masses[i - 1]).map((m) => query.star(m, age, z));
  return { age, z, turnoffMass, points };
}
