import { parseGridFile } from './parseGridFile.js';
import { resampleEeps } from './resampleEeps.js';
import { buildGrid, type Grid } from './grid.js';
import type { GridProblem } from './gridFileFormat.js';

/**
 * A grid from the text of a grid file in the open layout (`# starclock-grid v1`, see
 * gridFileFormat.ts): parsed and validated (parseGridFile), every good track resampled onto
 * EEPs by the same method as the built-in grid (resampleEeps), then made ready for
 * interpolation (buildGrid). Problems are returned, not thrown; `grid` is null when no track
 * survives.
 *
 * @param text the file's contents
 * @param source a name for messages (the file name)
 */
export function gridFromFile(text: string, source: string): { grid: Grid | null; problems: GridProblem[] } {
  const { tracks, problems } = parseGridFile(text);
  if (tracks.length === 0) return { grid: null, problems };
  return { grid: buildGrid(tracks.map(resampleEeps), source), problems };
}
