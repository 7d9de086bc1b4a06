import { Command, InvalidArgumentError, Option } from 'commander';
import { DEFAULT_BATCH_COLUMNS, CLASH_PREFIX } from '../../lib/io/batchPlan.js';
import { STATE_KEYS } from '../../lib/model/starState.js';
import { SOLAR_Z } from '../../lib/model/limits.js';
import type { Grid } from '../../lib/tracks/grid.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { parseZ, Z_TEXT } from '../options.js';
import { RowsRejected } from '../rowsRejected.js';

const MAX_WORKERS = 64;

function parseWorkers(text: string): number {
  const n = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || !Number.isInteger(n) || n < 1 || n > MAX_WORKERS) {
    throw new InvalidArgumentError(`--workers '${text}' is not a whole number from 1 to ${MAX_WORKERS}`);
  }
  return n;
}

function parseList(option: string) {
  return (text: string): string[] => {
    const list = text.split(',').map((s) => s.trim());
    if (list.some((s) => s === '')) throw new InvalidArgumentError(`${option} '${text}' has an empty name; separate names with commas`);
    return list;
  };
}

interface BatchOptions {
  output?: string;
  massCol?: string;
  ageCol?: string;
  zCol?: string;
  ageUnit?: string;
  columns?: string[];
  rejects?: string;
  workers: number;
  format?: 'csv' | 'ndjson';
  outputFormat?: 'csv' | 'ndjson';
  columnsIn?: string[];
  z?: number;
  grid?: string;
  progress: boolean;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** `starclock batch`: the present-day state of every row of a table, streamed. */
export function batchCommand(io: Io): Command {
  return new Command('batch')
    .description('present-day state of every row of a CSV or NDJSON table (birth mass, age, optional z); input columns pass through')
    .argument('<in>', 'input table (CSV or NDJSON), or - for standard input')
    .option('-o, --output <file>', 'output file (written whole or not at all); default standard output')
    .option('--mass-col <name>', 'the birth-mass column (Msun); default initialMass, else mass')
    .option('--age-col <name>', 'the age column; default age (with its unit: age_Gyr, age (Myr), age[yr])')
    .option('--z-col <name>', 'the metal-fraction column; default z, else [Fe/H] from feh or [Fe/H]')
    .addOption(new Option('--age-unit <unit>', 'unit of a bare age (yr, kyr, Myr, Gyr); default from the header; yr with --columns-in'))
    .addOption(new Option('--z <Z>', `metal fraction of every row when the table has none, ${Z_TEXT} (default ${SOLAR_Z})`).argParser(parseZ))
    .addOption(new Option('--columns <list>', 'computed columns, comma-separated state keys (default: all but initialMass, z, age)').argParser(parseList('--columns')))
    .option('--rejects <file>', 'file for rows that cannot be computed (default OUT.rejects.csv; with standard output, stderr lines)')
    .addOption(new Option('--workers <n>', 'worker threads (1 = this thread only)').argParser(parseWorkers).default(1))
    .addOption(new Option('--format <kind>', 'input format (default: from the extension, else the content)').choices(['csv', 'ndjson']))
    .addOption(new Option('--output-format <kind>', "output format (default: OUT's extension, else the input's)").choices(['csv', 'ndjson']))
    .addOption(new Option('--columns-in <list>', 'line filter: the input has no header and these columns (e.g. mass,age,z); no header is written').argParser(parseList('--columns-in')))
    .option('--grid <file>', 'a track grid file in the open layout instead of the built-in grid')
    .option('--no-progress', 'no progress bar (it is shown only when stderr is a terminal)')
    .addHelpText(
      'after',
      `
Columns are found by name, without regard to case: the birth mass in initialMass,
else mass (Msun); the age in age, with its unit in the header as age_Gyr, age/Gyr,
age (Gyr), age[Gyr] or age [Gyr] (yr, kyr, Myr, Gyr), or from --age-unit, or in
every cell (4.6Gyr); a bare age with no unit anywhere is an error (exit 2). The
metal fraction comes from a z column, else from [Fe/H] in feh or [Fe/H], else --z
(default ${SOLAR_Z}).

Every input column is written back as it was; the computed columns follow
(default: ${DEFAULT_BATCH_COLUMNS.join(', ')};
also allowed: ${STATE_KEYS.filter((k) => !DEFAULT_BATCH_COLUMNS.includes(k)).join(', ')}, as used: age in yr, z after
conversion). A computed column whose name the input already has is written
${CLASH_PREFIX}NAME. Numbers are written as the shortest text that reads back to the same
double; keys that do not apply (a black hole's colour) are empty (null in NDJSON).

Rows that cannot be computed go to the rejects file with their row number (the
header is row 1; a quoted field with line breaks still counts as one row) and the
reason. Exit codes: 0 every row written, 3 some rows rejected, 2 unusable input or
options, 1 failure. A summary goes to stderr.

Line filter (--columns-in, for a Spark pipe or Hadoop streaming): no header in or
out, ages in yr unless --age-unit says otherwise, one output line per input line;
a rejected row is written with empty computed fields and reported on stderr as
"starclock: row N: reason" (N counts the lines of this input), and the exit code
stays 0. Splitting the input at any line and joining the outputs gives the same
bytes as one run.

Examples:
  starclock batch stars.csv -o states.csv
  starclock batch stars.ndjson --columns phase,teff,luminosity --workers 2 -o states.ndjson
  cat part-0001 | starclock batch - --columns-in id,mass,age_Gyr,z --columns phase,teff
`,
    )
    .action(async (input: string, options: BatchOptions) => {
      const { runBatch } = await import('../batchRun.js');
      let grid: Grid | null = null;
      let gridBytes: Uint8Array | null = null;
      if (options.grid !== undefined) {
        const [{ loadGridFile }, { serializeGrid }] = await Promise.all([import('../gridSource.js'), import('../../lib/tracks/gridCache.js')]);
        grid = await loadGridFile(options.grid, io);
        if (options.workers > 1) gridBytes = serializeGrid(grid);
      } else if (options.workers === 1) {
        // with worker threads each loads its own copy; this thread needs none
        const { loadBuiltinGrid } = await import('../../lib/io/loadBuiltinGrid.js');
        grid = loadBuiltinGrid();
      }
      const summary = await runBatch(
        {
          input, output: options.output, rejects: options.rejects, format: options.format, outputFormat: options.outputFormat,
          columnsIn: options.columnsIn, massCol: options.massCol, ageCol: options.ageCol, zCol: options.zCol,
          ageUnit: options.ageUnit, z: options.z, columns: options.columns, workers: options.workers,
          progress: options.progress, grid, gridBytes,
        },
        io,
      );
      const rate = summary.read / Math.max(summary.seconds, 1e-6);
      diagnostic(
        io,
        `batch: ${plural(summary.read, 'row')} read, ${summary.written} written, ${summary.rejected} rejected` +
          `${summary.rejected > 0 ? ` (${summary.rejectsTo === 'stderr' ? 'listed above' : `in ${summary.rejectsTo}`})` : ''}` +
          ` in ${summary.seconds.toFixed(2)} s (${Math.round(rate)} rows/s)`,
      );
      if (summary.rejected > 0 && !summary.filter) {
        throw new RowsRejected(`${plural(summary.rejected, 'row')} of ${summary.read} rejected`);
      }
    });
}
