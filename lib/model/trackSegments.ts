import { monotoneCubic, type MonotoneCubic } from '../interp/monotoneCubic.js';
import type { Track } from '../tracks/track.js';

/** One phase run of a track, with its monotone cubics in age built once. */
export interface TrackSegment {
  /** first and last point index (inclusive) */
  start: number;
  end: number;
  phase: number;
  startAge: number;
  endAge: number;
  mass: MonotoneCubic;
  coreMass: MonotoneCubic;
  logL: MonotoneCubic;
  logTeff: MonotoneCubic;
}

const cache = new WeakMap<Track, TrackSegment[]>();

/**
 * Splits a track into its phase runs and builds, per run, Steffen (1990) monotone cubics of
 * mass, core mass, log L and log Teff over age. Phase boundaries are never interpolated
 * across, so jumps there (the helium flash, remnant birth) stay sharp, and the monotone
 * cubic keeps mass from ever growing between points. Built once per track and cached.
 */
export function trackSegments(track: Track): TrackSegment[] {
  const hit = cache.get(track);
  if (hit) return hit;
  const segs: TrackSegment[] = [];
  let s = 0;
  for (let i = 1; i <= track.n; i++) {
    if (i === track.n || track.phase[i] !== track.phase[s]) {
      const e = i - 1;
      const ages = track.age.subarray(s, e + 1);
      const one = e === s;
      const x = one ? Float64Array.of(ages[0], ages[0] + 1) : ages;
      const col = (c: Float64Array) => monotoneCubic(x, one ? Float64Array.of(c[s], c[s]) : c.subarray(s, e + 1));
      segs.push({
        start: s, end: e, phase: track.phase[s], startAge: track.age[s], endAge: track.age[e],
        mass: col(track.mass), coreMass: col(track.coreMass), logL: col(track.logL), logTeff: col(track.logTeff),
      });
      s = i;
    }
  }
  cache.set(track, segs);
  return segs;
}
