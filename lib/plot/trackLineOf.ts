import type { Grid } from '../tracks/grid.js';
import { interpolatedTrack } from '../interp/interpolatedTrack.js';
import { interpolatedTrackEeps } from '../interp/interpolatedTrackEeps.js';
import { PHASE_INDEX } from '../model/phases.js';
import type { TrackEvent } from './eventMark.js';
import type { TrackLine } from './trackFigure.js';

const NEUTRON_STAR = PHASE_INDEX['neutron-star'];
const BLACK_HOLE = PHASE_INDEX['black-hole'];
const MARKED: ReadonlySet<string> = new Set<TrackEvent>(['zams', 'tams', 'he-ignition', 'remnant-birth']);

/**
 * The drawable track of one star, interpolated in a grid (interpolatedTrack, EEP by EEP):
 * every EEP from the pre-main sequence on, through white-dwarf cooling to the track's end.
 * Neutron-star and black-hole points are left out — they sit far off any diagram of stars
 * (a black hole has no light) — so such a track ends at core collapse, where its
 * remnant-birth mark then goes. Marks: the zams, tams, he-ignition and remnant-birth EEPs
 * (interpolatedTrackEeps) the track has.
 *
 * @param grid the grid to interpolate in
 * @param initialMass Msun, within the grid
 * @param z metal fraction, within the grid
 * @param label legend text
 * @throws RangeError when mass or z is outside the grid
 * @example trackLineOf(grid, 1, 0.014, '1 Msun').events.map((e) => e.event) // ['zams', 'tams', 'he-ignition', 'remnant-birth']
 */
export function trackLineOf(grid: Grid, initialMass: number, z: number, label: string): TrackLine {
  const track = interpolatedTrack(grid, initialMass, z);
  let n = 0;
  while (n < track.n && track.phase[n] !== NEUTRON_STAR && track.phase[n] !== BLACK_HOLE) n++;
  const events: { event: TrackEvent; index: number }[] = [];
  for (const eep of interpolatedTrackEeps(grid, initialMass, z)) {
    if (!MARKED.has(eep.name)) continue;
    events.push({ event: eep.name as TrackEvent, index: Math.min(eep.index, n - 1) });
  }
  return { label, logTeff: track.logTeff.slice(0, n), logL: track.logL.slice(0, n), events };
}
