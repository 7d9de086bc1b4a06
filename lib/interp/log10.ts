/**
 * log10(x) for the interpolator's hot loop, table-driven after Tang 1990 ("Table-driven
 * implementation of the logarithm function in IEEE floating-point arithmetic", ACM
 * Transactions on Mathematical Software 16, 378–400): x = 2^e · m with m in [1, 2); with
 * c = 1 + k/256 the table node at or below m, m − c is exact and t = (m − c)/c < 1/256, so
 * log10 x = e·log10 2 + log10 c + log1p(t)/ln 10, log1p by its Taylor series to t⁷ (remainder
 * below 1e-20). The exponent is read from the double's bits and m is x scaled by a table power
 * of two (exact). It agrees with Math.log10 to within 2.5e-16 · max(1, |log10 x|) over the
 * normal range (test/interp-log10.test.ts) and in V8 costs less than Math.log. Zero, negative, subnormal,
 * infinite and NaN arguments go to Math.log10, so those edges are exactly the library's.
 */

const F64 = new Float64Array(1);
const U32 = new Uint32Array(F64.buffer);
/** index of the high 32-bit word of a double in U32 (1 on little-endian machines) */
const HI = new Uint8Array(Uint16Array.of(1).buffer)[0] === 1 ? 1 : 0;

const BITS = 8;
const NODES = 1 << BITS;
/** 1 / c_k for the nodes c_k = 1 + k/256 */
const INV_C = Float64Array.from({ length: NODES }, (_, k) => 1 / (1 + k / NODES));
/** log10(c_k) */
const LOG10_C = Float64Array.from({ length: NODES }, (_, k) => Math.log10(1 + k / NODES));
/** 2^−e at [e + 1022], e = −1022 … 1023 (exact powers of two) */
const INV_POW2 = Float64Array.from({ length: 2046 }, (_, i) => 2 ** -(i - 1022));
const LOG10_2 = Math.log10(2);
const INV_LN10 = 1 / Math.LN10;

/** log10(x) (see the module's comment for the method and its accuracy). */
export function log10(x: number): number {
  F64[0] = x;
  const hi = U32[HI];
  // positive normal numbers only: sign clear, exponent neither 0 nor all ones
  if (hi < 0x00100000 || hi >= 0x7ff00000) return Math.log10(x);
  const e = (hi >>> 20) - 1023;
  const k = (hi >>> (20 - BITS)) & (NODES - 1);
  const m = x * INV_POW2[e + 1022];
  const t = (m - (1 + k / NODES)) * INV_C[k];
  const p = t + t * t * (-1 / 2 + t * (1 / 3 + t * (-1 / 4 + t * (1 / 5 + t * (-1 / 6 + t * (1 / 7))))));
  return e * LOG10_2 + (LOG10_C[k] + p * INV_LN10);
}
