import type { Track } from './track.js';
import type { EepTrack } from './eepTrack.js';
import { trackSegments, type TrackSegment } from '../model/trackSegments.js';
import { PHASES } from '../model/phases.js';

/**
 * Secondary EEPs placed between each pair of consecutive breakpoints, by phase (the
 * interior points of one stretch; both ends are breakpoints themselves). Chosen so that the
 * stretches where a star changes fastest in the HR diagram get the most points.
 */
export const SECONDARY_EEPS: Readonly<Record<(typeof PHASES)[number], number>> = {
  'pre-main-sequence': 28,
  'main-sequence': 30,
  subgiant: 20,
  'red-giant-branch': 50,
  'core-helium-burning': 40,
  'asymptotic-giant-branch': 30,
  'post-asymptotic-giant-branch': 12,
  'white-dwarf': 36,
  'neutron-star': 16,
  'black-hole': 4,
  'brown-dwarf': 48,
};

/*
 * Weights of the distance along a track (Dotter 2016 §3: a metric in the HR diagram plus
 * age): Teff spans about a sixth of the dex that luminosity does, so its steps count ×4, and
 * log age ×0.25 keeps stretches where the star barely moves in the diagram (the main sequence
 * of a red dwarf, a black hole) evenly sampled in time. Common practice; the weights are ours.
 */
const W_TEFF = 4;
const W_AGE = 0.25;

/**
 * Resamples a track onto EEPs by the method of Dotter 2016 (ApJS 222, 8, §3): the track is
 * cut at its breakpoints — every primary EEP and both ends of every phase — and each stretch
 * between two breakpoints gets a fixed number of secondary EEPs (by phase), evenly spaced in
 * the distance along the track, d² = ΔlogL² + (4 ΔlogTeff)² + (0.25 Δlog age)². The state at
 * each EEP comes from the track's monotone cubics in age, so the resampled track lies on the
 * original. A phase boundary keeps both its points (end of one phase and start of the next,
 * at one age), so jumps such as the helium flash stay sharp.
 *
 * @param track a generated or loaded track with its primary EEPs
 * @returns the EEP track; its `layout` says which tracks it may be blended with
 * @throws RangeError if an age is not positive (log age is used)
 * @example resampleEeps(generateTrack(1, 0.014, { fullLife: true })).n // the EEP count of its layout
 */
export function resampleEeps(track: Track): EepTrack {
  const { age, phase } = track;
  if (!(age[0] > 0)) throw new RangeError(`track of ${track.initialMass} Msun: first age ${age[0]} must be > 0 yr to resample in log age`);
  const brk = new Set<number>([0, track.n - 1]);
  for (let i = 1; i < track.n; i++) {
    if (phase[i] !== phase[i - 1]) {
      brk.add(i - 1);
      brk.add(i);
    }
  }
  for (const e of track.eeps) brk.add(e.index);
  const points = [...brk].sort((a, b) => a - b);

  const segs = trackSegments(track);
  const segOf = (i: number): TrackSegment => {
    for (const s of segs) if (i >= s.start && i <= s.end) return s;
    return segs[segs.length - 1];
  };

  const out = { logAge: [] as number[], mass: [] as number[], coreMass: [] as number[], logL: [] as number[], logTeff: [] as number[], phase: [] as number[] };
  const sig: string[] = [];
  const rawIndexToEep = new Map<number, number>();
  const pushRaw = (i: number) => {
    rawIndexToEep.set(i, out.logAge.length);
    out.logAge.push(Math.log10(age[i]));
    out.mass.push(track.mass[i]);
    out.coreMass.push(track.coreMass[i]);
    out.logL.push(track.logL[i]);
    out.logTeff.push(track.logTeff[i]);
    out.phase.push(phase[i]);
  };

  pushRaw(points[0]);
  for (let k = 0; k + 1 < points.length; k++) {
    const a = points[k];
    const b = points[k + 1];
    if (phase[a] !== phase[b]) {
      sig.push('|');
      pushRaw(b);
      continue;
    }
    const count = SECONDARY_EEPS[PHASES[phase[a]]];
    sig.push(String(phase[a]));
    // cumulative distance over the raw points a..b
    const len = b - a;
    const cum = new Float64Array(len + 1);
    for (let i = a + 1; i <= b; i++) {
      const dL = track.logL[i] - track.logL[i - 1];
      const dT = W_TEFF * (track.logTeff[i] - track.logTeff[i - 1]);
      const dA = W_AGE * (Math.log10(age[i]) - Math.log10(age[i - 1]));
      cum[i - a] = cum[i - a - 1] + Math.sqrt(dL * dL + dT * dT + dA * dA);
    }
    const total = cum[len];
    const seg = segOf(a);
    let j = 0;
    for (let q = 1; q <= count; q++) {
      const target = (total * q) / (count + 1);
      while (j < len - 1 && cum[j + 1] < target) j++;
      const span = cum[j + 1] - cum[j];
      const f = span > 0 ? (target - cum[j]) / span : 0;
      const ageQ = age[a + j] + f * (age[a + j + 1] - age[a + j]);
      const t = Math.min(Math.max(ageQ, seg.startAge), seg.endAge);
      out.logAge.push(Math.log10(ageQ));
      out.mass.push(seg.mass(t));
      out.coreMass.push(Math.min(seg.coreMass(t), seg.mass(t)));
      out.logL.push(seg.logL(t));
      out.logTeff.push(seg.logTeff(t));
      out.phase.push(phase[a]);
    }
    pushRaw(b);
  }
  const primary = track.eeps.map((e) => ({ name: e.name, index: rawIndexToEep.get(e.index) ?? 0 }));
  const ignition = heliumIgnitionKind(track);
  const layout = `${sig.join(',')};${primary.map((p) => p.name).join(',')};${ignition};${track.remnant}`;
  return {
    initialMass: track.initialMass,
    z: track.z,
    n: out.logAge.length,
    logAge: Float64Array.from(out.logAge),
    mass: Float64Array.from(out.mass),
    coreMass: Float64Array.from(out.coreMass),
    logL: Float64Array.from(out.logL),
    logTeff: Float64Array.from(out.logTeff),
    phase: Uint8Array.from(out.phase),
    primary,
    layout,
    msLifetime: track.msLifetime,
    remnant: track.remnant,
    remnantMass: track.remnantMass,
  };
}

const RGB = PHASES.indexOf('red-giant-branch');
const CHEB = PHASES.indexOf('core-helium-burning');

/**
 * How helium ignited, read from the track itself so that a grid file (which carries no
 * events) gives the same layouts as the model: 'flash' when the luminosity falls by more than
 * a factor 3 from the red-giant tip to the start of helium burning — the degenerate core's
 * flash lifts its degeneracy and the star settles on the horizontal branch at a few per cent
 * of the tip luminosity (e.g. Kippenhahn, Weigert & Weiss 2012, §33) — 'quiet' for a smaller
 * drop, 'none' without a red-giant-to-helium-burning step.
 */
export function heliumIgnitionKind(track: Track): 'flash' | 'quiet' | 'none' {
  for (let i = 1; i < track.n; i++) {
    if (track.phase[i] === CHEB && track.phase[i - 1] === RGB) {
      return track.logL[i - 1] - track.logL[i] > Math.log10(3) ? 'flash' : 'quiet';
    }
  }
  return 'none';
}
