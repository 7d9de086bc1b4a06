import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inverseNormal } from '../lib/population/inverseNormal.js';
import { normalCdf } from '../lib/population/normalCdf.js';

describe('inverseNormal(p)', () => {
  // standard normal quantiles (from memory; standard tables): tolerance 1e-13 relative
  test.each([
    { p: 0.975, x: 1.959963984540054 },
    { p: 0.5, x: 0 },
    { p: 0.8413447460685429, x: 1 },
    { p: 0.001, x: -3.090232306167813 },
    { p: 1e-10, x: -6.361340902404056 },
  ])('inverseNormal($p) is $x', ({ p, x }) => {
    expect(Math.abs(inverseNormal(p) - x)).toBeLessThanOrEqual(1e-13 * Math.max(1, Math.abs(x)));
  });

  // Tolerance 2e-14·(1 + x²) relative: a one-ulp change of x moves Φ(x) by about x²·2⁻⁵² relative in the tails,
  // so that is the best any double x can do there.
  test('normalCdf(inverseNormal(p)) returns p within 2e-14·(1 + x²) relative, tails included (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-300, max: 0.5, noNaN: true }), fc.boolean(), (q, upper) => {
        const p = upper ? 1 - q : q;
        if (!(p > 0 && p < 1)) return;
        const x = inverseNormal(p);
        const back = upper ? normalCdf(-x) : normalCdf(x);
        const target = upper ? 1 - p : p;
        expect(Math.abs(back / target - 1)).toBeLessThan(2e-14 * (1 + x * x));
      }),
      { numRuns: 3000 },
    );
  });

  test.each([0, 1, -0.1, 1.5, NaN])('inverseNormal(%s) throws a RangeError', (p) => {
    expect(() => inverseNormal(p)).toThrow(/strictly between 0 and 1/);
  });
});
