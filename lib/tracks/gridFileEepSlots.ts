import { PHASES, PHASE_INDEX } from '../model/phases.js';
import type { EepName } from './track.js';

/** Where the layout puts one primary EEP on a given track (see gridFileFormat.ts). */
export interface GridFileEepSlot {
  name: EepName;
  /** the point index the convention places it on */
  index: number;
  /** first and last point index a label may sit on (equal to `index` except for ms-mid and first-thermal-pulse) */
  lo: number;
  hi: number;
  /** true when a labelled track may leave it out (a closing EEP of the phase the track stops in) */
  optional: boolean;
  /** where it goes, in words, for messages */
  where: string;
}

const MS = PHASE_INDEX['main-sequence'];
const SG = PHASE_INDEX.subgiant;
const RGB = PHASE_INDEX['red-giant-branch'];
const CHEB = PHASE_INDEX['core-helium-burning'];
const AGB = PHASE_INDEX['asymptotic-giant-branch'];
const REMNANTS = [PHASE_INDEX['white-dwarf'], PHASE_INDEX['neutron-star'], PHASE_INDEX['black-hole']];

/**
 * The primary-EEP slots of a track by the layout's convention (gridFileFormat.ts), in the
 * order of `PRIMARY_EEPS`: for each EEP the track has, the row it goes on, the rows a label
 * may sit on, and whether a labelled track may leave it out. Used by `placePrimaryEeps`
 * (which takes `index`) and by the grid-file reader (which checks labels against the slots).
 *
 * @param phase `PHASE_INDEX` code of each point, life order assumed
 * @param age yr of each point, same length
 * @returns the slots, in `PRIMARY_EEPS` order
 * @throws RangeError if the columns are empty, differ in length, or a phase code is unknown
 * @example gridFileEepSlots(Uint8Array.of(1, 1, 1), Float64Array.of(0, 1, 2)).map((s) => s.name)
 * // ['pms-start', 'zams', 'ms-mid', 'tams', 'track-end']
 */
export function gridFileEepSlots(phase: Uint8Array, age: Float64Array): GridFileEepSlot[] {
  const n = phase.length;
  if (n === 0) throw new RangeError('phase has no points; a track needs at least one');
  if (age.length !== n) throw new RangeError(`age has ${age.length} points but phase has ${n}; they must be equal`);
  const first = new Int32Array(PHASES.length).fill(-1);
  const last = new Int32Array(PHASES.length).fill(-1);
  for (let i = 0; i < n; i++) {
    const p = phase[i];
    if (p >= PHASES.length) throw new RangeError(`phase code ${p} at point ${i} is not a phase; codes are 0–${PHASES.length - 1}`);
    if (first[p] < 0) first[p] = i;
    last[p] = i;
  }
  const end = n - 1;
  const slots: GridFileEepSlot[] = [];
  const at = (name: EepName, index: number, where: string, optional = false, lo = index, hi = index) =>
    slots.push({ name, index, lo, hi, optional, where });
  // closing EEPs of the phase the track stops in may be left out by labelled tracks
  const stopsIn = (p: number) => last[p] === end;

  at('pms-start', 0, 'the first row');
  if (first[MS] >= 0) {
    at('zams', first[MS], 'the first main-sequence row');
    at('ms-mid', msMid(phase, age, first[MS], last[MS]), 'a main-sequence row', stopsIn(MS), first[MS], last[MS]);
    at('tams', last[MS], 'the last main-sequence row', stopsIn(MS));
  }
  if (first[SG] >= 0) at('rgb-base', last[SG], 'the last subgiant row', stopsIn(SG));
  if (first[CHEB] >= 0) {
    if (first[RGB] >= 0) at('he-ignition', last[RGB], 'the last red-giant-branch row (the tip)');
    else at('he-ignition', first[CHEB], 'the first core-helium-burning row');
    at('cheb-start', first[CHEB], 'the first core-helium-burning row');
    at('cheb-end', last[CHEB], 'the last core-helium-burning row', stopsIn(CHEB));
  }
  if (first[AGB] >= 0) {
    at('first-thermal-pulse', last[AGB], 'an asymptotic-giant-branch row', stopsIn(AGB), first[AGB], last[AGB]);
    at('agb-end', last[AGB], 'the last asymptotic-giant-branch row', stopsIn(AGB));
  }
  let remnant = -1;
  for (const r of REMNANTS) if (first[r] >= 0 && (remnant < 0 || first[r] < remnant)) remnant = first[r];
  if (remnant >= 0) at('remnant-birth', remnant, 'the first white-dwarf, neutron-star or black-hole row');
  at('track-end', end, 'the last row');
  return slots;
}

/** The main-sequence point whose age is nearest the middle of the main sequence (earlier on a tie). */
function msMid(phase: Uint8Array, age: Float64Array, lo: number, hi: number): number {
  const target = age[lo] + (age[hi] - age[lo]) / 2;
  let best = lo;
  let bestGap = Infinity;
  for (let i = lo; i <= hi; i++) {
    if (phase[i] !== MS) continue;
    const gap = Math.abs(age[i] - target);
    if (gap < bestGap) {
      bestGap = gap;
      best = i;
    }
  }
  return best;
}
