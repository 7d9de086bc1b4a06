import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { rng } from '../lib/population/rng.js';

const MASK = (1n << 64n) - 1n;
const rotl = (x: bigint, k: bigint) => ((x << k) | (x >> (64n - k))) & MASK;
function splitmix(seed: bigint, k: bigint): bigint {
  let z = (seed + k * 0x9e3779b97f4a7c15n) & MASK;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK;
  return z ^ (z >> 31n);
}
/**
 * Independent reference of the documented stream: xoroshiro128+ (Blackman & Vigna, reference
 * xoroshiro128plus.c: result = s0 + s1; s1 ^= s0; s0 = rotl(s0, 24) ^ s1 ^ (s1 << 16); s1 = rotl(s1, 37))
 * seeded with SplitMix64 outputs 2i+1, 2i+2; 32-bit words are the low halves of the sums;
 * uniform = ((w1 >>> 6)·2²⁶ + (w2 >>> 6) + ½)·2⁻⁵².
 */
function referenceUniforms(seed: number, index: number, count: number): number[] {
  let s0 = splitmix(BigInt(seed), BigInt(2 * index + 1));
  let s1 = splitmix(BigInt(seed), BigInt(2 * index + 2));
  const word = () => {
    const result = (s0 + s1) & MASK;
    s1 ^= s0;
    s0 = rotl(s0, 24n) ^ s1 ^ ((s1 << 16n) & MASK);
    s1 = rotl(s1, 37n);
    return Number(result & 0xffffffffn);
  };
  const out: number[] = [];
  for (let k = 0; k < count; k++) {
    const a = word() >>> 6;
    const b = word() >>> 6;
    out.push((a * 2 ** 26 + b + 0.5) * 2 ** -52);
  }
  return out;
}

describe('rng(seed, index)', () => {
  test('rng(seed, index) draws the documented SplitMix64-seeded xoroshiro128+ stream (independent BigInt reference)', () => {
    fc.assert(
      fc.property(fc.maxSafeNat(), fc.nat({ max: 2 ** 40 }), (seed, index) => {
        const r = rng(seed, index);
        const got = [r.uniform(), r.uniform(), r.uniform(), r.uniform()];
        expect(got).toEqual(referenceUniforms(seed, index, 4));
      }),
      { numRuns: 300 },
    );
  });

  test('rng(seed, index).uniform() stays strictly inside (0, 1) with mean ½ and variance 1/12', () => {
    // uniform on (0,1): mean 1/2, variance 1/12 (exact); 2e5 draws, tolerance 5 standard errors
    const n = 200000;
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n / 4; i++) {
      const r = rng(12345, i);
      for (let k = 0; k < 4; k++) {
        const u = r.uniform();
        expect(u > 0 && u < 1).toBe(true);
        s += u;
        s2 += u * u;
      }
    }
    const mean = s / n;
    const variance = s2 / n - mean * mean;
    expect(Math.abs(mean - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(5 * Math.sqrt(1 / 180 / n)); // Var(u²-ish) bound: Var[(u−½)²] = 1/180
  });

  test('rng(seed, index) is deterministic and independent of the order streams are made in (property)', () => {
    fc.assert(
      fc.property(fc.maxSafeNat(), fc.array(fc.nat({ max: 1e9 }), { minLength: 1, maxLength: 20 }), (seed, indices) => {
        const first = indices.map((i) => rng(seed, i).uniform());
        const again = [...indices].reverse().map((i) => rng(seed, i).uniform()).reverse();
        expect(again).toEqual(first);
      }),
    );
  });

  test('rng(seed, index) differs between neighbouring seeds and neighbouring indices', () => {
    const a = rng(7, 0).uniform();
    expect(rng(8, 0).uniform()).not.toBe(a);
    expect(rng(7, 1).uniform()).not.toBe(a);
  });

  test.each([
    { seed: -1, index: 0, message: /seed -1 must be an integer/ },
    { seed: 1.5, index: 0, message: /seed 1.5 must be an integer/ },
    { seed: 2 ** 53, index: 0, message: /seed 9007199254740992/ },
    { seed: 1, index: -3, message: /index -3 must be an integer/ },
    { seed: 1, index: 2 ** 52, message: /index 4503599627370496/ },
  ])('rng($seed, $index) throws a RangeError naming the argument', ({ seed, index, message }) => {
    expect(() => rng(seed, index)).toThrow(RangeError);
    expect(() => rng(seed, index)).toThrow(message);
  });
});
