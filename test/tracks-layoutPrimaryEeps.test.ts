import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { layoutPrimaryEeps } from '../lib/tracks/layoutPrimaryEeps.js';
import { builtinGridTracks } from '../lib/tracks/builtinGridTracks.js';
import { interpolatedTrackEeps } from '../lib/interp/interpolatedTrackEeps.js';
import { interpolatedTrack } from '../lib/interp/interpolatedTrack.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { PHASE_INDEX } from '../lib/model/phases.js';

describe('layoutPrimaryEeps(layout, phase)', () => {
  // The oracle is resampleEeps itself, which knows where each EEP came from.
  test.each([0.0001, 0.002, 0.014, 0.03])('equals resampleEeps(track).primary for every built-in track at z %s', (z) => {
    for (const t of builtinGridTracks(z)) {
      expect(layoutPrimaryEeps(t.layout, t.phase), `${t.initialMass} Msun, ${t.layout}`).toEqual(t.primary);
    }
  }, 60000);

  test('the documented example: a brown dwarf', () => {
    expect(layoutPrimaryEeps('10;pms-start,track-end;none;brown-dwarf', new Uint8Array(50).fill(10))).toEqual([
      { name: 'pms-start', index: 0 },
      { name: 'track-end', index: 49 },
    ]);
  });

  test.each([
    { name: 'too few EEPs', layout: '10;pms-start,track-end;none;brown-dwarf', n: 10, words: ['end at EEP 49'] },
    { name: 'unknown phase code', layout: '99;pms-start;none;brown-dwarf', n: 10, words: ["'99'"] },
    { name: 'unknown EEP', layout: '10;pms-start,nova;none;brown-dwarf', n: 50, words: ["'nova'"] },
    { name: 'malformed', layout: 'nonsense', n: 5, words: ['malformed'] },
  ])('throws RangeError for a layout that does not fit: $name', ({ layout, n, words }) => {
    const phase = new Uint8Array(n).fill(PHASE_INDEX['brown-dwarf']);
    expect(() => layoutPrimaryEeps(layout, phase)).toThrow(RangeError);
    try {
      layoutPrimaryEeps(layout, phase);
    } catch (error) {
      for (const w of words) expect((error as Error).message).toContain(w);
    }
  });
});

describe('interpolatedTrackEeps(grid, initialMass, z)', () => {
  const grid = loadBuiltinGrid();
  test('fits the interpolated track: same EEP count, each EEP on a row of its phase, in life order', () => {
    fc.assert(
      fc.property(fc.double({ min: -2, max: Math.log10(150), noNaN: true }), fc.double({ min: -4, max: Math.log10(0.03), noNaN: true }), (lm, lz) => {
        const m = Math.min(150, 10 ** lm);
        const z = Math.min(0.03, Math.max(1e-4, 10 ** lz));
        const track = interpolatedTrack(grid, m, z);
        const eeps = interpolatedTrackEeps(grid, m, z);
        expect(eeps[0]).toEqual({ name: 'pms-start', index: 0 });
        expect(eeps[eeps.length - 1]).toEqual({ name: 'track-end', index: track.n - 1 });
        for (const e of eeps) {
          if (e.name === 'zams' || e.name === 'tams' || e.name === 'ms-mid') expect(track.phase[e.index]).toBe(PHASE_INDEX['main-sequence']);
          if (e.name === 'cheb-start' || e.name === 'cheb-end') expect(track.phase[e.index]).toBe(PHASE_INDEX['core-helium-burning']);
        }
        for (let k = 1; k < eeps.length; k++) expect(eeps[k].index).toBeGreaterThanOrEqual(eeps[k - 1].index);
      }),
      { numRuns: 200 },
    );
  });

  test('a 1 Msun star at solar z has the EEPs of its life from pre-main sequence to white dwarf', () => {
    expect(interpolatedTrackEeps(grid, 1, 0.014).map((e) => e.name)).toEqual([
      'pms-start', 'zams', 'ms-mid', 'tams', 'rgb-base', 'he-ignition', 'cheb-start', 'cheb-end', 'first-thermal-pulse', 'agb-end', 'remnant-birth', 'track-end',
    ]);
  });

  test('throws RangeError naming the grid range for a mass outside it', () => {
    expect(() => interpolatedTrackEeps(grid, 200, 0.014)).toThrow(/initialMass 200 outside the built-in grid's/);
  });
});
