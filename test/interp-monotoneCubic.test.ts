import { createRequire } from 'node:module';
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { monotoneCubic, type MonotoneCubicMethod } from '../lib/interp/monotoneCubic.js';

// Oracle: the registry package cubic-hermite-spline 1.0.1 (CommonJS, no types). Read from its
// index.js: interpolate(t, points, tangents, knots?, derivative?, result?) where points and
// tangents are arrays of vectors (here 1-vectors [v]), tangents are dy/dx in data units (it
// multiplies them by the knot spacing itself), knots are the x positions, and with
// derivative = true it returns d/du on the unit parameter u = (t - k0)/(k1 - k0), so dy/dx is
// that divided by (k1 - k0). It throws outside [knots[0], knots[n-1]].
type HermiteOracle = (
  t: number,
  points: number[][],
  tangents: number[][],
  knots?: number[],
  derivative?: boolean,
) => number[];
const hermite = createRequire(import.meta.url)('cubic-hermite-spline') as HermiteOracle;

const METHODS: MonotoneCubicMethod[] = ['steffen', 'fritsch-carlson'];

/** |got − want| ≤ rel · max(scale, |want|) — one helper, tolerance chosen per check. */
function expectClose(got: number, want: number, rel: number, scale = 0): void {
  const tol = rel * Math.max(scale, Math.abs(want));
  if (!(Math.abs(got - want) <= tol)) {
    throw new Error(`expected ${got} to be within ${tol} of ${want} (|diff| = ${Math.abs(got - want)})`);
  }
}

// ---------------------------------------------------------------------------------------------
// Generators: strictly increasing x from positive gaps, y either free or monotone.

const gaps = (min: number, max: number) =>
  fc.array(fc.double({ min: 1e-3, max: 10, noNaN: true }), { minLength: min - 1, maxLength: max - 1 });

function cumulative(start: number, steps: number[]): number[] {
  const out = [start];
  for (const d of steps) out.push(out[out.length - 1] + d);
  return out;
}

/**
 * Ordinary magnitudes for the comparisons: values below 1e-12 in size become exact 0 (flats
 * stay in the mix; subnormals are exercised separately in the robustness property).
 */
const tame = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true }).map((v) => (Math.abs(v) < 1e-12 ? 0 : v));

/** Nodes with monotone y: increments ≥ 0 (with exact flats), optionally mirrored to decreasing. */
const monotoneData = fc
  .integer({ min: 2, max: 25 })
  .chain((n) =>
    fc.record({
      x0: fc.double({ min: -100, max: 100, noNaN: true }),
      dx: fc.array(fc.double({ min: 1e-3, max: 10, noNaN: true }), { minLength: n - 1, maxLength: n - 1 }),
      y0: fc.double({ min: -100, max: 100, noNaN: true }),
      dy: fc.array(fc.oneof(fc.constant(0), tame(0, 50)), {
        minLength: n - 1,
        maxLength: n - 1,
      }),
      decreasing: fc.boolean(),
    }),
  )
  .map(({ x0, dx, y0, dy, decreasing }) => ({
    x: cumulative(x0, dx),
    y: cumulative(y0, decreasing ? dy.map((d) => -d) : dy),
  }))
  .filter(({ x }) => x.every((v, i) => i === 0 || v > x[i - 1]));

/** Nodes with arbitrary y (local extrema, flats, sign changes). */
const freeData = fc
  .integer({ min: 2, max: 25 })
  .chain((n) =>
    fc.record({
      x0: fc.double({ min: -100, max: 100, noNaN: true }),
      dx: fc.array(fc.double({ min: 1e-3, max: 10, noNaN: true }), { minLength: n - 1, maxLength: n - 1 }),
      y: fc.array(fc.oneof(fc.constant(0), tame(-1e3, 1e3)), {
        minLength: n,
        maxLength: n,
      }),
    }),
  )
  .map(({ x0, dx, y }) => ({ x: cumulative(x0, dx), y }))
  .filter(({ x }) => x.every((v, i) => i === 0 || v > x[i - 1]));

