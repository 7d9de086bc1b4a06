/**
 * Which dots to draw when there are too many to draw all: the plane is cut into square cells
 * of `cell` px and only the brightest point of each cell is kept (a bright star hides the
 * dim ones behind it anyway — the rule is uPlot's "draw about one point per pixel", applied
 * in two dimensions). Points outside [0, width) × [0, height) are dropped.
 *
 * @param xs px across (relative to the plot's left edge)
 * @param ys px down (relative to the plot's top edge)
 * @param brightness any increasing measure of brightness (e.g. log L)
 * @param width plot width, px
 * @param height plot height, px
 * @param cell cell size, px (> 0)
 * @returns indices of the kept points, dimmest first (so that bright dots are drawn on top)
 * @example decimateDots([1, 1.5, 9], [1, 1.2, 9], [0, 2, 1], 10, 10, 2) // Int32Array [2, 1]
 */
export function decimateDots(
  xs: ArrayLike<number>, ys: ArrayLike<number>, brightness: ArrayLike<number>, width: number, height: number, cell: number,
): Int32Array {
  if (!(cell > 0)) throw new RangeError(`cell ${cell} px must be > 0`);
  const cols = Math.max(1, Math.ceil(width / cell));
  const rows = Math.max(1, Math.ceil(height / cell));
  const best = new Int32Array(cols * rows).fill(-1);
  const inv = 1 / cell;
  let kept = 0;
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    const y = ys[i];
    if (!(x >= 0 && x < width && y >= 0 && y < height)) continue;
    const k = Math.floor(y * inv) * cols + Math.floor(x * inv);
    const j = best[k];
    if (j < 0) {
      best[k] = i;
      kept++;
    } else if (brightness[i] > brightness[j]) best[k] = i;
  }
  const out = new Int32Array(kept);
  let m = 0;
  for (let k = 0; k < best.length; k++) if (best[k] >= 0) out[m++] = best[k];
  return sortByBrightness(out, brightness);
}

function sortByBrightness(indices: Int32Array, brightness: ArrayLike<number>): Int32Array {
  const order = Array.from(indices);
  order.sort((a, b) => brightness[a] - brightness[b] || a - b);
  return Int32Array.from(order);
}
