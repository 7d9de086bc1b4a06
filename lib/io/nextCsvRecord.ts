/** One record as `nextCsvRecord` reads it; the caller owns and reuses the object. */
export interface CsvRecord {
  /** field values, quotes removed and `""` undone */
  fields: string[];
  /** the record's text is `text.slice(start, rawEnd)`: its terminator (LF or CRLF) excluded */
  rawEnd: number;
  /** true if the record ended in CRLF */
  crlf: boolean;
  /** what is wrong with the quoting, or null; the fields are then as far as they could be read */
  error: string | null;
}

/** A fresh record holder for {@link nextCsvRecord}. */
export const emptyCsvRecord = (): CsvRecord => ({ fields: [], rawEnd: 0, crlf: false, error: null });

/**
 * Reads the record that starts at `start` in `text`, after RFC 4180 (Shafranovich 2005):
 * fields separated by `,`, records ended by LF or CRLF (or the end of the text), a field
 * that starts with `"` is quoted and may hold commas, line breaks and `""` for a quote.
 * Malformed quoting does not throw: an unterminated quote, text after a closing quote or a
 * quote inside an unquoted field sets `error` and the record ends where the machine of
 * createRecordCutter says it ends, so both agree. In `lineMode` a line break always ends the
 * record (a quoted field still open there is an error). Lines without `"` take a fast path
 * (`split`).
 *
 * @param text the text holding whole records
 * @param start offset of the record's first character (< text.length)
 * @param lineMode true: every LF ends a record
 * @param out the record holder, overwritten
 * @returns the offset just after the record's terminator
 * @example
 * const r = emptyCsvRecord();
 * nextCsvRecord('a,"b,c"\r\nd', 0, false, r) // 9; r.fields = ['a', 'b,c'], r.rawEnd = 7, r.crlf = true
 */
export function nextCsvRecord(text: string, start: number, lineMode: boolean, out: CsvRecord): number {
  const n = text.length;
  const nl = text.indexOf('\n', start);
  const lineEnd = nl < 0 ? n : nl;
  const next = nl < 0 ? n : nl + 1;
  const crlf = nl >= 0 && lineEnd > start && text.charCodeAt(lineEnd - 1) === 13;
  const plainEnd = crlf ? lineEnd - 1 : lineEnd;
  const line = text.slice(start, plainEnd);
  if (line.indexOf('"') < 0) {
    const rawEnd = plainEnd;
    out.fields = line.split(',');
    out.rawEnd = rawEnd;
    out.crlf = crlf;
    out.error = null;
    return next;
  }
  const fields: string[] = [];
  let error: string | null = null;
  let i = start;
  for (;;) {
    // at the start of a field
    if (text.charCodeAt(i) === 34 /* " */) {
      let value = '';
      let from = i + 1;
      let closed = false;
      for (;;) {
        const close = text.indexOf('"', from);
        const limit = lineMode ? text.indexOf('\n', from) : -1;
        if (close < 0 || (limit >= 0 && limit < close)) {
          const stop = limit >= 0 ? limit : n;
          value += text.slice(from, stop);
          i = stop;
          error ??= lineMode ? `field ${fields.length + 1}: a quoted field is not closed before the end of the line` : `field ${fields.length + 1}: a quoted field is not closed before the end of the input`;
          break;
        }
        value += text.slice(from, close);
        if (text.charCodeAt(close + 1) === 34) {
          value += '"';
          from = close + 2;
          continue;
        }
        i = close + 1;
        closed = true;
        break;
      }
      if (closed) {
        // after the closing quote: a comma, the end of the record, or (malformed) more text
        const c = text.charCodeAt(i);
        if (!(i >= n || c === 44 || c === 10 || (c === 13 && text.charCodeAt(i + 1) === 10))) {
          error ??= `field ${fields.length + 1}: text after the closing quote`;
          let j = i;
          while (j < n) {
            const d = text.charCodeAt(j);
            if (d === 44 || d === 10) break;
            j++;
          }
          value += text.slice(i, j);
          i = j;
        }
      }
      fields.push(value);
    } else {
      let j = i;
      while (j < n) {
        const d = text.charCodeAt(j);
        if (d === 44 || d === 10) break;
        if (d === 34) error ??= `field ${fields.length + 1}: a quote inside an unquoted field (quote the whole field and double the quote)`;
        j++;
      }
      fields.push(text.slice(i, j));
      i = j;
    }
    // i is at a comma, LF, CR before LF, or the end
    const c = i < n ? text.charCodeAt(i) : -1;
    if (c === 44) {
      i++;
      continue;
    }
    let rawEnd = i;
    let isCrlf = false;
    if (c === 13) {
      i++;
      isCrlf = true;
    }
    if (i < n && text.charCodeAt(i) === 10) i++;
    // an unquoted last field keeps a CR before the LF: drop it from that field and the raw text
    if (!isCrlf && rawEnd > start && text.charCodeAt(rawEnd - 1) === 13 && text.charCodeAt(rawEnd) === 10) {
      isCrlf = true;
      rawEnd--;
      const last = fields.length - 1;
      fields[last] = fields[last].slice(0, -1);
    }
    out.fields = fields;
    out.rawEnd = rawEnd;
    out.crlf = isCrlf;
    out.error = error;
    return i;
  }
}
