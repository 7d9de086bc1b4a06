import { beforeAll, describe, expect, test } from 'vitest';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { subsetGrid } from '../lib/tracks/subsetGrid.js';
import { createGridQuery } from '../lib/interp/gridQuery.js';
import type { Grid } from '../lib/tracks/grid.js';

let grid: Grid;
beforeAll(() => {
  grid = loadBuiltinGrid();
});

describe('subsetGrid(grid, zMin, zMax)', () => {
  test('subsetGrid keeps a node alone and brackets an off-node range', () => {
    expect(subsetGrid(grid, 0.014, 0.014).slabs.map((s) => s.z)).toEqual([0.014]);
    expect(subsetGrid(grid, 0.012, 0.015).slabs.map((s) => s.z)).toEqual([0.01, 0.014, 0.02]);
  });

  test('subsetGrid answers exactly as the whole grid inside its range', () => {
    const a = createGridQuery(grid);
    const b = createGridQuery(subsetGrid(grid, 0.005, 0.012));
    for (const [m, t, z] of [[1, 4.6e9, 0.008], [3, 3e8, 0.011], [0.4, 1e10, 0.006]]) {
      expect(b.star(m, t, z)).toEqual(a.star(m, t, z));
    }
  });

  test('subsetGrid throws RangeError for an inverted or outside range', () => {
    expect(() => subsetGrid(grid, 0.02, 0.01)).toThrow(/zMin 0.02 must not exceed/);
    expect(() => subsetGrid(grid, 0.01, 0.5)).toThrow(/outside/);
  });
});
