/** SplitMix64 increment γ = 0x9E3779B97F4A7C15 (the golden-ratio "gamma"), as 32-bit halves. */
const GAMMA_HI = 0x9e3779b9;
const GAMMA_LO = 0x7f4a7c15;
/** First and second mixing multipliers of SplitMix64's finaliser (Steele, Lea & Flood 2014). */
const M1_HI = 0xbf58476d;
const M1_LO = 0x1ce4e5b9;
const M2_HI = 0x94d049bb;
const M2_LO = 0x133111eb;
const TWO32 = 4294967296;

// 64-bit scratch result of mul64 / add64 (high and low unsigned 32-bit words)
let rHi = 0;
let rLo = 0;

/** (ah·2³² + al) × (bh·2³² + bl) mod 2⁶⁴ into rHi, rLo; exact through 16-bit limbs. */
function mul64(ah: number, al: number, bh: number, bl: number): void {
  const a0 = al & 0xffff;
  const a1 = al >>> 16;
  const b0 = bl & 0xffff;
  const b1 = bl >>> 16;
  const p00 = a0 * b0;
  const p01 = a0 * b1;
  const p10 = a1 * b0;
  const p11 = a1 * b1;
  const mid = (p00 >>> 16) + (p01 & 0xffff) + (p10 & 0xffff);
  const carry = p11 + (p01 >>> 16) + (p10 >>> 16) + (mid >>> 16);
  rLo = ((mid & 0xffff) * 65536 + (p00 & 0xffff)) >>> 0;
  rHi = (carry + Math.imul(ah, bl) + Math.imul(al, bh)) >>> 0;
}

/**
 * Output number `position` (1, 2, 3, …) of the SplitMix64 generator seeded with `seed`,
 * computed directly, without stepping through the earlier outputs.
 *
 * SplitMix64 (Steele, Lea & Flood 2014, "Fast splittable pseudorandom number generators",
 * OOPSLA '14; the 64-bit finaliser constants as in Vigna's reference `splitmix64.c`): the
 * state advances by γ = 0x9E3779B97F4A7C15 per output, and output k is the mix of
 * state₀ + k·γ (mod 2⁶⁴):
 * z ← (z ⊕ z≫30)·0xBF58476D1CE4E5B9; z ← (z ⊕ z≫27)·0x94D049BB133111EB; z ⊕ z≫31.
 * Because output k depends only on (seed, k), it serves as a counter-based hash: this is how
 * each star's own stream is seeded (see {@link rng}). All 64-bit arithmetic is done exactly in
 * 32-bit halves (no BigInt, no allocation).
 *
 * @param seed the 64-bit initial state, given as a non-negative safe integer (0 ≤ seed < 2⁵³)
 * @param position the output number, a non-negative safe integer (1 is the first output)
 * @param out receives the output as two unsigned 32-bit words: out[0] high, out[1] low
 * @returns out
 * @throws nothing (callers validate seed and position)
 * @example splitMix64(0, 1, new Uint32Array(2)) // [0xe220a839, 0x7b1dcdaf]
 */
export function splitMix64(seed: number, position: number, out: Uint32Array): Uint32Array {
  const sHi = Math.floor(seed / TWO32) >>> 0;
  const sLo = seed >>> 0;
  // state = seed + position·γ (mod 2⁶⁴)
  mul64(Math.floor(position / TWO32) >>> 0, position >>> 0, GAMMA_HI, GAMMA_LO);
  let lo = sLo + rLo;
  let hi = (sHi + rHi + (lo >= TWO32 ? 1 : 0)) >>> 0;
  lo >>>= 0;
  // z ^= z >>> 30; z *= M1
  let xl = (lo >>> 30) | (hi << 2);
  let xh = hi >>> 30;
  mul64((hi ^ xh) >>> 0, (lo ^ xl) >>> 0, M1_HI, M1_LO);
  hi = rHi;
  lo = rLo;
  // z ^= z >>> 27; z *= M2
  xl = (lo >>> 27) | (hi << 5);
  xh = hi >>> 27;
  mul64((hi ^ xh) >>> 0, (lo ^ xl) >>> 0, M2_HI, M2_LO);
  hi = rHi;
  lo = rLo;
  // z ^= z >>> 31
  xl = (lo >>> 31) | (hi << 1);
  xh = hi >>> 31;
  out[0] = hi ^ xh;
  out[1] = lo ^ xl;
  return out;
}
