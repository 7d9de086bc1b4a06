import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { generateTrack } from '../lib/model/generateTrack.js';
import { PHASE_INDEX } from '../lib/model/phases.js';
import { writeGridFile } from '../lib/tracks/writeGridFile.js';
import { gridFileString } from '../lib/tracks/gridFileString.js';
import { parseGridFile } from '../lib/tracks/parseGridFile.js';
import { placePrimaryEeps } from '../lib/tracks/placePrimaryEeps.js';
import { GRID_FILE_FIRST_LINE, GRID_FILE_HEADER } from '../lib/tracks/gridFileFormat.js';
import type { Track } from '../lib/tracks/track.js';

/**
 * Round-trip tolerance of logL and logTeff (see writeGridFile): the file holds 10^x printed
 * with String(), the reader stores log10 of it. Exact when |x| ≥ 1; otherwise within 2^-53 dex
 * (1.11e-16, half an ulp of 1) — measured over 3e7 random doubles when the layout was chosen,
 * and property-tested below.
 */
const LOG_TOLERANCE = 2 ** -53;
const logClose = (got: number, want: number) => (Math.abs(want) >= 1 ? got === want : Math.abs(got - want) <= LOG_TOLERANCE);

const MODEL_CASES = [
  { mass: 0.05, z: 0.014 }, { mass: 0.3, z: 0.014 }, { mass: 0.8, z: 0.014 }, { mass: 1, z: 0.014 },
  { mass: 1.5, z: 0.0001 }, { mass: 3, z: 0.03 }, { mass: 6, z: 0.014 }, { mass: 15, z: 0.014 },
  { mass: 40, z: 0.002 },
];

function expectSameTrack(got: Track, want: Track): void {
  expect(got.initialMass).toBe(want.initialMass);
  expect(got.z).toBe(want.z);
  expect(got.n).toBe(want.n);
  expect(got.age).toEqual(want.age);
  expect(got.mass).toEqual(want.mass);
  expect(got.coreMass).toEqual(want.coreMass);
  expect(got.phase).toEqual(want.phase);
  expect(got.eeps).toEqual(want.eeps);
  for (let i = 0; i < want.n; i++) {
    if (!logClose(got.logL[i], want.logL[i])) throw new Error(`logL[${i}] ${got.logL[i]} vs ${want.logL[i]}`);
    if (!logClose(got.logTeff[i], want.logTeff[i])) throw new Error(`logTeff[${i}] ${got.logTeff[i]} vs ${want.logTeff[i]}`);
  }
}

