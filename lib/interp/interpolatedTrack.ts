import type { Grid, GridSlab } from '../tracks/grid.js';
import { REC, REC_STRIDE, REMNANT_CODES } from '../tracks/grid.js';
import { findInterval } from './bisect.js';
import { createMassBlend, locateMass, W_C00, W_C01, W_C10, W_C11, W_LM, W_U } from './massBlend.js';
import type { Track } from '../tracks/track.js';

/**
 * A track interpolated from a grid at one initial mass and z, EEP by EEP: the columns of a
 * model Track (ages in yr), without its EEP marks and events (`track` prints the EEPs from
 * interpolatedTrackEeps).
 */
export type InterpolatedTrack = Omit<Track, 'eeps' | 'events'>;

/** Record offsets of the four state columns kept per EEP (cols[j·4 + c]): mass, core mass, log L, log Teff. */
const STATE_AT = [REC.mass, REC.coreMass, REC.logL, REC.logTeff];

function slabTrack(slab: GridSlab, lm: number) {
  const mb = createMassBlend();
  mb.w[W_LM] = lm;
  locateMass(slab, mb);
  const { run, b0, b1 } = mb;
  const w = mb.w;
  const c00 = w[W_C00], c01 = w[W_C01], c10 = w[W_C10], c11 = w[W_C11], u = w[W_U];
  const n = run.n;
  const out = { n, logAge: new Float64Array(n), cols: new Float64Array(n * 4), phase: run.phase, layout: run.layout, msl: 0, rm: 0, remnant: run.remnant };
  const D = run.rec;
  const blend = (q0: number, q1: number) => c00 * D[q0] + c10 * D[q0 + 1] + c01 * D[q1] + c11 * D[q1 + 1];
  for (let j = 0; j < n; j++) {
    const q0 = (b0 + j) * REC_STRIDE;
    const q1 = (b1 + j) * REC_STRIDE;
    out.logAge[j] = blend(q0 + REC.logAge, q1 + REC.logAge);
    for (let c = 0; c < 4; c++) out.cols[j * 4 + c] = blend(q0 + STATE_AT[c], q1 + STATE_AT[c]);
  }
  const t0 = mb.i;
  const t1 = u > 0 ? t0 + 1 : t0;
  out.msl = run.logMsLifetime[t0] * (1 - u) + run.logMsLifetime[t1] * u;
  out.rm = run.remnantMass[t0] * (1 - u) + run.remnantMass[t1] * u;
  return out;
}

/**
 * The EEP track of a star of initial mass `initialMass` and metal fraction `z` interpolated
 * from a grid: at every EEP, age and state are blended across the neighbouring tracks in
 * mass exactly as the point query does (locateMass), then linearly in log Z between the two
 * bracketing metallicities when they share the EEP layout (else the nearer one's track).
 *
 * @throws RangeError when mass or z is outside the grid
 * @example interpolatedTrack(grid, 1, 0.014).phase[0] // 0 (pre-main-sequence)
 */
export function interpolatedTrack(grid: Grid, initialMass: number, z: number): InterpolatedTrack {
  if (!(initialMass >= grid.massRange.min && initialMass <= grid.massRange.max)) {
    throw new RangeError(`initialMass ${initialMass} outside the ${grid.source} grid's ${grid.massRange.min}–${grid.massRange.max} Msun`);
  }
  if (!(z >= grid.zRange.min && z <= grid.zRange.max)) {
    throw new RangeError(`z ${z} outside the ${grid.source} grid's ${grid.zRange.min}–${grid.zRange.max}`);
  }
  const lm = Math.log10(initialMass);
  const lz = Math.log10(z);
  let a = slabTrack(grid.slabs[0], lm);
  if (grid.slabs.length > 1) {
    const k = findInterval(grid.logZ, lz);
    const w = Math.min(1, Math.max(0, (lz - grid.logZ[k]) / (grid.logZ[k + 1] - grid.logZ[k])));
    a = slabTrack(grid.slabs[k], lm);
    if (w > 0) {
      const b = slabTrack(grid.slabs[k + 1], lm);
      if (b.layout === a.layout) {
        for (let j = 0; j < a.n; j++) a.logAge[j] = (1 - w) * a.logAge[j] + w * b.logAge[j];
        for (let j = 0; j < a.cols.length; j++) a.cols[j] = (1 - w) * a.cols[j] + w * b.cols[j];
        a.msl = (1 - w) * a.msl + w * b.msl;
        a.rm = (1 - w) * a.rm + w * b.rm;
      } else if (w >= 0.5) a = b;
    }
  }
  const n = a.n;
  const col = (c: number) => {
    const x = new Float64Array(n);
    for (let j = 0; j < n; j++) x[j] = a.cols[j * 4 + c];
    return x;
  };
  // Each EEP's age is its own cubic in mass; on a sparse grid the slope terms can put one
  // EEP a little before the previous one, so the track keeps the running maximum.
  const age = new Float64Array(n);
  let prev = -Infinity;
  for (let j = 0; j < n; j++) {
    prev = Math.max(prev, a.logAge[j]);
    age[j] = 10 ** prev;
  }
  const mass = col(0);
  const coreMass = col(1);
  for (let j = 0; j < n; j++) {
    mass[j] *= initialMass; // stored as fractions of the initial mass
    coreMass[j] *= initialMass;
    if (coreMass[j] > mass[j]) coreMass[j] = mass[j];
  }
  return {
    initialMass, z, n, age, mass, coreMass, logL: col(2), logTeff: col(3), phase: a.phase.slice(),
    msLifetime: a.msl === 0 ? 0 : 10 ** a.msl, remnant: REMNANT_CODES[a.remnant], remnantMass: a.rm,
  };
}
