const INV_SQRT_PI = 1 / Math.sqrt(Math.PI);
const SQRT1_2 = Math.SQRT1_2;

/**
 * erfc(x) for x ≥ 0, to about 1e-15 relative.
 * - x < 1.5: the all-positive series erf x = (2/√π) e^(−x²) Σₙ 2ⁿ x^(2n+1) / (1·3·…·(2n+1))
 *   (Abramowitz & Stegun 1964, 7.1.6), so erfc = 1 − erf with no cancellation inside the sum;
 * - x ≥ 1.5: the continued fraction erfc x = (e^(−x²)/√π) · 1/(x + ½/(x + 1/(x + (3/2)/(x + …))))
 *   (A&S 7.1.14), evaluated by the modified Lentz method (Press et al., Numerical Recipes §5.2).
 */
function erfcPositive(x: number): number {
  const x2 = x * x;
  if (x < 1.5) {
    let term = x;
    let sum = x;
    for (let n = 1; n < 200; n++) {
      term *= (2 * x2) / (2 * n + 1);
      sum += term;
      if (term < sum * 1e-17) break;
    }
    return 1 - 2 * INV_SQRT_PI * Math.exp(-x2) * sum;
  }
  // f = x + a1/(x + a2/(x + …)), a_n = n/2
  const tiny = 1e-300;
  let f = x;
  let C = f;
  let D = 0;
  for (let n = 1; n < 500; n++) {
    const a = n / 2;
    D = x + a * D;
    if (D === 0) D = tiny;
    C = x + a / C;
    if (C === 0) C = tiny;
    D = 1 / D;
    const delta = C * D;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return (INV_SQRT_PI * Math.exp(-x2)) / f;
}

/**
 * The standard normal cumulative distribution Φ(x) = ½ erfc(−x/√2), accurate to about 1e-15
 * relative in both tails (erfc from the Abramowitz & Stegun 1964 series 7.1.6 below 1.5 and
 * continued fraction 7.1.14 from 1.5 up, both exact expansions summed to convergence).
 *
 * @param x standard score (any finite number; ±Infinity give 1 and 0)
 * @returns Φ(x) in [0, 1]
 * @throws RangeError when x is NaN
 * @example normalCdf(1) // 0.8413447460685429
 */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) throw new RangeError('normalCdf: x is NaN');
  if (x === Infinity) return 1;
  if (x === -Infinity) return 0;
  const t = x * SQRT1_2;
  return t < 0 ? 0.5 * erfcPositive(-t) : 1 - 0.5 * erfcPositive(t);
}
