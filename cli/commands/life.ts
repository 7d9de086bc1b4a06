import { Command } from 'commander';
import type { Life } from '../../lib/model/life.js';
import { formatLifeTimeline } from '../../lib/io/formatLifeTimeline.js';
import { stateRecord } from '../../lib/io/stateRecord.js';
import { toJson } from '../../lib/io/toJson.js';
import type { Io } from '../io.js';
import { fehOption, formatOption, jsonOption, massOption, resolveZ, wantsJson, zOption } from '../options.js';

/**
 * A star's whole life: `lifeOf` of its track, with every state's keys put in
 * schema order (events keep `event` first). The model is imported on first use.
 *
 * @param initialMass birth mass, Msun
 * @param z metal mass fraction
 * @throws RangeError from the model for values outside its ranges
 */
export async function lifeTimeline(initialMass: number, z: number): Promise<Life> {
  const [{ generateTrack }, { lifeOf }] = await Promise.all([
    import('../../lib/model/generateTrack.js'),
    import('../../lib/model/lifeOf.js'),
  ]);
  const life = lifeOf(generateTrack(initialMass, z));
  return {
    initialMass: life.initialMass,
    z: life.z,
    phases: life.phases.map(({ phase, start, end }) => ({ phase, start: stateRecord(start), end: stateRecord(end) })),
    events: life.events.map((e) => ({ event: e.event, ...stateRecord(e) })),
  };
}

interface LifeOptions {
  mass: number;
  z?: number;
  feh?: number;
  json?: boolean;
  format?: string;
}

/** `starclock life`: the timeline of one star's life. */
export function lifeCommand(io: Io): Command {
  return new Command('life')
    .description("a star's whole life as a timeline: each phase's start and end, key events, remnant")
    .addOption(massOption())
    .addOption(zOption())
    .addOption(fehOption())
    .addOption(jsonOption())
    .addOption(formatOption())
    .addHelpText(
      'after',
      `
The table lists each phase with its start and end age, its duration and the
luminosity, Teff, radius, mass and spectral type at its start and end, then the
key events with their ages. --json prints
  { "initialMass", "z", "phases": [{ "phase", "start": {state}, "end": {state} }],
    "events": [{ "event", ...state }] }
with ages in yr.

Examples:
  starclock life --mass 1
  starclock life --mass 5 --z 0.008 --json
`,
    )
    .action(async (options: LifeOptions) => {
      const life = await lifeTimeline(options.mass, resolveZ(options));
      io.out(wantsJson(options) ? toJson(life, 2) + '\n' : formatLifeTimeline(life));
    });
}
