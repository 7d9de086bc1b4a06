import { Command } from 'commander';
import type { StarState } from '../../lib/model/starState.js';
import { STATE_KEYS } from '../../lib/model/starState.js';
import type { RemnantKind } from '../../lib/model/phases.js';
import type { Eep } from '../../lib/tracks/track.js';
import { formatAge } from '../../lib/io/formatAge.js';
import { formatCsv } from '../../lib/io/formatCsv.js';
import { formatStateValue } from '../../lib/io/formatStateValue.js';
import { formatTable } from '../../lib/io/formatTable.js';
import { stateRecord } from '../../lib/io/stateRecord.js';
import { toJson } from '../../lib/io/toJson.js';
import type { Io } from '../io.js';
import { resolveSource, type StarSource } from '../gridSource.js';
import {
  checkMass, checkZ, dataFormatOption, exactOption, fehOption, gridMassOption, gridOption, gridZOption, jsonOption,
  resolveZ, type TypedValues,
} from '../options.js';

/** One row of a track: the EEP index, the primary EEP names on it (space-separated) or null, and the state. */
export type TrackPoint = { eep: number; primaryEep: string | null } & StarState;

/** A star's track over age, one point per EEP (what `starclock track` prints). */
export interface TrackTable {
  initialMass: number;
  z: number;
  msLifetime: number;
  remnant: RemnantKind;
  remnantMass: number;
  points: TrackPoint[];
}

/** Columns of an EEP track as the interpolator and resampleEeps both give them. */
interface EepColumns {
  n: number;
  age: ArrayLike<number>;
  mass: ArrayLike<number>;
  coreMass: ArrayLike<number>;
  logL: ArrayLike<number>;
  logTeff: ArrayLike<number>;
  phase: ArrayLike<number>;
  msLifetime: number;
  remnant: RemnantKind;
  remnantMass: number;
}

/**
 * The track of one star, one point per EEP: interpolated in `source`'s grid
 * (interpolatedTrack, its primary EEPs by interpolatedTrackEeps) or, for the exact model,
 * generated for exactly this mass and z over its whole life and resampled onto EEPs by the
 * same method as the grid's tracks (resampleEeps). Every point's state comes from
 * observeState. Modules are imported on first use.
 *
 * @param initialMass Msun
 * @param z metal fraction
 * @throws RangeError for a mass or z outside the grid or model
 */
export async function trackTable(source: StarSource, initialMass: number, z: number): Promise<TrackTable> {
  const { observeState } = await import('../../lib/model/observeState.js');
  let columns: EepColumns;
  let eeps: Eep[];
  if (source.query === null) {
    const [{ generateTrack }, { resampleEeps }] = await Promise.all([
      import('../../lib/model/generateTrack.js'),
      import('../../lib/tracks/resampleEeps.js'),
    ]);
    const e = resampleEeps(generateTrack(initialMass, z, { fullLife: true }));
    columns = { ...e, age: Float64Array.from(e.logAge, (a) => 10 ** a) };
    eeps = e.primary;
  } else {
    const [{ interpolatedTrack }, { interpolatedTrackEeps }] = await Promise.all([
      import('../../lib/interp/interpolatedTrack.js'),
      import('../../lib/interp/interpolatedTrackEeps.js'),
    ]);
    columns = interpolatedTrack(source.query.grid, initialMass, z);
    eeps = interpolatedTrackEeps(source.query.grid, initialMass, z);
  }
  const names: (string | null)[] = new Array<string | null>(columns.n).fill(null);
  for (const e of eeps) names[e.index] = names[e.index] === null ? e.name : `${names[e.index]} ${e.name}`;
  const { msLifetime, remnant, remnantMass } = columns;
  const points: TrackPoint[] = [];
  for (let j = 0; j < columns.n; j++) {
    const state = stateRecord(observeState(
      initialMass, z, columns.age[j], columns.phase[j], columns.mass[j], columns.coreMass[j], columns.logL[j], columns.logTeff[j],
      msLifetime, remnant, remnantMass,
    ));
    points.push({ eep: j, primaryEep: names[j], ...state });
  }
  return { initialMass, z, msLifetime, remnant, remnantMass, points };
}

