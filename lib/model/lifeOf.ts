import type { Track } from '../tracks/track.js';
import type { Life } from './life.js';
import { trackSegments } from './trackSegments.js';
import { evaluateSegment, starAt } from './starAt.js';

/**
 * A star's whole life as a timeline: every phase it passes through within 0–100 Gyr with
 * the full state at its start and end, and the key events (ZAMS, core hydrogen exhaustion,
 * helium flash or ignition, first thermal pulse, envelope loss, planetary nebula or
 * supernova, remnant birth, white dwarf reaching 10 000 / 6000 / 4000 K) with the state just
 * after each.
 *
 * @example lifeOf(generateTrack(1)).phases[1].phase // 'main-sequence'
 */
export function lifeOf(track: Track): Life {
  const segs = trackSegments(track);
  const phases = segs.map((seg) => ({
    phase: evaluateSegment(track, seg, seg.startAge).phase,
    start: evaluateSegment(track, seg, seg.startAge),
    end: evaluateSegment(track, seg, seg.endAge),
  }));
  const events = track.events
    .slice()
    .sort((a, b) => a.age - b.age)
    .map((e) => ({ event: e.event, ...starAt(track, e.age) }));
  return { initialMass: track.initialMass, z: track.z, phases, events };
}
