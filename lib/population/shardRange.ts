/**
 * The stars of shard `i` of `n`: a contiguous index range. Shards 0 … n−1 cover 0 … size−1
 * exactly once, in order, and differ in length by at most one star
 * (start = ⌊i·size/n⌋, end = ⌊(i+1)·size/n⌋). Since every star's values depend only on the
 * seed and its index ({@link rng}), running the shards anywhere and concatenating them gives
 * exactly one run's output.
 *
 * @param size number of stars, integer ≥ 0
 * @param i shard number, integer 0 ≤ i < n
 * @param n number of shards, integer ≥ 1
 * @returns { start, count }: stars start … start + count − 1
 * @throws RangeError naming size, i or n when it is not such an integer
 * @example shardRange(10, 1, 3) // { start: 3, count: 3 }
 */
export function shardRange(size: number, i: number, n: number): { start: number; count: number } {
  if (!Number.isSafeInteger(size) || size < 0) throw new RangeError(`size ${size} must be an integer ≥ 0`);
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`shard count n ${n} must be an integer ≥ 1`);
  if (!Number.isSafeInteger(i) || i < 0 || i >= n) throw new RangeError(`shard i ${i} must be an integer 0–${n - 1}`);
  // exact integer arithmetic while i·size < 2⁵³
  const cut = (k: number) => (k * size <= Number.MAX_SAFE_INTEGER ? Math.floor((k * size) / n) : Number(BigInt(k) * BigInt(size) / BigInt(n)));
  const start = cut(i);
  return { start, count: cut(i + 1) - start };
}
