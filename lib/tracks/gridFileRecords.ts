/** One line (or quoted multi-line record) of a grid file, as `gridFileRecords` splits it. */
export type GridFileRecord =
  | { kind: 'comment'; line: number; text: string }
  | { kind: 'blank'; line: number }
  | { kind: 'row'; line: number; fields: string[]; error: string | null };

/**
 * Splits the text of a grid file into records after RFC 4180 (Shafranovich 2005): fields
 * separated by `,`, records by LF or CRLF, a field in `"…"` may hold commas, line breaks and
 * `""` for a quote. A line that starts with `#` is a comment and an empty line is blank
 * (neither is split). A leading UTF-8 byte-order mark is dropped. Malformed quoting (an
 * unterminated quote, text after a closing quote, a quote inside an unquoted field) does not
 * throw: the record carries an `error` message and its fields as far as they could be read.
 * Lines without a quote take a fast path (`split`).
 *
 * @param text the whole file
 * @returns records in file order, each with the 1-based line it starts on
 * @example gridFileRecords('# c\r\n1,"a,b"\n').map((r) => r.kind) // ['comment', 'row']
 */
export function gridFileRecords(text: string): GridFileRecord[] {
  const out: GridFileRecord[] = [];
  const n = text.length;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  let line = 1;
  while (i < n) {
    const nl = text.indexOf('\n', i);
    const stop = nl < 0 ? n : nl;
    const lineEnd = stop > i && text.charCodeAt(stop - 1) === 13 ? stop - 1 : stop;
    if (text.charCodeAt(i) === 35 /* # */) {
      out.push({ kind: 'comment', line, text: text.slice(i, lineEnd) });
    } else if (lineEnd === i) {
      out.push({ kind: 'blank', line });
    } else {
      const plain = text.slice(i, lineEnd);
      if (plain.indexOf('"') < 0) {
        out.push({ kind: 'row', line, fields: plain.split(','), error: null });
      } else {
        const rec = quotedRecord(text, i, line);
        out.push({ kind: 'row', line, fields: rec.fields, error: rec.error });
        i = rec.next;
        line = rec.nextLine;
        continue;
      }
    }
    i = stop + 1;
    line += 1;
  }
  return out;
}

/** Reads one record that contains quotes, from `start`; returns where the next record begins. */
function quotedRecord(text: string, start: number, line: number): { fields: string[]; error: string | null; next: number; nextLine: number } {
  const n = text.length;
  const fields: string[] = [];
  let error: string | null = null;
  let j = start;
  let curLine = line;
  for (;;) {
    let field = '';
    if (text.charCodeAt(j) === 34 /* " */) {
      j += 1;
      for (;;) {
        const q = text.indexOf('"', j);
        if (q < 0) {
          const rest = text.slice(j);
          field += rest;
          curLine += countNewlines(rest);
          error ??= `field ${fields.length + 1} opens a quote that is never closed (RFC 4180: a quoted field ends with ")`;
          j = n;
          break;
        }
        const piece = text.slice(j, q);
        field += piece;
        curLine += countNewlines(piece);
        if (text.charCodeAt(q + 1) === 34) {
          field += '"';
          j = q + 2;
        } else {
          j = q + 1;
          break;
        }
      }
      // after the closing quote: a separator, a line end or the end of the text
      const c = text.charCodeAt(j);
      if (j < n && c !== 44 && c !== 10 && !(c === 13 && text.charCodeAt(j + 1) === 10)) {
        error ??= `field ${fields.length + 1} has text after its closing quote (RFC 4180: write "" for a quote inside a quoted field)`;
        while (j < n && text.charCodeAt(j) !== 44 && text.charCodeAt(j) !== 10) field += text[j++];
        if (field.endsWith('\r') && text.charCodeAt(j) === 10) field = field.slice(0, -1);
      }
    } else {
      while (j < n) {
        const c = text.charCodeAt(j);
        if (c === 44 || c === 10 || (c === 13 && text.charCodeAt(j + 1) === 10)) break;
        if (c === 34) error ??= `field ${fields.length + 1} has a quote inside an unquoted field (RFC 4180: quote the whole field and write "" for the quote)`;
        field += text[j++];
      }
    }
    fields.push(field);
    if (j >= n) return { fields, error, next: n, nextLine: curLine + 1 };
    const c = text.charCodeAt(j);
    if (c === 44) {
      j += 1;
      continue;
    }
    j += c === 13 ? 2 : 1;
    return { fields, error, next: j, nextLine: curLine + 1 };
  }
}

function countNewlines(s: string): number {
  let k = 0;
  for (let p = s.indexOf('\n'); p >= 0; p = s.indexOf('\n', p + 1)) k++;
  return k;
}
