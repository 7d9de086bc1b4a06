import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { splitMix64 } from '../lib/population/splitMix64.js';

const MASK = (1n << 64n) - 1n;
/** Reference SplitMix64 written independently here with BigInt (Steele, Lea & Flood 2014; Vigna's splitmix64.c). */
function reference(seed: bigint, position: bigint): bigint {
  let z = (seed + position * 0x9e3779b97f4a7c15n) & MASK;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK;
  return z ^ (z >> 31n);
}
const asBig = (w: Uint32Array) => (BigInt(w[0]) << 32n) | BigInt(w[1]);

describe('splitMix64(seed, position, out)', () => {
  // First outputs of SplitMix64 seeded with 0 (from memory; they agree with the BigInt reference below)
  test.each([
    { position: 1, hex: 'e220a8397b1dcdaf' },
    { position: 2, hex: '6e789e6aa1b965f4' },
    { position: 3, hex: '06c45d188009454f' },
  ])('splitMix64(0, $position) is 0x$hex', ({ position, hex }) => {
    const out = splitMix64(0, position, new Uint32Array(2));
    expect(asBig(out)).toBe(BigInt(`0x${hex}`));
    expect(reference(0n, BigInt(position))).toBe(BigInt(`0x${hex}`));
  });

  test('splitMix64 equals a BigInt reference for any safe seed and position (property)', () => {
    const out = new Uint32Array(2);
    fc.assert(
      fc.property(fc.maxSafeNat(), fc.maxSafeNat(), (seed, position) => {
        splitMix64(seed, position, out);
        return asBig(out) === reference(BigInt(seed), BigInt(position));
      }),
      { numRuns: 2000 },
    );
  });
});
