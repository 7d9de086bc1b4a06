import { beforeAll, describe, expect, test } from 'vitest';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { createGridQuery, type GridQuery } from '../lib/interp/gridQuery.js';
import { isochrone } from '../lib/interp/isochrone.js';
import { PHASE_INDEX } from '../lib/model/phases.js';

let q: GridQuery;
beforeAll(() => {
  q = createGridQuery(loadBuiltinGrid());
});

describe('isochrone(query, age, z)', () => {
  // Main-sequence lifetimes of detailed models near solar metallicity (REFERENCES.md, from
  // memory there): at an age inside a mass's accepted lifetime range the turnoff lies near
  // that mass. Ages: the middle of each range; tolerance: the mass whose lifetime spans the
  // range's half-width (lifetime ∝ M^-2.5 → ±(ln(range)/2.5/2) in ln M, widened to ±10 %).
  test.each([
    { mass: 1.0, age: 9.75e9, tol: 0.08 },
    { mass: 2.0, age: 1.2e9, tol: 0.1 },
    { mass: 5.0, age: 1.0e8, tol: 0.1 },
    { mass: 15, age: 11.75e6, tol: 0.12 },
  ])('isochrone turnoff at $age yr is $mass Msun within $tol (REFERENCES lifetimes)', ({ mass, age, tol }) => {
    const iso = isochrone(q, age, 0.014);
    expect(Math.abs(iso.turnoffMass / mass - 1)).toBeLessThan(tol);
  });

  test('isochrone turnoff falls as the population ages', () => {
    const ages = [1e7, 3e7, 1e8, 3e8, 1e9, 3e9, 1e10];
    const t = ages.map((a) => isochrone(q, a, 0.014).turnoffMass);
    for (let i = 1; i < t.length; i++) expect(t[i]).toBeLessThan(t[i - 1]);
  });

  test('isochrone points come in increasing initial mass, all at the one age, main sequence below the turnoff', () => {
    const iso = isochrone(q, 2e9, 0.014);
    for (let i = 1; i < iso.points.length; i++) expect(iso.points[i].initialMass).toBeGreaterThan(iso.points[i - 1].initialMass);
    for (const p of iso.points) {
      expect(p.age).toBe(2e9);
      if (p.initialMass > 0.5 && p.initialMass < 0.99 * iso.turnoffMass) expect(p.phase).toBe('main-sequence');
      if (p.initialMass > 1.02 * iso.turnoffMass) expect(PHASE_INDEX[p.phase]).toBeGreaterThan(PHASE_INDEX['main-sequence']);
    }
  });

  test('isochrone of a metal-poor population has a lower turnoff mass at the same age (shorter lives)', () => {
    expect(isochrone(q, 1.2e10, 0.0002).turnoffMass).toBeLessThan(isochrone(q, 1.2e10, 0.014).turnoffMass);
  });

  test.each([
    ['age 0', () => isochrone(q, 0, 0.014), /age 0 yr must be > 0/],
    ['z out of grid', () => isochrone(q, 1e9, 0.5), /z 0.5 outside/],
    ['count', () => isochrone(q, 1e9, 0.014, { count: 1 }), /count 1/],
  ])('isochrone throws RangeError for %s', (_, f, re) => {
    expect(f).toThrow(RangeError);
    expect(f).toThrow(re);
  });
});
