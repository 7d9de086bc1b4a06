import { gridOfSlabs, type Grid } from './grid.js';

/**
 * The part of a grid needed for metallicities in [zMin, zMax]: the slabs inside the range
 * plus the nearest one on either side (so interpolation in log Z is unchanged there). Used to
 * embed only what a page needs. Slab data are shared, not copied.
 *
 * @throws RangeError if zMin > zMax or the range lies outside the grid
 * @example subsetGrid(grid, 0.014, 0.014).slabs.length // 1 (0.014 is a node)
 */
export function subsetGrid(grid: Grid, zMin: number, zMax: number): Grid {
  if (!(zMin <= zMax)) throw new RangeError(`subsetGrid: zMin ${zMin} must not exceed zMax ${zMax}`);
  if (zMin < grid.zRange.min || zMax > grid.zRange.max) {
    throw new RangeError(`subsetGrid: z ${zMin}–${zMax} outside the ${grid.source} grid's ${grid.zRange.min}–${grid.zRange.max}`);
  }
  const zs = grid.slabs.map((s) => s.z);
  let lo = 0;
  while (lo + 1 < zs.length && zs[lo + 1] <= zMin) lo++;
  let hi = zs.length - 1;
  while (hi - 1 >= 0 && zs[hi - 1] >= zMax) hi--;
  return gridOfSlabs(grid.slabs.slice(lo, hi + 1), grid.source);
}
