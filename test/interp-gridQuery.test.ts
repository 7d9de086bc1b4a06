import { beforeAll, describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { createGridQuery, type GridQuery } from '../lib/interp/gridQuery.js';
import { accuracySample } from '../lib/interp/accuracySample.js';
import { monotoneCubic } from '../lib/interp/monotoneCubic.js';
import { createMassBlend, locateMass, W_C00, W_C01, W_C10, W_C11, W_LM } from '../lib/interp/massBlend.js';
import { prepareRun, REC, REC_STRIDE, type Grid } from '../lib/tracks/grid.js';
import { serializeGrid, deserializeGrid, openGridCache } from '../lib/tracks/gridCache.js';
import { PHASE_INDEX } from '../lib/model/phases.js';

let grid: Grid;
let q: GridQuery;
beforeAll(() => {
  grid = loadBuiltinGrid();
  q = createGridQuery(grid);
});

// the solar slab with every run prepared (a loaded run derives its slopes on first use)
const solar = () => {
  const slab = grid.slabs.find((s) => s.z === 0.014)!;
  slab.runs.forEach(prepareRun);
  return slab;
};

describe('createGridQuery(grid).star(initialMass, age, z)', () => {
  test('star() is exact at a grid node: a track mass at one of its EEP ages gives that EEP state', () => {
    const slab = solar();
    const run = slab.runs.find((r) => r.layout.includes('flash') && r.count > 4)!;
    const k = 3;
    const j = Math.floor(run.n / 3);
    const m = 10 ** run.logM[k];
    const rec = (k * run.n + j) * REC_STRIDE;
    const a = 10 ** run.rec[rec + REC.logAge];
    const s = q.star(m, a, 0.014);
    // tolerance 1e-9 dex: log/exp round trips of mass and age only
    expect(Math.log10(s.luminosity)).toBeCloseTo(run.rec[rec + REC.logL], 9);
    expect(Math.log10(s.teff)).toBeCloseTo(run.rec[rec + REC.logTeff], 9);
    expect(s.mass).toBeCloseTo(run.rec[rec + REC.mass] * m, 9); // stored as a fraction of the initial mass
  });

  test('star() blends masses with the monotone cubic through the run (Steffen 1990): equals monotoneCubic over the tracks at a fixed EEP', () => {
    const slab = solar();
    const run = slab.runs.reduce((a, b) => (b.count > a.count ? b : a));
    const j = Math.floor(run.n / 2);
    const ys = Array.from({ length: run.count }, (_, k) => run.rec[(k * run.n + j) * REC_STRIDE + REC.logL]);
    const f = monotoneCubic(run.logM, ys);
    const mb = createMassBlend();
    for (const frac of [0.13, 0.5, 0.77]) {
      const k = Math.floor(run.count / 2);
      const lm = run.logM[k] + frac * (run.logM[k + 1] - run.logM[k]);
      const firstTrack = slab.runOf.indexOf(slab.runs.indexOf(run));
      mb.w[W_LM] = lm;
      locateMass(slab, mb);
      expect(mb.i + firstTrack).toBeGreaterThanOrEqual(0);
      const [c00, c01, c10, c11] = [mb.w[W_C00], mb.w[W_C01], mb.w[W_C10], mb.w[W_C11]];
      const v = c00 * run.rec[(mb.b0 + j) * REC_STRIDE + REC.logL] + c10 * run.rec[(mb.b0 + j) * REC_STRIDE + REC.logL + 1]
        + c01 * run.rec[(mb.b1 + j) * REC_STRIDE + REC.logL] + c11 * run.rec[(mb.b1 + j) * REC_STRIDE + REC.logL + 1];
      expect(v).toBeCloseTo(f(lm), 12);
    }
  });

  test('star() gives the Sun at 4.57 Gyr (IAU 2015 B3 nominal: L 1 ±5 %, Teff 5772 K ±1.5 %, R 1 ±5 %)', () => {
    const s = q.star(1, 4.57e9, 0.014);
    expect(s.luminosity).toBeGreaterThan(0.95);
    expect(s.luminosity).toBeLessThan(1.05);
    expect(Math.abs(s.teff / 5772 - 1)).toBeLessThan(0.015);
    expect(Math.abs(s.radius - 1)).toBeLessThan(0.05);
    expect(s.phase).toBe('main-sequence');
  });

  test.each([
    ['initialMass', () => q.star(200, 1e9, 0.014), /initialMass 200 outside/],
    ['z', () => q.star(1, 1e9, 0.05), /z 0.05 outside/],
    ['age', () => q.star(1, -1, 0.014), /age -1 yr outside/],
    ['age NaN', () => q.star(1, NaN, 0.014), /age NaN/],
  ])('star() throws RangeError naming %s and the valid range', (_, f, re) => {
    expect(f).toThrow(RangeError);
    expect(f).toThrow(re);
  });

  test('star() never blends across the helium-flash mass: a flash star and a quiet-ignition star either side', () => {
    const lo = q.star(1.98, 1.5e9, 0.014);
    const hi = q.star(2.02, 1.5e9, 0.014);
    expect(lo.phase).toBeDefined();
    expect(hi.phase).toBeDefined();
    // at 1.5 Gyr both are past the main sequence; their core masses differ as the two layouts do
    expect(Number.isFinite(lo.coreMass) && Number.isFinite(hi.coreMass)).toBe(true);
  });
});

describe('createGridQuery(grid) — accuracy against the direct model (issue targets)', () => {
  test('accuracySample at solar z: median |Δlog L| ≤ 0.01 and |Δlog Teff| ≤ 0.005 dex on the MS, ≤ 0.03 / 0.01 later, phases agree ≥ 99 %', () => {
    const [ms, late] = accuracySample(q, { count: 300, seed: 99 });
    expect(ms.medianDLogL).toBeLessThanOrEqual(0.01);
    expect(ms.medianDLogTeff).toBeLessThanOrEqual(0.005);
    expect(late.medianDLogL).toBeLessThanOrEqual(0.03);
    expect(late.medianDLogTeff).toBeLessThanOrEqual(0.01);
    expect(ms.phaseAgreement).toBeGreaterThanOrEqual(0.99);
    expect(late.phaseAgreement).toBeGreaterThanOrEqual(0.99);
  });

  test('accuracySample between metallicity nodes (z 0.0042): main-sequence targets hold', () => {
    const [ms, late] = accuracySample(q, { count: 200, seed: 5, z: 0.0042 });
    expect(ms.medianDLogL).toBeLessThanOrEqual(0.01);
    expect(ms.medianDLogTeff).toBeLessThanOrEqual(0.005);
    expect(late.medianDLogL).toBeLessThanOrEqual(0.03);
  });
});

describe('createGridQuery(grid).columns(input, out)', () => {
  test('columns() equals star() star by star', () => {
    const m = Float64Array.of(0.05, 0.3, 1, 2.5, 9, 30, 120);
    const a = Float64Array.of(1e9, 5e9, 4.6e9, 5e8, 3e7, 6.5e6, 2e6);
    const c = q.columns({ initialMass: m, age: a, z: 0.014 });
    for (let i = 0; i < m.length; i++) {
      const s = q.star(m[i], a[i], 0.014);
      expect(c.status[i]).toBe(0);
      expect(c.phase[i]).toBe(PHASE_INDEX[s.phase]);
      // tolerance 1e-12 relative: the columns use exp/log in place of ** and log10
      expect(c.luminosity[i]).toBeCloseTo(s.luminosity, 12 - Math.max(0, Math.ceil(Math.log10(s.luminosity + 1))));
      expect(c.teff[i] / (s.teff || 1)).toBeCloseTo(s.teff === 0 ? 0 : 1, 12);
      expect(c.radius[i] / s.radius).toBeCloseTo(1, 12);
      expect(c.mass[i]).toBeCloseTo(s.mass, 12);
    }
  });

  test('columns() marks rows out of range with a status code and zeros, and computes the rest', () => {
    const c = q.columns({ initialMass: [1, 500, 1, 1], age: [1e9, 1e9, 1e9, 2e11], z: [0.014, 0.014, 0.9, 0.014] });
    expect(Array.from(c.status)).toEqual([0, 1, 2, 3]);
    expect(c.luminosity[0]).toBeGreaterThan(0);
    expect(c.luminosity[1]).toBe(0);
  });

  test('columns() with one z for all outside the grid refuses every row (mass first), then answers again', () => {
    const c = q.columns({ initialMass: [1, 500, 1], age: [1e9, 1e9, -1], z: 0.5 });
    expect(Array.from(c.status)).toEqual([2, 1, 2]);
    expect(Array.from(c.luminosity)).toEqual([0, 0, 0]);
    const d = q.columns({ initialMass: [1], age: [1e9], z: 0.014 });
    expect(d.status[0]).toBe(0);
    expect(d.luminosity[0]).toBe(q.columns({ initialMass: [1], age: [1e9], z: [0.014] }).luminosity[0]);
  });

  test('columns() over several blocks (refused rows among them) gives each star what columns() gives it alone', () => {
    // evaluateStars works in blocks of 1024 stars: rows either side of the block edges, and
    // refused rows (mass, z, age) scattered through them, must not disturb their neighbours
    const n = 2600;
    const rnd = (k: number) => ((k * 2654435761) % 4294967296) / 4294967296;
    const m = new Float64Array(n);
    const a = new Float64Array(n);
    const z = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      m[i] = i % 97 === 5 ? 500 : 0.1 * 1000 ** rnd(i + 1);
      a[i] = i % 89 === 7 ? -1 : 1.38e10 * rnd(i + 7919);
      z[i] = i % 83 === 11 ? 0.9 : 10 ** (-4 + 2.4 * rnd(i + 104729));
    }
    const all = q.columns({ initialMass: m, age: a, z });
    const keys = ['status', 'phase', 'mass', 'coreMass', 'luminosity', 'teff', 'radius', 'logg', 'msLifetime', 'remnantMass', 'remnant'] as const;
    for (const i of [0, 1, 5, 7, 11, 1022, 1023, 1024, 1025, 2047, 2048, 2049, 2599, ...Array.from({ length: 40 }, (_, k) => 61 * k + 3)]) {
      const one = q.columns({ initialMass: [m[i]], age: [a[i]], z: [z[i]] });
      for (const k of keys) expect(all[k][i], `${k} of row ${i}`).toBe(one[k][0]);
    }
    expect(all.status[5]).toBe(1);
    expect(all.status[11]).toBe(2);
    expect(all.status[7 + 89]).toBe(3);
  });

  test('a z at a metallicity node, its log rounded either way, answers as the node (one slab, not two)', () => {
    const at = q.columns({ initialMass: [1, 3, 20], age: [4.6e9, 3e8, 8e6], z: 0.014 });
    for (const z of [0.014 * (1 + 2e-16), 0.014 * (1 - 2e-16), 0.014 * (1 + 1e-13)]) {
      const near = q.columns({ initialMass: [1, 3, 20], age: [4.6e9, 3e8, 8e6], z });
      expect(Array.from(near.luminosity)).toEqual(Array.from(at.luminosity));
      expect(Array.from(near.teff)).toEqual(Array.from(at.teff));
    }
  });

  test('columns() over random stars is finite, keeps coreMass ≤ mass and is deterministic (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -2, max: Math.log10(150), noNaN: true }), fc.double({ min: 0, max: 1e11, noNaN: true }), fc.double({ min: -4, max: Math.log10(0.03), noNaN: true })), { minLength: 1, maxLength: 40 }),
        (rows) => {
          const input = { initialMass: rows.map((r) => 10 ** r[0]), age: rows.map((r) => r[1]), z: rows.map((r) => 10 ** r[2]) };
          const a = q.columns(input);
          const b = q.columns(input);
          for (let i = 0; i < rows.length; i++) {
            if (a.status[i] !== 0) continue;
            for (const k of ['mass', 'coreMass', 'luminosity', 'teff', 'radius', 'logg', 'msLifetime', 'remnantMass'] as const) {
              if (!Number.isFinite(a[k][i])) return false;
              if (a[k][i] !== b[k][i]) return false;
            }
            if (a.coreMass[i] > a.mass[i]) return false;
          }
          return true;
        },
      ),
      { seed: 20261201, numRuns: 200 },
    );
  });

  test('star() is continuous in mass inside a phase (property): 1e-5 dex in mass moves log L by < 0.01 dex', () => {
    fc.assert(
      fc.property(fc.double({ min: -0.9, max: 1.9, noNaN: true }), fc.double({ min: 0.05, max: 0.6, noNaN: true }), (lm, f) => {
        const m = 10 ** lm;
        const age = Math.min(f * 1e10 * m ** -2.5, 9.9e10);
        const s1 = q.star(m, age, 0.014);
        const s2 = q.star(m * 10 ** 1e-5, age, 0.014);
        if (s1.phase !== s2.phase || s1.phase !== 'main-sequence') return true;
        return Math.abs(Math.log10(s1.luminosity / s2.luminosity)) < 0.01;
      }),
      { seed: 7, numRuns: 200 },
    );
  });
});