describe('writeGridFile → parseGridFile round trip', () => {
  test.each(MODEL_CASES.flatMap((c) => [{ ...c, fullLife: false }, { ...c, fullLife: true }]))(
    'parseGridFile(gridFileString([generateTrack($mass, $z, fullLife $fullLife)])) gives the same track',
    ({ mass, z, fullLife }) => {
      const track = generateTrack(mass, z, { fullLife });
      const { tracks, problems } = parseGridFile(gridFileString([track]));
      expect(problems).toEqual([]);
      expect(tracks).toHaveLength(1);
      expectSameTrack(tracks[0], track);
      expect(tracks[0].remnant).toBe(track.remnant);
      expect(tracks[0].remnantMass).toBe(track.remnantMass);
      expect(tracks[0].msLifetime).toBeCloseTo(track.msLifetime, -2); // yr; zams→tams span vs tMS, rounding only
      expect(tracks[0].events).toEqual([]);
    },
  );

  test('a grid of many model tracks round-trips in file order', () => {
    const want = [0.5, 1, 2, 8, 20].flatMap((m) => [0.001, 0.014].map((z) => generateTrack(m, z)));
    const { tracks, problems } = parseGridFile(gridFileString(want));
    expect(problems).toEqual([]);
    expect(tracks.map((t) => [t.initialMass, t.z])).toEqual(want.map((t) => [t.initialMass, t.z]));
    tracks.forEach((t, k) => expectSameTrack(t, want[k]));
  });

  test('log10(Number(String(10 ** x))) is exact for |x| ≥ 1 and within 2^-53 below (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -300, max: 300, noNaN: true }), (x) => logClose(Math.log10(Number(String(10 ** x))), x)),
      { numRuns: 20000 },
    );
  });

  // Synthetic tracks: random positive ages and decreasing masses over a few phases in life order.
  const syntheticTrack = fc
    .record({
      initialMass: fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
      z: fc.double({ min: 1e-6, max: 0.5, noNaN: true }),
      steps: fc.array(
        fc.record({
          dAge: fc.double({ min: 1e-3, max: 1e9, noNaN: true }),
          massFactor: fc.double({ min: 0.5, max: 1, noNaN: true }),
          coreFraction: fc.double({ min: 0, max: 1, noNaN: true }),
          logL: fc.double({ min: -12, max: 7, noNaN: true }),
          logTeff: fc.double({ min: 1.1, max: 7, noNaN: true }),
          nextPhase: fc.boolean(),
        }),
        { minLength: 1, maxLength: 40 },
      ),
    })
    .map(({ initialMass, z, steps }): Track => {
      const n = steps.length;
      const path = [PHASE_INDEX['pre-main-sequence'], PHASE_INDEX['main-sequence'], PHASE_INDEX.subgiant, PHASE_INDEX['red-giant-branch'],
        PHASE_INDEX['core-helium-burning'], PHASE_INDEX['asymptotic-giant-branch'], PHASE_INDEX['white-dwarf']];
      const age = new Float64Array(n);
      const mass = new Float64Array(n);
      const coreMass = new Float64Array(n);
      const logL = new Float64Array(n);
      const logTeff = new Float64Array(n);
      const phase = new Uint8Array(n);
      let p = 0;
      let a = 0;
      let m = initialMass;
      steps.forEach((s, i) => {
        const advance = i > 0 && s.nextPhase && p < path.length - 1;
        if (advance) p++;
        else if (i > 0) a += s.dAge; // a phase boundary may repeat the age; inside a phase it grows
        if (i > 0) m *= s.massFactor;
        age[i] = a;
        mass[i] = m;
        coreMass[i] = Math.min(m, m * s.coreFraction);
        logL[i] = s.logL;
        logTeff[i] = s.logTeff;
        phase[i] = path[p];
      });
      return { initialMass, z, n, age, mass, coreMass, logL, logTeff, phase, eeps: [], events: [], msLifetime: 0, remnant: 'white-dwarf', remnantMass: m };
    })
    .filter((t) => {
      for (let i = 1; i < t.n; i++) if (t.age[i] === t.age[i - 1] && t.phase[i] === t.phase[i - 1]) return false; // dAge below the ulp of age
      return true;
    });

  test('writeGridFile → parseGridFile is exact for age, mass, coreMass and phase of random tracks (property)', () => {
    fc.assert(
      fc.property(syntheticTrack, (t) => {
        const { tracks, problems } = parseGridFile(gridFileString([t]));
        expect(problems).toEqual([]);
        const got = tracks[0];
        expect(got.age).toEqual(t.age);
        expect(got.mass).toEqual(t.mass);
        expect(got.coreMass).toEqual(t.coreMass);
        expect(got.phase).toEqual(t.phase);
        for (let i = 0; i < t.n; i++) {
          if (!logClose(got.logL[i], t.logL[i]) || !logClose(got.logTeff[i], t.logTeff[i])) return false;
        }
        // unlabelled in, EEPs placed by the convention out
        expect(got.eeps).toEqual(placePrimaryEeps(t.phase, t.age));
        return true;
      }),
      { numRuns: 300 },
    );
  });
});

