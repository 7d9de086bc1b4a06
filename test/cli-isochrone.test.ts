import { describe, expect, test } from 'vitest';
import { STATE_KEYS } from '../lib/model/starState.js';
import { expectStateSchema, lines, runBin } from './cli-run.js';

/** Every schema key in order with a value of its type — expectStateSchema without the mass ≤ initialMass check (see below). */
function expectStateShape(state: Record<string, unknown>): void {
  expectStateSchema({ ...state, mass: Math.min(state.mass as number, state.initialMass as number) });
}

interface IsochroneJson {
  age: number;
  z: number;
  turnoffMass: number;
  points: Array<Record<string, unknown> & { initialMass: number; age: number; z: number; phase: string }>;
}

const iso = (args: string[]): IsochroneJson => {
  const { code, stdout, stderr } = runBin(['isochrone', ...args, '--json']);
  expect(stderr).toBe('');
  expect(code).toBe(0);
  return JSON.parse(stdout) as IsochroneJson;
};

describe('starclock isochrone --json', () => {
  test('{ age, z, turnoffMass, points } with schema states in increasing initial mass, all of that age and z', () => {
    const i = iso(['--age', '1Gyr', '--count', '60']);
    expect(Object.keys(i)).toEqual(['age', 'z', 'turnoffMass', 'points']);
    expect(i.age).toBe(1e9);
    expect(i.z).toBe(0.014);
    expect(i.points.length).toBeGreaterThanOrEqual(60);
    i.points.forEach((p, k) => {
      expectStateShape(p);
      expect(p.age).toBe(1e9);
      expect(p.z).toBe(0.014);
      if (k > 0) expect(p.initialMass).toBeGreaterThan(i.points[k - 1].initialMass);
    });
    // the built-in grid's whole mass range
    expect(i.points[0].initialMass).toBe(0.01);
    expect(i.points[i.points.length - 1].initialMass).toBeCloseTo(150, 9);
  });

  // The grid blends present mass as a fraction of the initial mass, which the monotone cubic
  // keeps ≤ 1 (lib/tracks/grid.ts), so no star comes out heavier than at birth.
  test('every point has mass ≤ initialMass', () => {
    const i = iso(['--age', '1Gyr', '--count', '60']);
    for (const p of i.points) expect(p.mass as number).toBeLessThanOrEqual(p.initialMass * (1 + 1e-12));
  });

  // Main-sequence lifetimes near solar z (REFERENCES.md, "Main sequence", from memory): 2.0 Msun
  // lives 0.9–1.5 Gyr, 1.0 Msun 8.5–11 Gyr. With the local scaling t ∝ M^-2.5 (textbook, common
  // practice) the turnoff mass at age T is M·(t(M)/T)^0.4 (derived): at 1 Gyr 1.92–2.35 Msun,
  // at 10 Gyr 0.937–1.039 Msun.
  test.each([
    { age: '1Gyr', lo: 1.92, hi: 2.35 },
    { age: '10Gyr', lo: 0.937, hi: 1.039 },
  ])('turnoff at $age lies in $lo–$hi Msun, with main-sequence stars below it and none just above', ({ age, lo, hi }) => {
    const i = iso(['--age', age]);
    expect(i.turnoffMass).toBeGreaterThanOrEqual(lo);
    expect(i.turnoffMass).toBeLessThanOrEqual(hi);
    const below = i.points.filter((p) => p.initialMass < i.turnoffMass * 0.99 && p.initialMass > 0.5);
    const above = i.points.filter((p) => p.initialMass > i.turnoffMass * 1.01 && p.initialMass < i.turnoffMass * 1.2);
    expect(below.every((p) => p.phase === 'main-sequence')).toBe(true);
    expect(above.length).toBeGreaterThan(0);
    expect(above.some((p) => p.phase === 'main-sequence')).toBe(false);
  });

  test('--feh and --grid: a metal-poor isochrone, and one from the sample grid within its 0.5–5 Msun', () => {
    const poor = iso(['--age', '10Gyr', '--feh', '-1', '--count', '20']);
    expect(poor.z).toBeLessThan(0.002);
    const sample = iso(['--age', '1Gyr', '--grid', 'tracks-demo/sample-grid.csv', '--count', '20']);
    expect(sample.points[0].initialMass).toBe(0.5);
    expect(sample.points[sample.points.length - 1].initialMass).toBeCloseTo(5, 9);
    // the sparse grid's turnoff within 3 % of the built-in grid's (1 Gyr: between its 2 and 3 Msun tracks)
    const builtin = iso(['--age', '1Gyr', '--count', '20']);
    expect(Math.abs(sample.turnoffMass / builtin.turnoffMass - 1)).toBeLessThanOrEqual(0.03);
  });
});

