import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { generateTrack } from '../lib/model/generateTrack.js';
import { PHASE_INDEX, PHASES } from '../lib/model/phases.js';
import { placePrimaryEeps } from '../lib/tracks/placePrimaryEeps.js';
import { PRIMARY_EEPS, type Eep, type Track } from '../lib/tracks/track.js';

const code = (...names: (typeof PHASES)[number][]) => Uint8Array.from(names.map((p) => PHASE_INDEX[p]));
const names = (eeps: Eep[]) => eeps.map((e) => `${e.name}@${e.index}`);
const lastOf = (t: Track, phase: (typeof PHASES)[number]) => t.phase.lastIndexOf(PHASE_INDEX[phase]);
const without = (eeps: Eep[], name: string) => eeps.filter((e) => e.name !== name);

describe('placePrimaryEeps(phase, age) by the layout convention', () => {
  const cases: { name: string; phase: Uint8Array; age: number[]; want: string[] }[] = [
    { name: 'a pre-main sequence and a main sequence', phase: code('pre-main-sequence', 'pre-main-sequence', 'main-sequence', 'main-sequence', 'main-sequence'), age: [0, 1, 1, 2, 3],
      want: ['pms-start@0', 'zams@2', 'ms-mid@3', 'tams@4', 'track-end@4'] },
    { name: 'one point', phase: code('main-sequence'), age: [5], want: ['pms-start@0', 'zams@0', 'ms-mid@0', 'tams@0', 'track-end@0'] },
    { name: 'ms-mid nearest the middle in age, not in rows', phase: code('main-sequence', 'main-sequence', 'main-sequence', 'main-sequence'), age: [0, 1, 2, 10],
      want: ['pms-start@0', 'zams@0', 'ms-mid@2', 'tams@3', 'track-end@3'] },
    { name: 'a tie for ms-mid, taking the earlier row', phase: code('main-sequence', 'main-sequence'), age: [0, 2], want: ['pms-start@0', 'zams@0', 'ms-mid@0', 'tams@1', 'track-end@1'] },
    { name: 'a red giant whose envelope is lost: no he-ignition', phase: code('main-sequence', 'subgiant', 'red-giant-branch', 'white-dwarf'), age: [0, 1, 2, 3],
      want: ['pms-start@0', 'zams@0', 'ms-mid@0', 'tams@0', 'rgb-base@1', 'remnant-birth@3', 'track-end@3'] },
    { name: 'the red-giant tip as he-ignition', phase: code('main-sequence', 'subgiant', 'red-giant-branch', 'red-giant-branch', 'core-helium-burning', 'asymptotic-giant-branch', 'asymptotic-giant-branch', 'post-asymptotic-giant-branch', 'white-dwarf'), age: [0, 1, 2, 3, 3, 4, 5, 6, 7],
      want: ['pms-start@0', 'zams@0', 'ms-mid@0', 'tams@0', 'rgb-base@1', 'he-ignition@3', 'cheb-start@4', 'cheb-end@4', 'first-thermal-pulse@6', 'agb-end@6', 'remnant-birth@8', 'track-end@8'] },
    { name: 'no red giant branch: he-ignition on the first helium-burning row', phase: code('main-sequence', 'subgiant', 'core-helium-burning', 'core-helium-burning', 'black-hole'), age: [0, 1, 1, 2, 2],
      want: ['pms-start@0', 'zams@0', 'ms-mid@0', 'tams@0', 'rgb-base@1', 'he-ignition@2', 'cheb-start@2', 'cheb-end@3', 'remnant-birth@4', 'track-end@4'] },
    { name: 'a brown dwarf', phase: code('brown-dwarf', 'brown-dwarf', 'brown-dwarf'), age: [1, 2, 3], want: ['pms-start@0', 'track-end@2'] },
    { name: 'a track that starts as a white dwarf', phase: code('white-dwarf', 'white-dwarf'), age: [1, 2], want: ['pms-start@0', 'remnant-birth@0', 'track-end@1'] },
  ];
  test.each(cases)('placePrimaryEeps(phase, age) places $name', ({ phase, age, want }) => {
    expect(names(placePrimaryEeps(phase, Float64Array.from(age)))).toEqual(want);
  });

  test.each([
    { name: 'empty columns', phase: new Uint8Array(0), age: new Float64Array(0), message: /no points/ },
    { name: 'columns of different length', phase: code('main-sequence'), age: Float64Array.of(0, 1), message: /age has 2 points but phase has 1/ },
    { name: 'an unknown phase code', phase: Uint8Array.of(1, 99), age: Float64Array.of(0, 1), message: /phase code 99 at point 1 is not a phase; codes are 0–10/ },
  ])('placePrimaryEeps(phase, age) throws RangeError for $name', ({ phase, age, message }) => {
    expect(() => placePrimaryEeps(phase, age)).toThrow(RangeError);
    expect(() => placePrimaryEeps(phase, age)).toThrow(message);
  });

  test('placePrimaryEeps(phase, age) returns EEPs ordered by index, life order within a point, each once (property)', () => {
    const track = fc.array(fc.record({ step: fc.nat(3), dt: fc.double({ min: 0, max: 10, noNaN: true }) }), { minLength: 1, maxLength: 60 }).map((steps) => {
      let p = 0;
      let a = 0;
      const phase = new Uint8Array(steps.length);
      const age = new Float64Array(steps.length);
      steps.forEach((s, i) => {
        p = Math.min(PHASES.length - 1, p + (i > 0 && s.step === 0 ? 1 : 0));
        a += s.dt;
        phase[i] = p;
        age[i] = a;
      });
      return { phase, age };
    });
    fc.assert(
      fc.property(track, ({ phase, age }) => {
        const eeps = placePrimaryEeps(phase, age);
        const order = eeps.map((e) => PRIMARY_EEPS.indexOf(e.name));
        expect(new Set(eeps.map((e) => e.name)).size).toBe(eeps.length);
        for (let k = 1; k < eeps.length; k++) {
          expect(eeps[k].index > eeps[k - 1].index || (eeps[k].index === eeps[k - 1].index && order[k] > order[k - 1])).toBe(true);
        }
        expect(eeps[0]).toEqual({ name: 'pms-start', index: 0 });
        expect(eeps.at(-1)).toEqual({ name: 'track-end', index: phase.length - 1 });
      }),
      { numRuns: 500 },
    );
  });
});

