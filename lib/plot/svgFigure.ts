import { escapeXml } from './escapeXml.js';
import type { HrFrame } from './hrFrame.js';

/** What a figure puts on its page. */
export interface FigureParts {
  frame: HrFrame;
  title: string;
  /** lines under the title (what was drawn, from what, how) */
  subtitle: readonly string[];
  /** the data marks, drawn clipped to the plot rectangle */
  body: string;
  /** the legend's markup (svgLegend), placed right of the plot */
  legend: string;
}

/**
 * The whole SVG document of a figure: XML declaration, `<svg>` with width, height and
 * viewBox, generic font family (sans-serif, so any printer has it), a `<title>` for screen
 * readers, a white page, the title and subtitle lines, the axes, the data clipped to the plot
 * area, and the legend. User text is XML-escaped here (title, subtitle).
 *
 * @returns the document text, ending with a newline
 */
export function svgFigure(parts: FigureParts): string {
  const { frame, title, subtitle, body, legend } = parts;
  const { width, height, left, right, top, bottom } = frame;
  const lines = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="sans-serif" role="img">`,
    `<title>${escapeXml(title)}</title>`,
    '<defs><clipPath id="plot-area">' +
      `<rect x="${left}" y="${top}" width="${right - left}" height="${bottom - top}"/></clipPath></defs>`,
    `<rect class="page" x="0" y="0" width="${width}" height="${height}" fill="#ffffff"/>`,
    `<text class="title" x="${left}" y="28" font-size="17" font-weight="bold" fill="#111111">${escapeXml(title)}</text>`,
  ];
  subtitle.forEach((line, i) => {
    lines.push(`<text class="subtitle" x="${left}" y="${46 + 14 * i}" font-size="11.5" fill="#555555">${escapeXml(line)}</text>`);
  });
  lines.push(frame.axes);
  lines.push(`<g class="data" clip-path="url(#plot-area)">`, body, '</g>');
  lines.push(legend);
  lines.push('</svg>');
  return lines.join('\n') + '\n';
}
