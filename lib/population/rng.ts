import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import { splitMix64 } from './splitMix64.js';

/** A star's own random stream: uniform draws strictly inside (0, 1). */
export interface StarRng {
  /** The next uniform variate in (0, 1): a midpoint of the 2⁻⁵² grid, never 0 or 1. */
  uniform(): number;
}

const MAX_SEED = Number.MAX_SAFE_INTEGER;
const TWO_M52 = 2 ** -52;
const WORDS = new Uint32Array(2);

/**
 * The random stream of star `index` of a population seeded with `seed`.
 *
 * Algorithm: xoroshiro128+ (Blackman & Vigna 2018, "Scrambled linear pseudorandom number
 * generators", ACM TOMS 47(4), 2021), as implemented by the `pure-rand` package
 * (`pure-rand/generator/xoroshiro128plus`, v8.4.2). Its 128-bit state is seeded, as its
 * authors recommend, from SplitMix64 ({@link splitMix64}): star i takes outputs 2i + 1 and
 * 2i + 2 of the SplitMix64 stream whose initial state is `seed`. So star i's draws depend only
 * on (seed, i) — never on how many stars are drawn before it — and a population split into
 * shards (index ranges) and concatenated is identical to one run. SplitMix64 is a bijection of
 * its state, so two consecutive outputs are never both zero (xoroshiro's one forbidden state).
 *
 * Each uniform takes the top 26 bits of two successive 32-bit generator words (pure-rand returns
 * the low half of the 64-bit xoroshiro128+ sum; its lowest bits are the generator's weakest, so
 * they are dropped) and returns (k + ½)·2⁻⁵², k ∈ [0, 2⁵²): strictly inside (0, 1), so inverse
 * CDFs never see 0 or 1.
 *
 * @param seed non-negative safe integer (0 ≤ seed ≤ 2⁵³ − 1)
 * @param index star index, non-negative safe integer with 2·index + 2 ≤ 2⁵³ − 1
 * @returns the star's stream
 * @throws RangeError naming seed or index when it is not such an integer
 * @example rng(7, 0).uniform() // the same number on every run and every machine
 */
export function rng(seed: number, index: number): StarRng {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed ${seed} must be an integer in 0–${MAX_SEED}`);
  }
  if (!Number.isSafeInteger(index) || index < 0 || 2 * index + 2 > MAX_SEED) {
    throw new RangeError(`index ${index} must be an integer in 0–${(MAX_SEED - 2) / 2}`);
  }
  splitMix64(seed, 2 * index + 1, WORDS);
  const s0Hi = WORDS[0];
  const s0Lo = WORDS[1];
  splitMix64(seed, 2 * index + 2, WORDS);
  // pure-rand's state order: [s0 high, s0 low, s1 high, s1 low]
  const g = xoroshiro128plusFromState([s0Hi | 0, s0Lo | 0, WORDS[0] | 0, WORDS[1] | 0]);
  return {
    uniform(): number {
      const a = g.next() >>> 6;
      const b = g.next() >>> 6;
      return (a * 67108864 + b + 0.5) * TWO_M52;
    },
  };
}
