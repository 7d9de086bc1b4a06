import uPlot from 'uplot';
import type { StateColumns } from '../../lib/interp/gridQuery.js';
import type { ColorTable } from './colorTable.js';
import { allocateDrawnStars, drawStars, nearestDrawn, type DiagramView, type DrawnStars } from './starLayer.js';

/** A polyline in data units of the current diagram; NaN breaks the line. */
export interface Overlay {
  x: Float64Array;
  y: Float64Array;
  stroke: string;
  width: number;
  dash: number[];
}

/** A ring around one star, in data units. */
export interface Ring {
  x: number;
  y: number;
  stroke: string;
}

/**
 * The diagram: uPlot draws the axes, ticks and grid on its canvas and the overlays (isochrone,
 * track, rings) in its `draw` hook; the stars are drawn into an ImageData buffer on a canvas of
 * exactly the plotting area's size in device pixels, placed in uPlot's `.u-under` element —
 * beneath uPlot's own canvas, so its grid and overlays lie on top — and put with one
 * putImageData per frame. uPlot is redrawn only when an overlay changes.
 */
export interface DiagramChart {
  plot: uPlot;
  view: DiagramView;
  drawn: DrawnStars;
  /** draws the stars of `cols`; returns how many were drawn */
  drawStars(cols: StateColumns, n: number): number;
  setOverlays(lines: Overlay[], rings: Ring[]): void;
  /**
   * The benchmark's baseline: the same buffer cleared, `n` fixed squares of one colour written
   * at the pixel positions `xy` (x, y pairs, the same every frame), and put — no physics.
   */
  fillFixed(xy: Int32Array, n: number): void;
  /** the star buffer's size in device pixels */
  size(): { width: number; height: number };
  /** the drawn star nearest the CSS pixel (relative to the plotting area), within `radius` CSS px, or −1 */
  nearest(cssX: number, cssY: number, radius: number): number;
  destroy(): void;
}

export function createDiagramChart(
  el: HTMLElement, view: DiagramView, lut: ColorTable, n: number, width: number, height: number, onResize: () => void,
): DiagramChart {
  let lines: Overlay[] = [];
  let rings: Ring[] = [];
  const axisStroke = '#a8aec4';
  const gridStroke = 'rgba(255,255,255,0.08)';
  const hr = view.kind === 'hr';
  const opts: uPlot.Options = {
    width,
    height,
    scales: {
      x: { time: false, auto: false, range: [view.xMin, view.xMax], dir: view.xFlip ? -1 : 1 },
      y: { auto: false, range: [view.yMin, view.yMax], dir: view.yFlip ? -1 : 1 },
    },
    axes: [
      { label: hr ? 'log Teff (K)' : 'B − V (mag)', stroke: axisStroke, grid: { stroke: gridStroke }, ticks: { stroke: gridStroke } },
      { label: hr ? 'log L (Lsun)' : 'M_V (mag)', stroke: axisStroke, grid: { stroke: gridStroke }, ticks: { stroke: gridStroke } },
    ],
    series: [{}, { show: false }],
    legend: { show: false },
    cursor: { drag: { x: false, y: false }, points: { show: false }, x: false, y: false },
    hooks: {
      // the plotting box settles after the axes are measured (and on setSize): redraw the stars then
      setSize: [() => queueMicrotask(onResize)],
      draw: [
        (u) => {
          const ctx = u.ctx;
          const { left, top, width: w, height: h } = u.bbox;
          ctx.save();
          ctx.beginPath();
          ctx.rect(left, top, w, h);
          ctx.clip();
          for (const line of lines) {
            ctx.strokeStyle = line.stroke;
            ctx.lineWidth = line.width * devicePixelRatio;
            ctx.setLineDash(line.dash.map((d) => d * devicePixelRatio));
            ctx.beginPath();
            let pen = false;
            for (let i = 0; i < line.x.length; i++) {
              const vx = line.x[i];
              const vy = line.y[i];
              if (!(Number.isFinite(vx) && Number.isFinite(vy))) {
                pen = false;
                continue;
              }
              const px = u.valToPos(vx, 'x', true);
              const py = u.valToPos(vy, 'y', true);
              if (pen) ctx.lineTo(px, py);
              else ctx.moveTo(px, py);
              pen = true;
            }
            ctx.stroke();
          }
          ctx.setLineDash([]);
          for (const ring of rings) {
            if (!(Number.isFinite(ring.x) && Number.isFinite(ring.y))) continue;
            const px = Math.min(left + w - 4, Math.max(left + 4, u.valToPos(ring.x, 'x', true)));
            const py = Math.min(top + h - 4, Math.max(top + 4, u.valToPos(ring.y, 'y', true)));
            ctx.strokeStyle = ring.stroke;
            ctx.lineWidth = 1.5 * devicePixelRatio;
            ctx.beginPath();
            ctx.arc(px, py, 7 * devicePixelRatio, 0, 2 * Math.PI);
            ctx.stroke();
          }
          ctx.restore();
        },
      ],
    },
  };
  const plot = new uPlot(opts, [[view.xMin, view.xMax], [null, null]], el);
  const canvas = document.createElement('canvas');
  canvas.className = 'star-layer';
  plot.under.appendChild(canvas);
  const ctx = canvas.getContext('2d', { alpha: true }) as CanvasRenderingContext2D;
  let image: ImageData = ctx.createImageData(1, 1);
  let pixels: Uint32Array;
  // uPlot settles its plotting box (bbox, device pixels) only once the axes are measured, and
  // again on setSize, so the buffer follows it before every frame
  const size = () => {
    const w = Math.max(1, Math.round(plot.bbox.width));
    const h = Math.max(1, Math.round(plot.bbox.height));
    if (w === image.width && h === image.height && pixels) return;
    canvas.width = w;
    canvas.height = h;
    canvas.style.width = `${w / devicePixelRatio}px`;
    canvas.style.height = `${h / devicePixelRatio}px`;
    image = ctx.createImageData(w, h);
    pixels = new Uint32Array(image.data.buffer);
  };
  size();
  const drawn = allocateDrawnStars(n);
  return {
    plot, view, drawn,
    drawStars(cols: StateColumns, count: number): number {
      size();
      const k = drawStars({ width: image.width, height: image.height, data: pixels }, cols, count, view, lut, devicePixelRatio, drawn);
      ctx.putImageData(image, 0, 0);
      return k;
    },
    fillFixed(xy: Int32Array, count: number): void {
      size();
      const w = image.width;
      const h = image.height;
      pixels.fill(0);
      const c = 0xffe6f2ff;
      for (let s = 0; s < count; s++) {
        const cx = xy[2 * s];
        const cy = xy[2 * s + 1];
        for (let y = cy - 1; y <= cy + 1; y++) {
          if (y < 0 || y >= h) continue;
          for (let x = cx - 1; x <= cx + 1; x++) if (x >= 0 && x < w) pixels[y * w + x] = c;
        }
      }
      ctx.putImageData(image, 0, 0);
    },
    size: () => {
      size();
      return { width: image.width, height: image.height };
    },
    setOverlays(l: Overlay[], r: Ring[]) {
      lines = l;
      rings = r;
      plot.redraw(false, false);
    },
    nearest(cssX: number, cssY: number, radius: number): number {
      const s = devicePixelRatio;
      return nearestDrawn(drawn, n, cssX * s, cssY * s, radius * s);
    },
    destroy() {
      plot.destroy();
    },
  };
}
