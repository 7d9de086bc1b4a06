import type { GridRun, GridSlab } from '../tracks/grid.js';
import { MASS_BINS, prepareRun } from '../tracks/grid.js';

/**
 * Slots of {@link MassBlend.w}. The Hermite weights blend the two bracketing tracks:
 * value = c00·y₀ + c10·y₀′ + c01·y₁ + c11·y₁′, with y′ the precomputed Steffen slopes in
 * log M (already scaled by the interval width here); u is the fraction of the way from the
 * lower track to the upper one (0 when one track answers); m, lm and la are the star's
 * initial mass, its log10 and the log10 age asked, set by the caller.
 */
export const W_C00 = 0;
export const W_C01 = 1;
export const W_C10 = 2;
export const W_C11 = 3;
export const W_U = 4;
export const W_M = 5;
export const W_LM = 6;
export const W_LA = 7;
export const W_SLOTS = 8;

/**
 * Where a mass falls in a metallicity slab, and the star being asked. The numbers that are
 * not integers live in the typed array `w` (slots W_*) rather than in arguments: V8 boxes
 * every double passed to a function it does not inline, and the interpolator's hot loop
 * (locateMass, blendRun) would otherwise allocate a dozen heap numbers per star.
 */
export interface MassBlend {
  run: GridRun;
  /** first EEP index of the lower and upper track in the run's track-major arrays */
  b0: number;
  b1: number;
  /** lower track's position in the run */
  i: number;
  /** weights and the star's coordinates: see W_C00 … W_LA */
  w: Float64Array;
}

/** A blank MassBlend to be filled by locateMass. */
export function createMassBlend(): MassBlend {
  return { run: undefined as unknown as GridRun, b0: 0, b1: 0, i: 0, w: new Float64Array(W_SLOTS) };
}

/**
 * Fills `out` for the log10 initial mass in `out.w[W_LM]` in `slab`: the Hermite cubic between the two
 * bracketing tracks with their Steffen slopes — the monotone cubic through the four nearest
 * tracks of a run (linear where the run has only two) — or, when the two bracketing tracks
 * belong to different EEP layouts (either side of the helium-flash mass, of the white-dwarf /
 * neutron-star / black-hole boundaries…), the nearer track alone: the grid never blends
 * tracks that do not share their EEPs. Masses outside the slab take its end track.
 */
export function locateMass(slab: GridSlab, out: MassBlend): void {
  const w = out.w;
  const lm = w[W_LM];
  const logM = slab.logM;
  let k = massCell(slab, lm);
  // u: the fraction of the way to the next track; hM the interval (0: one track answers)
  let u = 0;
  let hM = 0;
  if (slab.runOf[k] === slab.runOf[k + 1]) {
    hM = logM[k + 1] - logM[k];
    u = (lm - logM[k]) / hM;
    if (u < 0) u = 0;
    else if (u > 1) u = 1;
  } else if (lm - logM[k] >= logM[k + 1] - lm) k += 1;
  const run = slab.runs[slab.runOf[k]];
  if (run.ageIndex.length === 0) prepareRun(run); // a loaded run's first use
  const i = slab.indexInRun[k];
  const v = 1 - u;
  out.run = run;
  out.i = i;
  out.b0 = i * run.n;
  out.b1 = hM > 0 ? out.b0 + run.n : out.b0;
  w[W_U] = u;
  w[W_C00] = (1 + 2 * u) * v * v;
  w[W_C01] = u * u * (3 - 2 * u);
  w[W_C10] = u * v * v * hM;
  w[W_C11] = u * u * (u - 1) * hM;
}

/**
 * The last track of `slab` whose log10 mass is ≤ `lm` (0 below the first; the last but one
 * above the end): the mass index gives the last track at or below the bin's lower edge, then a
 * step or two within the bin.
 */
function massCell(slab: GridSlab, lm: number): number {
  const logM = slab.logM;
  if (logM.length < 3) return 0;
  let b = Math.floor((lm - slab.massIndexMin) * slab.massIndexScale);
  if (b < 0) b = 0;
  else if (b > MASS_BINS) b = MASS_BINS;
  let k = slab.massIndex[b];
  const last = logM.length - 2;
  while (k < last && logM[k + 1] <= lm) k++;
  return k;
}
