import { escapeXml } from './escapeXml.js';
import { formatTick } from './formatTick.js';
import { niceStep } from './niceStep.js';
import { niceTicks } from './niceTicks.js';
import { svgNumber as n } from './svgNumber.js';

/** The data ranges of an HR diagram: log10 Teff/K across, log10 L/Lsun up. */
export interface HrDomain {
  logTeff: [number, number];
  logL: [number, number];
}

/** An HR diagram's page: its size, the plot rectangle and the scales into it. */
export interface HrFrame {
  width: number;
  height: number;
  /** plot rectangle, px */
  left: number;
  right: number;
  top: number;
  bottom: number;
  domain: HrDomain;
  /** px across for a log Teff (hot on the left: the axis decreases to the right) */
  x(logTeff: number): number;
  /** px down for a log L */
  y(logL: number): number;
  /** the tick values of each axis, increasing */
  ticks: { logTeff: number[]; logL: number[] };
  /** grid lines, frame, ticks, tick labels and axis titles as SVG markup */
  axes: string;
}

/** Page layout of every figure (px): room for the title above and the legend on the right. */
export const FIGURE_LAYOUT = Object.freeze({ width: 820, height: 580, left: 70, right: 590, top: 70, bottom: 520 });

/** Axis titles with their units, the same on every figure. */
export const AXIS_TITLES = Object.freeze({ logTeff: 'log Teff (K)', logL: 'log L (Lsun)' });

const INK = '#222222';
const GRID = '#e4e4e4';

/**
 * The frame of an HR diagram: log Teff (K) across, decreasing to the right as the diagram is
 * always drawn (hot stars on the left), log L (Lsun) up; nice ticks (niceTicks, 1-2-5 steps)
 * with labels, light grid lines at the ticks, a frame, and the axis titles with units.
 *
 * @param domain the ranges to show (each lo < hi; usually widened by niceDomain first)
 * @throws RangeError for an empty or non-finite range
 * @example hrFrame({ logTeff: [3.4, 4.6], logL: [-2, 4] }).x(4.6) // 70 (the left edge)
 */
export function hrFrame(domain: HrDomain): HrFrame {
  const { width, height, left, right, top, bottom } = FIGURE_LAYOUT;
  for (const [name, [lo, hi]] of Object.entries(domain) as [string, [number, number]][]) {
    if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo < hi)) {
      throw new RangeError(`${name} axis range [${lo}, ${hi}] must be finite with lo < hi`);
    }
  }
  const [t0, t1] = domain.logTeff;
  const [l0, l1] = domain.logL;
  const x = (v: number) => left + ((t1 - v) / (t1 - t0)) * (right - left);
  const y = (v: number) => bottom - ((v - l0) / (l1 - l0)) * (bottom - top);
  const xTicks = niceTicks(t0, t1, 6);
  const yTicks = niceTicks(l0, l1, 8);
  const xStep = niceStep(t0, t1, 6);
  const yStep = niceStep(l0, l1, 8);
  const parts: string[] = ['<g class="axes" fill="none" stroke-width="1">'];
  const grid: string[] = [];
  const marks: string[] = [];
  for (const v of xTicks) {
    const px = n(x(v));
    grid.push(`M${px} ${top}V${bottom}`);
    marks.push(`M${px} ${bottom}v5`);
  }
  for (const v of yTicks) {
    const py = n(y(v));
    grid.push(`M${left} ${py}H${right}`);
    marks.push(`M${left} ${py}h-5`);
  }
  parts.push(`<path class="grid" stroke="${GRID}" d="${grid.join('')}"/>`);
  parts.push(`<rect class="frame" x="${left}" y="${top}" width="${right - left}" height="${bottom - top}" stroke="${INK}"/>`);
  parts.push(`<path class="tick-marks" stroke="${INK}" d="${marks.join('')}"/>`);
  parts.push('</g>');
  parts.push(`<g class="tick-labels x-ticks" font-size="11" fill="${INK}" text-anchor="middle">`);
  for (const v of xTicks) parts.push(`<text x="${n(x(v))}" y="${bottom + 18}">${escapeXml(formatTick(v, xStep))}</text>`);
  parts.push('</g>');
  parts.push(`<g class="tick-labels y-ticks" font-size="11" fill="${INK}" text-anchor="end">`);
  for (const v of yTicks) parts.push(`<text x="${left - 8}" y="${n(y(v) + 4)}">${escapeXml(formatTick(v, yStep))}</text>`);
  parts.push('</g>');
  const midX = n((left + right) / 2);
  const midY = n((top + bottom) / 2);
  parts.push(`<text class="axis-title x-title" x="${midX}" y="${bottom + 40}" font-size="13" fill="${INK}" text-anchor="middle">${escapeXml(AXIS_TITLES.logTeff)}</text>`);
  parts.push(`<text class="axis-title y-title" x="0" y="0" transform="translate(${left - 44} ${midY}) rotate(-90)" font-size="13" fill="${INK}" text-anchor="middle">${escapeXml(AXIS_TITLES.logL)}</text>`);
  return { width, height, left, right, top, bottom, domain, x, y, ticks: { logTeff: xTicks, logL: yTicks }, axes: parts.join('\n') };
}
