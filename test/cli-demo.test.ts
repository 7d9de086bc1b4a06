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
    expect(said).toHaveLength(1);
    expect(said[0]).toContain('wrote');
    expect(said[0]).toContain(join(out, 'present-states.csv'));
    expect(said[0]).toContain(join(out, 'lives.json'));
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
    expect(readdirSync(out).sort()).toEqual(['lives.json', 'present-states.csv']);
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
    expect(readdirSync(join(cwd, 'starclock-demo')).sort()).toEqual(['lives.json', 'present-states.csv']);
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
