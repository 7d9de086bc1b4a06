import type { GridQuery } from '../interp/gridQuery.js';
import { isochrone } from '../interp/isochrone.js';
import { isRemnantPhase } from '../model/phases.js';
import type { IsochroneLine } from './isochroneFigure.js';

/**
 * The drawable isochrone of one age (isochrone: the states of every initial mass at that age,
 * refined near the turnoff) between `minMass` and `maxMass`: stars with light, in increasing
 * initial mass; neutron stars and black holes are left out (far off any diagram of stars, or
 * dark), and the line breaks where the living stars end and the white dwarfs begin. The
 * turnoff is the state at the turnoff mass, or null when every mass is still on (or before)
 * the main sequence.
 *
 * @param query grid interpolator
 * @param age yr, > 0
 * @param z metal fraction within the grid
 * @param minMass Msun
 * @param maxMass Msun, > minMass
 * @param label legend text
 * @returns the line, and the turnoff mass (Msun; maxMass when nothing has left the main sequence)
 * @throws RangeError for values out of range
 */
export function isochroneLineOf(
  query: GridQuery, age: number, z: number, minMass: number, maxMass: number, label: string,
): { line: IsochroneLine; turnoffMass: number } {
  const iso = isochrone(query, age, z, { minMass, maxMass, count: 400 });
  const logTeff: number[] = [];
  const logL: number[] = [];
  const starts: number[] = [];
  let previousRemnant: boolean | null = null;
  let gap = false;
  for (const p of iso.points) {
    const dark = p.phase === 'black-hole' || p.phase === 'neutron-star' || !(p.luminosity > 0 && p.teff > 0);
    if (dark) {
      gap = true;
      continue;
    }
    const remnant = isRemnantPhase(p.phase);
    if (logTeff.length > 0 && (gap || remnant !== previousRemnant)) starts.push(logTeff.length);
    gap = false;
    previousRemnant = remnant;
    logTeff.push(Math.log10(p.teff));
    logL.push(Math.log10(p.luminosity));
  }
  let turnoff: IsochroneLine['turnoff'] = null;
  if (iso.turnoffMass < maxMass) {
    const s = query.star(iso.turnoffMass, age, z);
    if (s.luminosity > 0 && s.teff > 0) turnoff = { logTeff: Math.log10(s.teff), logL: Math.log10(s.luminosity) };
  }
  return { line: { label, logTeff, logL, starts, turnoff }, turnoffMass: iso.turnoffMass };
}
