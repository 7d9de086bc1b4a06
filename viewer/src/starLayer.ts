import type { StateColumns } from '../../lib/interp/gridQuery.js';
import { PHASE_INDEX } from '../../lib/model/phases.js';
import type { ColorTable } from './colorTable.js';

/** Which diagram: HR (log Teff, log L) or colour–magnitude (B−V, M_V). */
export type DiagramKind = 'hr' | 'cmd';

/** Axis limits of a diagram in data units; `xFlip` draws x decreasing to the right, `yFlip` y increasing downward. */
export interface DiagramView {
  kind: DiagramKind;
  xMin: number;
  xMax: number;
  yMin: number;
  yMax: number;
  xFlip: boolean;
  yFlip: boolean;
}

/** HR diagram: log Teff 5.4 (250 000 K, hot post-AGB stars and young white dwarfs) to 3.2 (1600 K); log L −6 to 6.7. */
export const HR_VIEW: DiagramView = { kind: 'hr', xMin: 3.2, xMax: 5.4, yMin: -6, yMax: 6.7, xFlip: true, yFlip: false };
/** Colour–magnitude diagram: B−V −0.5 to 2.5, M_V −11 (top) to 19 (bottom). */
export const CMD_VIEW: DiagramView = { kind: 'cmd', xMin: -0.5, xMax: 2.5, yMin: -11, yMax: 19, xFlip: false, yFlip: true };

/** A pixel buffer the stars are drawn into (an ImageData's bytes seen as Uint32). */
export interface PixelTarget {
  width: number;
  height: number;
  data: Uint32Array;
}

/** Marker shapes, also stored per drawn star for hit testing and tests. */
export const MARK = { none: 0, star: 1, whiteDwarf: 2, neutronStar: 3, clamped: 4 } as const;

const WD = PHASE_INDEX['white-dwarf'];
const NS = PHASE_INDEX['neutron-star'];
const BH = PHASE_INDEX['black-hole'];
const INV_LN10 = 1 / Math.LN10;

/** Where each star was drawn in the last frame (pixel centre; mark MARK.none when not drawn). */
export interface DrawnStars {
  x: Float32Array;
  y: Float32Array;
  mark: Uint8Array;
}

export function allocateDrawnStars(n: number): DrawnStars {
  return { x: new Float32Array(n), y: new Float32Array(n), mark: new Uint8Array(n) };
}

/**
 * Draws every computed star of `cols` into `target`, each in its own colour as seen (the
 * library's blackbody colour, through `lut`): ordinary stars as a filled square, white dwarfs
 * as a hollow square, neutron stars as a hollow diamond; a star beyond the axis limits is held
 * at the edge and drawn as a short bar along it (neutron stars, far below and left of the main
 * sequence, always sit on an edge); black holes have no light and are not drawn. The buffer is
 * cleared first (transparent, the page's dark background shows through). `scale` is the pixel
 * ratio (markers grow with it). Positions go into `drawn` for hit testing.
 */
