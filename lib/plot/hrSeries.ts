import type { HrFrame } from './hrFrame.js';
import { linePath } from './linePath.js';
import { seriesStyle } from './seriesStyle.js';

/** One line of an HR figure, drawn (see {@link hrSeries}). */
export interface HrSeries {
  /** its colour (seriesStyle), for marks drawn on it */
  color: string;
  /** the points in px, for marks placed at them */
  xs: Float64Array;
  ys: Float64Array;
  /** the `<path>` element of the line */
  path: string;
  /** the legend swatch: a short stretch of the same line */
  swatch: string;
}

/**
 * The `i`-th line of an HR figure through (log Teff, log L) points: projected by `frame`, in
 * the i-th colour and dash pattern (seriesStyle), as an SVG path of class `cls` with a new
 * subpath at every index in `starts` (linePath), with its legend swatch.
 *
 * @example hrSeries(frame, 0, 'track', logTeff, logL, []).path // '<path class="track" …/>'
 */
export function hrSeries(frame: HrFrame, i: number, cls: string, logTeff: ArrayLike<number>, logL: ArrayLike<number>, starts: readonly number[]): HrSeries {
  const { color, dash } = seriesStyle(i);
  const count = logTeff.length;
  const xs = new Float64Array(count);
  const ys = new Float64Array(count);
  for (let j = 0; j < count; j++) {
    xs[j] = frame.x(logTeff[j]);
    ys[j] = frame.y(logL[j]);
  }
  const dashAttr = dash === '' ? '' : ` stroke-dasharray="${dash}"`;
  return {
    color,
    xs,
    ys,
    path: `<path class="${cls}" fill="none" stroke="${color}" stroke-width="1.6" stroke-linejoin="round"${dashAttr} d="${linePath(xs, ys, starts)}"/>`,
    swatch: `<path fill="none" stroke="${color}" stroke-width="2"${dashAttr} d="M0 6H24"/>`,
  };
}