describe('placePrimaryEeps(phase, age) on the built-in model tracks', () => {
  const MASSES = [0.05, 0.3, 1, 1.5, 3, 6, 15, 40];
  const Z = [0.014, 0.0001, 0.03];
  const grid = MASSES.flatMap((mass) => Z.map((z) => ({ mass, z })));

  // With fullLife (how the grid builds its tracks) every phase is complete, and the convention
  // gives the model's own EEPs — except first-thermal-pulse on AGBs that pulse: the model puts
  // it where its early AGB ends (30 points after the AGB starts), which phases and ages cannot
  // show, so the convention puts it on the last AGB point, with agb-end.
  test.each(grid)('placePrimaryEeps reproduces the EEPs of generateTrack($mass, $z, fullLife) but first-thermal-pulse', ({ mass, z }) => {
    const t = generateTrack(mass, z, { fullLife: true });
    const placed = placePrimaryEeps(t.phase, t.age);
    expect(without(placed, 'first-thermal-pulse')).toEqual(without(t.eeps, 'first-thermal-pulse'));
    const pulse = t.eeps.find((e) => e.name === 'first-thermal-pulse');
    const placedPulse = placed.find((e) => e.name === 'first-thermal-pulse');
    if (!pulse) {
      expect(placedPulse).toBeUndefined();
      return;
    }
    const agb = PHASE_INDEX['asymptotic-giant-branch'];
    expect(t.phase[pulse.index]).toBe(agb);
    expect(placedPulse).toEqual({ name: 'first-thermal-pulse', index: lastOf(t, 'asymptotic-giant-branch') });
    // the model's pulse, where it has one, is 30 points into its AGB
    if (pulse.index !== lastOf(t, 'asymptotic-giant-branch')) expect(pulse.index - t.phase.indexOf(agb)).toBe(30);
  });

  // Cut at 100 Gyr (the default), a main sequence still going on at the cut has no tams and,
  // if the middle was not reached, no ms-mid in the model; the convention closes every phase
  // at its last point.
  test.each([0.3, 0.5].flatMap((mass) => Z.map((z) => ({ mass, z }))))(
    'placePrimaryEeps adds tams (and ms-mid) at the 100 Gyr cut of generateTrack($mass, $z)',
    ({ mass, z }) => {
      const t = generateTrack(mass, z);
      const placed = placePrimaryEeps(t.phase, t.age);
      const lastMs = lastOf(t, 'main-sequence');
      expect(lastMs).toBe(t.n - 1);
      expect(t.eeps.find((e) => e.name === 'tams')).toBeUndefined();
      expect(placed.find((e) => e.name === 'tams')).toEqual({ name: 'tams', index: lastMs });
      const modelMid = t.eeps.find((e) => e.name === 'ms-mid');
      expect(without(without(placed, 'tams'), 'ms-mid')).toEqual(without(t.eeps, 'ms-mid'));
      if (modelMid) expect(placed.find((e) => e.name === 'ms-mid')!.index).toBeLessThan(modelMid.index);
    },
  );
});
