import type { GridRun, GridSlab } from '../tracks/grid.js';
import { MASS_BINS, prepareRun } from '../tracks/grid.js';

/**
 * Where a mass falls in a metallicity slab and the cubic Hermite weights that blend the two
 * bracketing tracks there: value = c00·y₀ + c10·y₀′ + c01·y₁ + c11·y₁′, with y′ the
 * precomputed Steffen slopes in log M (already scaled by the interval width here).
 */
export interface MassBlend {
  run: GridRun;
  /** first EEP index of the lower and upper track in the run's track-major arrays */
  b0: number;
  b1: number;
  /** lower track's position in the run and the fraction toward the upper one (0 when single) */
  i: number;
  u: number;
  c00: number;
  c01: number;
  c10: number;
  c11: number;
}

/**
 * Fills `out` for log10 initial mass `lm` in `slab`: the Hermite cubic between the two
 * bracketing tracks with their Steffen slopes — the monotone cubic through the four nearest
 * tracks of a run (linear where the run has only two) — or, when the two bracketing tracks
 * belong to different EEP layouts (either side of the helium-flash mass, of the white-dwarf /
 * neutron-star / black-hole boundaries…), the nearer track alone: the grid never blends
 * tracks that do not share their EEPs. Masses outside the slab take its end track.
 */
export function locateMass(slab: GridSlab, lm: number, out: MassBlend): void {
  const logM = slab.logM;
  let k: number;
  if (logM.length < 3) k = 0;
  else {
    // the mass index gives the last track at or below the bin's edge; step up within the bin
    let b = Math.floor((lm - slab.massIndexMin) * slab.massIndexScale);
    if (b < 0) b = 0;
    else if (b > MASS_BINS) b = MASS_BINS;
    k = slab.massIndex[b];
    const last = logM.length - 2;
    while (k < last && logM[k + 1] <= lm) k++;
  }
  const ra = slab.runOf[k];
  if (ra === slab.runOf[k + 1]) {
    const run = slab.runs[ra];
    if (run.ageIndex.length === 0) prepareRun(run); // a loaded run's first use
    const hM = logM[k + 1] - logM[k];
    let u = (lm - logM[k]) / hM;
    if (u < 0) u = 0;
    else if (u > 1) u = 1;
    const i = slab.indexInRun[k];
    const v = 1 - u;
    out.run = run;
    out.i = i;
    out.u = u;
    out.b0 = i * run.n;
    out.b1 = out.b0 + run.n;
    out.c00 = (1 + 2 * u) * v * v;
    out.c01 = u * u * (3 - 2 * u);
    out.c10 = u * v * v * hM;
    out.c11 = u * u * (u - 1) * hM;
    return;
  }
  if (lm - logM[k] >= logM[k + 1] - lm) k += 1;
  const run = slab.runs[slab.runOf[k]];
  if (run.ageIndex.length === 0) prepareRun(run);
  out.run = run;
  out.i = slab.indexInRun[k];
  out.u = 0;
  out.b0 = out.i * run.n;
  out.b1 = out.b0;
  out.c00 = 1;
  out.c01 = 0;
  out.c10 = 0;
  out.c11 = 0;
}
