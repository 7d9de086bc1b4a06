import { mkdtempSync, readFileSync, existsSync, writeFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { lines, ROOT, runBin, runMain } from './cli-run.js';
import { parseXml, select, textOf } from './plot-xml.js';

const dir = mkdtempSync(join(tmpdir(), 'starclock-plot-'));
const out = (name: string) => join(dir, name);

describe('starclock plot (spawned)', () => {
  test('plot track --mass 1,2,5 writes a figure with three tracks and says so on stderr', () => {
    const file = out('tracks.svg');
    const { code, stdout, stderr } = runBin(['plot', 'track', '--mass', '1,2,5', '-o', file]);
    expect(code).toBe(0);
    expect(stdout).toBe('');
    expect(stderr).toMatch(/^starclock: wrote .*tracks\.svg \(\d+ KB\)\n$/);
    const root = parseXml(readFileSync(file, 'utf8'));
    expect(select(root, 'path', 'track')).toHaveLength(3);
    expect(textOf(select(root, 'text', 'title')[0])).toBe('Evolutionary tracks of 1, 2 and 5 Msun');
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  test('plot isochrone --age 100Myr,1Gyr -o - writes the SVG to stdout', () => {
    const { code, stdout } = runBin(['plot', 'isochrone', '--age', '100Myr,1Gyr', '--feh', '-0.5', '-o', '-']);
    expect(code).toBe(0);
    const root = parseXml(stdout);
    expect(select(root, 'path', 'isochrone')).toHaveLength(2);
    expect(select(root, 'g', 'legend-entry').map(textOf)[0]).toMatch(/^100 Myr[\d.]+ Msun$/);
    expect(textOf(select(root, 'text', 'subtitle')[0])).toContain('[Fe/H] \u22120.50');
  });

  test('plot hr SCENARIO draws the scenario at its "now", with a per-phase legend', () => {
    const file = out('greywake.svg');
    const { code } = runBin(['plot', 'hr', join(ROOT, 'tracks-demo/scenarios/greywake-cluster.json'), '-o', file]);
    expect(code).toBe(0);
    const root = parseXml(readFileSync(file, 'utf8'));
    expect(textOf(select(root, 'text', 'title')[0])).toBe('Greywake Cluster at 12 Gyr');
    expect(select(root, 'g', 'legend-entry').map(textOf)).toContainEqual(expect.stringMatching(/^white-dwarf[\d,]+$/));
    expect(select(select(root, 'g', 'stars')[0], 'circle').length).toBeGreaterThan(100);
  });

  test('plot hr TABLE --age shows every star at that age; --title sets the title (escaped)', () => {
    const file = out('catalogue.svg');
    const title = `<script>&"'`;
    const { code } = runBin(['plot', 'hr', join(ROOT, 'tracks-demo/orvel-catalogue.csv'), '--age', '1Gyr', '--title', title, '-o', file]);
    expect(code).toBe(0);
    const text = readFileSync(file, 'utf8');
    expect(text).not.toContain('<script>');
    expect(textOf(select(parseXml(text), 'text', 'title')[0])).toBe(title);
  });
});

describe('starclock plot: bad input exits 2 with one stderr line naming the option and range', () => {
  test.each([
    { name: 'mass out of range', args: ['plot', 'track', '--mass', '1,200', '-o', 'x.svg'], message: /--mass 200 is outside the valid range 0\.01–150 Msun/ },
    { name: 'mass not a number', args: ['plot', 'track', '--mass', '1,heavy', '-o', 'x.svg'], message: /--mass 'heavy' is not a number; valid range 0\.01–150 Msun/ },
    { name: 'too many masses', args: ['plot', 'track', '--mass', '1,2,3,4,5,6,7,8,9,10,11,12,13', '-o', 'x.svg'], message: /--mass gives 13 masses; valid range 1–12/ },
    { name: 'z out of range', args: ['plot', 'track', '--mass', '1', '--z', '0.5', '-o', 'x.svg'], message: /--z 0\.5 is outside the valid range 0\.0001–0\.03/ },
    { name: 'age out of range', args: ['plot', 'isochrone', '--age', '1Gyr,200Gyr', '-o', 'x.svg'], message: /--age 200Gyr is outside the valid range \(0, 100 Gyr\]/ },
    { name: 'min mass above max', args: ['plot', 'isochrone', '--age', '1Gyr', '--min-mass', '5', '--max-mass', '2', '-o', 'x.svg'], message: /--min-mass 5 must be below --max-mass 2 Msun/ },
    { name: 'no output', args: ['plot', 'track', '--mass', '1'], message: /-o, --output <file>/ },
    { name: '--at not a time', args: ['plot', 'hr', 'tracks-demo/scenarios/greywake-cluster.json', '--at', 'soon', '-o', 'x.svg'], message: /--at 'soon' is not a time.*valid range \(0, 100 Gyr\]/ },
    { name: 'output directory missing', args: ['plot', 'track', '--mass', '1', '-o', '/nonexistent-starclock-dir/x.svg'], message: /-o \/nonexistent-starclock-dir\/x\.svg: its directory does not exist/ },
    { name: 'missing input', args: ['plot', 'hr', 'no-such.csv', '-o', 'x.svg'], message: /cannot read INPUT no-such\.csv: no such file/ },
  ])('$name', ({ args, message }) => {
    const { code, stdout, stderr } = runBin(args);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    expect(stderr).toMatch(message);
    expect(existsSync(join(ROOT, 'x.svg'))).toBe(false);
  });

  test('refuses to overwrite its input table, which stays as it was', async () => {
    const table = out('stars.csv');
    writeFileSync(table, 'initialMass,age_Gyr\n1,4.6\n');
    const { code, stderr } = await runMain(['plot', 'hr', table, '-o', table]);
    expect(code).toBe(2);
    expect(stderr).toMatch(/-o .*stars\.csv is an input file of this run/);
    expect(readFileSync(table, 'utf8')).toBe('initialMass,age_Gyr\n1,4.6\n');
  });

  test('a bad table row names file, line, column, value and range', async () => {
    const table = out('bad.csv');
    writeFileSync(table, 'initialMass,age_Gyr\n1,4.6\n1,-3\n');
    const { code, stderr } = await runMain(['plot', 'hr', table, '-o', out('bad.svg')]);
    expect(code).toBe(2);
    expect(lines(stderr)).toHaveLength(1);
    expect(stderr).toMatch(/bad\.csv:3: column age_Gyr: '-3' is not in the valid range \(0, 100\] Gyr/);
    expect(existsSync(out('bad.svg'))).toBe(false);
  });

  test('--age on a scenario and --at on a table are refused with the reason', async () => {
    const a = await runMain(['plot', 'hr', join(ROOT, 'tracks-demo/scenarios/greywake-cluster.json'), '--age', '1Gyr', '-o', out('a.svg')]);
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/--age is for tables; a scenario is shown at --at T/);
    const b = await runMain(['plot', 'hr', join(ROOT, 'tracks-demo/orvel-catalogue.csv'), '--at', '1Gyr', '-o', out('b.svg')]);
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/--at is for scenarios/);
  });

  test('help of each plot subcommand names its options', async () => {
    for (const [sub, option] of [['track', '--mass'], ['isochrone', '--age'], ['hr', '--at']]) {
      const { code, stdout } = await runMain(['plot', sub, '--help']);
      expect(code).toBe(0);
      expect(stdout).toContain(option);
      expect(stdout).toContain('-o, --output <file>');
    }
  });
});
