import { svgNumber as n } from './svgNumber.js';

/**
 * The `d` attribute of a polyline through points (px), with a new subpath (`M`) at every index
 * in `starts` so that gaps stay gaps. Points closer than 0.05 px to the previous one are
 * skipped (they add bytes, not ink).
 *
 * @param xs px across
 * @param ys px down
 * @param starts indices where a subpath begins (0 is implied)
 * @example linePath([0, 10, 20], [5, 5, 0], []) // 'M0 5L10 5L20 0'
 */
export function linePath(xs: ArrayLike<number>, ys: ArrayLike<number>, starts: readonly number[]): string {
  const begin = new Set(starts);
  let d = '';
  let px = NaN;
  let py = NaN;
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    const y = ys[i];
    const move = i === 0 || begin.has(i);
    if (!move && Math.abs(x - px) < 0.05 && Math.abs(y - py) < 0.05 && i !== xs.length - 1 && !begin.has(i + 1)) continue;
    d += `${move ? 'M' : 'L'}${n(x)} ${n(y)}`;
    px = x;
    py = y;
  }
  return d;
}
