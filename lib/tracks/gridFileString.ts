import { writeGridFile, type WriteGridFileOptions } from './writeGridFile.js';
import type { Track } from './track.js';

/**
 * The whole grid file of `tracks` as one string: `writeGridFile` collected. For tests and
 * small grids; stream large ones with `writeGridFile`.
 *
 * @param tracks the tracks, one run of rows each
 * @param options comment lines for the head of the file
 * @throws RangeError as `writeGridFile`
 * @example gridFileString([generateTrack(1)]).startsWith('# starclock-grid v1\n') // true
 */
export function gridFileString(tracks: readonly Track[], options: WriteGridFileOptions = {}): string {
  const chunks: string[] = [];
  writeGridFile(tracks, (c) => chunks.push(c), options);
  return chunks.join('');
}
