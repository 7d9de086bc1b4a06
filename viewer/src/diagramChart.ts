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
 * The diagram: uPlot draws the axes, ticks and grid on its canvas, once (again only on a resize);
 * the stars are drawn into an ImageData buffer on a canvas of exactly the plotting area's size
 * in device pixels, placed in uPlot's `.u-under` element — beneath uPlot's canvas, so the grid
 * lies on top — and put with one putImageData per frame; the overlays (isochrone, track, rings)
 * go on a third canvas of the same size at the bottom of uPlot's `.u-over` element, placed with
 * uPlot's valToPos, so a frame never redraws the axes.
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
    },
  };
  const plot = new uPlot(opts, [[view.xMin, view.xMax], [null, null]], el);
  const canvas = document.createElement('canvas');
  canvas.className = 'star-layer';
  plot.under.appendChild(canvas);
  const ctx = canvas.getContext('2d', { alpha: true }) as CanvasRenderingContext2D;
  // overlays on their own canvas above uPlot's, so a new frame never redraws the axes
  const overCanvas = document.createElement('canvas');
  overCanvas.className = 'overlay-layer';
  plot.over.prepend(overCanvas);
  const octx = overCanvas.getContext('2d') as CanvasRenderingContext2D;
  const drawOverlays = () => {
    const w = canvas.width;
    const h = canvas.height;
    if (overCanvas.width !== w || overCanvas.height !== h) {
      overCanvas.width = w;
      overCanvas.height = h;
      overCanvas.style.width = canvas.style.width;
      overCanvas.style.height = canvas.style.height;
    }
    const r = devicePixelRatio;
    const X = (v: number) => plot.valToPos(v, 'x') * r;
    const Y = (v: number) => plot.valToPos(v, 'y') * r;
    octx.clearRect(0, 0, w, h);
    for (const line of lines) {
      octx.strokeStyle = line.stroke;
      octx.lineWidth = line.width * r;
      octx.setLineDash(line.dash.map((d) => d * r));
      octx.beginPath();
      let pen = false;
      for (let i = 0; i < line.x.length; i++) {
        const vx = line.x[i];
        const vy = line.y[i];
        if (!(Number.isFinite(vx) && Number.isFinite(vy))) {
          pen = false;
          continue;
        }
        if (pen) octx.lineTo(X(vx), Y(vy));
        else octx.moveTo(X(vx), Y(vy));
        pen = true;
      }
      octx.stroke();
    }
    octx.setLineDash([]);
    for (const ring of rings) {
      if (!(Number.isFinite(ring.x) && Number.isFinite(ring.y))) continue;
      const px = Math.min(w - 4 * r, Math.max(4 * r, X(ring.x)));
      const py = Math.min(h - 4 * r, Math.max(4 * r, Y(ring.y)));
      octx.strokeStyle = ring.stroke;
      octx.lineWidth = 1.5 * r;
      octx.beginPath();
      octx.arc(px, py, 7 * r, 0, 2 * Math.PI);
      octx.stroke();
    }
  };
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
      size();
      drawOverlays();
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
