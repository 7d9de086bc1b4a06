import { MAX_AGE } from './limits.js';
import type { StarState } from './starState.js';
import type { Track } from '../tracks/track.js';
import { trackSegments, type TrackSegment } from './trackSegments.js';
import { observeState } from './observeState.js';

/**
 * The state of a track's star at `age`, by Steffen monotone cubic interpolation in age
 * inside the phase that contains it (phase runs are never blended: see trackSegments).
 * At an age shared by the end of one phase and the start of the next, the later phase
 * answers. Ages before the track's first point take its first point; the track covers
 * 0–100 Gyr.
 *
 * @param track from generateTrack
 * @param age yr since birth, 0 ≤ age ≤ 1e11
 * @throws RangeError if age is not finite or outside 0–100 Gyr
 * @example starAt(generateTrack(1), 4.57e9).luminosity // ≈ 1.0
 */
export function starAt(track: Track, age: number): StarState {
  if (!Number.isFinite(age) || age < 0 || age > MAX_AGE) {
    throw new RangeError(`age ${age} yr outside 0–${MAX_AGE} yr (0–100 Gyr)`);
  }
  const segs = trackSegments(track);
  const seg = segmentAt(segs, Math.min(age, track.age[track.n - 1]));
  return evaluateSegment(track, seg, age);
}

/** The phase run that answers at `age`: the last one whose start age is ≤ age. */
export function segmentAt(segs: TrackSegment[], age: number): TrackSegment {
  let lo = 0;
  let hi = segs.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (segs[mid].startAge <= age) lo = mid;
    else hi = mid - 1;
  }
  return segs[lo];
}

/** Full state from one phase run at `age` (clamped to the run). */
export function evaluateSegment(track: Track, seg: TrackSegment, age: number): StarState {
  const a = Math.min(Math.max(age, seg.startAge), seg.endAge);
  return observeState(
    track.initialMass, track.z, age, seg.phase, seg.mass(a), seg.coreMass(a), seg.logL(a), seg.logTeff(a),
    track.msLifetime, track.remnant, track.remnantMass,
  );
}
