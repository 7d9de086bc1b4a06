/** One CSV cell before quoting: text, a number, or empty (`null`/`undefined`). */
export type CsvCell = string | number | null | undefined;

/**
 * Writes a table as CSV after RFC 4180 (Shafranovich 2005): comma-separated,
 * a field quoted with `"` when it holds a comma, quote, CR or LF, quotes inside
 * doubled. Numbers are written with `String(x)`, the shortest text that reads back
 * to the same double; `null` and `undefined` are empty fields. Lines end in `\n`
 * (RFC 4180 names CRLF; LF is what Unix tools expect, and every RFC 4180 reader
 * this project ships accepts both).
 *
 * @param header column names
 * @param rows rows of cells, each as long as `header`
 * @throws RangeError if a row's length differs from the header's, or a number is not finite
 * @example formatCsv(['name', 'mass'], [['Vesk A', 1]]) // 'name,mass\nVesk A,1\n'
 */
export function formatCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  let out = header.map(csvField).join(',') + '\n';
  rows.forEach((row, r) => {
    if (row.length !== header.length) {
      throw new RangeError(`CSV row ${r + 1} has ${row.length} cells, expected ${header.length}`);
    }
    out += row
      .map((cell, c) => {
        if (typeof cell === 'number' && !Number.isFinite(cell)) {
          throw new RangeError(`CSV row ${r + 1}, column ${c + 1} (${header[c]}): ${cell} is not a finite number`);
        }
        return csvField(cell);
      })
      .join(',') + '\n';
  });
  return out;
}

function csvField(cell: CsvCell): string {
  if (cell === null || cell === undefined) return '';
  const text = String(cell);
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}