const text = (key: keyof StarState, s: StarState): string => formatStateValue(key, s[key]).text;

/** The human table of a track: a heading, then every EEP with a readable subset of the state. */
export function formatTrackTable(track: TrackTable, label: string): string {
  const life = track.msLifetime > 0 ? formatAge(track.msLifetime, 3) : undefined;
  const heading =
    `Track of a ${text('initialMass', track.points[0])} Msun star (z ${text('z', track.points[0])}) from ${label}: ` +
    `${track.points.length} EEPs; main-sequence lifetime ${life ? `${life.text} ${life.unit}` : '—'}; ` +
    `ends as ${track.remnant} of ${text('remnantMass', track.points[0])} Msun\n\n`;
  const rows = track.points.map((p) => {
    const age = formatAge(p.age, 4);
    return [
      String(p.eep), p.primaryEep ?? '', `${age.text} ${age.unit}`, p.phase, text('mass', p), text('coreMass', p),
      text('luminosity', p), text('teff', p), text('radius', p), text('spectralType', p),
    ];
  });
  return heading + formatTable(
    ['eep', 'primary EEP', 'age', 'phase', 'mass (Msun)', 'core (Msun)', 'L (Lsun)', 'Teff (K)', 'R (Rsun)', 'type'],
    rows,
    ['right', 'left', 'right', 'left', 'right', 'right', 'right', 'right', 'right', 'left'],
  );
}

/** The track as CSV: `eep`, `primaryEep`, then the schema's keys. */
export function trackCsv(track: TrackTable): string {
  return formatCsv(['eep', 'primaryEep', ...STATE_KEYS], track.points.map((p) => [p.eep, p.primaryEep, ...STATE_KEYS.map((k) => p[k])]));
}

interface TrackOptions {
  mass: number;
  z?: number;
  feh?: number;
  grid?: string;
  exact?: boolean;
  json?: boolean;
  format: string;
}

/** `starclock track`: a star's track over age, one row per EEP. */
export function trackCommand(io: Io): Command {
  const typed: TypedValues = {};
  return new Command('track')
    .description("a star's evolution track over age, one row per equivalent evolutionary point (EEP)")
    .addOption(gridMassOption(typed))
    .addOption(gridZOption(typed))
    .addOption(fehOption())
    .addOption(gridOption())
    .addOption(exactOption())
    .addOption(jsonOption())
    .addOption(dataFormatOption())
    .addHelpText(
      'after',
      `
One row per EEP (equivalent evolutionary point, Dotter 2016): EEP k of every track of
the same kind is the same stage of life, which is what lets tracks be interpolated.
Each row has its EEP index, the primary EEP on it where there is one (pms-start, zams,
ms-mid, tams, rgb-base, he-ignition, cheb-start, cheb-end, first-thermal-pulse, agb-end,
remnant-birth, track-end), its age and the star state. The track is the whole life,
also beyond 100 Gyr for stars that live that long.

The track is interpolated in the built-in grid, or in --grid FILE; --exact builds it
for exactly this mass and z with the analytic model (resampled onto the same EEPs).

--format table (default) is for humans: a readable subset of columns, every row.
--format csv: header eep,primaryEep and then every key of the star state.
--format json (or --json):
  { "initialMass", "z", "msLifetime", "remnant", "remnantMass",
    "points": [{ "eep", "primaryEep", ...state }] }
with ages in yr, points in EEP order (ages never decrease).

Examples:
  starclock track --mass 1
  starclock track --mass 3 --feh -0.3 --format csv > track-3.csv
  starclock track --mass 1.2 --grid tracks-demo/sample-grid.csv --json
`,
    )
    .action(async (options: TrackOptions) => {
      const z = resolveZ(options);
      const source = await resolveSource(options, io);
      checkMass(options.mass, typed, source.massRange);
      checkZ(z, options, typed, source.zRange);
      const track = await trackTable(source, options.mass, z);
      const format = options.json === true ? 'json' : options.format;
      if (format === 'json') io.out(toJson(track, 2) + '\n');
      else if (format === 'csv') io.out(trackCsv(track));
      else io.out(formatTrackTable(track, source.label));
    });
}