/** Query fractions in [0, 1] mapped onto [x0, xn]. */
const fractions = fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 60 });

function intervalOf(x: number[], xq: number): number {
  let i = 0;
  while (i < x.length - 2 && x[i + 1] <= xq) i++;
  return i;
}

// ---------------------------------------------------------------------------------------------
// Independent test-side slope rules, written from the papers' statements.

/**
 * Fritsch & Carlson 1980 (SIAM J. Numer. Anal. 17, 238), the original algorithm as stated in
 * the paper's steps: (1) three-point derivative estimates (interior: derivative of the parabola
 * through three neighbours; ends: the same parabola's derivative at the end node); (2) zero at
 * data extrema/flats and where an end estimate points against its secant; (3) for each interval
 * left to right, if α² + β² > 9 scale both by τ = 3/√(α² + β²).
 */
function referenceFritschCarlson(x: number[], y: number[]): number[] {
  const n = x.length;
  const h: number[] = [];
  const d: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(x[i + 1] - x[i]);
    d.push((y[i + 1] - y[i]) / h[i]);
  }
  if (n === 2) return [d[0], d[0]];
  const m: number[] = new Array(n).fill(0);
  for (let i = 1; i < n - 1; i++) {
    // Parabola through (x[i-1], x[i], x[i+1]); its derivative at x[i] (Lagrange form).
    const inner = (h[i] * d[i - 1] + h[i - 1] * d[i]) / (h[i - 1] + h[i]);
    m[i] = d[i - 1] * d[i] > 0 ? inner : 0;
  }
  const left = ((2 * h[0] + h[1]) * d[0] - h[0] * d[1]) / (h[0] + h[1]);
  m[0] = left * d[0] > 0 ? left : 0;
  const a = h[n - 2];
  const b = h[n - 3];
  const right = ((2 * a + b) * d[n - 2] - a * d[n - 3]) / (a + b);
  m[n - 1] = right * d[n - 2] > 0 ? right : 0;
  for (let i = 0; i < n - 1; i++) {
    if (d[i] === 0) continue;
    const al = m[i] / d[i];
    const be = m[i + 1] / d[i];
    if (al * al + be * be > 9) {
      const tau = 3 / Math.hypot(al, be);
      m[i] = tau * al * d[i];
      m[i + 1] = tau * be * d[i];
    }
  }
  return m;
}

/**
 * Steffen 1990 (A&A 239, 443) in its case form (the paper states eq. 11 as the compact form
 * of these cases): y' = 0 if s[i-1]·s[i] ≤ 0; else 2·sign·min(|s[i-1]|, |s[i]|) if |p| exceeds
 * twice either secant; else p. Ends (eqs. 26–27): end-parabola slope p, 0 if p·s ≤ 0, 2s if
 * |p| > 2|s|, else p.
 */
function referenceSteffen(x: number[], y: number[]): number[] {
  const n = x.length;
  const h: number[] = [];
  const s: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(x[i + 1] - x[i]);
    s.push((y[i + 1] - y[i]) / h[i]);
  }
  if (n === 2) return [s[0], s[0]];
  const m: number[] = new Array(n).fill(0);
  for (let i = 1; i < n - 1; i++) {
    const p = (s[i - 1] * h[i] + s[i] * h[i - 1]) / (h[i - 1] + h[i]);
    if (s[i - 1] * s[i] <= 0) m[i] = 0;
    else if (Math.abs(p) > 2 * Math.abs(s[i - 1]) || Math.abs(p) > 2 * Math.abs(s[i]))
      m[i] = 2 * Math.sign(s[i]) * Math.min(Math.abs(s[i - 1]), Math.abs(s[i]));
    else m[i] = p;
  }
  const end = (p: number, se: number) => (p * se <= 0 ? 0 : Math.abs(p) > 2 * Math.abs(se) ? 2 * se : p);
  m[0] = end(s[0] * (1 + h[0] / (h[0] + h[1])) - (s[1] * h[0]) / (h[0] + h[1]), s[0]);
  const hl = h[n - 2];
  const hp = h[n - 3];
  m[n - 1] = end(s[n - 2] * (1 + hl / (hl + hp)) - (s[n - 3] * hl) / (hl + hp), s[n - 2]);
  return m;
}

