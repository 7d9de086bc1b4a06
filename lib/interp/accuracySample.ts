import { generateTrack } from '../model/generateTrack.js';
import { starAt } from '../model/starAt.js';
import { trackSegments } from '../model/trackSegments.js';
import { PHASES, PHASE_INDEX } from '../model/phases.js';
import type { GridQuery } from './gridQuery.js';

/** One row of the interpolation-accuracy table. */
export interface AccuracyRow {
  group: 'main-sequence' | 'later phases';
  stars: number;
  /** sampled stars whose phase was too short to have ages away from its ends */
  shortPhasesLeftOut: number;
  medianDLogL: number;
  medianDLogTeff: number;
  p90DLogL: number;
  p90DLogTeff: number;
  /** fraction of stars whose interpolated phase equals the direct model's */
  phaseAgreement: number;
}

/** A deterministic pseudo-random sequence (Park & Miller 1988 minimal standard), for a fixed sample. */
function minstd(seed: number): () => number {
  let s = seed % 2147483647;
  if (s <= 0) s += 2147483646;
  return () => (s = (s * 16807) % 2147483647) / 2147483647;
}

const quantile = (a: number[], q: number) => {
  if (a.length === 0) return 0;
  const b = a.slice().sort((x, y) => x - y);
  return b[Math.min(b.length - 1, Math.floor(q * b.length))];
};

/**
 * Accuracy of a grid interpolator against the direct model (the track generated for exactly
 * that mass and z) over a fixed sample: `count` stars with initial mass log-uniform in
 * [minMass, maxMass] and, for each, an age drawn uniformly in time inside one of its phases
 * (chosen at random), away from the phase's ends: at least 5 % of the phase's duration and
 * 1 % of the star's age from either end — the interpolator places phase ends to about 0.1 %
 * in age, so phases shorter than 2 % of the star's age (post-AGB crossings, thermal pulses)
 * have no such ages and are left out and counted. Reports median and 90th-percentile
 * |Δ log L| and |Δ log Teff| on the main sequence and in later phases, and the phase
 * agreement.
 */
export function accuracySample(query: GridQuery, options: { count?: number; z?: number; seed?: number; minMass?: number; maxMass?: number } = {}): AccuracyRow[] {
  const count = options.count ?? 400;
  const z = options.z ?? 0.014;
  const rnd = minstd(options.seed ?? 12345);
  const lo = Math.log10(options.minMass ?? 0.1);
  const hi = Math.log10(options.maxMass ?? 100);
  const groups = { 'main-sequence': { dl: [] as number[], dt: [] as number[], same: 0, n: 0, skipped: 0 }, 'later phases': { dl: [] as number[], dt: [] as number[], same: 0, n: 0, skipped: 0 } };
  const ms = PHASE_INDEX['main-sequence'];
  for (let i = 0; i < count; i++) {
    const m = 10 ** (lo + (hi - lo) * rnd());
    const track = generateTrack(m, z);
    const segs = trackSegments(track).filter((s) => s.endAge > s.startAge && s.phase >= ms && PHASES[s.phase] !== 'black-hole');
    const seg = segs[Math.floor(rnd() * segs.length)];
    const span = seg.endAge - seg.startAge;
    const t0 = Math.max(seg.startAge + 0.05 * span, seg.startAge * 1.01);
    const t1 = Math.min(seg.endAge - 0.05 * span, seg.endAge / 1.01);
    const g = groups[seg.phase === ms ? 'main-sequence' : 'later phases'];
    const f = rnd();
    if (!(t1 > t0)) {
      g.skipped++;
      continue;
    }
    const age = t0 + (t1 - t0) * f;
    const exact = starAt(track, age);
    const interp = query.star(m, age, z);
    g.n++;
    if (exact.phase === interp.phase) {
      g.same++;
      g.dl.push(Math.abs(Math.log10(interp.luminosity / exact.luminosity)));
      g.dt.push(Math.abs(Math.log10(interp.teff / exact.teff)));
    }
  }
  return (['main-sequence', 'later phases'] as const).map((k) => ({
    group: k,
    stars: groups[k].n,
    shortPhasesLeftOut: groups[k].skipped,
    medianDLogL: quantile(groups[k].dl, 0.5),
    medianDLogTeff: quantile(groups[k].dt, 0.5),
    p90DLogL: quantile(groups[k].dl, 0.9),
    p90DLogTeff: quantile(groups[k].dt, 0.9),
    phaseAgreement: groups[k].n ? groups[k].same / groups[k].n : 1,
  }));
}