export function drawStars(
  target: PixelTarget, cols: StateColumns, n: number, view: DiagramView, lut: ColorTable, scale: number, drawn: DrawnStars,
): number {
  const { width: w, height: h, data } = target;
  data.fill(0);
  // the same mapping as uPlot's valToPos in canvas pixels: min → 0, max → width; pixel = floor
  const sx = w / (view.xMax - view.xMin);
  const sy = h / (view.yMax - view.yMin);
  const x0 = view.xFlip ? view.xMax : view.xMin;
  const y0 = view.yFlip ? view.yMin : view.yMax;
  const fx = view.xFlip ? -sx : sx;
  const fy = view.yFlip ? sy : -sy;
  const hr = view.kind === 'hr';
  const r = scale >= 2 ? 2 : 1; // half size of a star's square
  const R = r + 2; // half size of the remnant outlines
  const { phase, status, luminosity, teff } = cols;
  const { rgba } = lut;
  const dx = drawn.x;
  const dy = drawn.y;
  const dm = drawn.mark;
  let count = 0;
  for (let s = 0; s < n; s++) {
    const ph = phase[s];
    if (status[s] !== 0 || ph === BH) {
      dm[s] = MARK.none;
      continue;
    }
    const logT = Math.log(teff[s]) * INV_LN10;
    const logL = Math.log(luminosity[s]) * INV_LN10;
    const k = lut.index(logT);
    let vx: number;
    let vy: number;
    if (hr) {
      vx = logT;
      vy = logL;
    } else {
      vx = lut.bvAt(logT);
      vy = lut.mvAt(logT, logL);
    }
    let px = Math.floor((vx - x0) * fx);
    let py = Math.floor((vy - y0) * fy);
    let edge = false;
    if (px < 0) { px = 0; edge = true; } else if (px > w - 1) { px = w - 1; edge = true; }
    if (py < 0) { py = 0; edge = true; } else if (py > h - 1) { py = h - 1; edge = true; }
    const c = rgba[k];
    let mark: number;
    if (ph === NS) {
      mark = MARK.neutronStar;
      // held wholly inside the plot, so the outline reads as a diamond on the edge
      const q = R + 1;
      if (px < q) px = q; else if (px > w - 1 - q) px = w - 1 - q;
      if (py < q) py = q; else if (py > h - 1 - q) py = h - 1 - q;
      diamond(data, w, h, px, py, R + 1, c);
    } else if (ph === WD) {
      mark = MARK.whiteDwarf;
      if (edge) bar(data, w, h, px, py, R, c);
      else hollowSquare(data, w, h, px, py, R, c);
    } else if (edge) {
      mark = MARK.clamped;
      bar(data, w, h, px, py, R, c);
    } else {
      mark = MARK.star;
      square(data, w, h, px, py, r, c);
    }
    dx[s] = px;
    dy[s] = py;
    dm[s] = mark;
    count++;
  }
  return count;
}

function square(d: Uint32Array, w: number, h: number, cx: number, cy: number, r: number, c: number): void {
  const xa = cx - r < 0 ? 0 : cx - r;
  const xb = cx + r > w - 1 ? w - 1 : cx + r;
  const ya = cy - r < 0 ? 0 : cy - r;
  const yb = cy + r > h - 1 ? h - 1 : cy + r;
  for (let y = ya; y <= yb; y++) {
    const row = y * w;
    for (let x = xa; x <= xb; x++) d[row + x] = c;
  }
}

function put(d: Uint32Array, w: number, h: number, x: number, y: number, c: number): void {
  if (x >= 0 && x < w && y >= 0 && y < h) d[y * w + x] = c;
}

function hollowSquare(d: Uint32Array, w: number, h: number, cx: number, cy: number, r: number, c: number): void {
  for (let i = -r; i <= r; i++) {
    put(d, w, h, cx + i, cy - r, c);
    put(d, w, h, cx + i, cy + r, c);
    put(d, w, h, cx - r, cy + i, c);
    put(d, w, h, cx + r, cy + i, c);
  }
}

function diamond(d: Uint32Array, w: number, h: number, cx: number, cy: number, r: number, c: number): void {
  for (let i = 0; i <= r; i++) {
    const j = r - i;
    put(d, w, h, cx + i, cy + j, c);
    put(d, w, h, cx - i, cy + j, c);
    put(d, w, h, cx + i, cy - j, c);
    put(d, w, h, cx - i, cy - j, c);
  }
}

/** A bar along whichever edge the point sits on (both, in a corner). */
function bar(d: Uint32Array, w: number, h: number, cx: number, cy: number, r: number, c: number): void {
  const onSide = cx === 0 || cx === w - 1;
  const onTopBottom = cy === 0 || cy === h - 1;
  for (let i = -r; i <= r; i++) {
    if (onSide) {
      put(d, w, h, cx, cy + i, c);
      put(d, w, h, cx === 0 ? 1 : cx - 1, cy + i, c);
    }
    if (onTopBottom) {
      put(d, w, h, cx + i, cy, c);
      put(d, w, h, cx + i, cy === 0 ? 1 : cy - 1, c);
    }
  }
}

/** The drawn star nearest to (x, y) within `radius` pixels, or −1. */
export function nearestDrawn(drawn: DrawnStars, n: number, x: number, y: number, radius: number): number {
  let best = -1;
  let bestD = radius * radius;
  const { x: X, y: Y, mark } = drawn;
  for (let s = 0; s < n; s++) {
    if (mark[s] === MARK.none) continue;
    const ex = X[s] - x;
    const ey = Y[s] - y;
    const d = ex * ex + ey * ey;
    if (d <= bestD) {
      bestD = d;
      best = s;
    }
  }
  return best;
}
