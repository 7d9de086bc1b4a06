import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { findInterval } from '../lib/interp/bisect.js';

const X = [0, 1, 2, 3];

describe('findInterval(x, xq)', () => {
  // Expected indices follow from the definition x[i] <= xq < x[i+1], clamped to [0, n-2].
  test.each([
    { name: 'inside the first interval', xq: 0.5, want: 0 },
    { name: 'inside a middle interval', xq: 1.5, want: 1 },
    { name: 'on the first node', xq: 0, want: 0 },
    { name: 'on an interior node (starts its interval)', xq: 1, want: 1 },
    { name: 'on the last interior node', xq: 2, want: 2 },
    { name: 'on the last node (clamped)', xq: 3, want: 2 },
    { name: 'below the range (clamped)', xq: -5, want: 0 },
    { name: 'above the range (clamped)', xq: 99, want: 2 },
    { name: '-Infinity', xq: -Infinity, want: 0 },
    { name: '+Infinity', xq: Infinity, want: 2 },
  ])('returns $want for $name', ({ xq, want }) => {
    expect(findInterval(X, xq)).toBe(want);
  });

  test('returns 0 for every query when there are exactly 2 nodes', () => {
    for (const xq of [-1, 0, 0.5, 1, 2]) expect(findInterval([0, 1], xq)).toBe(0);
  });

  test('works on a Float64Array', () => {
    expect(findInterval(Float64Array.of(10, 20, 40, 80), 45)).toBe(2);
  });

  test('agrees with a linear scan on random ascending nodes (property)', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 2, maxLength: 40 }),
        fc.double({ min: -2e6, max: 2e6, noNaN: true }),
        (raw, xq) => {
          const x = Float64Array.from(raw).sort();
          if (new Set(x).size !== x.length) return; // -0 and 0 are one value once sorted
          const n = x.length;
          let want = 0;
          for (let i = 0; i < n - 1; i++) if (x[i] <= xq) want = i; // last interval starting at or below xq
          const got = findInterval(x, xq);
          expect(got).toBe(want);
          expect(got).toBeGreaterThanOrEqual(0);
          expect(got).toBeLessThanOrEqual(n - 2);
        },
      ),
      { numRuns: 500 },
    );
  });

  test.each([
    { name: 'NaN query', x: X, xq: Number.NaN, type: RangeError, msg: /xq is NaN/ },
    { name: 'one node', x: [1], xq: 1, type: RangeError, msg: /length 1; need at least 2/ },
    { name: 'no nodes', x: [], xq: 1, type: RangeError, msg: /length 0; need at least 2/ },
    { name: 'non-array x', x: null as unknown as number[], xq: 1, type: TypeError, msg: /array-like/ },
    { name: 'non-number query', x: X, xq: '1' as unknown as number, type: TypeError, msg: /xq must be a number, got string/ },
  ])('throws on $name', ({ x, xq, type, msg }) => {
    expect(() => findInterval(x, xq)).toThrow(type);
    expect(() => findInterval(x, xq)).toThrow(msg);
  });
});
