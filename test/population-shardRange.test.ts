import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { shardRange } from '../lib/population/shardRange.js';

describe('shardRange(size, i, n)', () => {
  test.each([
    { size: 10, i: 0, n: 3, start: 0, count: 3 },
    { size: 10, i: 1, n: 3, start: 3, count: 3 },
    { size: 10, i: 2, n: 3, start: 6, count: 4 },
    { size: 2, i: 4, n: 5, start: 1, count: 1 },
    { size: 0, i: 0, n: 1, start: 0, count: 0 },
  ])('shardRange($size, $i, $n) is stars $start… ($count)', ({ size, i, n, start, count }) => {
    expect(shardRange(size, i, n)).toEqual({ start, count });
  });

  test('shardRange: shards 0…n−1 are contiguous, cover every star once and differ by at most one (property)', () => {
    fc.assert(
      fc.property(fc.nat({ max: 4294967295 }), fc.integer({ min: 1, max: 5000 }), (size, n) => {
        let next = 0;
        let min = Infinity;
        let max = -Infinity;
        for (let i = 0; i < n; i++) {
          const { start, count } = shardRange(size, i, n);
          expect(start).toBe(next);
          next = start + count;
          min = Math.min(min, count);
          max = Math.max(max, count);
        }
        expect(next).toBe(size);
        expect(max - min).toBeLessThanOrEqual(1);
      }),
      { numRuns: 200 },
    );
  });

  test.each([
    { args: [-1, 0, 1], message: /size -1/ },
    { args: [10, 3, 3], message: /shard i 3 must be an integer 0–2/ },
    { args: [10, 0, 0], message: /shard count n 0/ },
    { args: [10, 0.5, 2], message: /shard i 0.5/ },
  ])('shardRange($args) throws a RangeError naming the argument', ({ args, message }) => {
    expect(() => shardRange(args[0], args[1], args[2])).toThrow(message);
  });
});
