import { Command } from 'commander';
import type { StarState } from '../../lib/model/starState.js';
import { STATE_KEYS } from '../../lib/model/starState.js';
import type { Isochrone } from '../../lib/interp/isochrone.js';
import type { GridQuery } from '../../lib/interp/gridQuery.js';
import { formatAge } from '../../lib/io/formatAge.js';
import { formatCsv } from '../../lib/io/formatCsv.js';
import { formatSignificant } from '../../lib/io/formatSignificant.js';
import { formatStateValue } from '../../lib/io/formatStateValue.js';
import { formatTable } from '../../lib/io/formatTable.js';
import { stateRecord } from '../../lib/io/stateRecord.js';
import { toJson } from '../../lib/io/toJson.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { resolveSource } from '../gridSource.js';
import {
  ageOption, ageWarning, checkZ, countOption, dataFormatOption, fehOption, gridOption, gridZOption, jsonOption, resolveZ,
  type TypedValues,
} from '../options.js';

/**
 * Stars of one age across the grid's mass range (lib/interp/isochrone.ts), every state put in
 * schema order; points in increasing initial mass.
 *
 * @param query the grid's interpolator
 * @param age yr
 * @param z metal fraction within the grid
 * @param count log-spaced masses (more near the turnoff)
 */
export async function isochroneTable(query: GridQuery, age: number, z: number, count: number): Promise<Isochrone> {
  const { isochrone } = await import('../../lib/interp/isochrone.js');
  const iso = isochrone(query, age, z, { count });
  return { age: iso.age, z: iso.z, turnoffMass: iso.turnoffMass, points: iso.points.map(stateRecord) };
}

const text = (key: keyof StarState, s: StarState): string => formatStateValue(key, s[key]).text;

/** The human table: the turnoff mass first, then every point with a readable subset of the state. */
export function formatIsochroneTable(iso: Isochrone, label: string): string {
  const age = formatAge(iso.age, 4);
  const heading =
    `Isochrone at ${age.text} ${age.unit}, z ${formatSignificant(iso.z, 3, true)} (${label}): ` +
    `turnoff mass ${formatSignificant(iso.turnoffMass, 4)} Msun; ${iso.points.length} stars\n\n`;
  const rows = iso.points.map((p) => [
    text('initialMass', p), p.phase, text('mass', p), text('luminosity', p), text('teff', p), text('radius', p),
    text('logg', p), text('spectralType', p), text('mv', p), text('bv', p),
  ]);
  return heading + formatTable(
    ['initial mass (Msun)', 'phase', 'mass (Msun)', 'L (Lsun)', 'Teff (K)', 'R (Rsun)', 'log g', 'type', 'M_V', 'B−V'],
    rows,
    ['right', 'left', 'right', 'right', 'right', 'right', 'right', 'left', 'right', 'right'],
  );
}

interface IsochroneOptions {
  age: number;
  z?: number;
  feh?: number;
  grid?: string;
  count: number;
  json?: boolean;
  format: string;
}

/** `starclock isochrone`: a population of one age across the mass range, and its turnoff mass. */
export function isochroneCommand(io: Io): Command {
  const typed: TypedValues = {};
  return new Command('isochrone')
    .description('stars of one age across the mass range, with the main-sequence turnoff mass')
    .addOption(ageOption())
    .addOption(gridZOption(typed))
    .addOption(fehOption())
    .addOption(gridOption())
    .addOption(countOption())
    .addOption(jsonOption())
    .addOption(dataFormatOption())
    .addHelpText(
      'after',
      `
The state, at one age, of stars of every birth mass in the grid's range (the built-in
grid: 0.01–150 Msun; or --grid FILE's), from --count log-spaced masses plus extra ones
near the turnoff, in increasing initial mass. The turnoff mass is the largest birth
mass still on the main sequence at that age, found by bisection on the phase.
Stars that have died appear as their remnants.

--format table (default): the turnoff mass first, then one row per star.
--format csv: every key of the star state, one row per star.
--format json (or --json): { "age", "z", "turnoffMass", "points": [state …] }, ages in yr.

Examples:
  starclock isochrone --age 1Gyr
  starclock isochrone --age 12Gyr --feh -1.5 --count 100 --format csv > old-cluster.csv
  starclock isochrone --age 500Myr --grid tracks-demo/sample-grid.csv --json
`,
    )
    .action(async (options: IsochroneOptions) => {
      const z = resolveZ(options);
      const source = await resolveSource(options, io);
      checkZ(z, options, typed, source.zRange);
      const warning = ageWarning(options.age);
      if (warning !== undefined) diagnostic(io, warning);
      // resolveSource gives an interpolator unless --exact, which this command does not take
      if (source.query === null) throw new Error('internal error: isochrone needs a grid');
      const iso = await isochroneTable(source.query, options.age, z, options.count);
      const format = options.json === true ? 'json' : options.format;
      if (format === 'json') io.out(toJson(iso, 2) + '\n');
      else if (format === 'csv') io.out(formatCsv([...STATE_KEYS], iso.points.map((p) => STATE_KEYS.map((k) => p[k]))));
      else io.out(formatIsochroneTable(iso, source.label));
    });
}
