import { gridFileEepSlots } from './gridFileEepSlots.js';
import type { Eep } from './track.js';

/**
 * Places the primary EEPs of a track from its phases and ages alone, by the convention of the
 * open grid layout (documented in gridFileFormat.ts): pms-start on the first point, zams on
 * the first main-sequence point, ms-mid on the main-sequence point nearest the middle of the
 * main sequence in age, tams on the last main-sequence point, rgb-base on the last subgiant
 * point, he-ignition on the red-giant tip (or the first core-helium-burning point when there
 * is no red giant branch; none when helium never ignites), cheb-start / cheb-end on the first
 * / last core-helium-burning point, first-thermal-pulse and agb-end on the last AGB point
 * (phases and ages do not show where a pulse is), remnant-birth on the first white-dwarf,
 * neutron-star or black-hole point, track-end on the last point. The EEP method is that of
 * Dotter 2016 (ApJS 222, 8); the rows chosen are this project's.
 *
 * @param phase `PHASE_INDEX` code of each point, in life order
 * @param age yr since birth of each point, non-decreasing
 * @returns the EEPs the track has, ordered by point index (life order within one point)
 * @throws RangeError if the columns are empty, differ in length, or a phase code is unknown
 * @example
 * // two pre-main-sequence points, then three main-sequence points
 * placePrimaryEeps(Uint8Array.of(0, 0, 1, 1, 1), Float64Array.of(0, 1, 1, 2, 3))
 * // [{ name: 'pms-start', index: 0 }, { name: 'zams', index: 2 }, { name: 'ms-mid', index: 3 },
 * //  { name: 'tams', index: 4 }, { name: 'track-end', index: 4 }]
 */
export function placePrimaryEeps(phase: Uint8Array, age: Float64Array): Eep[] {
  const eeps = gridFileEepSlots(phase, age).map((s): Eep => ({ name: s.name, index: s.index }));
  // slots come in life order; a stable sort by index keeps life order within a point
  return eeps.sort((a, b) => a.index - b.index);
}
