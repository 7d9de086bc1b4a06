import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, expect, test } from 'vitest';
import fc from 'fast-check';
import { BIN, ROOT, runMain } from './cli-run.js';

const dir = mkdtempSync(join(tmpdir(), 'starclock-batch-test-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
let n = 0;
const file = (name: string, text: string | Buffer): string => {
  const sub = join(dir, String(n++));
  mkdirSync(sub);
  const path = join(sub, name);
  writeFileSync(path, text);
  return path;
};

/** Spawns the real binary with `input` on stdin. */
function run(args: string[], input = ''): { code: number; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [BIN, 'batch', ...args], { input, encoding: 'utf8', timeout: 60000, cwd: dir });
  if (r.error) throw r.error;
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

const TABLE = 'name,mass,age_Gyr\r\nVesk A,1,4.57\r\n"Orun, the ""old""",0.8,12\r\n"Tal\r\nB",40,0.5\r\n';

test('batch IN -o OUT passes every input column through, appends the state, exit 0 and a summary on stderr', () => {
  const input = file('stars.csv', '\uFEFF' + TABLE);
  const out = join(dir, 'states-1.csv');
  const r = run([input, '-o', out]);
  expect(r.code).toBe(0);
  expect(r.stdout).toBe('');
  expect(r.stderr).toMatch(/^starclock: batch: 3 rows read, 3 written, 0 rejected in [\d.]+ s \(\d+ rows\/s\)\n$/);
  const text = readFileSync(out, 'utf8');
  // BOM, CRLF and the quoting of the input are kept; the input's mass column makes the computed one sc_mass
  expect(text.startsWith('\uFEFFname,mass,age_Gyr,phase,sc_mass,coreMass,luminosity,teff,radius,logg,spectralType,bv,mbol,mv,color,msLifetime,remnant,remnantMass\r\n')).toBe(true);
  const rows = text.split('\r\n');
  expect(rows[1]).toMatch(/^Vesk A,1,4.57,main-sequence,(?:0\.99\d*|1(?:\.00\d*)?),0,[\d.]+,57\d\d[\d.]*,[\d.]+,4.4\d+,G\dV,/);
  expect(rows[2].startsWith('"Orun, the ""old""",0.8,12,main-sequence,')).toBe(true);
  expect(rows[3]).toBe('"Tal');
  expect(rows[4]).toMatch(/^B",40,0.5,black-hole,[\d.]+,[\d.]+,0,0,[\d.e-]+,[\d.]+,,,,,,[\d.]+,black-hole,[\d.]+$/);
  expect(readFileSync(`${out}.rejects.csv`, 'utf8')).toBe('\uFEFFrow,reason,name,mass,age_Gyr\r\n');
});

test('batch writes rejects with their row numbers (header = row 1, a quoted line break inside one row) and reasons, exit 3', () => {
  const input = file('mixed.csv', 'name,mass,age (Myr),z\n"Two\nlines",1,100,0.014\nBad,abc,100,0.014\n\nOld,1,200000,0.014\nRich,1,100,0.5\nShort,1\nGood,2,10,0.01\n');
  const out = join(dir, 'mixed-out.csv');
  const r = run([input, '-o', out]);
  expect(r.code).toBe(3);
  expect(r.stderr).toContain(`starclock: batch: 6 rows read, 2 written, 4 rejected (in ${out}.rejects.csv)`);
  expect(r.stderr).toContain('starclock: 4 rows of 6 rejected');
  expect(readFileSync(out, 'utf8').split('\n').filter((l) => l !== '').length).toBe(4); // header, two lines of one row, Good
  expect(readFileSync(`${out}.rejects.csv`, 'utf8')).toBe(
    'row,reason,name,mass,age (Myr),z\n' +
      `3,"column 'mass': 'abc' is not a number; expected a birth mass in Msun, 0.01–150 Msun",Bad,abc,100,0.014\n` +
      `5,column 'age (Myr)': '200000' Myr (200000000000 yr) is outside the valid range 0–100 Gyr,Old,1,200000,0.014\n` +
      `6,column 'z': 0.5 is outside the valid range 0.0001–0.03,Rich,1,100,0.5\n` +
      '7,"2 fields, but the header has 4",Short,1\n',
  );
});

test.each([
  { name: 'no mass column', text: 'name,age_Gyr\na,1\n', args: [], message: /the header has no birth-mass column/ },
  { name: 'a bare age column', text: 'mass,age\n1,4.6\n', args: [], message: /column 'age' has no unit \(row 2: 1,4.6\); give --age-unit/ },
  { name: 'an empty input', text: '', args: [], message: /is empty: a CSV table needs a header line/ },
  { name: 'an unknown option', text: 'mass,age_Gyr\n1,1\n', args: ['--frobnicate'], message: /unknown option '--frobnicate'/ },
  { name: 'a bad --workers', text: 'mass,age_Gyr\n1,1\n', args: ['--workers', '0'], message: /--workers '0' is not a whole number from 1 to 64/ },
])('batch exits 2 with one clear line for $name, and writes no output', ({ text, args, message }) => {
  const input = file('t.csv', text);
  const out = join(dir, `none-${n}.csv`);
  const r = run([input, '-o', out, ...args]);
  expect(r.code).toBe(2);
  expect(r.stderr).toMatch(message);
  expect(existsSync(out)).toBe(false);
  expect(existsSync(`${out}.rejects.csv`)).toBe(false);
  expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
});

test('batch - reads standard input and writes standard output; rejects go to stderr lines', () => {
  const r = run(['-', '--columns', 'phase,teff'], 'mass,age_Gyr\n1,4.6\n0.001,1\n');
  expect(r.code).toBe(3);
  expect(r.stdout).toMatch(/^mass,age_Gyr,phase,teff\n1,4.6,main-sequence,57\d\d[\d.]*\n$/);
  expect(r.stderr).toContain("starclock: row 3: column 'mass': 0.001 is outside the valid range 0.01–150 Msun");
});

test('batch --columns picks the computed columns, in the order given; initialMass, z and age as used', () => {
  const r = run(['-', '--columns', 'teff,age,z,initialMass', '--z', '0.002'], 'initialMass,age_Myr\n1,100\n');
  expect(r.code).toBe(0);
  const [header, row] = r.stdout.trimEnd().split('\n');
  expect(header).toBe('initialMass,age_Myr,teff,age,z,sc_initialMass');
  expect(row).toMatch(/^1,100,\d+[\d.]*,100000000,0.002,1$/);
});

test('batch reads NDJSON (detected by content) and writes NDJSON, input text kept', () => {
  const r = run(['-', '--columns', 'phase,mass', '--age-unit', 'Gyr'], '{"id": 7, "mass": 1, "age": 4.6}\n{"id":8,"mass":2,"age":"1Gyr"}\n');
  expect(r.code).toBe(0);
  const lines = r.stdout.trimEnd().split('\n');
  expect(lines[0]).toMatch(/^\{"id": 7, "mass": 1, "age": 4.6,"phase":"main-sequence","sc_mass":[\d.]+\}$/);
  expect(JSON.parse(lines[1])).toMatchObject({ id: 8, mass: 2, age: '1Gyr', phase: 'main-sequence' });
});

test('batch writes NDJSON from CSV for an .ndjson output', () => {
  const input = file('s.csv', 'name,mass,age_Gyr\nVo,1,1\n');
  const out = join(dir, 'o.ndjson');
  expect(run([input, '-o', out, '--columns', 'phase']).code).toBe(0);
  expect(JSON.parse(readFileSync(out, 'utf8'))).toEqual({ name: 'Vo', mass: '1', age_Gyr: '1', phase: 'main-sequence' });
});

test('batch --workers 2 writes the same bytes as one thread, rejects included', () => {
  const rows: string[] = ['name,mass,age_Gyr'];
  for (let i = 0; i < 120000; i++) rows.push(`s${i},${(0.1 * 1000 ** ((i * 0.618034) % 1)).toPrecision(4)},${i % 1000 === 7 ? 'x' : ((i * 0.414) % 13.8).toFixed(3)}`);
  const input = file('big.csv', rows.join('\n') + '\n');
  const one = join(dir, 'one.csv');
  const two = join(dir, 'two.csv');
  const a = run([input, '-o', one]);
  const b = run([input, '-o', two, '--workers', '2']);
  expect(a.code).toBe(3);
  expect(b.code).toBe(3);
  expect(readFileSync(two).equals(readFileSync(one))).toBe(true);
  expect(readFileSync(`${two}.rejects.csv`).equals(readFileSync(`${one}.rejects.csv`))).toBe(true);
  expect(readFileSync(`${one}.rejects.csv`, 'utf8').split('\n').length - 2).toBe(120);
}, 120000);

test('batch --grid FILE interpolates in a user grid and checks rows against its ranges', () => {
  const grid = join(ROOT, 'tracks-demo', 'sample-grid.csv');
  const r = run(['-', '--grid', grid, '--columns', 'phase'], 'mass,age_Gyr,z\n1,4.6,0.014\n1,4.6,0.02\n');
  expect(r.code).toBe(3);
  expect(r.stdout).toBe('mass,age_Gyr,z,phase\n1,4.6,0.014,main-sequence\n');
  expect(r.stderr).toMatch(/row 3: column 'z': 0.02 is outside the valid range/);
});

test('batch reads the demo catalogue (initialMass, age_Gyr, z) with every row computed', () => {
  const r = run([join(ROOT, 'tracks-demo', 'orvel-catalogue.csv'), '--columns', 'phase,spectralType']);
  expect(r.code).toBe(0);
  const lines = r.stdout.trimEnd().split('\n');
  expect(lines[0]).toBe('name,initialMass,age_Gyr,z,note,phase,spectralType');
  expect(lines.length).toBeGreaterThan(10);
});

test('batch refuses to write over its input, also through a symbolic link, and leaves it unchanged', () => {
  const input = file('keep.csv', 'mass,age_Gyr\n1,1\n');
  const link = join(dir, `link-${n}.csv`);
  symlinkSync(input, link);
  for (const out of [input, link]) {
    const r = run([input, '-o', out]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/refusing to write .*: it is the input file/);
  }
  expect(readFileSync(input, 'utf8')).toBe('mass,age_Gyr\n1,1\n');
});

test('batch that fails at the end leaves no partial output and no temporary file; an existing OUT stays as it was', () => {
  const input = file('s.csv', 'mass,age_Gyr\n1,1\n');
  const sub = join(dir, `fail-${n}`);
  mkdirSync(sub);
  // the output names a folder: the rename at the end fails
  const out = join(sub, 'out');
  mkdirSync(out);
  const r = run([input, '-o', out]);
  expect(r.code).toBe(1);
  expect(readdirSync(sub)).toEqual(['out']);
  // an existing output file is kept when a run fails on bad input
  const existing = join(sub, 'existing.csv');
  writeFileSync(existing, 'old\n');
  const bad = file('bad.csv', 'mass,age\n1,4.6\n');
  expect(run([bad, '-o', existing]).code).toBe(2);
  expect(readFileSync(existing, 'utf8')).toBe('old\n');
  expect(readdirSync(sub).sort()).toEqual(['existing.csv', 'out']);
});

test('batch line filter (--columns-in): no header in or out, one line out per line in, rejects on stderr, exit 0', () => {
  const r = run(['-', '--columns-in', 'id,mass,age', '--columns', 'phase,remnant'], 'a,1,4.6e9\nb,zz,1\n\nc,0.5,1e9\n');
  expect(r.code).toBe(0);
  expect(r.stdout).toBe('a,1,4.6e9,main-sequence,white-dwarf\nb,zz,1,,\n,,\nc,0.5,1e9,main-sequence,white-dwarf\n');
  expect(r.stderr).toContain("starclock: row 2: column 'mass': 'zz' is not a number");
  expect(r.stderr).toContain('starclock: row 3: 1 field, but --columns-in names 3');
});

test('batch line filter: splitting the input at any line and joining the outputs gives the same bytes (property)', () => {
  const line = fc.oneof(
    fc.tuple(fc.double({ min: 0.05, max: 150, noNaN: true }), fc.double({ min: 0, max: 1.4e10, noNaN: true }), fc.double({ min: 1e-4, max: 0.03, noNaN: true }))
      .map(([m, a, z]) => `${m},${a},${z}`),
    fc.constantFrom('1,x,0.01', '', '1,1e9', '"1",1e9,0.02'),
  );
  const args = ['-', '--columns-in', 'mass,age,z', '--columns', 'phase,teff,luminosity,spectralType,color'];
  fc.assert(
    fc.property(fc.array(line, { minLength: 1, maxLength: 12 }), fc.nat(12), (lines, cut) => {
      const k = cut % (lines.length + 1);
      const text = (ls: string[]) => (ls.length === 0 ? '' : ls.join('\n') + '\n');
      const whole = run(args, text(lines));
      const head = run(args, text(lines.slice(0, k)));
      const tail = run(args, text(lines.slice(k)));
      expect(whole.code).toBe(0);
      expect(head.stdout + tail.stdout).toBe(whole.stdout);
      expect(whole.stdout.split('\n').length - 1).toBe(lines.length);
    }),
    { numRuns: 8 },
  );
}, 120000);

test('batch --help names the exit codes, the unit forms and the line filter', async () => {
  const r = await runMain(['batch', '--help']);
  expect(r.code).toBe(0);
  expect(r.stdout).toContain('age_Gyr, age/Gyr');
  expect(r.stdout).toContain('3 some rows rejected');
  expect(r.stdout).toContain('--columns-in');
});
