import { expect, test } from 'vitest';
import fc from 'fast-check';
import { gridFileRecords, type GridFileRecord } from '../lib/tracks/gridFileRecords.js';

const rows = (recs: GridFileRecord[]) => recs.map((r) => (r.kind === 'row' ? [r.line, r.fields, r.error] : [r.line, r.kind]));

test.each([
  { name: 'plain LF rows', text: 'a,b\nc,d\n', want: [[1, ['a', 'b'], null], [2, ['c', 'd'], null]] },
  { name: 'CRLF rows and a BOM', text: '\uFEFFa,b\r\nc,d\r\n', want: [[1, ['a', 'b'], null], [2, ['c', 'd'], null]] },
  { name: 'comments and blank lines, counted as lines', text: '# x\n\na\r\n\r\n# y\nb', want: [[1, 'comment'], [2, 'blank'], [3, ['a'], null], [4, 'blank'], [5, 'comment'], [6, ['b'], null]] },
  { name: 'quoted fields with a comma, a doubled quote and empty quotes', text: '"a,b","say ""hi""",""\n', want: [[1, ['a,b', 'say "hi"', ''], null]] },
  { name: 'a quoted field over two lines, the next row on line 3', text: 'x,"one\ntwo"\r\ny\n', want: [[1, ['x', 'one\ntwo'], null], [3, ['y'], null]] },
  { name: 'empty fields', text: ',,\n', want: [[1, ['', '', ''], null]] },
])('gridFileRecords(text) splits $name', ({ text, want }) => {
  expect(rows(gridFileRecords(text))).toEqual(want);
});

test.each([
  { name: 'an unterminated quote', text: 'a,"b\nc\n', message: /field 2 opens a quote that is never closed/ },
  { name: 'text after a closing quote', text: '"a"b,c\n', message: /field 1 has text after its closing quote/ },
  { name: 'a quote inside an unquoted field', text: 'a,b"c\n', message: /field 2 has a quote inside an unquoted field/ },
])('gridFileRecords(text) flags $name without throwing', ({ text, message }) => {
  const [rec] = gridFileRecords(text);
  expect(rec.kind).toBe('row');
  expect(rec.kind === 'row' && rec.error).toMatch(message);
});

test('gridFileRecords(text) reads back any fields quoted after RFC 4180 (property)', () => {
  const quote = (s: string) => (/[",\r\n]/.test(s) || s.startsWith('#') ? `"${s.replaceAll('"', '""')}"` : s);
  const table = fc.array(fc.array(fc.string({ unit: fc.constantFrom('a', ',', '"', '\n', '\r\n', ' ', '#', 'é') }), { minLength: 2, maxLength: 4 }), { minLength: 1, maxLength: 6 });
  fc.assert(
    fc.property(table, fc.boolean(), (t, crlf) => {
      const text = t.map((r) => r.map(quote).join(',')).join(crlf ? '\r\n' : '\n') + '\n';
      const got = gridFileRecords(text);
      expect(got.map((r) => (r.kind === 'row' ? r.fields : null))).toEqual(t);
      expect(got.every((r) => r.kind === 'row' && r.error === null)).toBe(true);
    }),
    { numRuns: 500 },
  );
});
