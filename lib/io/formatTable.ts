/** Horizontal alignment of a table column. */
export type Align = 'left' | 'right';

/**
 * Lays out rows of text as a plain-text table: one header line, a rule of
 * dashes, then the rows, columns separated by two blanks and padded to the widest
 * cell; trailing blanks are removed from every line. Widths count code points, so
 * `→` and `—` take one column.
 *
 * @param header column titles
 * @param rows cells as text, each row as long as `header`
 * @param align per column; default left for the first column, right for the rest
 * @returns the table, lines ending in `\n`
 * @throws RangeError if a row's length differs from the header's
 * @example formatTable(['key', 'value'], [['teff', '5772']]) // 'key   value\n----  -----\nteff   5772\n'
 */
export function formatTable(header: readonly string[], rows: readonly (readonly string[])[], align?: readonly Align[]): string {
  const columns = header.length;
  const widths = header.map(width);
  rows.forEach((row, r) => {
    if (row.length !== columns) {
      throw new RangeError(`table row ${r + 1} has ${row.length} cells, expected ${columns}`);
    }
    for (let c = 0; c < columns; c++) widths[c] = Math.max(widths[c], width(row[c]));
  });
  const aligns = header.map((_, c) => align?.[c] ?? (c === 0 ? 'left' : 'right'));
  const line = (cells: readonly string[]): string =>
    cells
      .map((cell, c) => (aligns[c] === 'left' ? padEnd(cell, widths[c]) : padStart(cell, widths[c])))
      .join('  ')
      .trimEnd() + '\n';
  let out = line(header);
  out += widths.map((w) => '-'.repeat(w)).join('  ') + '\n';
  for (const row of rows) out += line(row);
  return out;
}

function width(text: string): number {
  return [...text].length;
}
function padEnd(text: string, w: number): string {
  return text + ' '.repeat(w - width(text));
}
function padStart(text: string, w: number): string {
  return ' '.repeat(w - width(text)) + text;
}
