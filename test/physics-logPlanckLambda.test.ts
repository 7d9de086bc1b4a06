import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { C2_RADIATION } from '../lib/physics/constants.js';
import { logPlanckLambda } from '../lib/physics/logPlanckLambda.js';

describe('logPlanckLambda(lambda, teff, c2)', () => {
  test.each([
    { l: 550e-9, t: 5772 }, { l: 400e-9, t: 3000 }, { l: 700e-9, t: 30000 }, { l: 1e-6, t: 1e6 },
  ])('equals ln[λ⁻⁵/(exp(c2/λT) − 1)] (Planck 1901) at $l m, $t K, 1e-12 relative', ({ l, t }) => {
    const ref = Math.log(l ** -5 / Math.expm1(C2_RADIATION / (l * t)));
    expect(Math.abs(logPlanckLambda(l, t) / ref - 1)).toBeLessThan(1e-12);
  });

  test('peaks at Wien’s displacement λ T = 2.897771955e-3 m K (CODATA 2018) within 0.1 %', () => {
    const t = 5000;
    let best = 0;
    let bestV = -Infinity;
    for (let l = 300e-9; l < 1500e-9; l += 0.1e-9) {
      const v = logPlanckLambda(l, t);
      if (v > bestV) { bestV = v; best = l; }
    }
    expect(Math.abs((best * t) / 2.897771955e-3 - 1)).toBeLessThan(1e-3);
  });

  test('is finite for any λT from 1e-9 to 1e6 m K (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 9, noNaN: true }),
      (ll, lt) => Number.isFinite(logPlanckLambda(360e-9 * 10 ** (ll / 5), 10 ** lt))));
  });
});