describe('starclock isochrone --format table and csv', () => {
  test('table: the turnoff mass first, then one row per star', () => {
    const { code, stdout } = runBin(['isochrone', '--age', '1Gyr', '--count', '30']);
    expect(code).toBe(0);
    const out = lines(stdout);
    expect(out[0]).toMatch(/^Isochrone at 1 Gyr, z 0\.014 \(the built-in grid\): turnoff mass 2\.\d+ Msun; \d+ stars$/);
    const n = Number(/(\d+) stars/.exec(out[0])![1]);
    expect(out).toHaveLength(n + 3);
    expect(out[1]).toMatch(/^initial mass \(Msun\)\s+phase/);
  });

  test('csv: the schema keys, one row per star', () => {
    const { code, stdout } = runBin(['isochrone', '--age', '300Myr', '--count', '25', '--format', 'csv']);
    expect(code).toBe(0);
    const rows = lines(stdout);
    expect(rows[0]).toBe(STATE_KEYS.join(','));
    const json = iso(['--age', '300Myr', '--count', '25']);
    expect(rows).toHaveLength(json.points.length + 1);
  });
});

describe('starclock isochrone rejects bad input with exit 2 and one stderr line', () => {
  test.each([
    { name: 'missing --age', args: [], words: ['--age', 'not specified'] },
    { name: 'zero age', args: ['--age', '0'], words: ['--age', '0', '(0, 100 Gyr]'] },
    { name: 'text age', args: ['--age', 'old'], words: ['--age', 'old'] },
    { name: 'count 1', args: ['--age', '1', '--count', '1'], words: ['--count', '1', '2–100000'] },
    { name: 'fractional count', args: ['--age', '1', '--count', '2.5'], words: ['--count', '2.5', '2–100000'] },
    { name: 'text count', args: ['--age', '1', '--count', 'many'], words: ['--count', 'many', '2–100000'] },
    { name: 'z above range', args: ['--age', '1', '--z', '0.05'], words: ['--z', '0.05', '0.0001–0.03'] },
    { name: 'z off the user grid', args: ['--age', '1', '--z', '0.02', '--grid', 'tracks-demo/sample-grid.csv'], words: ['--z', '0.02', 'sample-grid.csv', '0.014 only'] },
    { name: 'missing grid file', args: ['--age', '1', '--grid', 'nowhere.csv'], words: ['--grid', 'nowhere.csv'] },
    { name: 'bad format', args: ['--age', '1', '--format', 'ndjson'], words: ['--format', 'ndjson'] },
    { name: '--exact is not an isochrone option', args: ['--age', '1', '--exact'], words: ['--exact', 'unknown option'] },
  ])('$name', ({ args, words }) => {
    const { code, stdout, stderr } = runBin(['isochrone', ...args]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    for (const word of words) expect(stderr).toContain(word);
  });
});

describe('starclock isochrone --help', () => {
  test('documents the options, the turnoff and the JSON layout', () => {
    const { code, stdout } = runBin(['isochrone', '--help']);
    expect(code).toBe(0);
    const help = stdout.replace(/\s+/g, ' ');
    for (const word of ['--age <age>', '--z <Z>', '--feh <dex>', '--grid <file>', '--count <N>', '--format', 'turnoff', '"turnoffMass"', 'a bare number is Gyr']) {
      expect(help).toContain(word);
    }
  });
});
