import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { niceDomain } from '../lib/plot/niceDomain.js';
import { niceStep } from '../lib/plot/niceStep.js';
import { niceTicks } from '../lib/plot/niceTicks.js';
import { formatTick } from '../lib/plot/formatTick.js';

// A step is nice when it is 1, 2 or 5 times a power of ten (to 1e-9 relative).
function isNice(step: number): boolean {
  const power = Math.floor(Math.log10(step) + 1e-12);
  const mantissa = step / 10 ** power;
  return [1, 2, 5, 10].some((f) => Math.abs(mantissa - f) < 1e-9 * f);
}

const domain = fc
  .tuple(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1e-6, max: 1e6, noNaN: true }))
  .map(([lo, span]) => [lo, lo + span] as const)
  // spans down to a millionth of the values' size: finer axes are beyond any figure's labels
  .filter(([lo, hi]) => hi - lo > 1e-6 * Math.max(1, Math.abs(lo), Math.abs(hi)));

describe('niceTicks(lo, hi, count)', () => {
  test.each([
    // expected values worked by hand from the 1-2-5 rule (nearest nice step to span / count)
    { lo: 3.42, hi: 4.71, count: 6, ticks: [3.6, 3.8, 4, 4.2, 4.4, 4.6] },
    { lo: -5.9, hi: 6.3, count: 8, ticks: [-4, -2, 0, 2, 4, 6] },
    { lo: 0, hi: 1, count: 5, ticks: [0, 0.2, 0.4, 0.6, 0.8, 1] },
    { lo: 0.1, hi: 0.3, count: 2, ticks: [0.1, 0.2, 0.3] },
    { lo: 3.5, hi: 6.5, count: 6, ticks: [3.5, 4, 4.5, 5, 5.5, 6, 6.5] },
    { lo: 2, hi: 2, count: 6, ticks: [2] },
  ])('niceTicks($lo, $hi, $count) is $ticks', ({ lo, hi, count, ticks }) => {
    expect(niceTicks(lo, hi, count)).toEqual(ticks);
  });

  test('values print exactly (0.3, not 0.30000000000000004)', () => {
    expect(niceTicks(0, 0.9, 9).map(String)).toEqual(['0', '0.1', '0.2', '0.3', '0.4', '0.5', '0.6', '0.7', '0.8', '0.9']);
  });

  test.each([
    { lo: NaN, hi: 1 }, { lo: 0, hi: Infinity }, { lo: 2, hi: 1 },
  ])('niceTicks($lo, $hi) throws RangeError naming the domain', ({ lo, hi }) => {
    expect(() => niceTicks(lo, hi)).toThrow(RangeError);
    expect(() => niceTicks(lo, hi)).toThrow(/axis domain/);
  });

  test('niceTicks(0, 1, 0) throws RangeError naming the count', () => {
    expect(() => niceTicks(0, 1, 0)).toThrow(/tick count 0/);
  });

  test('property: ticks lie inside the domain, strictly increase, and step evenly by a nice step', () => {
    fc.assert(
      fc.property(domain, fc.integer({ min: 1, max: 20 }), ([lo, hi], count) => {
        const ticks = niceTicks(lo, hi, count);
        const step = niceStep(lo, hi, count);
        expect(isNice(step)).toBe(true);
        const slack = 1e-9 * Math.max(Math.abs(lo), Math.abs(hi), step);
        for (const t of ticks) {
          expect(t).toBeGreaterThanOrEqual(lo - slack);
          expect(t).toBeLessThanOrEqual(hi + slack);
          // every tick is a whole multiple of the step
          expect(Math.abs(t / step - Math.round(t / step))).toBeLessThan(1e-6);
        }
        for (let k = 1; k < ticks.length; k++) {
          expect(ticks[k]).toBeGreaterThan(ticks[k - 1]);
          // difference of two doubles of size |t|: exact to about 1e-15 |t|
          expect(Math.abs(ticks[k] - ticks[k - 1] - step)).toBeLessThanOrEqual(1e-9 * step + 1e-14 * Math.abs(ticks[k]));
        }
      }),
      { numRuns: 1000 },
    );
  });

  test('property: the step is within 0.63–1.59 × span / count, so the tick count stays near count', () => {
    fc.assert(
      fc.property(domain, fc.integer({ min: 1, max: 20 }), ([lo, hi], count) => {
        const raw = (hi - lo) / count;
        const ratio = niceStep(lo, hi, count) / raw;
        expect(ratio).toBeGreaterThanOrEqual(0.63);
        expect(ratio).toBeLessThanOrEqual(1.59);
        const n = niceTicks(lo, hi, count).length;
        expect(n).toBeLessThanOrEqual(Math.floor(count / 0.63) + 2);
        expect(n).toBeGreaterThanOrEqual(Math.floor(count / 1.59));
      }),
      { numRuns: 1000 },
    );
  });
});

describe('niceDomain(lo, hi, count)', () => {
  test('niceDomain(3.42, 4.71, 6) is [3.4, 4.8]', () => {
    expect(niceDomain(3.42, 4.71, 6)).toEqual([3.4, 4.8]);
  });

  test('property: the widened domain holds the input and starts and ends on a tick', () => {
    fc.assert(
      fc.property(domain, fc.integer({ min: 2, max: 12 }), ([lo, hi], count) => {
        const [a, b] = niceDomain(lo, hi, count);
        expect(a).toBeLessThanOrEqual(lo);
        expect(b).toBeGreaterThanOrEqual(hi);
        const ticks = niceTicks(a, b, count);
        expect(ticks[0]).toBe(a);
        expect(ticks[ticks.length - 1]).toBe(b);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('formatTick(value, step)', () => {
  test.each([
    { value: -2, step: 1, text: '\u22122' },
    { value: 3.6, step: 0.2, text: '3.6' },
    { value: 4, step: 0.2, text: '4.0' },
    { value: 0, step: 0.5, text: '0.0' },
    { value: 1000, step: 500, text: '1000' },
    { value: -0.05, step: 0.05, text: '\u22120.05' },
  ])('formatTick($value, $step) is $text', ({ value, step, text }) => {
    expect(formatTick(value, step)).toBe(text);
  });
});
