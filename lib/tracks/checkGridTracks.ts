import { gridFileRead } from './gridFileRead.js';
import type { GridProblem } from './gridFileFormat.js';

/**
 * Validates a track grid in the open layout (gridFileFormat.ts) and returns every problem,
 * with row, column, the offending value and what is allowed: the checks of `parseGridFile`,
 * without building tracks or asking the model for remnants (what `grid check` runs).
 *
 * @param text the whole file
 * @returns the problems sorted by row; empty when the file is good
 * @example checkGridTracks('# starclock-grid v1\n')
 * // [{ row: 2, column: null, value: null, message: "missing header line; expected 'initialMass,z,age,…'" }]
 */
export function checkGridTracks(text: string): GridProblem[] {
  return gridFileRead(text, false).problems;
}
