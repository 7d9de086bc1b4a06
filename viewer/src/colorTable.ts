import { absoluteVisualMagnitude } from '../../lib/physics/absoluteVisualMagnitude.js';
import { blackbodyColor } from '../../lib/physics/blackbodyColor.js';
import { bvColor } from '../../lib/physics/bvColor.js';

/** log10 Teff/K covered by the tables: the library's colour range, 10 K to 1e9 K. */
export const LUT_LOG_MIN = 1;
export const LUT_LOG_MAX = 9;
/** Table step, dex: 0.002 dex is 0.46 % in Teff, below one 8-bit colour step on the main sequence. */
export const LUT_STEP = 0.002;

/** Per-Teff tables of the library's colour functions, sampled once, indexed per star. */
export interface ColorTable {
  size: number;
  /** ImageData pixel (RGBA bytes in memory order, read as a little-endian Uint32) of blackbodyColor */
  rgba: Uint32Array;
  /** bvColor, mag */
  bv: Float64Array;
  /** absoluteVisualMagnitude(1 Lsun, Teff): M_V of this Teff at one solar luminosity, mag */
  mvAtUnitL: Float64Array;
  /** table index of log10 Teff (nearest node, clamped to the table): the colour's */
  index(logTeff: number): number;
  /** B−V at log10 Teff, linear between nodes */
  bvAt(logTeff: number): number;
  /** M_V at log10 Teff and log10 L/Lsun, linear between nodes */
  mvAt(logTeff: number, logL: number): number;
}

const LITTLE_ENDIAN = new Uint8Array(new Uint32Array([1]).buffer)[0] === 1;

/** Packs 8-bit r, g, b and opaque alpha into a Uint32 with ImageData's byte order. */
export function packRgba(r: number, g: number, b: number): number {
  return LITTLE_ENDIAN ? ((255 << 24) | (b << 16) | (g << 8) | r) >>> 0 : ((r << 24) | (g << 16) | (b << 8) | 255) >>> 0;
}

/**
 * Samples the library's blackbody colour (blackbodyColor), B−V (bvColor) and visual magnitude
 * (absoluteVisualMagnitude) on a log Teff grid, so a frame of 1e5 stars costs one table read
 * per star instead of a call each. The magnitude is sampled at L = 1 Lsun; a star of
 * luminosity L is `mvAtUnitL − 2.5 log10 L`, since M_V = M_bol − BC_V and M_bol differs by
 * exactly −2.5 log10 L (IAU 2015 B2) while BC_V depends on Teff alone. The colour is the
 * nearest node's (0.002 dex apart, within an 8-bit step on the main sequence); B−V and M_V are
 * linear between nodes, within 0.002 mag of the library's from 2000 K up (see the viewer tests).
 */
export function createColorTable(): ColorTable {
  const size = Math.round((LUT_LOG_MAX - LUT_LOG_MIN) / LUT_STEP) + 1;
  const rgba = new Uint32Array(size);
  const bv = new Float64Array(size);
  const mvAtUnitL = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    const teff = 10 ** Math.min(LUT_LOG_MAX, LUT_LOG_MIN + i * LUT_STEP);
    const hex = blackbodyColor(teff);
    rgba[i] = packRgba(parseInt(hex.slice(1, 3), 16), parseInt(hex.slice(3, 5), 16), parseInt(hex.slice(5, 7), 16));
    bv[i] = bvColor(teff);
    mvAtUnitL[i] = absoluteVisualMagnitude(1, teff);
  }
  const inv = 1 / LUT_STEP;
  const last = size - 1;
  const lerp = (table: Float64Array, logTeff: number) => {
    let p = (logTeff - LUT_LOG_MIN) * inv;
    if (!(p > 0)) p = 0;
    else if (p > last) p = last;
    let k = Math.floor(p);
    if (k >= last) k = last - 1;
    const f = p - k;
    return table[k] + f * (table[k + 1] - table[k]);
  };
  return {
    size, rgba, bv, mvAtUnitL,
    index(logTeff: number): number {
      const k = Math.round((logTeff - LUT_LOG_MIN) * inv);
      return k < 0 ? 0 : k > last ? last : k;
    },
    bvAt: (logTeff: number) => lerp(bv, logTeff),
    mvAt: (logTeff: number, logL: number) => lerp(mvAtUnitL, logTeff) - 2.5 * logL,
  };
}