// ---------------------------------------------------------------------------------------------

describe('monotoneCubic(x, y, { method: "steffen" }) worked checks', () => {
  // Hand derivations from Steffen 1990 (A&A 239, 443): h = widths, s = secants,
  // interior p[i] = (s[i-1] h[i] + s[i] h[i-1]) / (h[i-1] + h[i]),
  // y'[i] = (sign s[i-1] + sign s[i]) · min(|s[i-1]|, |s[i]|, |p[i]|/2)              (eq. 11)
  // end p = s_end (1 + w) − s_next w, w = h_end/(h_end + h_next); 0 if p·s_end ≤ 0,
  // 2 s_end if |p| > 2|s_end|, else p                                             (eqs. 26–27)
  test.each([
    {
      // s = [1, 0]. Interior: p1 = (1·1 + 0·1)/2 = 0.5; signs 1 + 0 = 1; min(1, 0, 0.25) = 0 → 0.
      // Left: w = 1/2, p0 = 1·1.5 − 0·0.5 = 1.5, same sign, 1.5 ≤ 2 → 1.5.
      // Right: p2 = 0·1.5 − 1·0.5 = −0.5, p2·s1 = 0 ≤ 0 → 0.
      name: 'x=[0,1,2], y=[0,1,1] (flat end)',
      x: [0, 1, 2],
      y: [0, 1, 1],
      slopes: [1.5, 0, 0],
    },
    {
      // h = [1, 2], s = [2, 0.5]. Interior: p1 = (2·2 + 0.5·1)/3 = 1.5; 2·min(2, 0.5, 0.75) = 1.
      // Left: w = 1/3, p0 = 2·4/3 − 0.5/3 = 2.5 ≤ 4 → 2.5.
      // Right: w = 2/3, p2 = 0.5·5/3 − 2·2/3 = −0.5, against s1 = 0.5 → 0.
      name: 'x=[0,1,3], y=[0,2,3] (uneven spacing)',
      x: [0, 1, 3],
      y: [0, 2, 3],
      slopes: [2.5, 1, 0],
    },
    {
      // s = [1, −3]. Interior: signs cancel → 0 (extremum at the node).
      // Left: p0 = 1·1.5 − (−3)·0.5 = 3 > 2·1 → capped at 2.
      // Right: p2 = −3·1.5 − 1·0.5 = −5, same sign as −3, 5 ≤ 6 → −5.
      name: 'x=[0,1,2], y=[0,1,-2] (peak, capped end)',
      x: [0, 1, 2],
      y: [0, 1, -2],
      slopes: [2, 0, -5],
    },
  ])('gives slopes $slopes for $name', ({ x, y, slopes }) => {
    const f = monotoneCubic(x, y);
    expect(f.method).toBe('steffen');
    slopes.forEach((want, i) => expectClose(f.slopes[i], want, 1e-15, 1));
  });

  test('evaluates the Hermite cubic between nodes: x=[0,1,2], y=[0,1,1] at 0.5 is 0.6875', () => {
    // Hand: on [0,1], u = 0.5, Hermite basis h00 = 0.5, h10 = 0.125, h01 = 0.5, h11 = −0.125;
    // f = 0.5·0 + 0.125·1.5 + 0.5·1 − 0.125·0 = 0.6875. f' = m0 + 2·c2·d + 3·c3·d² with
    // c2 = 3·1 − 2·1.5 − 0 = 0, c3 = 1.5 + 0 − 2 = −0.5 → 1.5 − 0.375 = 1.125.
    const f = monotoneCubic([0, 1, 2], [0, 1, 1]);
    expectClose(f(0.5), 0.6875, 1e-15);
    expectClose(f.derivative(0.5), 1.125, 1e-15);
    expect(f(1.5)).toBe(1); // flat interval, both slopes 0
  });

  test('matches the case-form statement of Steffen 1990 on random data (property)', () => {
    fc.assert(
      fc.property(freeData, ({ x, y }) => {
        const f = monotoneCubic(x, y, { method: 'steffen' });
        const want = referenceSteffen(x, y);
        want.forEach((w, i) => expectClose(f.slopes[i], w, 1e-12, 1e-300));
      }),
      { numRuns: 300 },
    );
  });
});

