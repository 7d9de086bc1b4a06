import { readFile } from 'node:fs/promises';
import type { Grid } from '../lib/tracks/grid.js';
import type { GridProblem } from '../lib/tracks/gridFileFormat.js';
import type { GridQuery } from '../lib/interp/gridQuery.js';
import { MASS_RANGE, Z_RANGE } from '../lib/model/limits.js';
import type { Io } from './io.js';
import { diagnostic } from './io.js';
import type { NamedRange } from './options.js';

/** What answers a grid-backed command: the built-in grid, a user's grid file, or the model itself. */
export interface StarSource {
  /** for headings: "the built-in grid", "grid FILE", "the analytic model (exact track)" */
  label: string;
  massRange: NamedRange;
  zRange: NamedRange;
  /** the interpolator, or null for the exact model */
  query: GridQuery | null;
}

/**
 * The text of an input file, or of standard input for `-`.
 * @throws RangeError naming the file when it cannot be read (a bad path is bad input)
 */
export async function readInputText(path: string, option: string): Promise<string> {
  try {
    if (path === '-') {
      const chunks: Buffer[] = [];
      for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks).toString('utf8');
    }
    return await readFile(path, 'utf8');
  } catch (error) {
    const reason = (error as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (error as Error).message;
    throw new RangeError(`cannot read ${option} ${path}: ${reason}`);
  }
}

/** One problem of a grid file as `FILE:ROW: column COL: message` (the value added when the message does not quote it). */
export function formatGridProblem(file: string, p: GridProblem): string {
  const where = p.column === null ? '' : `column ${p.column}: `;
  const value = p.value !== null && !p.message.includes(p.value) ? ` (found '${p.value}')` : '';
  return `${file}:${p.row}: ${where}${p.message}${value}`;
}

/** What a grid file holds, read from its rows' keys: tracks (distinct initialMass, z), metallicities and mass range. */
export interface GridFileSummary {
  tracks: number;
  z: number[];
  massMin: number;
  massMax: number;
}

/** Counts the tracks of a grid file by their (initialMass, z) keys; rows whose key is unreadable are not counted. */
export async function gridFileSummary(text: string): Promise<GridFileSummary> {
  const { gridFileRecords } = await import('../lib/tracks/gridFileRecords.js');
  const keys = new Set<string>();
  const zs = new Set<number>();
  let massMin = Infinity;
  let massMax = -Infinity;
  let header = true;
  for (const rec of gridFileRecords(text)) {
    if (rec.kind !== 'row') continue;
    if (header) {
      header = false;
      continue;
    }
    const m = Number(rec.fields[0]);
    const z = Number(rec.fields[1]);
    if (!(Number.isFinite(m) && Number.isFinite(z)) || rec.fields[0].trim() === '' || rec.fields[1].trim() === '') continue;
    keys.add(`${m},${z}`);
    zs.add(z);
    massMin = Math.min(massMin, m);
    massMax = Math.max(massMax, m);
  }
  return { tracks: keys.size, z: [...zs].sort((a, b) => a - b), massMin, massMax };
}

const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;

/**
 * A user's grid file made ready for interpolation (gridFromFile). Every problem is printed
 * on stderr as `FILE:ROW: column COL: message`; when some tracks are good the command goes
 * on with them and a warning says how many tracks were left out.
 *
 * @throws RangeError (exit 2) when the file cannot be read or no track in it is usable
 */
export async function loadGridFile(path: string, io: Io): Promise<Grid> {
  const text = await readInputText(path, '--grid');
  const { gridFromFile } = await import('../lib/tracks/gridFromFile.js');
  const { grid, problems } = gridFromFile(text, path);
  for (const p of problems) io.err(formatGridProblem(path, p) + '\n');
  if (grid === null) {
    throw new RangeError(`--grid ${path}: no usable track (${plural(problems.length, 'problem')}); \`starclock grid check ${path}\` lists them`);
  }
  if (problems.length > 0) {
    const total = (await gridFileSummary(text)).tracks;
    const good = grid.slabs.reduce((sum, s) => sum + s.logM.length, 0);
    diagnostic(io, `warning: --grid ${path}: ${plural(problems.length, 'problem')}; ${plural(Math.max(0, total - good), 'track')} left out, going on with the other ${good}`);
  }
  return grid;
}

/** The grid a command interpolates in: `--grid FILE`, else the built-in one (loaded from its cache). */
export async function resolveSource(options: { grid?: string; exact?: boolean }, io: Io): Promise<StarSource> {
  if (options.exact === true) {
    return {
      label: 'the analytic model (exact track)',
      massRange: { ...MASS_RANGE, name: 'the valid range' },
      zRange: { ...Z_RANGE, name: 'the valid range' },
      query: null,
    };
  }
  const { createGridQuery } = await import('../lib/interp/gridQuery.js');
  if (options.grid !== undefined) {
    const grid = await loadGridFile(options.grid, io);
    const name = `the range of grid ${options.grid},`;
    return {
      label: `grid ${options.grid}`,
      massRange: { ...grid.massRange, name },
      zRange: { ...grid.zRange, name },
      query: createGridQuery(grid),
    };
  }
  const { loadBuiltinGrid } = await import('../lib/io/loadBuiltinGrid.js');
  const grid = loadBuiltinGrid();
  // The built-in grid spans the model's ranges; messages name them as the model's.
  return {
    label: 'the built-in grid',
    massRange: { ...MASS_RANGE, name: 'the valid range' },
    zRange: { ...Z_RANGE, name: 'the valid range' },
    query: createGridQuery(grid),
  };
}
