import { beforeAll, describe, expect, test } from 'vitest';
import { createGridQuery, type GridQuery } from '../lib/interp/gridQuery.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { decimateDots } from '../lib/plot/decimateDots.js';
import { escapeXml } from '../lib/plot/escapeXml.js';
import { AXIS_TITLES } from '../lib/plot/hrFrame.js';
import { isochroneFigure } from '../lib/plot/isochroneFigure.js';
import { isochroneLineOf } from '../lib/plot/isochroneLineOf.js';
import { parseStarTable } from '../lib/plot/parseStarTable.js';
import { DOT_LIMIT, populationFigure } from '../lib/plot/populationFigure.js';
import { populationPoints } from '../lib/plot/populationPoints.js';
import { seriesStyle } from '../lib/plot/seriesStyle.js';
import { trackFigure } from '../lib/plot/trackFigure.js';
import { trackLineOf } from '../lib/plot/trackLineOf.js';
import { parseXml, select, textOf, type XmlElement } from './plot-xml.js';

const HOSTILE = `<script>&"'`;
const Z = 0.014;
let query: GridQuery;

beforeAll(() => {
  query = createGridQuery(loadBuiltinGrid());
});

const tickValues = (root: XmlElement, axis: 'x-ticks' | 'y-ticks') =>
  select(root, 'g', axis)[0].children.map((t) => Number(textOf(t).replace('\u2212', '-')));

/** The checks every figure must pass: well-formed, sized, titled, nice ticks inside the axis. */
function expectFigure(svg: string, title: string): XmlElement {
  const root = parseXml(svg);
  expect(root.name).toBe('svg');
  expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
  const [x, y, w, h] = root.attrs.viewBox.split(' ').map(Number);
  expect([x, y]).toEqual([0, 0]);
  expect(Number(root.attrs.width)).toBe(w);
  expect(Number(root.attrs.height)).toBe(h);
  expect(root.attrs['font-family']).toBe('sans-serif');
  expect(textOf(select(root, 'text', 'title')[0])).toBe(title);
  expect(textOf(select(root, 'title')[0])).toBe(title);
  expect(textOf(select(root, 'text', 'x-title')[0])).toBe(AXIS_TITLES.logTeff);
  expect(textOf(select(root, 'text', 'y-title')[0])).toBe(AXIS_TITLES.logL);
  expect(AXIS_TITLES.logTeff).toMatch(/\(K\)/);
  expect(AXIS_TITLES.logL).toMatch(/\(Lsun\)/);
  for (const axis of ['x-ticks', 'y-ticks'] as const) {
    const values = tickValues(root, axis);
    expect(values.length).toBeGreaterThanOrEqual(3);
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeGreaterThan(values[i - 1]);
    const steps = values.slice(1).map((v, i) => v - values[i]);
    const step = steps[0];
    for (const s of steps) expect(s).toBeCloseTo(step, 9);
    const mantissa = step / 10 ** Math.floor(Math.log10(step) + 1e-12);
    expect([1, 2, 5].some((f) => Math.abs(mantissa - f) < 1e-9)).toBe(true);
  }
  // log Teff decreases to the right: the x labels' positions run opposite to their values
  const xs = select(root, 'g', 'x-ticks')[0].children.map((t) => Number(t.attrs.x));
  for (let i = 1; i < xs.length; i++) expect(xs[i]).toBeLessThan(xs[i - 1]);
  return root;
}

describe('escapeXml(text)', () => {
  test.each([
    { text: HOSTILE, out: '&lt;script&gt;&amp;&quot;&apos;' },
    { text: 'Orvel Reach', out: 'Orvel Reach' },
    { text: 'a\u0000b\u001fc', out: 'a\ufffdb\ufffdc' },
    { text: 'star \u2605 \ud83c\udf1f', out: 'star \u2605 \ud83c\udf1f' },
  ])('escapeXml($text) is $out', ({ text, out }) => {
    expect(escapeXml(text)).toBe(out);
  });
});

describe('seriesStyle(i)', () => {
  test('the first 7 differ in colour and in dash; the first 49 are distinct pairs', () => {
    const first = Array.from({ length: 7 }, (_, i) => seriesStyle(i));
    expect(new Set(first.map((s) => s.color)).size).toBe(7);
    expect(new Set(first.map((s) => s.dash)).size).toBe(7);
    const pairs = Array.from({ length: 49 }, (_, i) => JSON.stringify(seriesStyle(i)));
    expect(new Set(pairs).size).toBe(49);
  });
});

