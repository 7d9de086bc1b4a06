import { describe, expect, test } from 'vitest';
import { STATE_KEYS } from '../lib/model/starState.js';
import { SOLAR_Z } from '../lib/model/limits.js';
import { zFromFeh } from '../lib/model/zFromFeh.js';
import { expectStateSchema, lines, runBin, runMain } from './cli-run.js';

describe('starclock star --json', () => {
  test('prints exactly one JSON object with every schema key in order', () => {
    const { code, stdout, stderr } = runBin(['star', '--mass', '1', '--age', '4.57Gyr', '--json']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    const state = JSON.parse(stdout);
    expect(typeof state).toBe('object');
    expect(Array.isArray(state)).toBe(false);
    expectStateSchema(state);
    expect(state.initialMass).toBe(1);
    expect(state.age).toBe(4.57e9);
    expect(state.z).toBe(SOLAR_Z);
  });

  // The Sun: IAU 2015 Resolution B3 nominal L, R, Teff (Prša et al. 2016, AJ 152, 41);
  // solar age 4.5682 Gyr (Bouvier & Wadhwa 2010, Nature Geosci. 3, 637); tolerances from
  // /work/shared/REFERENCES.md ("Model Sun": L ±5 %, Teff ±1.5 %, R ±5 %).
  test('the Sun at 4.57 Gyr: L 1 Lsun ±5 %, Teff 5772 K ±1.5 %, R 1 Rsun ±5 %, main sequence, G type', () => {
    const { code, stdout } = runBin(['star', '--mass', '1', '--age', '4.57Gyr', '--z', String(SOLAR_Z), '--json']);
    expect(code).toBe(0);
    const sun = JSON.parse(stdout);
    expect(Math.abs(sun.luminosity - 1)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(sun.teff / 5772 - 1)).toBeLessThanOrEqual(0.015);
    expect(Math.abs(sun.radius - 1)).toBeLessThanOrEqual(0.05);
    expect(sun.phase).toBe('main-sequence');
    expect(sun.spectralType).toMatch(/^G\d(\.\d+)?V$/);
    expect(sun.remnant).toBe('white-dwarf');
  });

  test.each([
    { name: 'brown dwarf (exact model)', mass: '0.05', age: '1Gyr', extra: ['--exact'] },
    { name: 'red dwarf', mass: '0.2', age: '8Gyr' },
    { name: 'young Sun', mass: '1', age: '1Myr' },
    { name: 'old Sun', mass: '1', age: '12.5Gyr' },
    { name: 'dead Sun', mass: '1', age: '14Gyr' },
    { name: 'B star', mass: '5', age: '60Myr' },
    { name: 'dead B star', mass: '5', age: '1Gyr' },
    { name: 'massive star', mass: '20', age: '5Myr' },
    { name: 'dead massive star', mass: '20', age: '100Myr' },
    { name: 'dead very massive star', mass: '60', age: '100Myr' },
    { name: 'lowest mass', mass: '0.01', age: '10Myr' },
    { name: 'highest mass', mass: '150', age: '1Myr' },
    { name: 'oldest age', mass: '0.1', age: '100Gyr' },
  ])('$name (--mass $mass --age $age) follows the schema', ({ mass, age, extra }) => {
    const { code, stdout } = runBin(['star', '--mass', mass, '--age', age, '--json', ...(extra ?? [])]);
    expect(code).toBe(0);
    expectStateSchema(JSON.parse(stdout));
  });

  // The grid blends present mass as a fraction of the initial mass (lib/tracks/grid.ts), so
  // an interpolated brown dwarf keeps mass = initialMass exactly as the model does.
  test('brown dwarf (--mass 0.05 --age 1Gyr, built-in grid) follows the schema', () => {
    const { code, stdout } = runBin(['star', '--mass', '0.05', '--age', '1Gyr', '--json']);
    expect(code).toBe(0);
    expectStateSchema(JSON.parse(stdout));
  });

  test('a massive star long after its death is a neutron star or black hole', async () => {
    const { code, stdout } = await runMain(['star', '--mass', '20', '--age', '1Gyr', '--json']);
    expect(code).toBe(0);
    expect(['neutron-star', 'black-hole']).toContain(JSON.parse(stdout).phase);
  });

  test('--feh converts to z with zFromFeh', async () => {
    const { code, stdout } = await runMain(['star', '--mass', '1', '--age', '2Gyr', '--feh', '-0.5', '--json']);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).z).toBe(zFromFeh(-0.5));
  });

  test('--format json is the same as --json', async () => {
    const a = await runMain(['star', '--mass', '2', '--age', '300Myr', '--json']);
    const b = await runMain(['star', '--mass', '2', '--age', '300Myr', '--format', 'json']);
    expect(b.code).toBe(0);
    expect(b.stdout).toBe(a.stdout);
  });
});

