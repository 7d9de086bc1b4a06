import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, test } from 'vitest';
import { BIN, lines, ROOT, runBin } from './cli-run.js';

const SAMPLE = 'tracks-demo/sample-grid.csv';
const dir = mkdtempSync(join(tmpdir(), 'starclock-grid-cli-'));
const sampleText = readFileSync(join(ROOT, SAMPLE), 'utf8');

/** Runs the binary with `input` on stdin. */
function runWithInput(args: string[], input: string) {
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, input, encoding: 'utf8', timeout: 60000, maxBuffer: 1 << 28 });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

/** A copy of the sample grid with `edit` applied to its lines (1-based line numbers), written to the temp dir. */
function hostile(name: string, edit: (lines: string[]) => void): string {
  const l = sampleText.split('\n');
  edit(l);
  const path = join(dir, name);
  writeFileSync(path, l.join('\n'));
  return path;
}

describe('starclock grid check', () => {
  test('passes the sample grid with a one-line summary on stdout', () => {
    const { code, stdout, stderr } = runBin(['grid', 'check', SAMPLE]);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(lines(stdout)).toEqual([`${SAMPLE}: valid starclock-grid v1 file: 8 tracks, 1 metallicity (z 0.014), initial masses 0.5–5 Msun`]);
  });

  test('reads standard input with -', () => {
    const { code, stdout } = runWithInput(['grid', 'check', '-'], sampleText);
    expect(code).toBe(0);
    expect(stdout).toMatch(/^<stdin>: valid starclock-grid v1 file: 8 tracks/);
  });

  // Line numbers are 1-based as an editor shows them; line 5 is the first data row of the sample.
  test.each([
    { name: 'a number that is not one', edit: (l: string[]) => void (l[9] = l[9].replace(/^0\.5,0\.014,[^,]+,/, '0.5,0.014,soon,')), row: 10, words: ['column age', "'soon'"] },
    { name: 'an unknown phase', edit: (l: string[]) => void (l[9] = l[9].replace('pre-main-sequence', 'protostar')), row: 10, words: ['column phase', "'protostar'"] },
    { name: 'a negative mass', edit: (l: string[]) => void (l[40] = l[40].split(',').map((c, i) => (i === 5 ? '-0.5' : c)).join(',')), row: 41, words: ['column mass', '-0.5'] },
    { name: 'a radius off Stefan–Boltzmann', edit: (l: string[]) => void (l[20] = l[20].split(',').map((c, i) => (i === 9 ? '9' : c)).join(',')), row: 21, words: ['column radius', '9'] },
    { name: 'a short row', edit: (l: string[]) => void (l[30] = '0.5,0.014,1e9'), row: 31, words: ['3 fields'] },
    { name: 'NaN luminosity', edit: (l: string[]) => void (l[50] = l[50].split(',').map((c, i) => (i === 7 ? 'NaN' : c)).join(',')), row: 51, words: ['column luminosity', 'NaN'] },
    { name: 'a wrong first line', edit: (l: string[]) => void (l[0] = '# some-other-grid v3'), row: 1, words: ['first line'] },
  ])('a file with $name: exit 2, FILE:ROW: column COL: message on stderr, then a summary', ({ name, edit, row, words }) => {
    const path = hostile(`${name.replace(/\W+/g, '-')}.csv`, edit);
    const { code, stdout, stderr } = runBin(['grid', 'check', path]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    const err = lines(stderr);
    const line = err.find((e) => e.startsWith(`${path}:${row}: `));
    expect(line, stderr).toBeDefined();
    for (const word of words) expect(line).toContain(word);
    expect(err[err.length - 1]).toMatch(new RegExp(`^starclock: .*: \\d+ problems? on \\d+ lines?; not a valid starclock-grid v1 file$`));
  });

  test('lists every problem, not only the first', () => {
    const path = hostile('three-problems.csv', (l) => {
      l[9] = l[9].replace('pre-main-sequence', 'protostar');
      l[100] = l[100].split(',').map((c, i) => (i === 4 ? 'warp' : c)).join(',');
      l[200] = '1,0.014';
    });
    const { code, stderr } = runBin(['grid', 'check', path]);
    expect(code).toBe(2);
    const err = lines(stderr);
    for (const row of [10, 101, 201]) expect(err.some((e) => e.startsWith(`${path}:${row}: `)), `line ${row}`).toBe(true);
  });

  test.each([
    { name: 'a missing file', args: ['grid', 'check', 'no-such.csv'], words: ['no-such.csv', 'no such file'] },
    { name: 'no file argument', args: ['grid', 'check'], words: ["missing required argument 'file'"] },
    { name: 'an empty file on stdin', args: ['grid', 'check', '-'], words: ['<stdin>', 'not a valid'] },
  ])('bad input: $name (exit 2)', ({ args, words }) => {
    const { code, stdout, stderr } = runWithInput(args, '');
    expect(code).toBe(2);
    expect(stdout).toBe('');
    for (const word of words) expect(stderr).toContain(word);
  });
});

describe('starclock --grid FILE with problems', () => {
  test('prints every problem, goes on with the good tracks and says how many were left out', () => {
    const path = hostile('one-bad-track.csv', (l) => void (l[9] = l[9].replace('pre-main-sequence', 'protostar')));
    const { code, stdout, stderr } = runBin(['star', '--mass', '1.1', '--age', '3Gyr', '--grid', path, '--json']);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).phase).toBe('main-sequence');
    const err = lines(stderr);
    expect(err[0]).toMatch(new RegExp(`^${path.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}:10: column phase: `));
    expect(err[err.length - 1]).toBe(`starclock: warning: --grid ${path}: 1 problem; 1 track left out, going on with the other 7`);
  });

  test('exits 2 when no track is usable', () => {
    const path = hostile('no-header.csv', (l) => void (l[3] = 'mass,age'));
    const { code, stdout, stderr } = runBin(['track', '--mass', '1', '--grid', path]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)[0]).toContain(`${path}:4: `);
    expect(stderr).toContain('no usable track');
  });
});

