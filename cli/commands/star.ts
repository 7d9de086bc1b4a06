import { Command } from 'commander';
import type { StarState } from '../../lib/model/starState.js';
import { formatStateTable } from '../../lib/io/formatStateTable.js';
import { stateRecord } from '../../lib/io/stateRecord.js';
import { toJson } from '../../lib/io/toJson.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { ageOption, ageWarning, fehOption, formatOption, jsonOption, massOption, resolveZ, wantsJson, zOption } from '../options.js';

/**
 * The present state of one star: builds its track and reads it at `age`.
 * The model is imported on first use so that `--help` and bad input stay fast.
 *
 * @param initialMass birth mass, Msun
 * @param age yr
 * @param z metal mass fraction
 * @throws RangeError from the model for values outside its ranges
 */
export async function presentState(initialMass: number, age: number, z: number): Promise<StarState> {
  const [{ generateTrack }, { starAt }] = await Promise.all([
    import('../../lib/model/generateTrack.js'),
    import('../../lib/model/starAt.js'),
  ]);
  return stateRecord(starAt(generateTrack(initialMass, z), age));
}

interface StarOptions {
  mass: number;
  age: number;
  z?: number;
  feh?: number;
  json?: boolean;
  format?: string;
}

/** `starclock star`: the present-day state of one star. */
export function starCommand(io: Io): Command {
  return new Command('star')
    .description('present-day state of one star from its birth mass, metallicity and age')
    .addOption(massOption())
    .addOption(ageOption())
    .addOption(zOption())
    .addOption(fehOption())
    .addOption(jsonOption())
    .addOption(formatOption())
    .addHelpText(
      'after',
      `
Prints every key of the star state with its unit (ages in the table in yr, kyr, Myr
or Gyr; in JSON always yr). Keys that do not apply are "—" in the table and null in
JSON. Ages beyond 13.8 Gyr (the age of the universe) are allowed with a warning.

Examples:
  starclock star --mass 1 --age 4.57Gyr
  starclock star --mass 0.3 --age 8 --feh -0.5 --json
`,
    )
    .action(async (options: StarOptions) => {
      const warning = ageWarning(options.age);
      if (warning !== undefined) diagnostic(io, warning);
      const state = await presentState(options.mass, options.age, resolveZ(options));
      io.out(wantsJson(options) ? toJson(state, 2) + '\n' : formatStateTable(state));
    });
}
