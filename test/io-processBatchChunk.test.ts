import { expect, test } from 'vitest';
import fc from 'fast-check';
import { createGridQuery } from '../lib/interp/gridQuery.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { planBatch, type BatchPlanRequest } from '../lib/io/batchPlan.js';
import { processBatchChunk } from '../lib/io/processBatchChunk.js';
import { STATE_KEYS } from '../lib/model/starState.js';
import { zFromFeh } from '../lib/model/zFromFeh.js';

const query = createGridQuery(loadBuiltinGrid());
const decode = (b: Uint8Array) => new TextDecoder().decode(b);
const plan = (names: string[], more: Partial<BatchPlanRequest> = {}) =>
  planBatch({ input: 'csv', output: 'csv', filter: false, names, defaultZ: 0.014, ...more });

test('processBatchChunk(text) writes each input row as it was, then the state the grid gives for it', () => {
  const p = plan(['name', 'mass', 'age_Gyr', 'feh'], { columns: [...STATE_KEYS] });
  const r = processBatchChunk('"Vesk, A",1,4.6,0\nOrun,5,0.05,-0.5\nTal,30,0.01,0.1\n', p, query);
  const lines = decode(r.out).split('\n');
  expect(lines[0].startsWith('"Vesk, A",1,4.6,0,')).toBe(true);
  expect(r).toMatchObject({ records: 3, read: 3, written: 3, rejects: [] });
  const rows: [number, number, number][] = [[1, 4.6e9, zFromFeh(0)], [5, 5e7, zFromFeh(-0.5)], [30, 1e7, zFromFeh(0.1)]];
  rows.forEach(([m, age, z], i) => {
    const cells = lines[i].split(',').slice(-STATE_KEYS.length);
    const star = query.star(m, age, z) as unknown as Record<string, unknown>;
    STATE_KEYS.forEach((key, c) => {
      const want = star[key];
      if (want === null) expect(cells[c], key).toBe('');
      else if (typeof want === 'string') expect(cells[c], key).toBe(want);
      // columns() uses exp/log where star() uses ** and log10: agreement to 1e-9 (relative, or absolute near 0)
      else expect(Math.abs(Number(cells[c]) - (want as number)), key).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(want as number)));
    });
  });
});

test.each([
  { name: 'a bad number', row: 'a,abc,1', reason: "column 'mass': 'abc' is not a number; expected a birth mass in Msun, 0.01–150 Msun" },
  { name: 'an empty mass', row: 'a,,1', reason: "column 'mass' is empty; expected a birth mass in Msun, 0.01–150 Msun" },
  { name: 'a mass out of range', row: 'a,200,1', reason: "column 'mass': 200 is outside the valid range 0.01–150 Msun" },
  { name: 'an age out of range', row: 'a,1,101', reason: "column 'age_Gyr': '101' Gyr (101000000000 yr) is outside the valid range 0–100 Gyr" },
  { name: 'a negative age', row: 'a,1,-1', reason: "column 'age_Gyr': '-1' Gyr (-1000000000 yr) is outside the valid range 0–100 Gyr" },
  { name: 'a z out of range', row: 'a,1,1,0.5', reason: "column 'z': 0.5 is outside the valid range 0.0001–0.03", z: true },
  { name: 'a wrong field count', row: 'a,1', reason: '2 fields, but the header has 3' },
  { name: 'text after a closing quote', row: 'a,"1"x,4', reason: 'malformed CSV: field 2: text after the closing quote' },
])('processBatchChunk(text) rejects $name with the column, the value and the valid range', ({ row, reason, z }) => {
  const p = plan(z ? ['name', 'mass', 'age_Gyr', 'z'] : ['name', 'mass', 'age_Gyr']);
  const r = processBatchChunk(`ok,1,1${z ? ',0.014' : ''}\n${row}\n`, p, query);
  expect(r.rejects).toEqual([{ row: 2, reason, raw: row }]);
  expect(r.written).toBe(1);
  expect(decode(r.out).split('\n').length).toBe(2);
});

test('processBatchChunk(text) reads ages with their own units when the column has none, and flags bare ones', () => {
  const p = plan(['mass', 'age']);
  const r = processBatchChunk('1,4.6\n1,4.6Gyr\n1,300 Myr\n', p, query);
  expect(r.firstBareAge).toBe(1);
  expect(r.rejects.map((x) => x.row)).toEqual([1]);
  expect(r.rejects[0].reason).toMatch(/'4.6' has no unit, and neither the header nor --age-unit gives one/);
  expect(r.written).toBe(2);
});

