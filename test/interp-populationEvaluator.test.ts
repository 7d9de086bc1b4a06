import { beforeAll, describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { createGridQuery, type GridQuery } from '../lib/interp/gridQuery.js';
import { createPopulationEvaluator } from '../lib/interp/populationEvaluator.js';
import type { Grid } from '../lib/tracks/grid.js';

let grid: Grid;
let q: GridQuery;
beforeAll(() => {
  grid = loadBuiltinGrid();
  q = createGridQuery(grid);
});

const KEYS = ['mass', 'coreMass', 'luminosity', 'teff', 'radius', 'logg', 'msLifetime', 'remnantMass'] as const;

describe('createPopulationEvaluator(grid, initialMass, z).evaluate(age, out)', () => {
  test('evaluate() gives what columns() gives, frame after frame as a cluster ages (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -2, max: Math.log10(150), noNaN: true }), fc.double({ min: 0, max: 1e7, noNaN: true }), fc.double({ min: -4, max: Math.log10(0.03), noNaN: true })), { minLength: 1, maxLength: 30 }),
        fc.array(fc.double({ min: 5, max: 11, noNaN: true }), { minLength: 2, maxLength: 12 }),
        (stars, logTimes) => {
          // clamped: 10 ** log10(x) can miss x by an ulp and fall outside the grid
          const m = stars.map((s) => Math.min(150, Math.max(0.01, 10 ** s[0])));
          const birth = stars.map((s) => s[1]);
          const z = stars.map((s) => Math.min(0.03, Math.max(1e-4, 10 ** s[2])));
          const ev = createPopulationEvaluator(grid, m, z);
          for (const lt of [...logTimes].sort((x, y) => x - y)) {
            const age = birth.map((b) => Math.min(1e11, 10 ** lt) - b); // negative: not yet born
            const a = ev.evaluate(age);
            const b = q.columns({ initialMass: m, age, z });
            for (let i = 0; i < m.length; i++) {
              if (a.status[i] !== b.status[i]) return false;
              if (a.status[i] !== 0) continue;
              if (a.phase[i] !== b.phase[i]) return false;
              // 1e-6 relative: the remembered EEP and a fresh search meet the same bracket
              for (const k of KEYS) if (Math.abs(a[k][i] - b[k][i]) > 1e-6 * Math.max(Math.abs(b[k][i]), 1e-30)) return false;
            }
          }
          return true;
        },
      ),
      { seed: 99, numRuns: 120 },
    );
  });

  test('evaluate() marks ages outside 0–100 Gyr with status 3 and zeros', () => {
    const ev = createPopulationEvaluator(grid, [1, 2], 0.014);
    const o = ev.evaluate([-5, 2e11]);
    expect(Array.from(o.status)).toEqual([3, 3]);
    expect(o.luminosity[0]).toBe(0);
  });

  test('createPopulationEvaluator throws RangeError naming the star outside the grid', () => {
    expect(() => createPopulationEvaluator(grid, [1, 500], 0.014)).toThrow(/star 1: initialMass 500 outside/);
    expect(() => createPopulationEvaluator(grid, [1], [0.9])).toThrow(/star 0: z 0.9 outside/);
    expect(() => createPopulationEvaluator(grid, [1], 0.014).evaluate([1, 2])).toThrow(/2 ages for 1 stars/);
  });
});

describe('createPopulationEvaluator(…, { hrOnly: true })', () => {
  test('hrOnly writes the same phase, mass, luminosity and teff as the full evaluation', () => {
    const m = [0.05, 0.3, 1, 2.5, 9, 30, 60];
    const age = [1e9, 5e9, 4.6e9, 5e8, 3e7, 6.5e6, 1e8];
    const full = createPopulationEvaluator(grid, m, 0.014).evaluate(age);
    const hr = createPopulationEvaluator(grid, m, 0.014, { hrOnly: true }).evaluate(age);
    expect(Array.from(hr.phase)).toEqual(Array.from(full.phase));
    for (const k of ['mass', 'luminosity', 'teff'] as const) {
      for (let i = 0; i < m.length; i++) expect(hr[k][i]).toBeCloseTo(full[k][i], 10);
    }
  });
});