describe('starclock star (table)', () => {
  test('prints every schema key with its value and unit', () => {
    const { code, stdout, stderr } = runBin(['star', '--mass', '1', '--age', '4.57Gyr']);
    expect(code).toBe(0);
    expect(stderr).toBe('');
    const rows = lines(stdout).slice(2);
    expect(rows.map((row) => row.split(/\s+/)[0])).toEqual([...STATE_KEYS]);
    expect(stdout).toMatch(/^age\s+4\.57\s+Gyr$/m);
    expect(stdout).toMatch(/^teff\s+\d{4}\s+K$/m);
    expect(stdout).toMatch(/^luminosity\s+[\d.]+\s+Lsun$/m);
    expect(stdout).toMatch(/^phase\s+main-sequence$/m);
  });
});

describe('starclock star rejects bad input with exit 2 and one stderr line', () => {
  const AGE_RANGE = '(0, 100 Gyr]';
  const MASS_RANGE = '0.01–150 Msun';
  const Z_RANGE = '0.0001–0.03';
  test.each([
    { name: 'negative mass', args: ['--mass', '-1', '--age', '1'], words: ['--mass', '-1', MASS_RANGE] },
    { name: 'zero mass', args: ['--mass', '0', '--age', '1'], words: ['--mass', '0', MASS_RANGE] },
    { name: 'NaN mass', args: ['--mass', 'NaN', '--age', '1'], words: ['--mass', 'NaN', MASS_RANGE] },
    { name: 'text mass', args: ['--mass', 'heavy', '--age', '1'], words: ['--mass', 'heavy', MASS_RANGE] },
    { name: 'mass with trailing text', args: ['--mass', '1x', '--age', '1'], words: ['--mass', '1x', MASS_RANGE] },
    { name: 'mass above range', args: ['--mass', '200', '--age', '1'], words: ['--mass', '200', MASS_RANGE] },
    { name: 'mass below range', args: ['--mass', '0.005', '--age', '1'], words: ['--mass', '0.005', MASS_RANGE] },
    { name: 'Infinity mass', args: ['--mass', 'Infinity', '--age', '1'], words: ['--mass', 'Infinity', MASS_RANGE] },
    { name: 'negative age', args: ['--mass', '1', '--age', '-1Gyr'], words: ['--age', '-1Gyr', AGE_RANGE] },
    { name: 'zero age', args: ['--mass', '1', '--age', '0'], words: ['--age', '0', AGE_RANGE] },
    { name: 'NaN age', args: ['--mass', '1', '--age', 'NaN'], words: ['--age', 'NaN', AGE_RANGE] },
    { name: 'text age', args: ['--mass', '1', '--age', 'ancient'], words: ['--age', 'ancient', AGE_RANGE] },
    { name: 'age with two units', args: ['--mass', '1', '--age', '1GyrMyr'], words: ['--age', '1GyrMyr', AGE_RANGE] },
    { name: 'age beyond 100 Gyr', args: ['--mass', '1', '--age', '200Gyr'], words: ['--age', '200Gyr', AGE_RANGE] },
    { name: 'age beyond 100 Gyr in yr', args: ['--mass', '1', '--age', '1e12yr'], words: ['--age', '1e12yr', AGE_RANGE] },
    { name: 'Infinity age', args: ['--mass', '1', '--age', 'Infinity'], words: ['--age', 'Infinity', AGE_RANGE] },
    { name: 'z above range', args: ['--mass', '1', '--age', '1', '--z', '0.5'], words: ['--z', '0.5', Z_RANGE] },
    { name: 'z below range', args: ['--mass', '1', '--age', '1', '--z', '1e-5'], words: ['--z', '1e-5', Z_RANGE] },
    { name: 'zero z', args: ['--mass', '1', '--age', '1', '--z', '0'], words: ['--z', '0', Z_RANGE] },
    { name: 'text z', args: ['--mass', '1', '--age', '1', '--z', 'solar'], words: ['--z', 'solar', Z_RANGE] },
    { name: 'feh too high', args: ['--mass', '1', '--age', '1', '--feh', '2'], words: ['--feh', '2', 'dex'] },
    { name: 'feh too low', args: ['--mass', '1', '--age', '1', '--feh', '-5'], words: ['--feh', '-5', 'dex'] },
    { name: 'text feh', args: ['--mass', '1', '--age', '1', '--feh', 'poor'], words: ['--feh', 'poor', 'dex'] },
    { name: '--z with --feh', args: ['--mass', '1', '--age', '1', '--z', '0.01', '--feh', '0'], words: ['--z', '--feh', 'cannot be used with'] },
    { name: 'unknown option', args: ['--mass', '1', '--age', '1', '--colour'], words: ['--colour', 'unknown option'] },
    { name: 'missing --mass', args: ['--age', '1'], words: ['--mass', 'not specified'] },
    { name: 'missing --age', args: ['--mass', '1'], words: ['--age', 'not specified'] },
    { name: 'bad --format', args: ['--mass', '1', '--age', '1', '--format', 'xml'], words: ['--format', 'xml', 'table, json'] },
  ])('$name', ({ args, words }) => {
    const { code, stdout, stderr } = runBin(['star', ...args]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    const errorLines = lines(stderr);
    expect(errorLines).toHaveLength(1);
    expect(errorLines[0]).toMatch(/^starclock: /);
    for (const word of words) expect(errorLines[0]).toContain(word);
  });

  test('in-process main() gives the same exit code and message as the binary', async () => {
    const args = ['star', '--mass', '200', '--age', '1'];
    const spawned = runBin(args);
    const inProcess = await runMain(args);
    expect(inProcess).toEqual(spawned);
  });
});

describe('starclock star ages beyond the age of the universe', () => {
  test('work, with one warning line on stderr', () => {
    const { code, stdout, stderr } = runBin(['star', '--mass', '0.5', '--age', '20Gyr', '--json']);
    expect(code).toBe(0);
    expectStateSchema(JSON.parse(stdout));
    const warning = lines(stderr);
    expect(warning).toHaveLength(1);
    expect(warning[0]).toMatch(/^starclock: warning: /);
    expect(warning[0]).toContain('age of the universe');
    expect(warning[0]).toContain('13.8 Gyr');
  });

  test('13.8 Gyr itself gives no warning', async () => {
    const { code, stderr } = await runMain(['star', '--mass', '0.5', '--age', '13.8Gyr', '--json']);
    expect(code).toBe(0);
    expect(stderr).toBe('');
  });
});

describe('starclock star --help', () => {
  test('documents every option, the age units and the ranges', () => {
    const { code, stdout: help, stderr } = runBin(['star', '--help']);
    expect(code).toBe(0);
    expect(stderr).toBe('');
    // Commander wraps descriptions to the terminal width; compare with blanks collapsed.
    const stdout = help.replace(/\s+/g, ' ');
    for (const word of ['--mass <Msun>', '--age <age>', '--z <Z>', '--feh <dex>', '--json', '--format',
      'a bare number is Gyr', '0.01–150 Msun', '(0, 100 Gyr]', '0.0001–0.03', '4.6Gyr']) {
      expect(stdout).toContain(word);
    }
  });
});

// The interpolator's accuracy targets against the direct model (issue targets, as tested on the
// whole sample in test/interp-gridQuery.test.ts): median |Δlog L| ≤ 0.01 dex and |Δlog Teff| ≤
// 0.005 dex on the main sequence, 0.03 / 0.01 dex in later phases. One star is not a median, so
// each here may be off by twice the median target. Masses are kept away (> 1 %) from the layout
// boundaries (0.35, 0.84–0.9, 2.0, 8.0, 23 Msun at z 0.014), where the grid answers with the
// nearer side's track.
describe('starclock star (built-in grid) against star --exact (the model itself)', () => {
  test.each([
    { mass: '0.3', age: '3Gyr', phase: 'main-sequence', dl: 0.02, dt: 0.01 },
    { mass: '0.7', age: '500Myr', phase: 'main-sequence', dl: 0.02, dt: 0.01 },
    { mass: '1', age: '4.57Gyr', phase: 'main-sequence', dl: 0.02, dt: 0.01 },
    { mass: '1.3', age: '3Gyr', phase: 'main-sequence', dl: 0.02, dt: 0.01 },
    { mass: '4', age: '50Myr', phase: 'main-sequence', dl: 0.02, dt: 0.01 },
    { mass: '2.5', age: '3Gyr', phase: 'white-dwarf', dl: 0.06, dt: 0.02 },
    { mass: '4', age: '500Myr', phase: 'white-dwarf', dl: 0.06, dt: 0.02 },
    { mass: '15', age: '500Myr', phase: 'neutron-star', dl: 0.06, dt: 0.02 },
  ])('--mass $mass --age $age: same phase ($phase), |Δlog L| ≤ $dl, |Δlog Teff| ≤ $dt dex', ({ mass, age, phase, dl, dt }) => {
    const grid = runBin(['star', '--mass', mass, '--age', age, '--json']);
    const exact = runBin(['star', '--mass', mass, '--age', age, '--exact', '--json']);
    expect(grid.code).toBe(0);
    expect(exact.code).toBe(0);
    const a = JSON.parse(grid.stdout);
    const b = JSON.parse(exact.stdout);
    expect(a.phase).toBe(phase);
    expect(b.phase).toBe(phase);
    expect(Math.abs(Math.log10(a.luminosity / b.luminosity))).toBeLessThanOrEqual(dl);
    expect(Math.abs(Math.log10(a.teff / b.teff))).toBeLessThanOrEqual(dt);
    // the inputs pass through unchanged
    expect([a.initialMass, a.z, a.age]).toEqual([b.initialMass, b.z, b.age]);
  });
});

describe('starclock star --grid FILE', () => {
  const SAMPLE = 'tracks-demo/sample-grid.csv';

  test('answers from the file, every schema key present', () => {
    const { code, stdout, stderr } = runBin(['star', '--mass', '1.1', '--age', '3Gyr', '--grid', SAMPLE, '--json']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expectStateSchema(JSON.parse(stdout));
  });

  test.each([
    { name: 'mass above the grid', args: ['--mass', '7', '--age', '1'], words: ['--mass', '7', SAMPLE, '0.5–5 Msun'] },
    { name: 'mass below the grid', args: ['--mass', '0.3', '--age', '1'], words: ['--mass', '0.3', SAMPLE, '0.5–5 Msun'] },
    { name: 'z the grid does not hold', args: ['--mass', '1', '--age', '1', '--z', '0.004'], words: ['--z', '0.004', SAMPLE, '0.014 only'] },
    { name: '--feh off the grid', args: ['--mass', '1', '--age', '1', '--feh', '-0.5'], words: ['--feh', '-0.5', SAMPLE, '0.014 only'] },
  ])('names the grid file and its range: $name (exit 2, one line)', ({ args, words }) => {
    const { code, stdout, stderr } = runBin(['star', ...args, '--grid', SAMPLE]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    for (const word of words) expect(stderr).toContain(word);
  });

  test.each([
    { name: 'missing file', args: ['--grid', 'no-such-grid.csv'], words: ['--grid', 'no-such-grid.csv', 'no such file'] },
    { name: 'with --exact', args: ['--grid', SAMPLE, '--exact'], words: ['--exact', '--grid', 'cannot be used with'] },
    { name: 'no file name', args: ['--grid'], words: ['--grid', 'argument missing'] },
  ])('bad --grid use: $name (exit 2, one line)', ({ args, words }) => {
    const { code, stdout, stderr } = runBin(['star', '--mass', '1', '--age', '1', ...args]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    for (const word of words) expect(stderr).toContain(word);
  });
});

describe('starclock star --help (grid options)', () => {
  test('documents --grid and --exact', () => {
    const { code, stdout } = runBin(['star', '--help']);
    expect(code).toBe(0);
    const help = stdout.replace(/\s+/g, ' ');
    for (const word of ['--grid <file>', '--exact', 'built-in track grid', 'analytic model']) expect(help).toContain(word);
  });
});
