// The viewer's frame code runs in Node as well as in the page: these tests call it directly.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { allocateStateColumns, createGridQuery } from '../lib/interp/gridQuery.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { PHASES, PHASE_INDEX } from '../lib/model/phases.js';
import { absoluteVisualMagnitude } from '../lib/physics/absoluteVisualMagnitude.js';
import { blackbodyColor } from '../lib/physics/blackbodyColor.js';
import { bvColor } from '../lib/physics/bvColor.js';
import { parseScenario } from '../lib/population/parseScenario.js';
import { populationHistory } from '../lib/population/populationHistory.js';
import { samplePopulation } from '../lib/population/samplePopulation.js';
import { createColorTable, packRgba, LUT_LOG_MIN, LUT_STEP } from '../viewer/src/colorTable.js';
import { COUNT_SLOTS, createPopulation, OUTSIDE, UNBORN } from '../viewer/src/population.js';
import { allocateDrawnStars, drawStars, HR_VIEW, CMD_VIEW, MARK, nearestDrawn } from '../viewer/src/starLayer.js';
import { createTimeGrid } from '../viewer/src/timeGrid.js';
import { ROOT } from './cli-run.js';

const lut = createColorTable();

describe('createColorTable()', () => {
  test('holds blackbodyColor exactly at its nodes', () => {
    for (const i of [500, 1200, 1380, 1500, 1750, 2000]) {
      const hex = blackbodyColor(10 ** (LUT_LOG_MIN + i * LUT_STEP));
      const rgb = [1, 3, 5].map((o) => parseInt(hex.slice(o, o + 2), 16));
      expect(lut.rgba[i]).toBe(packRgba(rgb[0], rgb[1], rgb[2]));
    }
  });

  // 0.005 mag: a sixth of a pixel on the colour–magnitude diagram (30 mag over ~500 px); the
  // largest error, 0.0033 mag, is M_V at the kink of BC_V where its table ends (3210 K)
  test('gives B−V and M_V within 0.005 mag of the library from 2000 K to 300 000 K', () => {
    let worstBv = 0;
    let worstMv = 0;
    for (let x = Math.log10(2000); x < Math.log10(3e5); x += 0.00037) {
      const T = 10 ** x;
      worstBv = Math.max(worstBv, Math.abs(lut.bvAt(x) - bvColor(T)));
      worstMv = Math.max(worstMv, Math.abs(lut.mvAt(x, 1.5) - absoluteVisualMagnitude(10 ** 1.5, T)));
    }
    expect(worstBv).toBeLessThan(0.005);
    expect(worstMv).toBeLessThan(0.005);
  });
});

describe('createTimeGrid(time)', () => {
  const scenario = parseScenario(JSON.parse(readFileSync(join(ROOT, 'tracks-demo', 'scenarios', 'tessel-cluster.json'), 'utf8')));

  test('has exactly the times of populationHistory (the history command)', () => {
    const query = createGridQuery(loadBuiltinGrid());
    const sample = samplePopulation(scenario, { start: 0, count: 3 });
    const h = populationHistory(scenario, query, { sample });
    const g = createTimeGrid({ ...scenario.history, now: scenario.now, start: scenario.now, clock: 'elapsed' });
    expect(Array.from(g.times)).toEqual(h.times);
  });

  test('steps from grid time to grid time and holds at the ends', () => {
    const g = createTimeGrid({ from: 1e6, to: 1e9, steps: 4, spacing: 'log', now: 1e9, start: 1e9, clock: 'elapsed' });
    expect(Array.from(g.times)).toEqual([1e6, expect.closeTo(1e7, 0), expect.closeTo(1e8, -1), 1e9]);
    expect(g.step(1e6, 1)).toBe(g.times[1]);
    expect(g.step(g.times[1], 1)).toBe(g.times[2]);
    expect(g.step(5e7, -1)).toBe(g.times[1]);
    expect(g.step(1e9, 1)).toBe(1e9);
    expect(g.step(1e6, -1)).toBe(1e6);
  });

  test('maps slider fractions log-uniformly and back', () => {
    const g = createTimeGrid({ from: 1e6, to: 1e10, steps: 60, spacing: 'log', now: 1e10, start: 1e10, clock: 'elapsed' });
    expect(g.atFraction(0.5)).toBeCloseTo(1e8, -2);
    for (const f of [0, 0.13, 0.5, 0.999, 1]) expect(g.fraction(g.atFraction(f))).toBeCloseTo(f, 12);
  });

  test.each([
    [5e9, 'now'],
    [4e9, 'now − 1 Gyr'],
    [5.5e9, 'now + 500 Myr'],
  ])('labels a table clock at %d yr since the origin as %s', (t, label) => {
    const g = createTimeGrid({ from: 0, to: 1e10, steps: 200, spacing: 'linear', now: 5e9, start: 5e9, clock: 'offset' });
    expect(g.label(t)).toBe(label);
    expect(g.clock(t)).toBe(t - 5e9);
    expect(g.fromClock(g.clock(t))).toBe(t);
  });
});