describe('serializeGrid / deserializeGrid', () => {
  test('a grid survives the binary cache round trip with identical answers', () => {
    const again = createGridQuery(deserializeGrid(serializeGrid(grid)));
    for (const [m, a] of [[0.5, 1e10], [1, 4.6e9], [3, 3e8], [20, 8e6]]) {
      expect(again.star(m, a, 0.01)).toEqual(q.star(m, a, 0.01));
    }
  });

  test('openGridCache reads the header and track masses at once, each run only when first asked', () => {
    const bytes = serializeGrid(grid);
    let read = 0;
    const lazy = openGridCache((position, length) => {
      read += length;
      return bytes.subarray(position, position + length);
    });
    const opened = read;
    // the header and 11 slabs' masses: a few per cent of the cache
    expect(opened).toBeLessThan(0.05 * bytes.length);
    const lq = createGridQuery(lazy);
    expect(lq.star(1, 4.6e9, 0.014)).toEqual(q.star(1, 4.6e9, 0.014));
    // one star at one metallicity node loads one run of one slab
    const loaded = lazy.slabs.flatMap((s) => s.runs).filter((r) => r.load === null).length;
    expect(loaded).toBe(1);
    expect(read - opened).toBeLessThan(0.05 * bytes.length);
    // and answers everywhere as the built grid does
    for (const [m, a, z] of [[0.3, 1e10, 0.0002], [2.5, 1e9, 0.004], [40, 5e6, 0.03]]) {
      expect(lq.star(m, a, z)).toEqual(q.star(m, a, z));
    }
  });
});

describe('createGridQuery(grid) — masses', () => {
  test('star() never returns a present mass above the birth mass (property over the whole grid)', () => {
    fc.assert(
      fc.property(fc.double({ min: -2, max: Math.log10(150), noNaN: true }), fc.double({ min: 0, max: 1e11, noNaN: true }), (lm, age) => {
        const m = 10 ** lm;
        const s = q.star(m, age, 0.014);
        return s.mass <= m * (1 + 1e-12) && s.coreMass <= s.mass;
      }),
      { seed: 11, numRuns: 300 },
    );
  });
});

describe('createGridQuery(grid).columns — black holes', () => {
  test('columns() gives a black hole its Schwarzschild radius and the log g that goes with it, as star() does', () => {
    const c = q.columns({ initialMass: [60], age: [1e8], z: 0.014 });
    const s = q.star(60, 1e8, 0.014);
    expect(s.phase).toBe('black-hole');
    expect(c.radius[0]).toBeCloseTo(s.radius, 15);
    expect(c.logg[0]).toBeCloseTo(s.logg, 12);
  });
});