describe('trackFigure(tracks, text)', () => {
  test('one path per track, in distinct styles; a legend entry per mass; four marks on a 1 Msun track', () => {
    const masses = [0.8, 1, 2, 5, 20];
    const lines = masses.map((m) => trackLineOf(query.grid, m, Z, `${m} Msun`));
    const svg = trackFigure(lines, { title: 'Tracks', subtitle: ['z 0.014'] });
    const root = expectFigure(svg, 'Tracks');
    const paths = select(root, 'path', 'track');
    expect(paths).toHaveLength(masses.length);
    expect(new Set(paths.map((p) => `${p.attrs.stroke} ${p.attrs['stroke-dasharray'] ?? ''}`)).size).toBe(masses.length);
    // each path has one point per EEP drawn (points closer than 0.05 px merged): at least 50 vertices
    for (const p of paths) expect(p.attrs.d.match(/[ML]/g)!.length).toBeGreaterThan(50);
    const entries = select(root, 'g', 'legend-entry');
    expect(entries.map((e) => textOf(e))).toEqual(masses.map((m) => `${m} Msun`));
    const oneSun = lines[1].events.map((e) => e.event);
    expect(oneSun).toEqual(['zams', 'tams', 'he-ignition', 'remnant-birth']);
    // every track reaches the ZAMS: one ZAMS mark per track among the data (the legend has one more)
    const data = select(root, 'g', 'data')[0];
    expect(select(data, 'circle', 'event-zams')).toHaveLength(masses.length);
    expect(select(data, 'polygon', 'event-remnant-birth').length).toBe(lines.filter((l) => l.events.some((e) => e.event === 'remnant-birth')).length);
    expect(select(root, 'g', 'legend-key').map(textOf)).toContain('helium ignition');
  });

  test('a 20 Msun track ends at core collapse: no neutron-star point, remnant birth on the last point', () => {
    const line = trackLineOf(query.grid, 20, Z, '20 Msun');
    const last = line.logTeff.length - 1;
    expect(line.events.find((e) => e.event === 'remnant-birth')?.index).toBe(last);
    // a neutron star is at L ~ 1e-9 Lsun; the drawn track stays among stars
    for (let i = 0; i <= last; i++) expect(line.logL[i]).toBeGreaterThan(-1);
  });

  test('a hostile title is escaped and survives the round trip', () => {
    const svg = trackFigure([trackLineOf(query.grid, 1, Z, HOSTILE)], { title: HOSTILE, subtitle: [HOSTILE] });
    expect(svg).not.toContain('<script>');
    expect(svg).toContain('&lt;script&gt;&amp;&quot;&apos;');
    const root = expectFigure(svg, HOSTILE);
    expect(textOf(select(root, 'text', 'subtitle')[0])).toBe(HOSTILE);
    expect(textOf(select(root, 'g', 'legend-entry')[0])).toBe(HOSTILE);
  });
});

describe('isochroneFigure(lines, text)', () => {
  test('one path per age, a turnoff mark each, a legend entry per age with its turnoff mass', () => {
    const ages = [1e8, 1e9, 1e10];
    const made = ages.map((a) => isochroneLineOf(query, a, Z, 0.1, 150, `${a / 1e9} Gyr`));
    // turnoff masses fall with age (10 Gyr: about 1 Msun, the isochrone's own doc example)
    expect(made[0].turnoffMass).toBeGreaterThan(made[1].turnoffMass);
    expect(made[2].turnoffMass).toBeCloseTo(1.0, 0);
    const svg = isochroneFigure(made.map((m) => ({ ...m.line, value: `${m.turnoffMass.toFixed(2)} Msun` })), { title: 'Isochrones', subtitle: [] });
    const root = expectFigure(svg, 'Isochrones');
    expect(select(root, 'path', 'isochrone')).toHaveLength(3);
    expect(select(root, 'circle', 'turnoff')).toHaveLength(3);
    const entries = select(root, 'g', 'legend-entry');
    expect(entries).toHaveLength(3);
    expect(textOf(entries[2])).toContain(`${made[2].turnoffMass.toFixed(2)} Msun`);
  });

  test('the 10 Gyr isochrone breaks where its white dwarfs begin (two pieces or more)', () => {
    const { line } = isochroneLineOf(query, 1e10, Z, 0.1, 150, '10 Gyr');
    expect(line.starts.length).toBeGreaterThanOrEqual(1);
    const svg = isochroneFigure([line], { title: 't', subtitle: [] });
    const d = select(parseXml(svg), 'path', 'isochrone')[0].attrs.d;
    expect(d.match(/M/g)!.length).toBe(line.starts.length + 1);
  });
});

