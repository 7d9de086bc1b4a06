import { blackbodyColor } from '../physics/blackbodyColor.js';
import { PHASES } from '../model/phases.js';
import { decimateDots } from './decimateDots.js';
import { hrDomainOf } from './hrDomainOf.js';
import { FIGURE_LAYOUT, hrFrame } from './hrFrame.js';
import type { PopulationPoints } from './populationPoints.js';
import { svgFigure } from './svgFigure.js';
import { svgLegend, type LegendRow } from './svgLegend.js';
import { svgNumber as n } from './svgNumber.js';
import type { FigureText } from './trackFigure.js';

/** Above this many stars with light, dots are thinned to one per cell (decimateDots). */
export const DOT_LIMIT = 20000;
/** Cell size of the thinning, px: about a dot's diameter, so no kept dot hides another much. */
export const DOT_CELL = 2;

/** Counts written for readers: 12,345. */
const count = (x: number) => x.toLocaleString('en-US');

/**
 * An HR diagram of a population as an SVG document: each star with light a `<circle>` (in
 * `<g class="stars">`, no attribute per dot beyond position, radius and fill) filled with its colour as seen (blackbodyColor of its Teff, the state's
 * `color`), outlined thinly in grey so that white and pale stars — the white dwarfs above all —
 * show on the white page. Up to DOT_LIMIT stars every star is drawn; beyond, one dot per
 * DOT_CELL-px cell, the brightest star of the cell (decimateDots), and a subtitle line says
 * so. The legend counts the stars per phase (phases with none are left out) and names the
 * stars not drawn (neutron stars, black holes).
 *
 * @param points the population's points (populationPoints)
 * @param text title, subtitle lines (a line on the dots is added) and legend heading
 * @throws RangeError when no star has light
 */
export function populationFigure(points: PopulationPoints, text: FigureText): string {
  const drawn = points.logTeff.length;
  if (drawn === 0) throw new RangeError(`nothing to draw: none of the ${points.total} stars has light (all are neutron stars or black holes)`);
  const frame = hrFrame(hrDomainOf([points]));
  const width = frame.right - frame.left;
  const height = frame.bottom - frame.top;
  const xs = new Float64Array(drawn);
  const ys = new Float64Array(drawn);
  for (let i = 0; i < drawn; i++) {
    xs[i] = frame.x(points.logTeff[i]) - frame.left;
    ys[i] = frame.y(points.logL[i]) - frame.top;
  }
  const thinned = drawn > DOT_LIMIT;
  let order: Int32Array;
  if (thinned) order = decimateDots(xs, ys, points.logL, width + 1e-9, height + 1e-9, DOT_CELL);
  else {
    // every star; dimmest first so that bright stars are drawn on top
    const all = Array.from({ length: drawn }, (_, i) => i);
    all.sort((a, b) => points.logL[a] - points.logL[b] || a - b);
    order = Int32Array.from(all);
  }
  const r = thinned ? 1.7 : drawn > 2000 ? 1.8 : 2.6;
  const stroke = thinned || drawn > 2000 ? 0.25 : 0.4;
  const dots: string[] = [`<g class="stars" stroke="#555555" stroke-width="${stroke}">`];
  for (let k = 0; k < order.length; k++) {
    const i = order[k];
    const color = blackbodyColor(points.teff[i]);
    dots.push(`<circle cx="${n(xs[i] + frame.left, 1)}" cy="${n(ys[i] + frame.top, 1)}" r="${r}" fill="${color}"/>`);
  }
  dots.push('</g>');
  const rows: LegendRow[] = [];
  for (const phase of PHASES) {
    const c = points.counts[phase];
    if (c === 0 || phase === 'neutron-star' || phase === 'black-hole') continue;
    rows.push({ swatch: '', label: phase, value: count(c) });
  }
  const ns = points.counts['neutron-star'];
  const bh = points.counts['black-hole'];
  if (ns + bh > 0) {
    rows.push({ swatch: '', label: '' });
    if (ns > 0) rows.push({ swatch: '', label: 'neutron-star', value: count(ns) });
    if (bh > 0) rows.push({ swatch: '', label: 'black-hole', value: count(bh) });
    rows.push({ swatch: '', label: '(counted, not drawn)', kind: 'legend-note' });
  }
  rows.push({ swatch: '', label: '' });
  rows.push({ swatch: '', label: 'all stars', value: count(points.total), kind: 'legend-note' });
  const subtitle = [...text.subtitle];
  subtitle.push(thinned
    ? `Dot colour: the star's colour as seen. ${count(drawn)} stars with light drawn as ${count(order.length)} dots: one per ${DOT_CELL} px cell, the brightest kept.`
    : `Dot colour: the star's colour as seen; every star with light is one dot (${count(drawn)}).`);
  const legendX = FIGURE_LAYOUT.right + 22;
  const legend = svgLegend(rows, legendX, FIGURE_LAYOUT.top, FIGURE_LAYOUT.width - legendX - 12, text.legendTitle ?? 'Stars per phase');
  return svgFigure({ frame, title: text.title, subtitle, body: dots.join('\n'), legend });
}
