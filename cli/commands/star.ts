import { Command } from 'commander';
import type { StarState } from '../../lib/model/starState.js';
import type { GridQuery } from '../../lib/interp/gridQuery.js';
import { formatStateTable } from '../../lib/io/formatStateTable.js';
import { stateRecord } from '../../lib/io/stateRecord.js';
import { toJson } from '../../lib/io/toJson.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { resolveSource } from '../gridSource.js';
import {
  ageOption, ageWarning, checkMass, checkZ, exactOption, fehOption, formatOption, gridMassOption, gridOption, gridZOption,
  jsonOption, resolveZ, wantsJson, type TypedValues,
} from '../options.js';

/**
 * The present state of one star from the analytic model itself: builds its track for exactly
 * this mass and z and reads it at `age` (what `star --exact` prints).
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

/**
 * The present state of one star interpolated in a grid (what `star` prints by default).
 *
 * @param query the grid's interpolator (createGridQuery)
 * @throws RangeError naming the argument and the grid's range
 */
export function interpolatedState(query: GridQuery, initialMass: number, age: number, z: number): StarState {
  return stateRecord(query.star(initialMass, age, z));
}

interface StarOptions {
  mass: number;
  age: number;
  z?: number;
  feh?: number;
  json?: boolean;
  format?: string;
  grid?: string;
  exact?: boolean;
}

/** `starclock star`: the present-day state of one star. */
export function starCommand(io: Io): Command {
  const typed: TypedValues = {};
  return new Command('star')
    .description('present-day state of one star from its birth mass, metallicity and age')
    .addOption(gridMassOption(typed))
    .addOption(ageOption())
    .addOption(gridZOption(typed))
    .addOption(fehOption())
    .addOption(gridOption())
    .addOption(exactOption())
    .addOption(jsonOption())
    .addOption(formatOption())
    .addHelpText(
      'after',
      `
Prints every key of the star state with its unit (ages in the table in yr, kyr, Myr
or Gyr; in JSON always yr). Keys that do not apply are "—" in the table and null in
JSON. Ages beyond 13.8 Gyr (the age of the universe) are allowed with a warning.

The answer is interpolated in the built-in track grid (EEPs, monotone cubic in mass,
linear in log age and log z; see the README), or in --grid FILE, whose mass and z
ranges then apply. --exact builds the track for exactly this mass and z with the
analytic model instead, to compare (interpolation is good to about 0.01 dex in L
and 0.002 dex in Teff on the main sequence; see \`npm run bench\`).

Examples:
  starclock star --mass 1 --age 4.57Gyr
  starclock star --mass 0.3 --age 8 --feh -0.5 --json
  starclock star --mass 1.3 --age 3Gyr --exact
  starclock star --mass 1.3 --age 3Gyr --grid tracks-demo/sample-grid.csv
`,
    )
    .action(async (options: StarOptions) => {
      const z = resolveZ(options);
      const source = await resolveSource(options, io);
      checkMass(options.mass, typed, source.massRange);
      checkZ(z, options, typed, source.zRange);
      const warning = ageWarning(options.age);
      if (warning !== undefined) diagnostic(io, warning);
      const state = source.query === null
        ? await presentState(options.mass, options.age, z)
        : interpolatedState(source.query, options.mass, options.age, z);
      io.out(wantsJson(options) ? toJson(state, 2) + '\n' : formatStateTable(state));
    });
}
