import { describe, expect, test } from 'vitest';
import { blackbodyChromaticity } from '../lib/physics/blackbodyChromaticity.js';

/**
 * Planckian locus, Kang et al. 2002, J. Korean Phys. Soc. 41, 865, cubic splines
 * (coefficients from memory; REFERENCES.md lists the paper as C), 1667–25000 K.
 */
function kang(t: number): { x: number; y: number } {
  const x = t <= 4000
    ? -0.2661239e9 / t ** 3 - 0.2343589e6 / t ** 2 + 0.8776956e3 / t + 0.17991
    : -3.0258469e9 / t ** 3 + 2.1070379e6 / t ** 2 + 0.2226347e3 / t + 0.24039;
  const y = t <= 2222
    ? -1.1063814 * x ** 3 - 1.3481102 * x ** 2 + 2.18555832 * x - 0.20219683
    : t <= 4000
      ? -0.9549476 * x ** 3 - 1.37418593 * x ** 2 + 2.09137015 * x - 0.16748867
      : 3.081758 * x ** 3 - 5.8733867 * x ** 2 + 3.75112997 * x - 0.37001483;
  return { x, y };
}

describe('blackbodyChromaticity(teff, c2)', () => {
  test('gives CIE illuminant A (2848 K, c2 = 1.435e-2 m K) at x 0.44757, y 0.40745 (from memory) ±5e-4', () => {
    const { x, y } = blackbodyChromaticity(2848, 1.435e-2);
    // measured with the Wyman–Sloan–Shirley fit (red tail corrected): x 0.44770, y 0.40756
    expect(Math.abs(x - 0.44757)).toBeLessThan(5e-4);
    expect(Math.abs(y - 0.40745)).toBeLessThan(5e-4);
  });

  test.each([1667, 2000, 2500, 3000, 4000, 5000, 6500, 8000, 10000, 15000, 25000])(
    'lies on the Kang et al. 2002 Planckian locus at %i K within 1e-3', (t) => {
      const p = blackbodyChromaticity(t);
      const k = kang(t);
      expect(Math.abs(p.x - k.x)).toBeLessThan(1e-3);
      expect(Math.abs(p.y - k.y)).toBeLessThan(1e-3);
    },
  );

  test('tends to the red end of the spectral locus (0.7347, 0.2653; CIE 1931, from memory) when cold, ±0.01', () => {
    const p = blackbodyChromaticity(300);
    expect(Math.abs(p.x - 0.7347)).toBeLessThan(0.01);
    expect(Math.abs(p.y - 0.2653)).toBeLessThan(0.01);
  });

  test('is finite at 10 K and 1e9 K', () => {
    for (const t of [10, 1e9]) {
      const p = blackbodyChromaticity(t);
      expect(Number.isFinite(p.x) && Number.isFinite(p.y)).toBe(true);
    }
  });

  test.each([{ t: 0, c2: 0.0144 }, { t: 5000, c2: 0 }, { t: NaN, c2: 0.0144 }])('throws RangeError for teff $t, c2 $c2', ({ t, c2 }) => {
    expect(() => blackbodyChromaticity(t, c2)).toThrow(RangeError);
  });
});
