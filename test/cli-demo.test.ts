import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { STATE_KEYS } from '../lib/model/starState.js';
import { expectStateSchema, lines, ROOT, runBin } from './cli-run.js';

const DEMO_STARS = join(ROOT, 'tracks-demo', 'demo-stars.json');
const scenario = JSON.parse(readFileSync(DEMO_STARS, 'utf8')) as {
  region: string;
  stars: { name: string; initialMass: number; z: number; age: number }[];
};

// the bundled scenarios' file names (their "name" slugified) and every file the demo writes
const SCENARIOS = ['greywake-cluster', 'meridian-field', 'tessel-cluster', 'velkin-nursery'];
const EXPECTED_FILES = [
  'lives.json', 'orvel-catalogue-rejects.csv', 'orvel-catalogue-states.csv', 'present-states.csv',
  ...SCENARIOS.flatMap((s) => [`${s}-history.json`, `${s}-population.csv`, `${s}.html`]),
].sort();

const sha = (path: string): string => createHash('sha256').update(readFileSync(path)).digest('hex');

// Minimal RFC 4180 reader for the test (quoted fields, doubled quotes).
function readCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') { field += '"'; i++; }
      else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') { row.push(field); field = ''; }
    else if (c === '\n') { row.push(field); rows.push(row); row = []; field = ''; }
    else if (c !== '\r') field += c;
  }
  if (field !== '' || row.length > 0) { row.push(field); rows.push(row); }
  return rows;
}

describe('starclock demo', () => {
  const work = mkdtempSync(join(tmpdir(), 'starclock-demo-test-'));
  const out = join(work, 'out');
  const before = sha(DEMO_STARS);
  const run = runBin(['demo', '-o', out]);

  test('exits 0, prints a summary naming every star and says on stderr what it wrote', () => {
    expect(run.code).toBe(0);
    expect(run.stdout).toContain(scenario.region);
    for (const star of scenario.stars) expect(run.stdout).toContain(star.name);
    const said = lines(run.stderr);
    // one line for the named stars, one for the catalogue, one per bundled scenario
    expect(said).toHaveLength(2 + SCENARIOS.length);
    expect(said[0]).toContain('wrote');
    expect(said[0]).toContain(join(out, 'present-states.csv'));
    expect(said[0]).toContain(join(out, 'lives.json'));
    expect(said[1]).toContain(join(out, 'orvel-catalogue-states.csv'));
    for (const slug of SCENARIOS) expect(run.stderr).toContain(`file://${join(out, `${slug}.html`)}`);
  });

  test('runs every bundled scenario end to end: population CSV, history JSON and a viewer page', () => {
    for (const slug of SCENARIOS) {
      const pop = readCsv(readFileSync(join(out, `${slug}-population.csv`), 'utf8'));
      expect(pop[0].slice(0, 3)).toEqual(['index', 'birthTime', 'initialMass']);
      expect(pop.length).toBeGreaterThan(1000);
      const h = JSON.parse(readFileSync(join(out, `${slug}-history.json`), 'utf8'));
      expect(h.times.length).toBeGreaterThan(10);
      expect(Object.keys(h.counts)).toContain('main-sequence');
      const html = readFileSync(join(out, `${slug}.html`), 'utf8');
      expect(html.startsWith('<!doctype html>') || html.startsWith('<!DOCTYPE html>')).toBe(true);
      expect(html).not.toMatch(/<script[^>]+src=["']?https?:/i); // self-contained: nothing fetched
    }
  });

  test('puts the named catalogue through batch: every star computed', () => {
    const rows = readCsv(readFileSync(join(out, 'orvel-catalogue-states.csv'), 'utf8'));
    const input = readCsv(readFileSync(join(ROOT, 'tracks-demo', 'orvel-catalogue.csv'), 'utf8'));
    expect(rows.length).toBe(input.length);
    expect(rows[0].slice(0, input[0].length)).toEqual(input[0]);
    expect(rows[0]).toContain('phase');
  });

  test('writes present-states.csv: name then every schema key, one row per star, values that read back', () => {
    const rows = readCsv(readFileSync(join(out, 'present-states.csv'), 'utf8'));
    expect(rows[0]).toEqual(['name', ...STATE_KEYS]);
    expect(rows).toHaveLength(scenario.stars.length + 1);
    scenario.stars.forEach((star, i) => {
      const row = rows[i + 1];
      expect(row[0]).toBe(star.name);
      const state = Object.fromEntries(
        STATE_KEYS.map((key, c) => {
          const cell = row[c + 1];
          if (cell === '') return [key, null];
          return [key, ['phase', 'spectralType', 'color', 'remnant'].includes(key) ? cell : Number(cell)];
        }),
      );
      expectStateSchema(state);
      expect(state.initialMass).toBe(star.initialMass);
      expect(state.z).toBe(star.z);
      expect(state.age).toBe(star.age);
    });
  });

  test('the scenario spans a brown dwarf, a white-dwarf fate and a neutron-star or black-hole fate', () => {
    const rows = readCsv(readFileSync(join(out, 'present-states.csv'), 'utf8'));
    const remnant = rows[0].indexOf('remnant');
    const fates = rows.slice(1).map((row) => row[remnant]);
    expect(fates).toContain('brown-dwarf');
    expect(fates).toContain('white-dwarf');
    expect(fates.some((f) => f === 'neutron-star' || f === 'black-hole')).toBe(true);
  });

  test('writes lives.json with one life per star', () => {
    const lives = JSON.parse(readFileSync(join(out, 'lives.json'), 'utf8'));
    expect(lives.region).toBe(scenario.region);
    expect(lives.stars.map((s: { name: string }) => s.name)).toEqual(scenario.stars.map((s) => s.name));
    for (const life of lives.stars) expect(life.phases.length).toBeGreaterThan(0);
  });

  test('leaves no temporary files and does not touch its input', () => {
    expect(readdirSync(out).sort()).toEqual(EXPECTED_FILES);
    expect(sha(DEMO_STARS)).toBe(before);
  });

  test('a second run replaces its own outputs with the same content', () => {
    const first = readFileSync(join(out, 'present-states.csv'), 'utf8');
    const again = runBin(['demo', '-o', out]);
    expect(again.code).toBe(0);
    expect(readFileSync(join(out, 'present-states.csv'), 'utf8')).toBe(first);
  });

  test('without -o it writes to ./starclock-demo/', () => {
    const cwd = mkdtempSync(join(tmpdir(), 'starclock-demo-cwd-'));
    const { code } = runBin(['demo'], cwd);
    expect(code).toBe(0);
    expect(readdirSync(join(cwd, 'starclock-demo')).sort()).toEqual(EXPECTED_FILES);
  });

  test('-o naming a file that exists exits 2 with one line and writes nothing', () => {
    const file = join(work, 'not-a-dir');
    writeFileSync(file, 'keep me');
    const { code, stdout, stderr } = runBin(['demo', '-o', file]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    expect(stderr).toContain(file);
    expect(readFileSync(file, 'utf8')).toBe('keep me');
  });
});
