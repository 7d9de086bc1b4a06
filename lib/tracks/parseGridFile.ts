import { gridFileRead } from './gridFileRead.js';
import type { GridProblem } from './gridFileFormat.js';
import type { Track } from './track.js';

/**
 * Reads a track grid in the open layout (defined in gridFileFormat.ts) into columnar
 * {@link Track}s, collecting every problem instead of stopping at the first.
 *
 * Checked, each problem with its 1-based line (`row`), column, the text as written and what
 * is allowed: the first line and the header; the number of fields; quoting (RFC 4180); every
 * number (finite; initialMass, mass, luminosity, teff, radius > 0; 0 < z < 1; age ≥ 0;
 * 0 ≤ coreMass ≤ mass); phase and EEP names; along each track: ages never decreasing and
 * strictly increasing within a phase, mass never growing, phases in life order ending in at
 * most one remnant; a track appearing again (later in the file, or restarting inside its own
 * run); the radius within 1 % of the Stefan–Boltzmann radius of L and Teff; and, for tracks
 * whose rows carry EEP labels, every primary EEP the convention gives the track, each on its
 * row. initialMass and z outside the built-in model's ranges are not a problem.
 *
 * Tracks without any EEP label get their EEPs from `placePrimaryEeps`. A track with a problem
 * is left out of `tracks` (every occurrence of a repeated track is); the others are returned.
 *
 * Track fields: logL = log10(luminosity), logTeff = log10(teff) — these read back the logs a
 * `writeGridFile` file was written from to within 1.2e-16 dex (exactly when |log| ≥ 1; see
 * writeGridFile). `msLifetime` = age at tams − age at zams (0 without a main sequence; for a
 * labelled track cut on the main sequence, the model's value when initialMass and z are in its
 * ranges, else the span in the file). `remnant` and `remnantMass`: the remnant phase of the
 * last row and its mass when the track reaches one, `brown-dwarf` and the last mass when every
 * row is a brown dwarf; otherwise the built-in model's prediction `generateTrack(initialMass,
 * z)` when initialMass and z are inside its ranges (0.01–150 Msun, 1e-4–0.03); outside them,
 * or where the model cannot make the track, `white-dwarf` with the last row's core mass (its
 * mass when the core mass is 0) — a placeholder, since nothing in the file says how such a star
 * ends. `events` is empty: the layout carries no events.
 *
 * @param text the whole file (an optional UTF-8 BOM, LF or CRLF)
 * @returns the good tracks, in file order, and every problem, sorted by row
 * @example
 * const { tracks, problems } = parseGridFile(gridFileString([generateTrack(1)]));
 * tracks[0].eeps.length // 12; problems.length // 0
 */
export function parseGridFile(text: string): { tracks: Track[]; problems: GridProblem[] } {
  return gridFileRead(text, true);
}