describe('populationFigure(points, text)', () => {
  const table = (rows: string) =>
    parseStarTable(`initialMass,age_Gyr,z\n${rows}`, 't.csv', { massRange: { min: 0.01, max: 150 }, zRange: { min: 1e-4, max: 0.03 }, z: Z });

  test('every star with light is one dot in its state colour; counts per phase; the black hole is counted, not drawn', () => {
    const stars = table('1,4.57,0.014\n1,13,0.014\n0.6,12,0.014\n3,1,0.014\n40,1,0.014\n2,1.2,0.014\n');
    const points = populationPoints(query, stars);
    const states = Array.from(stars.initialMass, (m, i) => query.star(m, stars.age[i], stars.z[i]));
    const lit = states.filter((s) => s.phase !== 'black-hole' && s.phase !== 'neutron-star');
    const svg = populationFigure(points, { title: 'Six stars', subtitle: [] });
    const root = expectFigure(svg, 'Six stars');
    const dots = select(select(root, 'g', 'stars')[0], 'circle');
    expect(dots).toHaveLength(lit.length);
    // the dot colours are the states' own colours
    expect(dots.map((d) => d.attrs.fill).sort()).toEqual(lit.map((s) => s.color).sort());
    expect(states.some((s) => s.phase === 'white-dwarf')).toBe(true);
    // white dwarfs show on the white page: every dot is outlined
    expect(select(root, 'g', 'stars')[0].attrs.stroke).toMatch(/^#[0-5]/);
    const entries = select(root, 'g', 'legend-entry').map(textOf);
    const phases = new Map<string, number>();
    for (const s of states) phases.set(s.phase, (phases.get(s.phase) ?? 0) + 1);
    for (const [phase, n] of phases) expect(entries).toContain(`${phase}${n}`);
    expect(textOf(select(root, 'text', 'subtitle')[0])).toMatch(/every star with light is one dot/);
  });

  test(`beyond ${DOT_LIMIT} stars at most one dot per 2 px cell is drawn, and the subtitle says so`, () => {
    const n = 60000;
    const initialMass = new Float64Array(n);
    const age = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      initialMass[i] = 0.1 * 1.0001 ** (i * 0.8); // 0.1 … ~12 Msun
      age[i] = 1e8 + (i % 97) * 1e8;
    }
    const points = populationPoints(query, { initialMass, age, z: Z });
    const svg = populationFigure(points, { title: 'Many', subtitle: [] });
    const root = expectFigure(svg, 'Many');
    const dots = select(select(root, 'g', 'stars')[0], 'circle');
    expect(dots.length).toBeLessThan(points.logTeff.length);
    expect(dots.length).toBeGreaterThan(100);
    const cells = new Set(dots.map((d) => `${Math.floor((Number(d.attrs.cx) - 70) / 2)},${Math.floor((Number(d.attrs.cy) - 70) / 2)}`));
    // coordinates are rounded to 0.1 px, which can move a dot across a cell edge; almost all cells are distinct
    expect(cells.size).toBeGreaterThan(0.95 * dots.length);
    expect(textOf(select(root, 'text', 'subtitle')[0])).toMatch(/drawn as [\d,]+ dots: one per 2 px cell, the brightest kept/);
    expect(svg.length).toBeLessThan(2_000_000);
    const total = select(root, 'g', 'legend-note').map(textOf).find((t) => t.startsWith('all stars'));
    expect(total).toBe('all stars60,000');
  });
});

describe('decimateDots(xs, ys, brightness, width, height, cell)', () => {
  test('keeps the brightest point of each cell, dimmest first, and drops points outside', () => {
    expect(Array.from(decimateDots([1, 1.5, 9, 11], [1, 1.2, 9, 1], [0, 2, 1, 5], 10, 10, 2))).toEqual([2, 1]);
  });
  test('throws RangeError for a cell of 0 px', () => {
    expect(() => decimateDots([], [], [], 10, 10, 0)).toThrow(/cell 0 px/);
  });
});

describe('parseStarTable(text, source, options)', () => {
  const options = { massRange: { min: 0.01, max: 150 }, zRange: { min: 1e-4, max: 0.03 }, z: Z };
  test.each([
    { name: 'mass out of range', text: 'initialMass,age\n1,4e9\n200,1e9\n', message: /t\.csv:3: column initialMass: '200' is not in the valid range 0\.01–150 Msun/ },
    { name: 'no age column', text: 'initialMass\n1\n', message: /no age column/ },
    { name: 'no mass column', text: 'name,age\nA,1e9\n', message: /no initialMass \(or mass\) column/ },
    { name: 'bad z', text: 'mass,age_Myr,z\n1,100,0.5\n', message: /column z: '0\.5' is not in the valid range 0\.0001–0\.03/ },
    { name: 'age not a number', text: 'mass,age_Gyr\n1,old\n1,also\n', message: /column age_Gyr: 'old' .*\(and 1 more bad line\)/ },
  ])('$name throws RangeError naming line, column, value and range', ({ text, message }) => {
    expect(() => parseStarTable(text, 't.csv', options)).toThrow(RangeError);
    expect(() => parseStarTable(text, 't.csv', options)).toThrow(message);
  });
  test('reads age units from the column name, z from the options when the table has none, quotes and CRLF', () => {
    const t = parseStarTable('\ufeffname,mass,age_Myr\r\n"A, the first",1.5,300\r\n', 't.csv', options);
    expect(Array.from(t.initialMass)).toEqual([1.5]);
    expect(Array.from(t.age)).toEqual([3e8]);
    expect(Array.from(t.z)).toEqual([Z]);
    expect(t.zColumn).toBeNull();
  });
  test('with options.age every star has that age and the table needs no age column', () => {
    const t = parseStarTable('initialMass\n1\n2\n', 't.csv', { ...options, age: 1e9 });
    expect(Array.from(t.age)).toEqual([1e9, 1e9]);
    expect(t.ageColumn).toBeNull();
  });
});
