import { Command, Option } from 'commander';
import { resolve } from 'node:path';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { formatGridProblem, gridFileSummary, readInputText } from '../gridSource.js';
import { parseZList, rangeEnd } from '../options.js';
import { packageInfo } from '../packageRoot.js';

const plural = (n: number, word: string, words = `${word}s`): string => `${n} ${n === 1 ? word : words}`;

/**
 * Checks the text of a grid file in the open layout (checkGridTracks) and describes it.
 *
 * @param text the file's contents
 * @param name the file's name for messages (`<stdin>` for standard input)
 * @returns every problem as a `FILE:ROW: column COL: message` line, and the one-line summary
 */
export async function checkGridText(text: string, name: string): Promise<{ problems: string[]; summary: string }> {
  const { checkGridTracks } = await import('../../lib/tracks/checkGridTracks.js');
  const problems = checkGridTracks(text);
  if (problems.length > 0) {
    const rows = new Set(problems.map((p) => p.row)).size;
    return {
      problems: problems.map((p) => formatGridProblem(name, p)),
      summary: `${name}: ${plural(problems.length, 'problem')} on ${plural(rows, 'line')}; not a valid starclock-grid v1 file`,
    };
  }
  const s = await gridFileSummary(text);
  const zs = s.z.map(rangeEnd).join(', ');
  return {
    problems: [],
    summary:
      `${name}: valid starclock-grid v1 file: ${plural(s.tracks, 'track')}, ${plural(s.z.length, 'metallicity', 'metallicities')} ` +
      `(z ${zs}), initial masses ${rangeEnd(s.massMin)}–${rangeEnd(s.massMax)} Msun`,
  };
}

/**
 * The built-in grid's raw tracks in the open layout, as chunks of text: one metallicity's
 * tracks are generated and written (writeGridFile, ~64 K characters a chunk) before the next,
 * so memory holds one metallicity (~5 MB of text), never the whole ~50 MB file.
 *
 * @param zs built-in metallicities, in the order to write them
 * @param comments comment lines for the head of the file
 */
export async function* builtinGridChunks(zs: readonly number[], comments: readonly string[]): AsyncGenerator<string> {
  const [{ builtinRawTracks }, { writeGridFile }, { GRID_FILE_FIRST_LINE, GRID_FILE_HEADER }] = await Promise.all([
    import('../../lib/tracks/builtinGridTracks.js'),
    import('../../lib/tracks/writeGridFile.js'),
    import('../../lib/tracks/gridFileFormat.js'),
  ]);
  // Later metallicities continue the same file: their copy of the two head lines goes.
  const head = `${GRID_FILE_FIRST_LINE}\n${GRID_FILE_HEADER}\n`;
  for (let k = 0; k < zs.length; k++) {
    const chunks: string[] = [];
    writeGridFile(builtinRawTracks(zs[k]), (c) => chunks.push(c), k === 0 ? { comments } : {});
    if (k > 0) {
      if (!chunks[0].startsWith(head)) throw new Error('internal error: writeGridFile did not start with the layout head');
      chunks[0] = chunks[0].slice(head.length);
    }
    yield* chunks;
  }
}

/** `starclock grid check FILE|-`. */
function checkCommand(io: Io): Command {
  return new Command('check')
    .description('validate a track grid file in the open layout (- reads standard input)')
    .argument('<file>', 'the grid file, or - for standard input')
    .addHelpText(
      'after',
      `
Prints every problem on stderr as FILE:LINE: column COL: message (line numbers as an
editor shows them), then a summary line, and exits 2; a valid file gets a one-line
summary on stdout (tracks, metallicities, mass range) and exit 0.

The layout (starclock-grid v1) is described in the README ("Grid files") and defined in
lib/tracks/gridFileFormat.ts: a first line '# starclock-grid v1', the header
initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius, one row per track point.

Examples:
  starclock grid check tracks-demo/sample-grid.csv
  starclock grid export --z 0.014 | starclock grid check -
`,
    )
    .action(async (file: string) => {
      const name = file === '-' ? '<stdin>' : file;
      const result = await checkGridText(await readInputText(file, 'grid file'), name);
      for (const line of result.problems) io.err(line + '\n');
      if (result.problems.length > 0) throw new RangeError(result.summary);
      io.out(result.summary + '\n');
    });
}

interface ExportOptions {
  out?: string;
  z?: number[];
}

/** `starclock grid export [-o FILE] [--z Z[,Z…]]`. */
function exportCommand(io: Io): Command {
  return new Command('export')
    .description("write the built-in grid's tracks in the open layout (stdout, or -o FILE)")
    .addOption(new Option('-o, --out <file>', 'write to FILE (whole or not at all: temporary file, then rename) instead of stdout'))
    .addOption(new Option('--z <Z[,Z...]>', 'only these built-in metallicities, separated by commas (default: all)').argParser(parseZList))
    .addHelpText(
      'after',
      `
Writes the tracks the built-in grid is made of — the analytic model's tracks over each
star's whole life, before EEP resampling — in the open layout that --grid and
\`grid check\` read. The built-in metallicities are
  0.0001, 0.0002, 0.0005, 0.001, 0.002, 0.004, 0.007, 0.01, 0.014, 0.02, 0.03
with about 320 masses each from 0.01 to 150 Msun; all of them are about 50 MB.

Examples:
  starclock grid export --z 0.014 -o solar-grid.csv
  starclock grid export | gzip > builtin-grid.csv.gz
`,
    )
    .action(async (options: ExportOptions) => {
      const { BUILTIN_Z } = await import('../../lib/tracks/builtinGridTracks.js');
      const builtin: readonly number[] = BUILTIN_Z;
      const zs = options.z === undefined ? [...builtin] : [...new Set(options.z)].sort((a, b) => a - b);
      for (const z of zs) {
        if (!builtin.includes(z)) {
          throw new RangeError(`--z ${z} is not a metallicity of the built-in grid; they are ${builtin.join(', ')}`);
        }
      }
      const comments = [
        `The built-in grid of starclock ${packageInfo().version}: tracks of its analytic model (whole lives), z ${zs.join(', ')}.`,
        'Layout: see the README, "Grid files", or lib/tracks/gridFileFormat.ts.',
      ];
      const chunks = builtinGridChunks(zs, comments);
      if (options.out === undefined || options.out === '-') {
        for await (const chunk of chunks) {
          io.out(chunk);
          if (io.drain) await io.drain();
        }
        return;
      }
      const { writeFileAtomicChunks } = await import('../../lib/io/writeFileAtomicChunks.js');
      try {
        await writeFileAtomicChunks(options.out, chunks);
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code;
        if (code === 'ENOENT' || code === 'EACCES' || code === 'EISDIR' || code === 'ENOTDIR') {
          throw new RangeError(`cannot write -o ${options.out}: ${(error as Error).message}`);
        }
        throw error;
      }
      diagnostic(io, `wrote ${resolve(options.out)} (${plural(zs.length, 'metallicity', 'metallicities')} of the built-in grid)`);
    });
}

/** `starclock grid`: check a user's grid file, export the built-in one. */
export function gridCommand(io: Io): Command {
  return new Command('grid')
    .description('validate a track grid file (check) or write the built-in grid in the open layout (export)')
    .addCommand(checkCommand(io))
    .addCommand(exportCommand(io));
}