describe('starclock grid export', () => {
  const exported = join(dir, 'builtin-0.014.csv');
  beforeAll(() => {
    const { code, stderr } = runBin(['grid', 'export', '--z', '0.014', '-o', exported]);
    expect(code).toBe(0);
    expect(stderr).toContain(`wrote ${exported}`);
  }, 60000);

  test('writes a file that grid check passes, with no temporary file left', () => {
    const { code, stdout } = runBin(['grid', 'check', exported]);
    expect(code).toBe(0);
    expect(stdout).toMatch(/valid starclock-grid v1 file: \d+ tracks, 1 metallicity \(z 0\.014\), initial masses 0\.01–150 Msun/);
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  // Round trip: the file holds the built-in grid's own raw tracks; read back, resampled and
  // built, it must give the built-in grid's answers. Tolerance 1e-12 relative: writeGridFile
  // round-trips age and masses exactly and log L, log Teff to 1.2e-16 dex (see its doc comment).
  // B−V and the magnitudes get 1e-9 mag: the Flower/Torres BC_V polynomial has coefficients
  // of order 1e5 that cancel, which magnifies 1e-16 in log Teff to ~1e-11 mag.
  test.each([
    { mass: '0.3', age: '5Gyr' }, { mass: '1', age: '4.57Gyr' }, { mass: '1', age: '11.5Gyr' }, { mass: '2.5', age: '600Myr' },
    { mass: '5', age: '200Myr' }, { mass: '15', age: '12Myr' }, { mass: '40', age: '1Gyr' }, { mass: '0.05', age: '2Gyr' },
  ])('star --grid (exported z 0.014) equals the built-in grid: --mass $mass --age $age', ({ mass, age }) => {
    const a = JSON.parse(runBin(['star', '--mass', mass, '--age', age, '--json']).stdout);
    const b = JSON.parse(runBin(['star', '--mass', mass, '--age', age, '--json', '--grid', exported]).stdout);
    for (const key of Object.keys(a)) {
      const x = a[key];
      const y = b[key];
      if (typeof x !== 'number' || typeof y !== 'number') expect(y, key).toBe(x);
      else if (key === 'bv' || key === 'mbol' || key === 'mv') expect(Math.abs(y - x), key).toBeLessThanOrEqual(1e-9);
      else expect(Math.abs(y - x), key).toBeLessThanOrEqual(1e-12 * Math.abs(x));
    }
  });

  test('streams to stdout: the same bytes as -o, and --z out of order or repeated is sorted and once', () => {
    const { code, stdout } = runWithInput(['grid', 'export', '--z', '0.014,0.014'], '');
    expect(code).toBe(0);
    expect(stdout).toBe(readFileSync(exported, 'utf8'));
    const two = spawnSync(process.execPath, [BIN, 'grid', 'export', '--z', '0.03,0.0001'], { cwd: ROOT, encoding: 'utf8', maxBuffer: 1 << 28 });
    expect(two.status).toBe(0);
    const out = two.stdout;
    expect(out.split('\n').filter((l) => l.startsWith('# starclock-grid v1'))).toHaveLength(1);
    expect(out.split('\n').filter((l) => l.startsWith('initialMass,'))).toHaveLength(1);
    expect(out.indexOf('\n0.01,0.0001,')).toBeLessThan(out.indexOf('\n0.01,0.03,'));
    const check = runWithInput(['grid', 'check', '-'], out);
    expect(check.code).toBe(0);
    expect(check.stdout).toContain('2 metallicities (z 0.0001, 0.03)');
  }, 60000);

  test.each([
    { name: 'a metallicity not in the grid', args: ['--z', '0.012'], words: ['--z 0.012', 'not a metallicity of the built-in grid', '0.0001, 0.0002', '0.03'] },
    { name: 'a metallicity that is not a number', args: ['--z', '0.014,solar'], words: ['--z', "'solar'"] },
    { name: 'an output in a missing directory', args: ['--z', '0.014', '-o', join(dir, 'nowhere', 'g.csv')], words: ['cannot write', 'nowhere'] },
  ])('bad input: $name (exit 2, one line, nothing written)', ({ args, words }) => {
    const { code, stdout, stderr } = runBin(['grid', 'export', ...args]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    for (const word of words) expect(stderr).toContain(word);
  });
});

// The sample grid holds 8 tracks (0.5–5 Msun, z 0.014), thinned to every second row, against the
// built-in grid's ~40 tracks per dex of mass: its tracks are 0.08–0.22 dex apart (the built-in
// 0.025 dex) and the monotone cubic's error grows with the spacing, so it gets looser tolerances,
// chosen from its measured errors with room (about ×2): on the main sequence |Δlog L| ≤ 0.03 dex
// and |Δlog Teff| ≤ 0.01 dex (measured ≤ 0.012 / 0.002); in core helium burning, whose
// luminosity is set by the core and stays flat, |Δlog L| ≤ 0.15 and |Δlog Teff| ≤ 0.02 dex
// (measured 0.09 / 0.000 at 1.35 Msun); on the red giant branch the luminosity climbs about a
// dex in 3 % of the star's age, so a 0.1 % difference in the interpolated age scale shows as
// ≈ 0.15 dex: |Δlog L| ≤ 0.3, |Δlog Teff| ≤ 0.02 dex (measured 0.16 / 0.006). Stars sit between
// tracks of one EEP layout (1.1 and 1.35 between 1.0, 1.2 and 1.5; 4 between 3 and 5): across a
// layout change (0.8 | 1.0, 1.5 | 2.0) a sparse grid answers with the nearer track alone.
describe('starclock star --grid tracks-demo/sample-grid.csv against the built-in grid', () => {
  const phaseMiddle = (mass: string, phase: string): number => {
    const life = JSON.parse(runBin(['life', '--mass', mass, '--json']).stdout) as { phases: { phase: string; start: { age: number }; end: { age: number } }[] };
    const p = life.phases.find((q) => q.phase === phase)!;
    return (p.start.age + p.end.age) / 2;
  };
  test.each([
    { mass: '1.1', phase: 'main-sequence', dl: 0.03, dt: 0.01 },
    { mass: '1.35', phase: 'main-sequence', dl: 0.03, dt: 0.01 },
    { mass: '4', phase: 'main-sequence', dl: 0.03, dt: 0.01 },
    { mass: '1.35', phase: 'red-giant-branch', dl: 0.3, dt: 0.02 },
    { mass: '1.35', phase: 'core-helium-burning', dl: 0.15, dt: 0.02 },
  ])('$mass Msun in the middle of its $phase: same phase, |Δlog L| ≤ $dl, |Δlog Teff| ≤ $dt dex', ({ mass, phase, dl, dt }) => {
    const age = `${phaseMiddle(mass, phase)}yr`;
    const a = JSON.parse(runBin(['star', '--mass', mass, '--age', age, '--json']).stdout);
    const b = JSON.parse(runBin(['star', '--mass', mass, '--age', age, '--json', '--grid', SAMPLE]).stdout);
    expect(a.phase).toBe(phase);
    expect(b.phase).toBe(phase);
    expect(Math.abs(Math.log10(b.luminosity / a.luminosity))).toBeLessThanOrEqual(dl);
    expect(Math.abs(Math.log10(b.teff / a.teff))).toBeLessThanOrEqual(dt);
  });
});

describe('starclock grid --help', () => {
  test.each([
    { args: ['grid', '--help'], words: ['check', 'export'] },
    { args: ['grid', 'check', '--help'], words: ['<file>', 'standard input', 'FILE:LINE: column COL: message', 'starclock-grid v1', 'gridFileFormat.ts'] },
    { args: ['grid', 'export', '--help'], words: ['-o, --out <file>', '--z <Z[,Z...]>', '0.0001, 0.0002', 'temporary file'] },
  ])('starclock $args', ({ args, words }) => {
    const { code, stdout } = runBin(args);
    expect(code).toBe(0);
    const help = stdout.replace(/\s+/g, ' ');
    for (const word of words) expect(help).toContain(word);
  });
});
