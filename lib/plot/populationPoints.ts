import type { GridQuery, QueryInput } from '../interp/gridQuery.js';
import { allocateStateColumns } from '../interp/gridQuery.js';
import { PHASES, PHASE_INDEX, type Phase } from '../model/phases.js';

/** The stars of a population as an HR diagram sees them. */
export interface PopulationPoints {
  /** stars in the population */
  total: number;
  /** stars per phase, every phase present (0 when none) */
  counts: Record<Phase, number>;
  /** log10 Teff/K of the stars with light, in input order */
  logTeff: Float64Array;
  /** Teff, K, of the same stars (what their colour is computed from) */
  teff: Float64Array;
  /** log10 L/Lsun of the same stars */
  logL: Float64Array;
  /** their phase codes (PHASE_INDEX) */
  phase: Uint8Array;
  /** stars not drawn: neutron stars, black holes and stars without light */
  notDrawn: number;
}

const NS = PHASE_INDEX['neutron-star'];
const BH = PHASE_INDEX['black-hole'];

/**
 * The present states of a population's stars (the grid's columnar query, no per-star objects)
 * reduced to what an HR diagram draws: log Teff and log L of each star with light, its phase,
 * and counts per phase. Neutron stars (L ~ 1e-9 Lsun, off any diagram of stars) and black
 * holes (no light) are counted but not drawn.
 *
 * @param query grid interpolator
 * @param stars initial mass (Msun), age (yr) and z of every star
 * @throws RangeError naming the first star outside the grid's ranges (by its 1-based number)
 */
export function populationPoints(query: GridQuery, stars: QueryInput): PopulationPoints {
  const total = stars.initialMass.length;
  const cols = query.columns(stars, allocateStateColumns(total));
  const counts = Object.fromEntries(PHASES.map((p) => [p, 0])) as Record<Phase, number>;
  let drawn = 0;
  for (let i = 0; i < total; i++) {
    if (cols.status[i] !== 0) {
      const what = ['', 'initialMass', 'z', 'age'][cols.status[i]] ?? 'input';
      const value = what === 'initialMass' ? stars.initialMass[i] : what === 'age' ? stars.age[i]
        : typeof stars.z === 'number' ? stars.z : stars.z[i];
      throw new RangeError(`star ${i + 1}: ${what} ${value} is outside the grid's range`);
    }
    const p = cols.phase[i];
    counts[PHASES[p]]++;
    if (p !== NS && p !== BH && cols.luminosity[i] > 0 && cols.teff[i] > 0) drawn++;
  }
  const logTeff = new Float64Array(drawn);
  const logL = new Float64Array(drawn);
  const teff = new Float64Array(drawn);
  const phase = new Uint8Array(drawn);
  let k = 0;
  for (let i = 0; i < total; i++) {
    const p = cols.phase[i];
    if (p === NS || p === BH || !(cols.luminosity[i] > 0 && cols.teff[i] > 0)) continue;
    teff[k] = cols.teff[i];
    logTeff[k] = Math.log10(cols.teff[i]);
    logL[k] = Math.log10(cols.luminosity[i]);
    phase[k] = p;
    k++;
  }
  return { total, counts, logTeff, teff, logL, phase, notDrawn: total - drawn };
}
