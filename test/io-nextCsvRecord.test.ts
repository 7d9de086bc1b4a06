import { expect, test } from 'vitest';
import fc from 'fast-check';
import { emptyCsvRecord, nextCsvRecord } from '../lib/io/nextCsvRecord.js';
import { createRecordCutter } from '../lib/io/csvRecordCutter.js';

// All records of a text, as [fields, raw text, crlf, error].
function records(text: string, lineMode = false): [string[], string, boolean, string | null][] {
  const out: [string[], string, boolean, string | null][] = [];
  const r = emptyCsvRecord();
  let pos = 0;
  while (pos < text.length) {
    const start = pos;
    pos = nextCsvRecord(text, start, lineMode, r);
    out.push([r.fields, text.slice(start, r.rawEnd), r.crlf, r.error]);
  }
  return out;
}

test.each([
  { name: 'plain LF rows', text: 'a,b\nc,d\n', want: [[['a', 'b'], 'a,b', false, null], [['c', 'd'], 'c,d', false, null]] },
  { name: 'CRLF rows, CR kept out of the last field', text: 'a,b\r\nc,d\r\n', want: [[['a', 'b'], 'a,b', true, null], [['c', 'd'], 'c,d', true, null]] },
  { name: 'a last row without a terminator', text: 'a\nb', want: [[['a'], 'a', false, null], [['b'], 'b', false, null]] },
  { name: 'quotes around a comma, a doubled quote and an empty field', text: '"a,b","say ""hi""",""\n', want: [[['a,b', 'say "hi"', ''], '"a,b","say ""hi""",""', false, null]] },
  { name: 'a quoted field over two lines, then CRLF', text: 'x,"one\r\ntwo"\r\ny\n', want: [[['x', 'one\r\ntwo'], 'x,"one\r\ntwo"', true, null], [['y'], 'y', false, null]] },
  { name: 'empty fields and a blank line', text: ',,\n\n', want: [[['', '', ''], ',,', false, null], [[''], '', false, null]] },
  { name: 'non-ASCII text', text: 'Ölgä,"Ře, Ø"\n', want: [[['Ölgä', 'Ře, Ø'], 'Ölgä,"Ře, Ø"', false, null]] },
])('nextCsvRecord(text) reads $name', ({ text, want }) => {
  expect(records(text)).toEqual(want);
});

test.each([
  { name: 'an unterminated quote', text: 'a,"b\nc\n', message: /field 2: a quoted field is not closed before the end of the input/ },
  { name: 'text after a closing quote', text: '"a"b,c\n', message: /field 1: text after the closing quote/ },
  { name: 'a quote inside an unquoted field', text: 'a,b"c\n', message: /field 2: a quote inside an unquoted field/ },
])('nextCsvRecord(text) flags $name without throwing', ({ text, message }) => {
  expect(records(text)[0][3]).toMatch(message);
});

test('nextCsvRecord(text, lineMode) ends every record at a line break, an open quote is an error', () => {
  const got = records('a,"b\nc\n', true);
  expect(got.map((r) => r[1])).toEqual(['a,"b', 'c']);
  expect(got[0][3]).toMatch(/not closed before the end of the line/);
  expect(got[1][3]).toBeNull();
});

const quote = (s: string) => (/[",\r\n]/.test(s) ? `"${s.replaceAll('"', '""')}"` : s);
const cellUnit = fc.constantFrom('a', ',', '"', '\n', '\r\n', ' ', 'é', '1');
const table = fc.array(fc.array(fc.string({ unit: cellUnit, maxLength: 6 }), { minLength: 2, maxLength: 4 }), { minLength: 1, maxLength: 8 });

test('nextCsvRecord reads back any table written after RFC 4180, LF or CRLF (write→parse round trip, property)', () => {
  fc.assert(
    fc.property(table, fc.boolean(), (t, crlf) => {
      const text = t.map((r) => r.map(quote).join(',')).join(crlf ? '\r\n' : '\n') + (crlf ? '\r\n' : '\n');
      const got = records(text);
      expect(got.map((r) => r[0])).toEqual(t);
      expect(got.every((r) => r[3] === null && r[2] === crlf)).toBe(true);
    }),
    { numRuns: 500 },
  );
});

test('createRecordCutter cuts only where nextCsvRecord ends a record, fed in any pieces (property)', () => {
  // arbitrary text, malformed quoting included, fed to the cutter in random pieces
  const text = fc.string({ unit: fc.constantFrom('a', ',', '"', '\n', '\r', 'é'), maxLength: 60 });
  fc.assert(
    fc.property(text, fc.array(fc.nat(60), { maxLength: 5 }), fc.boolean(), (t, splits, lineMode) => {
      const bytes = new TextEncoder().encode(t);
      const ends = new Set<number>();
      const r = emptyCsvRecord();
      let pos = 0;
      while (pos < t.length) {
        pos = nextCsvRecord(t, pos, lineMode, r);
        if (r.rawEnd < pos) ends.add(new TextEncoder().encode(t.slice(0, pos)).length);
      }
      const cutter = createRecordCutter(lineMode);
      const points = [...new Set(splits.map((s) => Math.min(s, bytes.length)))].sort((a, b) => a - b);
      let buffer = new Uint8Array(0);
      let base = 0;
      const cuts: number[] = [];
      for (const p of [...points, bytes.length]) {
        const grown = new Uint8Array(bytes.subarray(base, p));
        const scannedFrom = buffer.length;
        const joined = new Uint8Array(buffer.length + grown.length);
        joined.set(buffer);
        joined.set(grown, buffer.length);
        const last = cutter.scan(joined, scannedFrom);
        buffer = joined;
        base = p;
        if (last > 0) {
          const absolute = base - buffer.length + last;
          if (!cuts.includes(absolute)) cuts.push(absolute);
          buffer = buffer.subarray(last);
          cutter.shift(last);
        }
      }
      for (const c of cuts) expect(ends.has(c), `cut at ${c} of ${JSON.stringify(t)}`).toBe(true);
      // the last record end of the whole text is always found
      const lastEnd = Math.max(0, ...ends);
      if (lastEnd > 0) expect(Math.max(...cuts)).toBe(lastEnd);
    }),
    { numRuns: 1000 },
  );
});