describe('createPopulation(grid, stars).evaluate(t, counts)', () => {
  test('counts per phase exactly as populationHistory at every history time', () => {
    const doc = JSON.parse(readFileSync(join(ROOT, 'tracks-demo', 'scenarios', 'greywake-cluster.json'), 'utf8'));
    const scenario = parseScenario({ ...doc, size: 1500 });
    const grid = loadBuiltinGrid();
    const sample = samplePopulation(scenario);
    const h = populationHistory(scenario, createGridQuery(grid), { sample });
    const pop = createPopulation(grid, sample);
    const counts = new Int32Array(COUNT_SLOTS);
    h.times.forEach((t, k) => {
      pop.evaluate(t, counts);
      const born = PHASES.reduce((sum, p) => sum + h.counts[p][k], 0);
      PHASES.forEach((p, i) => expect(counts[i], `${p} at ${t} yr`).toBe(h.counts[p][k]));
      expect(counts[UNBORN]).toBe(1500 - born);
      expect(counts[OUTSIDE]).toBe(0);
    });
  });

  test('marks stars older than the model as outside and unborn stars as unborn', () => {
    const pop = createPopulation(loadBuiltinGrid(), { initialMass: [1, 1], birthTime: [0, 5e9], z: [0.014, 0.014] });
    const counts = new Int32Array(COUNT_SLOTS);
    pop.evaluate(1e9, counts);
    expect(counts[UNBORN]).toBe(1);
    expect(counts[PHASE_INDEX['main-sequence']]).toBe(1);
    pop.evaluate(1.04e11, counts); // ages 104 Gyr (beyond the model's 100) and 99 Gyr
    expect(counts[OUTSIDE]).toBe(1);
    expect(counts[PHASE_INDEX['white-dwarf']]).toBe(1);
  });
});

describe('drawStars(target, cols, n, view, lut, scale, drawn)', () => {
  const W = 220;
  const H = 127;
  const make = () => {
    const cols = allocateStateColumns(6);
    const set = (s: number, phase: string, logT: number, logL: number, status = 0) => {
      cols.phase[s] = PHASE_INDEX[phase as keyof typeof PHASE_INDEX];
      cols.teff[s] = 10 ** logT;
      cols.luminosity[s] = 10 ** logL;
      cols.status[s] = status;
    };
    set(0, 'main-sequence', 3.76, 0); // Sun-like: inside the HR box
    set(1, 'white-dwarf', 4.2, -2.5);
    set(2, 'neutron-star', 4.1, -8.2); // far below the box
    set(3, 'black-hole', 0, 0);
    set(4, 'main-sequence', 3.76, 0, 3); // not born
    set(5, 'red-giant-branch', 3.0, 2); // cooler than the box: held at its right edge
    cols.teff[3] = 0;
    cols.luminosity[3] = 0;
    return cols;
  };
  const at = (data: Uint32Array, x: number, y: number) => data[y * W + x];

  test('draws each star in its own colour where the axes put it, and remnants with their markers', () => {
    const cols = make();
    const data = new Uint32Array(W * H);
    const drawn = allocateDrawnStars(6);
    const count = drawStars({ width: W, height: H, data }, cols, 6, HR_VIEW, lut, 1, drawn);
    expect(count).toBe(4);
    // uPlot's mapping: xMax at the left edge (x decreasing to the right), yMax at the top
    const px = Math.floor(((HR_VIEW.xMax - 3.76) / (HR_VIEW.xMax - HR_VIEW.xMin)) * W);
    const py = Math.floor(((HR_VIEW.yMax - 0) / (HR_VIEW.yMax - HR_VIEW.yMin)) * H);
    expect([drawn.x[0], drawn.y[0]]).toEqual([px, py]);
    expect(at(data, px, py)).toBe(lut.rgba[lut.index(3.76)]);
    expect(drawn.mark[0]).toBe(MARK.star);
    // a white dwarf is a hollow square: its centre stays clear, its outline is coloured
    expect(drawn.mark[1]).toBe(MARK.whiteDwarf);
    expect(at(data, drawn.x[1], drawn.y[1])).toBe(0);
    expect(at(data, drawn.x[1] + 3, drawn.y[1])).toBe(lut.rgba[lut.index(4.2)]);
    // the neutron star sits wholly inside the bottom edge as a diamond
    expect(drawn.mark[2]).toBe(MARK.neutronStar);
    expect(drawn.y[2]).toBe(H - 1 - 4);
    expect(at(data, drawn.x[2], H - 1)).toBe(lut.rgba[lut.index(4.1)]);
    expect(at(data, drawn.x[2], drawn.y[2])).toBe(0);
    // a black hole and an unborn star are not drawn
    expect(drawn.mark[3]).toBe(MARK.none);
    expect(drawn.mark[4]).toBe(MARK.none);
    // a star beyond the axis is held at the edge
    expect(drawn.mark[5]).toBe(MARK.clamped);
    expect(drawn.x[5]).toBe(W - 1);
  });

  test('puts M_V increasing downward in the colour–magnitude view', () => {
    const cols = allocateStateColumns(2);
    cols.phase.fill(PHASE_INDEX['main-sequence']);
    cols.teff.fill(5772);
    cols.luminosity[0] = 1;
    cols.luminosity[1] = 0.01; // 5 mag fainter
    const data = new Uint32Array(W * H);
    const drawn = allocateDrawnStars(2);
    drawStars({ width: W, height: H, data }, cols, 2, CMD_VIEW, lut, 1, drawn);
    expect(drawn.y[1]).toBeGreaterThan(drawn.y[0]);
    expect(drawn.x[0]).toBe(drawn.x[1]);
    const mv = absoluteVisualMagnitude(1, 5772);
    expect(drawn.y[0]).toBe(Math.floor(((mv - CMD_VIEW.yMin) / (CMD_VIEW.yMax - CMD_VIEW.yMin)) * H));
  });

  test('nearestDrawn finds the closest drawn star within the radius only', () => {
    const cols = make();
    const drawn = allocateDrawnStars(6);
    drawStars({ width: W, height: H, data: new Uint32Array(W * H) }, cols, 6, HR_VIEW, lut, 1, drawn);
    expect(nearestDrawn(drawn, 6, drawn.x[0] + 2, drawn.y[0] - 1, 4)).toBe(0);
    expect(nearestDrawn(drawn, 6, drawn.x[0] + 9, drawn.y[0], 4)).toBe(-1);
  });
});
