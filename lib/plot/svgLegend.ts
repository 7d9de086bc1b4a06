import { escapeXml } from './escapeXml.js';
import { svgNumber as n } from './svgNumber.js';

/** One row of a legend: a swatch (SVG markup drawn in a 24 × 12 px box at the origin) and its text. */
export interface LegendRow {
  /** markup of the swatch, or '' for none */
  swatch: string;
  label: string;
  /** right-aligned figure after the label (e.g. a count), or undefined */
  value?: string;
  /** `legend-entry` (one per series or class counted) or `legend-key` (how to read marks) */
  kind?: 'legend-entry' | 'legend-key' | 'legend-note';
}

/** Line height of legend rows, px. */
export const LEGEND_ROW = 18;

/**
 * A legend block at (x, y) (the top-left corner): an optional heading, then one row per entry,
 * `LEGEND_ROW` px apart. Each row is one `<g class="legend-entry|legend-key|legend-note">`
 * holding its swatch and its `<text>`; all text is XML-escaped.
 *
 * @param rows the rows, top to bottom; a row with label '' is a gap
 * @param x left edge, px
 * @param y top edge, px
 * @param width the legend's width, px (values are right-aligned to it)
 * @param heading bold first line, or '' for none
 */
export function svgLegend(rows: readonly LegendRow[], x: number, y: number, width: number, heading = ''): string {
  const out: string[] = [`<g class="legend" font-size="12" fill="#222222">`];
  let cy = y;
  if (heading !== '') {
    out.push(`<text class="legend-heading" x="${n(x)}" y="${n(cy + 12)}" font-weight="bold">${escapeXml(heading)}</text>`);
    cy += LEGEND_ROW + 2;
  }
  for (const row of rows) {
    if (row.label === '' && row.swatch === '') {
      cy += LEGEND_ROW / 2;
      continue;
    }
    const kind = row.kind ?? 'legend-entry';
    const textX = row.swatch === '' ? 0 : 32;
    const parts = [`<g class="${kind}" transform="translate(${n(x)} ${n(cy)})">`];
    if (row.swatch !== '') parts.push(row.swatch);
    parts.push(`<text x="${textX}" y="11"${kind === 'legend-note' ? ' fill="#555555" font-size="11"' : ''}>${escapeXml(row.label)}</text>`);
    if (row.value !== undefined) parts.push(`<text x="${n(width)}" y="11" text-anchor="end">${escapeXml(row.value)}</text>`);
    parts.push('</g>');
    out.push(parts.join(''));
    cy += LEGEND_ROW;
  }
  out.push('</g>');
  return out.join('\n');
}
