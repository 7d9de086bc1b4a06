import { eventMark, TRACK_EVENTS, type TrackEvent } from './eventMark.js';
import { hrDomainOf } from './hrDomainOf.js';
import { FIGURE_LAYOUT, hrFrame } from './hrFrame.js';
import { hrSeries } from './hrSeries.js';
import { svgFigure } from './svgFigure.js';
import { svgLegend, type LegendRow } from './svgLegend.js';

/** One evolutionary track to draw: its points in life order and its marked moments. */
export interface TrackLine {
  /** legend text, e.g. '1 Msun' */
  label: string;
  /** log10 Teff/K of each point */
  logTeff: ArrayLike<number>;
  /** log10 L/Lsun of each point */
  logL: ArrayLike<number>;
  /** marked moments, each at a point index */
  events: readonly { event: TrackEvent; index: number }[];
}

/** Options of a figure: its title and the lines under it. */
export interface FigureText {
  title: string;
  subtitle: readonly string[];
  /** legend heading */
  legendTitle?: string;
}

/**
 * An HR diagram of evolutionary tracks as an SVG document: one `<path class="track">` per
 * track, each in its own colour and dash pattern (seriesStyle: told apart in colour and in
 * greyscale), its ZAMS, end of main sequence, helium ignition and remnant birth marked with a
 * shape per moment (eventMark), and a legend of the tracks and of the marks.
 *
 * @param tracks the tracks, in legend order (at most 49 distinct styles)
 * @param text title and subtitle lines
 * @throws RangeError when no track has a finite point
 */
export function trackFigure(tracks: readonly TrackLine[], text: FigureText): string {
  const frame = hrFrame(hrDomainOf(tracks));
  const body: string[] = [];
  const marks: string[] = [];
  const rows: LegendRow[] = [];
  const used = new Set<TrackEvent>();
  tracks.forEach((track, i) => {
    const { color, xs, ys, path, swatch } = hrSeries(frame, i, 'track', track.logTeff, track.logL, []);
    const n = xs.length;
    body.push(path);
    for (const { event, index } of track.events) {
      if (index < 0 || index >= n) continue;
      used.add(event);
      marks.push(eventMark(event, xs[index], ys[index], color));
    }
    rows.push({ swatch, label: track.label });
  });
  const keys = TRACK_EVENTS.filter((e) => used.has(e.event));
  if (keys.length > 0) rows.push({ swatch: '', label: '' });
  for (const { event, label } of keys) {
    rows.push({ swatch: eventMark(event, 12, 6, '#222222'), label, kind: 'legend-key' });
  }
  const legendX = FIGURE_LAYOUT.right + 22;
  const legend = svgLegend(rows, legendX, FIGURE_LAYOUT.top, FIGURE_LAYOUT.width - legendX - 12, text.legendTitle ?? 'Initial mass');
  return svgFigure({ frame, title: text.title, subtitle: text.subtitle, body: body.join('\n') + '\n' + marks.join('\n'), legend });
}
