import { hrDomainOf } from './hrDomainOf.js';
import { FIGURE_LAYOUT, hrFrame } from './hrFrame.js';
import { hrSeries } from './hrSeries.js';
import { svgFigure } from './svgFigure.js';
import { svgLegend, type LegendRow } from './svgLegend.js';
import { svgNumber as n } from './svgNumber.js';
import type { FigureText } from './trackFigure.js';

/** One isochrone to draw: its points in increasing initial mass, its gaps and its turnoff. */
export interface IsochroneLine {
  /** legend text, e.g. '1 Gyr' */
  label: string;
  /** right-aligned legend figure, e.g. the turnoff mass '2.05 Msun' */
  value?: string;
  logTeff: ArrayLike<number>;
  logL: ArrayLike<number>;
  /** indices where the line breaks (a new piece starts), e.g. where the remnants begin */
  starts: readonly number[];
  /** the main-sequence turnoff's position, or null when there is none to mark */
  turnoff: { logTeff: number; logL: number } | null;
}

/**
 * An HR diagram of isochrones as an SVG document: one `<path class="isochrone">` per age (in
 * pieces where it breaks), each in its own colour and dash pattern, its main-sequence
 * turnoff marked with a `<circle class="turnoff">`, and a legend of the ages.
 *
 * @param lines the isochrones, in legend order
 * @param text title, subtitle and legend heading
 * @throws RangeError when no isochrone has a finite point
 */
export function isochroneFigure(lines: readonly IsochroneLine[], text: FigureText): string {
  const frame = hrFrame(hrDomainOf(lines));
  const body: string[] = [];
  const marks: string[] = [];
  const rows: LegendRow[] = [];
  lines.forEach((line, i) => {
    const { color, path, swatch } = hrSeries(frame, i, 'isochrone', line.logTeff, line.logL, line.starts);
    body.push(path);
    if (line.turnoff !== null) {
      const x = frame.x(line.turnoff.logTeff);
      const y = frame.y(line.turnoff.logL);
      marks.push(`<circle class="turnoff" cx="${n(x)}" cy="${n(y)}" r="4" fill="none" stroke="${color}" stroke-width="1.6"/>`);
    }
    rows.push({ swatch, label: line.label, value: line.value });
  });
  if (lines.some((l) => l.turnoff !== null)) {
    rows.push({ swatch: '', label: '' });
    rows.push({ swatch: '<circle cx="12" cy="6" r="4" fill="none" stroke="#222222" stroke-width="1.6"/>', label: 'main-sequence turnoff', kind: 'legend-key' });
  }
  const legendX = FIGURE_LAYOUT.right + 22;
  const legend = svgLegend(rows, legendX, FIGURE_LAYOUT.top, FIGURE_LAYOUT.width - legendX - 12, text.legendTitle ?? 'Age');
  return svgFigure({ frame, title: text.title, subtitle: text.subtitle, body: body.join('\n') + '\n' + marks.join('\n'), legend });
}
