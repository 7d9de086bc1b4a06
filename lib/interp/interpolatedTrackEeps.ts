import type { Grid, GridRun } from '../tracks/grid.js';
import { layoutPrimaryEeps } from '../tracks/layoutPrimaryEeps.js';
import type { Eep } from '../tracks/track.js';
import { findInterval } from './bisect.js';
import { createMassBlend, locateMass, W_LM } from './massBlend.js';

/**
 * The primary EEPs of `interpolatedTrack(grid, initialMass, z)`: the EEP layout that track
 * is blended in is found the same way (locateMass in the bracketing metallicity slab; the
 * upper slab when the two slabs' layouts differ and log Z is at least half way to it), and
 * its primary EEPs placed on the layout's EEP indices (layoutPrimaryEeps).
 *
 * @param grid from buildGrid
 * @param initialMass Msun, within the grid
 * @param z metal fraction, within the grid
 * @returns the EEPs, by index; index k is row k of the interpolated track
 * @throws RangeError when mass or z is outside the grid
 * @example interpolatedTrackEeps(grid, 1, 0.014)[1] // { name: 'zams', index: 29 }
 */
export function interpolatedTrackEeps(grid: Grid, initialMass: number, z: number): Eep[] {
  if (!(initialMass >= grid.massRange.min && initialMass <= grid.massRange.max)) {
    throw new RangeError(`initialMass ${initialMass} outside the ${grid.source} grid's ${grid.massRange.min}–${grid.massRange.max} Msun`);
  }
  if (!(z >= grid.zRange.min && z <= grid.zRange.max)) {
    throw new RangeError(`z ${z} outside the ${grid.source} grid's ${grid.zRange.min}–${grid.zRange.max}`);
  }
  const lm = Math.log10(initialMass);
  const mb = createMassBlend();
  mb.w[W_LM] = lm;
  const runAt = (k: number): GridRun => {
    locateMass(grid.slabs[k], mb);
    return mb.run;
  };
  let run = runAt(0);
  if (grid.slabs.length > 1) {
    const lz = Math.log10(z);
    const k = findInterval(grid.logZ, lz);
    const w = Math.min(1, Math.max(0, (lz - grid.logZ[k]) / (grid.logZ[k + 1] - grid.logZ[k])));
    run = runAt(k);
    if (w > 0) {
      const upper = runAt(k + 1);
      if (upper.layout !== run.layout && w >= 0.5) run = upper;
    }
  }
  return layoutPrimaryEeps(run.layout, run.phase);
}
