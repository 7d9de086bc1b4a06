import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { blackbodyColor } from '../lib/physics/blackbodyColor.js';
import { blackbodyXyz } from '../lib/physics/blackbodyXyz.js';
import { srgbTransfer } from '../lib/physics/srgbTransfer.js';
import { xyzToLinearSrgb } from '../lib/physics/xyzToLinearSrgb.js';

const rgb = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

/** Direct (non-tabulated) pipeline, to check the table lookup against. */
function direct(t: number): number[] {
  const xyz = blackbodyXyz(t, undefined, [0, 0, 0]);
  const c = xyzToLinearSrgb(xyz[0], xyz[1], xyz[2], [0, 0, 0]).map((v) => Math.max(0, v));
  const m = Math.max(...c);
  return c.map((v) => Math.round(255 * srgbTransfer(v / m)));
}

describe('blackbodyColor(teff)', () => {
  test.each([
    // REFERENCES.md (D): exact-Planck sRGB, ±3 levels
    { teff: 3000, ref: [255, 184, 109] },
    { teff: 5772, ref: [255, 241, 234] },
    { teff: 10000, ref: [205, 217, 255] },
  ])('gives $ref at $teff K within 3 levels', ({ teff, ref }) => {
    const got = rgb(blackbodyColor(teff));
    for (let k = 0; k < 3; k++) expect(Math.abs(got[k] - ref[k])).toBeLessThanOrEqual(3);
  });

  test('is a deep red when cold and the limiting blue-white when hot (documented limits)', () => {
    const [r, g, b] = rgb(blackbodyColor(300));
    expect(r).toBe(255);
    expect(g + b).toBeLessThan(20);
    const hot = rgb(blackbodyColor(1e8));
    expect(hot[2]).toBe(255);
    expect(hot[0]).toBeLessThan(hot[1]);
  });

  test('agrees with the direct computation within 1 level (table lookup, property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 9, noNaN: true }), (lt) => {
      const t = 10 ** lt;
      const a = rgb(blackbodyColor(t));
      const d = direct(t);
      return a.every((v, k) => Math.abs(v - d[k]) <= 1);
    }));
  });

  test('always returns a valid #rrggbb over 10 K – 1e9 K (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 9, noNaN: true }), (lt) => /^#[0-9a-f]{6}$/.test(blackbodyColor(10 ** lt))));
  });

  test.each([{ teff: 0 }, { teff: NaN }, { teff: 5e9 }])('throws RangeError for teff $teff', ({ teff }) => {
    expect(() => blackbodyColor(teff)).toThrow(RangeError);
  });
});