describe('monotoneCubic(x, y, { method: "fritsch-carlson" }) worked checks', () => {
  test('applies the α² + β² ≤ 9 limiter: x=[0,1,2,3], y=[0,1,2,10]', () => {
    // Hand, Fritsch & Carlson 1980 steps: s = [1, 1, 8]; three-point slopes m1 = (1+1)/2 = 1,
    // m2 = (1+8)/2 = 4.5; ends m0 = 1·1.5 − 1·0.5 = 1, m3 = 8·1.5 − 1·0.5 = 11.5.
    // Interval 0: α = β = 1, fine. Interval 1: α = 1, β = 4.5, α²+β² = 21.25 > 9,
    // τ = 3/√21.25 → m1 = 3/√21.25, m2 = 13.5/√21.25. Interval 2: α = m2/8 ≈ 0.366,
    // β = 11.5/8 = 1.4375, α²+β² ≈ 2.2 ≤ 9, unchanged.
    const f = monotoneCubic([0, 1, 2, 3], [0, 1, 2, 10], { method: 'fritsch-carlson' });
    const r = Math.sqrt(21.25);
    [1, 3 / r, 13.5 / r, 11.5].forEach((want, i) => expectClose(f.slopes[i], want, 1e-15));
  });
});

describe('monotoneCubic(x, y, { method: "fritsch-carlson" }) against the cubic-hermite-spline oracle', () => {
  test('slopes equal test-built Fritsch–Carlson tangents and values equal the oracle to 1e-12 (property)', () => {
    fc.assert(
      fc.property(fc.oneof(freeData, monotoneData), fractions, ({ x, y }, us) => {
        const f = monotoneCubic(x, y, { method: 'fritsch-carlson' });
        const tangents = referenceFritschCarlson(x, y);
        tangents.forEach((t, i) => expectClose(f.slopes[i], t, 1e-12, 1e-300));
        const points = y.map((v) => [v]);
        const tans = tangents.map((t) => [t]);
        const x0 = x[0];
        const span = x[x.length - 1] - x0;
        for (const u of us) {
          const xq = Math.min(x0 + u * span, x[x.length - 1]);
          const i = intervalOf(x, xq);
          const local = Math.max(Math.abs(y[i]), Math.abs(y[i + 1]));
          const ref = hermite(xq, points, tans, x)[0];
          expectClose(f(xq), ref, 1e-12, local);
          // The oracle's derivative is d/du on the unit parameter of the interval it picked;
          // at a node it picks the left interval, and C¹ makes the two agree anyway.
          let k = 0;
          while (!(xq >= x[k] && xq <= x[k + 1])) k++;
          const refSlope = hermite(xq, points, tans, x, true)[0] / (x[k + 1] - x[k]);
          const slopeScale = Math.max(Math.abs(tangents[i]), Math.abs(tangents[i + 1]), Math.abs(y[i + 1] - y[i]) / (x[i + 1] - x[i]));
          expectClose(f.derivative(xq), refSlope, 1e-9, slopeScale);
        }
      }),
      { numRuns: 400 },
    );
  });

  test('the oracle also agrees with the steffen evaluation given our Steffen slopes (property)', () => {
    fc.assert(
      fc.property(freeData, fractions, ({ x, y }, us) => {
        const f = monotoneCubic(x, y);
        const points = y.map((v) => [v]);
        const tans = Array.from(f.slopes, (t) => [t]);
        const span = x[x.length - 1] - x[0];
        for (const u of us) {
          const xq = Math.min(x[0] + u * span, x[x.length - 1]);
          const i = intervalOf(x, xq);
          const ref = hermite(xq, points, tans, x)[0];
          expectClose(f(xq), ref, 1e-12, Math.max(Math.abs(y[i]), Math.abs(y[i + 1])));
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe.each(METHODS)('monotoneCubic(x, y, { method: "%s" }) invariants', (method) => {
  test('returns y[i] exactly at every node (property)', () => {
    fc.assert(
      fc.property(freeData, ({ x, y }) => {
        const f = monotoneCubic(x, y, { method });
        x.forEach((xi, i) => expect(f(xi)).toBe(y[i] + 0)); // + 0 folds −0 into 0
      }),
      { numRuns: 300 },
    );
  });

  test.each([
    { name: 'rising, even spacing', a: 2, b: -1, x: [0, 1, 2, 3, 4] },
    { name: 'falling, uneven spacing', a: -0.75, b: 10, x: [-3, -2.5, 0, 0.1, 7, 20] },
    { name: 'steep, tiny spacing', a: 1e6, b: 3, x: [1e-6, 2e-6, 5e-6, 1e-5] },
    { name: 'constant', a: 0, b: 4.2, x: [0, 1, 10] },
    { name: 'two nodes', a: 3, b: 1, x: [2, 5] },
  ])('reproduces linear data ($name) to 1e-13 relative', ({ a, b, x }) => {
    const y = x.map((v) => a * v + b);
    const f = monotoneCubic(x, y, { method });
    const scale = Math.max(...y.map(Math.abs));
    for (let k = 0; k <= 200; k++) {
      const xq = x[0] + ((x[x.length - 1] - x[0]) * k) / 200;
      expectClose(f(xq), a * xq + b, 1e-13, scale);
      expectClose(f.derivative(xq), a, 1e-9, Math.abs(a));
    }
  });

  test('reproduces random linear data (property)', () => {
    fc.assert(
      fc.property(
        gaps(2, 20),
        tame(-100, 100),
        tame(-100, 100),
        fractions,
        (dx, a, b, us) => {
          const x = cumulative(0, dx);
          const y = x.map((v) => a * v + b);
          const f = monotoneCubic(x, y, { method });
          const scale = Math.max(...y.map(Math.abs), Math.abs(a) * x[x.length - 1]);
          for (const u of us) {
            const xq = u * x[x.length - 1];
            expectClose(f(xq), a * xq + b, 1e-12, scale);
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  test('gives monotone output on monotone data (property)', () => {
    fc.assert(
      fc.property(monotoneData, fractions, ({ x, y }, us) => {
        const f = monotoneCubic(x, y, { method });
        const sign = y[y.length - 1] >= y[0] ? 1 : -1;
        const span = x[x.length - 1] - x[0];
        const qs = [...us.map((u) => x[0] + u * span), ...x].sort((p, q) => p - q);
        // Rounding slack only: 1e-13 of the data's magnitude (genuine overshoot is O(Δy)).
        const tol = 1e-13 * Math.max(1, ...y.map(Math.abs));
        let prev = f(qs[0]);
        for (let k = 1; k < qs.length; k++) {
          const v = f(qs[k]);
          expect(sign * (v - prev)).toBeGreaterThanOrEqual(-tol);
          prev = v;
        }
        for (const q of qs) expect(sign * f.derivative(q)).toBeGreaterThanOrEqual(-tol);
      }),
      { numRuns: 400 },
    );
  });

  test('never overshoots [min(y[i], y[i+1]), max(y[i], y[i+1])] on monotone data (property)', () => {
    fc.assert(
      fc.property(monotoneData, fractions, ({ x, y }, us) => {
        const f = monotoneCubic(x, y, { method });
        const tol = 1e-13 * Math.max(1, ...y.map(Math.abs));
        for (let i = 0; i < x.length - 1; i++) {
          const lo = Math.min(y[i], y[i + 1]);
          const hi = Math.max(y[i], y[i + 1]);
          for (const u of us) {
            const v = f(x[i] + u * (x[i + 1] - x[i]));
            expect(v).toBeGreaterThanOrEqual(lo - tol);
            expect(v).toBeLessThanOrEqual(hi + tol);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  test('does not overshoot the classic step x=[0,1,2,3,4,5], y=[0,0,0,1,1,1]', () => {
    // An unconstrained C² spline rings on this step; a monotone rule must stay in [0, 1]
    // and hold the flats exactly.
    const f = monotoneCubic([0, 1, 2, 3, 4, 5], [0, 0, 0, 1, 1, 1], { method });
    for (let k = 0; k <= 500; k++) {
      const v = f((5 * k) / 500);
      expect(v).toBeGreaterThanOrEqual(0);
      expect(v).toBeLessThanOrEqual(1);
    }
    expect(f(1.5)).toBe(0);
    expect(f(3.5)).toBe(1);
  });

  test('is C¹: left and right derivative limits at interior nodes equal the node slope (property)', () => {
    fc.assert(
      fc.property(freeData, ({ x, y }) => {
        const f = monotoneCubic(x, y, { method });
        for (let i = 1; i < x.length - 1; i++) {
          const m = f.slopes[i];
          expect(f.derivative(x[i]) + 0).toBe(m + 0); // + 0 folds −0 into 0
          // Second derivative bound on each side: |f''| ≤ 2|c2| + 6|c3|h with the Hermite
          // coefficients c2 = (3s − 2m0 − m1)/h, c3 = (m0 + m1 − 2s)/h².
          for (const side of [-1, 1]) {
            const j = side < 0 ? i - 1 : i;
            const h = x[j + 1] - x[j];
            const s = (y[j + 1] - y[j]) / h;
            const m0 = f.slopes[j];
            const m1 = f.slopes[j + 1];
            const curv = (2 * Math.abs(3 * s - 2 * m0 - m1)) / h + (6 * Math.abs(m0 + m1 - 2 * s)) / h;
            const delta = 1e-7 * h;
            const scale = Math.abs(s) + Math.abs(m0) + Math.abs(m1);
            const got = f.derivative(x[i] + side * delta);
            expect(Math.abs(got - m)).toBeLessThanOrEqual(delta * curv * 1.001 + 1e-9 * scale + 1e-300);
          }
          // Value continuity from both sides too.
          const hL = x[i] - x[i - 1];
          const tolV = 1e-6 * (Math.abs(y[i]) + Math.abs(m) * hL) + 1e-12;
          expect(Math.abs(f(x[i] - 1e-9 * hL) - y[i])).toBeLessThanOrEqual(tolV);
        }
      }),
      { numRuns: 300 },
    );
  });

  test('derivative agrees with a central difference of the values (property)', () => {
    fc.assert(
      fc.property(freeData, fractions, ({ x, y }, us) => {
        const f = monotoneCubic(x, y, { method });
        for (const u of us) {
          const i = Math.min(Math.floor(u * (x.length - 1)), x.length - 2);
          const h = x[i + 1] - x[i];
          const xq = x[i] + h * (0.1 + 0.8 * (u * (x.length - 1) - i)); // keep away from nodes
          const e = 1e-5 * h;
          const fd = (f(xq + e) - f(xq - e)) / (2 * e);
          const scale = (Math.abs(y[i]) + Math.abs(y[i + 1])) / h + Math.abs(f.slopes[i]) + Math.abs(f.slopes[i + 1]);
          expectClose(f.derivative(xq), fd, 1e-5, scale);
        }
      }),
      { numRuns: 200 },
    );
  });

  test('holds the end values outside [x0, xn] and has derivative 0 there', () => {
    const f = monotoneCubic([1, 2, 4], [5, 7, 6], { method });
    expect(f(0)).toBe(5);
    expect(f(-Infinity)).toBe(5);
    expect(f(4.0001)).toBe(6);
    expect(f(Infinity)).toBe(6);
    expect(f.derivative(0.5)).toBe(0);
    expect(f.derivative(Infinity)).toBe(0);
    expect(f.derivative(1)).toBe(f.slopes[0]);
    expect(f.derivative(4)).toBe(f.slopes[2]);
  });

  test('gives the straight line through two nodes', () => {
    const f = monotoneCubic([1, 3], [10, 4], { method });
    expect(Array.from(f.slopes)).toEqual([-3, -3]);
    expectClose(f(2), 7, 1e-15);
    expectClose(f(1.5), 8.5, 1e-15);
    expect(f.derivative(2.5)).toBe(-3);
  });

  test('answers do not depend on query order (interval cache)', () => {
    fc.assert(
      fc.property(freeData, fractions, ({ x, y }, us) => {
        const a = monotoneCubic(x, y, { method });
        const b = monotoneCubic(x, y, { method });
        const span = x[x.length - 1] - x[0];
        const qs = us.map((u) => x[0] + u * span);
        const forward = qs.map((q) => a(q));
        const sorted = [...qs].sort((p, q) => p - q).map((q) => [q, b(q)] as const);
        const backward = new Map(sorted);
        qs.forEach((q, k) => expect(forward[k]).toBe(backward.get(q)));
      }),
      { numRuns: 200 },
    );
  });
});

describe.each(METHODS)('monotoneCubic(x, y, { method: "%s" }) at the edges of double precision', (method) => {
  // Subnormal and huge values, widths from 1e-300 to 1e300: the factory either throws a
  // RangeError about overflow or gives finite values that stay within each interval's data
  // range when the data are monotone. (This property found a NaN from α = m/s overflowing
  // on a subnormal secant, now avoided by limiting on the slopes with hypot.)
  const wild = fc.oneof(
    fc.constant(0),
    fc.double({ min: -1e-300, max: 1e-300, noNaN: true }),
    fc.double({ min: -1e300, max: 1e300, noNaN: true }),
    fc.double({ noNaN: true, noDefaultInfinity: true }),
  );
  const wildGap = fc.oneof(
    fc.double({ min: 1e-300, max: 1e-290, noNaN: true }),
    fc.double({ min: 1e-3, max: 10, noNaN: true }),
    fc.double({ min: 1e290, max: 1e300, noNaN: true }),
  );
  test('never returns NaN or ±Infinity; throws only RangeError (property)', () => {
    fc.assert(
      fc.property(
        fc.array(wildGap, { minLength: 1, maxLength: 12 }),
        fc.array(wild, { minLength: 13, maxLength: 13 }),
        fc.boolean(),
        fractions,
        (dx, ys, monotone, us) => {
          const x = cumulative(0, dx);
          let y = ys.slice(0, x.length);
          if (monotone) y = [...y].sort((p, q) => p - q);
          if (!x.every((v, i) => Number.isFinite(v) && (i === 0 || v > x[i - 1]))) return;
          let f;
          try {
            f = monotoneCubic(x, y, { method });
          } catch (e) {
            expect(e).toBeInstanceOf(RangeError);
            expect(String(e)).toMatch(/overflows; rescale the data/);
            return;
          }
          for (const m of f.slopes) expect(Number.isFinite(m)).toBe(true);
          for (const u of us) {
            const i = Math.min(Math.floor(u * (x.length - 1)), x.length - 2);
            const xq = x[i] + (u * (x.length - 1) - i) * (x[i + 1] - x[i]);
            const v = f(xq);
            expect(Number.isFinite(v)).toBe(true);
            expect(Number.isFinite(f.derivative(xq))).toBe(true);
            if (monotone) {
              const k = intervalOf(x, xq);
              const lo = Math.min(y[k], y[k + 1]);
              const hi = Math.max(y[k], y[k + 1]);
              const slack = 1e-12 * Math.max(Math.abs(lo), Math.abs(hi));
              expect(v).toBeGreaterThanOrEqual(lo - slack);
              expect(v).toBeLessThanOrEqual(hi + slack);
            }
          }
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe('monotoneCubic(x, y) input handling', () => {
  test('copies its inputs: later changes to x, y or the exposed arrays do not affect it', () => {
    const x = [0, 1, 2];
    const y = [0, 1, 4];
    const f = monotoneCubic(x, y);
    const before = f(1.5);
    x[1] = 0.5;
    y[1] = 3;
    f.x[1] = 1.9;
    f.y[2] = -1;
    f.slopes[1] = 100;
    expect(f(1.5)).toBe(before);
    expect(f.x).toBeInstanceOf(Float64Array);
    expect(monotoneCubic(Float64Array.of(0, 1, 2), Float64Array.of(0, 1, 4))(1.5)).toBe(before);
  });

  test('defaults to steffen', () => {
    expect(monotoneCubic([0, 1], [0, 1]).method).toBe('steffen');
    expect(monotoneCubic([0, 1], [0, 1], {}).method).toBe('steffen');
  });

  test.each([
    { name: 'equal x', x: [0, 1, 1, 2], y: [0, 1, 2, 3], type: RangeError, msg: /strictly increasing, but x\[2\] = 1 <= x\[1\] = 1/ },
    { name: 'decreasing x', x: [0, 2, 1], y: [0, 1, 2], type: RangeError, msg: /x\[2\] = 1 <= x\[1\] = 2/ },
    { name: 'NaN in x', x: [0, Number.NaN, 2], y: [0, 1, 2], type: RangeError, msg: /x\[1\] = NaN; every entry must be finite/ },
    { name: 'NaN in y', x: [0, 1, 2], y: [0, 1, Number.NaN], type: RangeError, msg: /y\[2\] = NaN; every entry must be finite/ },
    { name: 'Infinity in y', x: [0, 1, 2], y: [Infinity, 1, 2], type: RangeError, msg: /y\[0\] = Infinity/ },
    { name: 'length mismatch', x: [0, 1, 2], y: [0, 1], type: RangeError, msg: /x has length 3 but y has length 2/ },
    { name: 'one node', x: [0], y: [1], type: RangeError, msg: /1 node\(s\) given; need at least 2/ },
    { name: 'no nodes', x: [], y: [], type: RangeError, msg: /0 node\(s\) given; need at least 2/ },
    { name: 'overflowing secant', x: [0, 1], y: [-1.5e308, 1.5e308], type: RangeError, msg: /secant on interval 0 .* overflows/ },
    { name: 'string entry', x: [0, '1', 2] as unknown as number[], y: [0, 1, 2], type: TypeError, msg: /x\[1\] must be a number, got string/ },
    { name: 'missing y', x: [0, 1], y: undefined as unknown as number[], type: TypeError, msg: /y must be an array-like/ },
  ])('throws on $name', ({ x, y, type, msg }) => {
    expect(() => monotoneCubic(x, y)).toThrow(type);
    expect(() => monotoneCubic(x, y)).toThrow(msg);
  });

  test('throws on an unknown method, naming it and the valid ones', () => {
    const bad = { method: 'linear' as unknown as MonotoneCubicMethod };
    expect(() => monotoneCubic([0, 1], [0, 1], bad)).toThrow(RangeError);
    expect(() => monotoneCubic([0, 1], [0, 1], bad)).toThrow(/method "linear" is unknown; valid: 'steffen', 'fritsch-carlson'/);
  });

  test('throws on a NaN query instead of returning NaN', () => {
    const f = monotoneCubic([0, 1, 2], [0, 1, 0]);
    expect(() => f(Number.NaN)).toThrow(RangeError);
    expect(() => f(Number.NaN)).toThrow(/value: xq is NaN/);
    expect(() => f.derivative(Number.NaN)).toThrow(/derivative: xq is NaN/);
    expect(() => f('1' as unknown as number)).toThrow(TypeError);
  });
});
