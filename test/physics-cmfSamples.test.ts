import { describe, expect, test } from 'vitest';
import { CMF_SAMPLES } from '../lib/physics/cmfSamples.js';

const at = (l: number) => l - 360;

describe('CMF_SAMPLES', () => {
  test('covers 360–830 nm at 1 nm (471 samples)', () => {
    expect(CMF_SAMPLES.lambda.length).toBe(471);
    expect(CMF_SAMPLES.lambda[0]).toBe(360);
    expect(CMF_SAMPLES.lambda[470]).toBe(830);
  });

  // CIE 1931 2° table values (CIE 15:2004; from memory). Tolerance ±0.025: the accuracy of
  // the Wyman, Sloan & Shirley 2013 multi-lobe fit quoted in REFERENCES.md (for z̄, scaled by
  // its 1.75 peak).
  test.each([
    { l: 445, fn: 'x', ref: 0.348 }, { l: 600, fn: 'x', ref: 1.0622 }, { l: 555, fn: 'y', ref: 1.0 },
    { l: 500, fn: 'y', ref: 0.323 }, { l: 450, fn: 'z', ref: 1.7471 }, { l: 650, fn: 'x', ref: 0.2835 },
  ] as const)('gives $fn̄($l nm) ≈ $ref within 0.025 of the CIE table', ({ l, fn, ref }) => {
    expect(Math.abs(CMF_SAMPLES[fn][at(l)] - ref)).toBeLessThan(fn === 'z' ? 0.025 * 1.75 : 0.025);
  });

  test('keeps x̄/ȳ at the spectral-locus red end (0.7347/0.2653) beyond 700 nm, and z̄ ≈ 0', () => {
    for (const l of [700, 750, 830]) {
      expect(CMF_SAMPLES.x[at(l)] / CMF_SAMPLES.y[at(l)]).toBeCloseTo(0.7347 / 0.2653, 10);
      expect(CMF_SAMPLES.z[at(l)]).toBeLessThan(1e-6);
    }
  });

  test('is non-negative for ȳ and z̄ everywhere', () => {
    for (let i = 0; i < 471; i++) {
      expect(CMF_SAMPLES.y[i]).toBeGreaterThanOrEqual(0);
      expect(CMF_SAMPLES.z[i]).toBeGreaterThanOrEqual(0);
    }
  });
});