test('processBatchChunk(text) counts blank lines as rows but writes nothing for them', () => {
  const r = processBatchChunk('\n1,1\n\r\n\n1,x\n', plan(['mass', 'age_Gyr']), query);
  expect(r).toMatchObject({ records: 5, read: 2, written: 1 });
  expect(r.rejects.map((x) => x.row)).toEqual([5]);
});

test('processBatchChunk(NDJSON) appends the computed keys to each object as written, prefixing clashes per line', () => {
  const p = planBatch({ input: 'ndjson', output: 'ndjson', filter: false, names: ['id', 'mass', 'age'], defaultZ: 0.014, ageUnit: 'Gyr', columns: ['phase', 'mass', 'teff'] });
  const r = processBatchChunk('{"id":"a","mass":1,"age":4.6}\n{ "initialMass": 2, "mass":1, "age":"1Gyr" }\n{}\n[1]\n{"mass":1,"age":2,"teff":1}\n', p, query);
  const lines = decode(r.out).trimEnd().split('\n');
  expect(lines[0].startsWith('{"id":"a","mass":1,"age":4.6,"phase":"main-sequence","sc_mass":')).toBe(true);
  const objects = lines.map((l) => JSON.parse(l));
  expect(objects[1].mass).toBe(1); // the birth mass of the input stays
  expect(objects[1].sc_teff).toBeUndefined();
  expect(objects[2].teff).toBe(1);
  expect(objects[2].sc_teff).toBeGreaterThan(1000);
  expect(r.rejects).toEqual([
    { row: 3, reason: "key 'mass' is missing", raw: '{}' },
    { row: 4, reason: 'not a JSON object', raw: '[1]' },
  ]);
});

test('processBatchChunk(CSV → NDJSON) writes the input fields as strings and computed numbers as numbers, null where a key does not apply', () => {
  const p = plan(['name', 'mass', 'age_Gyr'], { output: 'ndjson', columns: ['phase', 'teff', 'color'] });
  const r = processBatchChunk('"Vo, ""x""",40,1\n', p, query);
  expect(JSON.parse(decode(r.out))).toEqual({ name: 'Vo, "x"', mass: '40', age_Gyr: '1', phase: 'black-hole', teff: 0, color: null });
});

test('processBatchChunk in the line filter writes a rejected row with empty computed fields', () => {
  const p = plan(['mass', 'age'], { filter: true, columns: ['phase', 'teff'] });
  const r = processBatchChunk('1,4.6e9\nx,1\n\n', p, query);
  expect(decode(r.out).split('\n').slice(1)).toEqual(['x,1,,', ',,', '']);
  expect(r.rejects.map((x) => x.row)).toEqual([2, 3]);
});

test('processBatchChunk: a table cut into chunks at any record boundary gives the same bytes and rejects (property)', () => {
  const p = plan(['name', 'mass', 'age_Gyr'], { columns: ['phase', 'mass', 'luminosity', 'spectralType'] });
  const row = fc.oneof(
    fc.tuple(fc.constantFrom('a', '"b, c"', '"d\ne"'), fc.double({ min: 0.05, max: 160, noNaN: true }), fc.double({ min: 0, max: 14, noNaN: true }))
      .map(([n, m, a]) => `${n},${m},${a}`),
    fc.constantFrom('', 'x,abc,1', 'y,1', 'z,"1"x,2'),
  );
  fc.assert(
    fc.property(fc.array(row, { minLength: 1, maxLength: 30 }), fc.array(fc.nat(30)), (rows, cuts) => {
      const whole = processBatchChunk(rows.map((r) => r + '\n').join(''), p, query);
      const points = [...new Set(cuts.map((c) => c % rows.length))].sort((a, b) => a - b);
      let out = '';
      let base = 0;
      const rejects: { row: number; reason: string; raw: string }[] = [];
      let from = 0;
      for (const to of [...points, rows.length]) {
        if (to <= from) continue;
        const r = processBatchChunk(rows.slice(from, to).map((x) => x + '\n').join(''), p, query);
        out += decode(r.out);
        rejects.push(...r.rejects.map((x) => ({ ...x, row: x.row + base })));
        base += r.records;
        from = to;
      }
      expect(out).toBe(decode(whole.out));
      expect(rejects).toEqual(whole.rejects);
    }),
    { numRuns: 100 },
  );
});
