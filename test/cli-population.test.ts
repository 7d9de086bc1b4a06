import { mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runBin, lines, expectStateSchema } from './cli-run.js';
import { POPULATION_COLUMNS } from '../lib/io/populationRows.js';
import { PHASES } from '../lib/model/phases.js';

const dir = mkdtempSync(join(tmpdir(), 'starclock-population-'));
const scenario = (over: Record<string, unknown> = {}) => {
  const file = join(dir, `s${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(file, JSON.stringify({
    name: 'Quill Drift', seed: 5, size: 600, imf: { kind: 'kroupa' },
    starFormation: { kind: 'burst', duration: '5Myr' }, metallicity: { z: 0.01 }, now: '300Myr',
    history: { from: '1Myr', to: '300Myr', steps: 12, spacing: 'log' }, ...over,
  }));
  return file;
};

describe('starclock population SCENARIO', () => {
  test('CSV: the index, birthTime and every schema key per star, one row per star', () => {
    const { code, stdout } = runBin(['population', scenario()]);
    expect(code).toBe(0);
    const rows = lines(stdout);
    expect(rows[0]).toBe(POPULATION_COLUMNS.join(','));
    expect(rows.length).toBe(601);
  });

  test.each(['csv', 'ndjson'])('--format %s: shards 0..n−1 concatenate to the bytes of one run', (format) => {
    const file = scenario();
    const whole = runBin(['population', file, '--format', format]).stdout;
    for (const n of [2, 3, 7]) {
      let joined = '';
      for (let i = 0; i < n; i++) joined += runBin(['population', file, '--format', format, '--shard', `${i}/${n}`]).stdout;
      expect(joined).toBe(whole);
    }
  });

  test('--format json: { name, seed, size, now, stars } with schema states, and -o writes the same', () => {
    const file = scenario();
    const { code, stdout } = runBin(['population', file, '--format', 'json']);
    expect(code).toBe(0);
    const doc = JSON.parse(stdout);
    expect(doc.name).toBe('Quill Drift');
    expect(doc.now).toBe(3e8);
    expect(doc.stars.length).toBe(600);
    for (const s of doc.stars.slice(0, 50)) {
      const { index, birthTime, ...state } = s;
      expect(Number.isInteger(index)).toBe(true);
      expect(birthTime).toBeGreaterThanOrEqual(0);
      expect(birthTime).toBeLessThanOrEqual(5e6);
      expectStateSchema(state);
      expect(state.age).toBeCloseTo(3e8 - birthTime, 3);
    }
    const out = join(dir, 'pop.json');
    expect(runBin(['population', file, '--format', 'json', '-o', out]).code).toBe(0);
    expect(readFileSync(out, 'utf8')).toBe(stdout);
  });

  test('the same scenario and seed give the same stars; another seed gives others', () => {
    const a = runBin(['population', scenario()]).stdout;
    const b = runBin(['population', scenario()]).stdout;
    const c = runBin(['population', scenario({ seed: 6 })]).stdout;
    expect(a).toBe(b);
    expect(c).not.toBe(a);
  });

  test.each([
    ['an unknown key', { colour: 'blue' }, /colour/],
    ['a bad IMF kind', { imf: { kind: 'lumpy' } }, /imf\.kind/],
    ['a bad age', { now: 'soon' }, /now/],
  ])('a scenario with %s exits 2 naming the key path', (_, over, re) => {
    const { code, stderr } = runBin(['population', scenario(over as Record<string, unknown>)]);
    expect(code).toBe(2);
    expect(stderr).toMatch(re);
  });

  test('bad --shard and a missing file exit 2 with one line; -o never overwrites the scenario', () => {
    const file = scenario();
    expect(runBin(['population', file, '--shard', '3/3']).code).toBe(2);
    expect(runBin(['population', file, '--shard', 'x']).stderr).toMatch(/--shard 'x'/);
    expect(runBin(['population', join(dir, 'nope.json')]).code).toBe(2);
    const before = readFileSync(file, 'utf8');
    expect(runBin(['population', file, '-o', file]).code).not.toBe(0);
    expect(readFileSync(file, 'utf8')).toBe(before);
    expect(existsSync(file)).toBe(true);
  });
});

describe('starclock history SCENARIO', () => {
  test('--json: times, counts per phase, remnants, supernovae, luminosity, bv, turnoff', () => {
    const file = scenario();
    const { code, stdout } = runBin(['history', file, '--json']);
    expect(code).toBe(0);
    const h = JSON.parse(stdout);
    expect(h.times.length).toBe(12);
    for (const key of ['supernovae', 'luminosity', 'bv', 'turnoffMass', 'remnantsBorn', 'color']) expect(h[key].length).toBe(12);
    for (const p of PHASES) expect(h.counts[p].length).toBe(12);
    // after the 5 Myr burst every star is born: the counts sum to the size
    const last = h.times.length - 1;
    expect(PHASES.reduce((s, p) => s + h.counts[p][last], 0)).toBe(600);
    // the turnoff falls as the cluster ages
    const t = h.turnoffMass.filter((x: number | null) => x !== null);
    expect(t[t.length - 1]).toBeLessThan(t[0]);
  });

  test('history at "now" agrees with population at "now" star for star (counts per phase)', () => {
    const file = scenario({ history: { from: '200Myr', to: '300Myr', steps: 2, spacing: 'linear' } });
    const h = JSON.parse(runBin(['history', file, '--json']).stdout);
    const pop = JSON.parse(runBin(['population', file, '--format', 'json']).stdout);
    const counts: Record<string, number> = {};
    for (const s of pop.stars) counts[s.phase] = (counts[s.phase] ?? 0) + 1;
    for (const p of PHASES) expect(h.counts[p][1], p).toBe(counts[p] ?? 0);
  });

  test('the table and CSV formats list every time', () => {
    const file = scenario();
    const table = runBin(['history', file]);
    expect(table.code).toBe(0);
    expect(lines(table.stdout).length).toBeGreaterThanOrEqual(12 + 3);
    const csv = lines(runBin(['history', file, '--format', 'csv']).stdout);
    expect(csv.length).toBe(13);
    expect(csv[0].split(',')[0]).toBe('time');
  });
});

describe('starclock population --format parquet', () => {
  test('writes a Parquet file whose rows read back (hyparquet) equal the NDJSON rows', async () => {
    const file = scenario();
    const out = join(dir, 'pop.parquet');
    const run = runBin(['population', file, '--format', 'parquet', '-o', out]);
    expect(run.code).toBe(0);
    const { parquetReadObjects } = await import('hyparquet');
    const buf = readFileSync(out);
    const rows = await parquetReadObjects({ file: buf.buffer.slice(buf.byteOffset, buf.byteOffset + buf.byteLength) });
    const nd = lines(runBin(['population', file, '--format', 'ndjson']).stdout).map((l) => JSON.parse(l));
    expect(rows.length).toBe(nd.length);
    for (let i = 0; i < nd.length; i += 37) {
      for (const key of POPULATION_COLUMNS) expect(rows[i][key], `${i} ${key}`).toEqual(nd[i][key]);
    }
  });

  test('--format parquet without -o exits 2 and says why', () => {
    const { code, stderr } = runBin(['population', scenario(), '--format', 'parquet']);
    expect(code).toBe(2);
    expect(stderr).toMatch(/give -o FILE/);
  });
});