describe('writeGridFile(tracks, out, options)', () => {
  test('writeGridFile(tracks, out) starts with the first line and the header, one line per point', () => {
    const track = generateTrack(1);
    const text = gridFileString([track]);
    const lines = text.split('\n');
    expect(lines[0]).toBe(GRID_FILE_FIRST_LINE);
    expect(lines[1]).toBe(GRID_FILE_HEADER);
    expect(lines).toHaveLength(2 + track.n + 1); // trailing newline
    expect(lines.at(-1)).toBe('');
    expect(lines[2].split(',').slice(0, 5)).toEqual(['1', '0.014', String(track.age[0]), 'pms-start', 'pre-main-sequence']);
  });

  test('writeGridFile(tracks, out) writes radius = √L / (Teff / 5772)² (Stefan–Boltzmann, IAU 2015 B3 Sun)', () => {
    const track = generateTrack(1);
    const row = gridFileString([track]).split('\n')[2].split(',');
    const L = Number(row[7]);
    const T = Number(row[8]);
    expect(Number(row[9])).toBe(Math.sqrt(L) / (T / 5772) ** 2);
  });

  test('writeGridFile(tracks, out) joins several EEPs on one point with a space', () => {
    const track = generateTrack(15); // he-ignition and cheb-start share the first helium-burning point
    const lines = gridFileString([track]).split('\n');
    const i = track.eeps.find((e) => e.name === 'cheb-start')!.index;
    expect(lines[2 + i].split(',')[3]).toBe('he-ignition cheb-start');
  });

  test('writeGridFile(tracks, out) streams a large grid in chunks of about 64 K characters', () => {
    const tracks = [0.8, 1, 1.2, 1.5, 2, 3, 4, 5, 6].map((m) => generateTrack(m));
    const chunks: string[] = [];
    writeGridFile(tracks, (c) => chunks.push(c));
    expect(chunks.length).toBeGreaterThan(3);
    for (const c of chunks) expect(c.length).toBeLessThan(65536 + 400); // one row past the threshold at most
    expect(chunks.join('')).toBe(gridFileString(tracks));
  });

  test('writeGridFile(tracks, out, { comments }) writes them after the first line', () => {
    const text = gridFileString([generateTrack(1)], { comments: ['made for a test', 'second'] });
    expect(text.split('\n').slice(0, 4)).toEqual([GRID_FILE_FIRST_LINE, '# made for a test', '# second', GRID_FILE_HEADER]);
    expect(parseGridFile(text).problems).toEqual([]);
  });

  const good = () => generateTrack(1);
  const bad: { name: string; tracks: () => Track[]; message: RegExp; options?: { comments: string[] } }[] = [
    { name: 'a non-finite age', tracks: () => { const t = good(); t.age[5] = NaN; return [t]; }, message: /point 5: age NaN yr/ },
    { name: 'mass ≤ 0', tracks: () => { const t = good(); t.mass[t.n - 1] = 0; return [t]; }, message: /mass 0 Msun must be finite and > 0/ },
    { name: 'coreMass > mass', tracks: () => { const t = good(); t.coreMass[3] = 2; return [t]; }, message: /point 3: coreMass 2 Msun/ },
    { name: 'a luminosity that underflows', tracks: () => { const t = good(); t.logL[0] = -400; return [t]; }, message: /logL -400 gives luminosity 0 Lsun/ },
    { name: 'an unknown phase code', tracks: () => { const t = good(); t.phase[t.n - 1] = 42; return [t]; }, message: /phase code 42/ },
    { name: 'ages decreasing', tracks: () => { const t = good(); t.age[10] = t.age[9] / 2; return [t]; }, message: /point 10: age .* before/ },
    { name: 'mass growing', tracks: () => { const t = good(); t.mass[100] = 1.5; return [t]; }, message: /point 100: mass 1.5 Msun is more/ },
    { name: 'an EEP index outside the track', tracks: () => { const t = good(); t.eeps[1] = { name: 'zams', index: t.n }; return [t]; }, message: /EEP zams index \d+ is outside/ },
    { name: 'two tracks with the same (initialMass, z)', tracks: () => [good(), good()], message: /tracks 1 and 2 both have initialMass 1 Msun, z 0.014/ },
    { name: 'a comment with a line break', tracks: () => [good()], message: /holds a line break/, options: { comments: ['a\nb'] } },
  ];
  test.each(bad)('writeGridFile(tracks, out) throws RangeError before writing anything for $name', ({ tracks, message, options }) => {
    const chunks: string[] = [];
    expect(() => writeGridFile([generateTrack(2), ...tracks()], (c) => chunks.push(c), options)).toThrow(message);
    expect(() => writeGridFile(tracks(), () => undefined, options)).toThrow(RangeError);
    expect(chunks).toEqual([]);
  });
});
