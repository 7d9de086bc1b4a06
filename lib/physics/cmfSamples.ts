import { smoothBlend } from './smoothBlend.js';

/**
 * Piecewise Gaussian lobe of Wyman, Sloan & Shirley 2013 (JCGT 2(2), 1–11, eq. 3):
 * exp(−½ ((λ − μ)/σ)²) with σ = σ1 below μ and σ2 above; λ, μ, σ in nm.
 */
function lobe(l: number, mu: number, s1: number, s2: number): number {
  const t = (l - mu) / (l < mu ? s1 : s2);
  return Math.exp(-0.5 * t * t);
}

/** x̄/ȳ at the red end of the CIE 1931 spectral locus, x = 0.7347, y = 0.2653 for
 * λ ≥ 700 nm (CIE 15:2004 tables; from memory): 0.7347 / 0.2653. */
const RED_END_RATIO = 0.7347 / 0.2653;

/**
 * CIE 1931 2° colour-matching functions x̄, ȳ, z̄ sampled at 1 nm over 360–830 nm, from the
 * multi-lobe piecewise-Gaussian fit of Wyman, Sloan & Shirley 2013 (JCGT 2(2), eq. 2;
 * coefficients from memory, verified here only through the chromaticity checks in the tests):
 *   x̄ = 1.056 g(599.8, 37.9, 31.0) + 0.362 g(442.0, 16.0, 26.7) − 0.065 g(501.1, 20.4, 26.2)
 *   ȳ = 0.821 g(568.8, 46.9, 40.5) + 0.286 g(530.9, 16.3, 31.1)
 *   z̄ = 1.217 g(437.0, 11.8, 36.0) + 0.681 g(459.0, 26.0, 13.8)
 *
 * One project correction: the fit's x̄ lobe falls off too fast beyond ~660 nm (at 700 nm it
 * gives x̄/ȳ ≈ 1.3 against the CIE table's 2.77), which matters for blackbodies cooler than
 * ~2000 K, whose visible light comes almost wholly from the far red. Over 660–700 nm x̄ is
 * blended (smoothstep) into ȳ × 0.7347/0.2653, the ratio at the red end of the CIE 1931
 * spectral locus, and kept at that ratio beyond; so the coolest bodies tend to the locus' red
 * end as real observers see them. Effect at 2848 K: x shifts by +0.0013 toward the CIE value.
 *
 * Columns: `lambda` nm; `x`, `y`, `z` dimensionless (peak ȳ ≈ 1). Computed once at load.
 *
 * @example
 * CMF_SAMPLES.lambda[195]; // 555
 */
export const CMF_SAMPLES = (() => {
  const n = 830 - 360 + 1;
  const lambda = new Float64Array(n);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const l = 360 + i;
    lambda[i] = l;
    const yy = 0.821 * lobe(l, 568.8, 46.9, 40.5) + 0.286 * lobe(l, 530.9, 16.3, 31.1);
    const xfit = 1.056 * lobe(l, 599.8, 37.9, 31.0) + 0.362 * lobe(l, 442.0, 16.0, 26.7) -
      0.065 * lobe(l, 501.1, 20.4, 26.2);
    const w = smoothBlend(l, 660, 700);
    x[i] = (1 - w) * xfit + w * RED_END_RATIO * yy;
    y[i] = yy;
    z[i] = 1.217 * lobe(l, 437.0, 11.8, 36.0) + 0.681 * lobe(l, 459.0, 26.0, 13.8);
  }
  return Object.freeze({ lambda, x, y, z });
})();
