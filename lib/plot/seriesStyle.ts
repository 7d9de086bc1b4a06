/** The colour and dash pattern of one line of a figure. */
export interface SeriesStyle {
  /** '#rrggbb' */
  color: string;
  /** SVG stroke-dasharray, or '' for a solid line */
  dash: string;
}

// Okabe & Ito (2008), "Color universal design": a qualitative palette told apart with the
// common colour-vision deficiencies; its yellow (#f0e442) is left out, too faint on paper.
const COLORS = ['#000000', '#e69f00', '#56b4e9', '#009e73', '#0072b2', '#d55e00', '#cc79a7'];
// Dash patterns (px) told apart in greyscale print, where the colours merge.
const DASHES = ['', '7 3', '2 2', '9 3 2 3', '4 4', '12 3 2 3 2 3', '1 3'];

/** How many series have a distinct colour–dash pair. */
export const SERIES_STYLE_COUNT = COLORS.length * DASHES.length;

/**
 * The style of series `i` (0-based): colour and dash both step with i, the dash shifted by one
 * more every full round of the palette, so the first 49 series all differ and the first 7
 * differ in colour and in dash alike.
 *
 * @param i series index, an integer ≥ 0
 * @example seriesStyle(1) // { color: '#e69f00', dash: '7 3' }
 */
export function seriesStyle(i: number): SeriesStyle {
  const round = Math.floor(i / COLORS.length);
  return { color: COLORS[i % COLORS.length], dash: DASHES[(i + round) % DASHES.length] };
}
