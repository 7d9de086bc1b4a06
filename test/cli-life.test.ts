import { describe, expect, test } from 'vitest';
import { PHASE_INDEX } from '../lib/model/phases.js';
import { LIFE_EVENTS } from '../lib/tracks/track.js';
import { SOLAR_Z } from '../lib/model/limits.js';
import { expectStateSchema, lines, runBin, runMain } from './cli-run.js';

interface State extends Record<string, unknown> {
  age: number;
  phase: keyof typeof PHASE_INDEX;
}
interface LifeJson {
  initialMass: number;
  z: number;
  phases: { phase: keyof typeof PHASE_INDEX; start: State; end: State }[];
  events: ({ event: string } & State)[];
}

function life(args: string[]): LifeJson {
  const { code, stdout, stderr } = runBin(['life', ...args, '--json']);
  expect(stderr).toBe('');
  expect(code).toBe(0);
  return JSON.parse(stdout) as LifeJson;
}

describe('starclock life --json', () => {
  test.each([
    { name: 'brown dwarf', mass: '0.05', last: ['brown-dwarf'] },
    { name: 'red dwarf', mass: '0.2', last: ['main-sequence', 'white-dwarf'] },
    { name: 'Sun', mass: '1', last: ['white-dwarf'] },
    { name: 'intermediate mass', mass: '3', last: ['white-dwarf'] },
    { name: 'massive', mass: '15', last: ['neutron-star', 'black-hole'] },
    { name: 'very massive', mass: '60', last: ['neutron-star', 'black-hole'] },
  ])('$name ($mass Msun): phases in life order, each start ≤ end, events in age order', ({ mass, last }) => {
    const timeline = life(['--mass', mass]);
    expect(Object.keys(timeline)).toEqual(['initialMass', 'z', 'phases', 'events']);
    expect(timeline.initialMass).toBe(Number(mass));
    expect(timeline.z).toBe(SOLAR_Z);
    expect(timeline.phases.length).toBeGreaterThan(0);
    let previousIndex = -1;
    let previousEnd = 0;
    for (const { phase, start, end } of timeline.phases) {
      expect(PHASE_INDEX[phase] ?? -1, phase).toBeGreaterThan(previousIndex);
      previousIndex = PHASE_INDEX[phase];
      expectStateSchema(start);
      expectStateSchema(end);
      expect(start.phase).toBe(phase);
      expect(end.phase).toBe(phase);
      expect(start.age).toBeLessThanOrEqual(end.age);
      expect(start.age).toBeGreaterThanOrEqual(previousEnd);
      previousEnd = end.age;
    }
    expect(last).toContain(timeline.phases[timeline.phases.length - 1].phase);
    let previousAge = 0;
    for (const event of timeline.events) {
      expect(LIFE_EVENTS as readonly string[]).toContain(event.event);
      expect(Object.keys(event)[0]).toBe('event');
      const { event: _name, ...state } = event;
      expectStateSchema(state);
      expect(event.age).toBeGreaterThanOrEqual(previousAge);
      previousAge = event.age;
    }
  });

  test('a Sun-like life passes the main sequence and the red-giant branch and starts at the ZAMS event', () => {
    const timeline = life(['--mass', '1']);
    const phases = timeline.phases.map((p) => p.phase);
    expect(phases).toContain('main-sequence');
    expect(phases).toContain('red-giant-branch');
    expect(timeline.events.map((e) => e.event)).toContain('zams');
  });

  test('--z is passed through', () => {
    expect(life(['--mass', '2', '--z', '0.004']).z).toBe(0.004);
  });
});

describe('starclock life (table)', () => {
  test('prints a summary, every phase with start, end and duration, and the events', async () => {
    const { code, stdout, stderr } = await runMain(['life', '--mass', '1']);
    expect(code).toBe(0);
    expect(stderr).toBe('');
    expect(lines(stdout)[0]).toMatch(/^Life of a 1 Msun star \(z 0\.014\)/);
    expect(stdout).toMatch(/^phase\s+start\s+end\s+duration/m);
    expect(stdout).toMatch(/^main-sequence\s+[\d.]+ [kMG]?yr\s+[\d.]+ Gyr\s+[\d.]+ Gyr/m);
    expect(stdout).toMatch(/^Events$/m);
    expect(stdout).toMatch(/^zams\s/m);
  });
});

describe('starclock life rejects bad input with exit 2 and one stderr line', () => {
  test.each([
    { name: 'mass above range', args: ['--mass', '151'], words: ['--mass', '151', '0.01–150 Msun'] },
    { name: 'text mass', args: ['--mass', 'big'], words: ['--mass', 'big', '0.01–150 Msun'] },
    { name: 'z above range', args: ['--mass', '1', '--z', '0.04'], words: ['--z', '0.04', '0.0001–0.03'] },
    { name: '--z with --feh', args: ['--mass', '1', '--z', '0.01', '--feh', '0'], words: ['--z', '--feh'] },
    { name: 'unknown option', args: ['--mass', '1', '--age', '1'], words: ['--age', 'unknown option'] },
  ])('$name', ({ args, words }) => {
    const { code, stdout, stderr } = runBin(['life', ...args]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(lines(stderr)).toHaveLength(1);
    for (const word of words) expect(stderr).toContain(word);
  });

  test('--help describes the timeline and the JSON shape', () => {
    const { code, stdout: help } = runBin(['life', '--help']);
    expect(code).toBe(0);
    const stdout = help.replace(/\s+/g, ' ');
    for (const word of ['--mass <Msun>', '--z <Z>', '--feh <dex>', '--json', '"phases"', '"events"']) {
      expect(stdout).toContain(word);
    }
  });
});
