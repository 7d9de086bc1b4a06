import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { lifeOf } from '../lib/model/lifeOf.js';
import { PHASE_INDEX } from '../lib/model/phases.js';

const SEED = 20240515;
const massArb = fc.double({ min: Math.log10(0.01), max: Math.log10(150), noNaN: true }).map((x) => Math.min(150, Math.max(0.01, 10 ** x)));
const zArb = fc.double({ min: -4, max: Math.log10(0.03), noNaN: true }).map((x) => Math.min(0.03, Math.max(1e-4, 10 ** x)));

describe('lifeOf(track)', () => {
  test('lists phases in life order, each with start.age ≤ end.age, and events in age order (property)', () => {
    fc.assert(fc.property(massArb, zArb, (m, z) => {
      const life = lifeOf(generateTrack(m, z));
      expect(life.initialMass).toBe(m);
      expect(life.z).toBe(z);
      expect(life.phases.length).toBeGreaterThan(0);
      for (let i = 0; i < life.phases.length; i++) {
        const p = life.phases[i];
        expect(p.start.phase).toBe(p.phase);
        expect(p.end.phase).toBe(p.phase);
        expect(p.start.age).toBeLessThanOrEqual(p.end.age);
        expect(p.end.mass).toBeLessThanOrEqual(p.start.mass);
        if (i > 0) {
          expect(PHASE_INDEX[p.phase]).toBeGreaterThan(PHASE_INDEX[life.phases[i - 1].phase]);
          expect(p.start.age).toBeGreaterThanOrEqual(life.phases[i - 1].end.age);
        }
      }
      for (let i = 1; i < life.events.length; i++) expect(life.events[i].age).toBeGreaterThanOrEqual(life.events[i - 1].age);
    }), { seed: SEED, numRuns: 200 });
  });

  test.each([
    { m: 1, phases: ['pre-main-sequence', 'main-sequence', 'subgiant', 'red-giant-branch', 'core-helium-burning', 'asymptotic-giant-branch', 'post-asymptotic-giant-branch', 'white-dwarf'], events: ['zams', 'helium-flash', 'planetary-nebula', 'remnant-birth'] },
    { m: 4, phases: ['pre-main-sequence', 'main-sequence', 'subgiant', 'red-giant-branch', 'core-helium-burning', 'asymptotic-giant-branch', 'post-asymptotic-giant-branch', 'white-dwarf'], events: ['helium-ignition', 'first-thermal-pulse', 'remnant-birth'] },
    { m: 15, phases: ['pre-main-sequence', 'main-sequence', 'subgiant', 'core-helium-burning', 'neutron-star'], events: ['helium-ignition', 'supernova', 'remnant-birth'] },
    { m: 0.05, phases: ['brown-dwarf'], events: [] },
  ])('lifeOf(generateTrack($m)) passes through the expected phases and events', ({ m, phases, events }) => {
    const life = lifeOf(generateTrack(m));
    expect(life.phases.map((p) => p.phase)).toEqual(phases);
    const names = life.events.map((e) => e.event);
    for (const e of events) expect(names).toContain(e);
  });
});
