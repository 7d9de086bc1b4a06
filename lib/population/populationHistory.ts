import { createPopulationEvaluator } from '../interp/populationEvaluator.js';
import type { GridQuery } from '../interp/gridQuery.js';
import { allocateStateColumns } from '../interp/gridQuery.js';
import { isochrone } from '../interp/isochrone.js';
import { PHASES, PHASE_INDEX, type Phase } from '../model/phases.js';
import { absoluteVisualMagnitude } from '../physics/absoluteVisualMagnitude.js';
import { planckianXyz } from '../physics/planckianXyz.js';
import { bvColor } from '../physics/bvColor.js';
import { srgbTransfer } from '../physics/srgbTransfer.js';
import { xyzToLinearSrgb } from '../physics/xyzToLinearSrgb.js';
import { samplePopulation, type PopulationSample } from './samplePopulation.js';
import type { HistorySpec, Scenario } from './scenario.js';

/** A population over time: one entry per time of the scenario's history grid. */
export interface PopulationHistory {
  /** yr since star formation began, ascending */
  times: number[];
  /** stars in each phase at each time (stars not yet born are not counted) */
  counts: Record<Phase, number[]>;
  /** stars that entered white-dwarf, neutron-star or black-hole since the previous time (since 0 at the first) */
  remnantsBorn: number[];
  /** of those, the ones that became a neutron star or a black hole (core-collapse supernovae) */
  supernovae: number[];
  /** summed bolometric luminosity of the stars born, Lsun */
  luminosity: number[];
  /** flux-weighted integrated B−V, mag; null when nothing born emits light */
  bv: (number | null)[];
  /** integrated colour as seen, '#rrggbb'; null when nothing born emits light */
  color: (string | null)[];
  /** main-sequence turnoff of the oldest stars (at the median z), Msun; null before any star is older than 0 */
  turnoffMass: (number | null)[];
}

/** The history's times from its spec, both ends exact. */
function historyTimes(h: HistorySpec): number[] {
  const { from, to, steps, spacing } = h;
  const times: number[] = [];
  for (let k = 0; k < steps; k++) {
    const f = k / (steps - 1);
    times.push(spacing === 'log' ? from * (to / from) ** f : from + (to - from) * f);
  }
  times[0] = from;
  times[steps - 1] = to;
  return times;
}

const XYZ = new Float64Array(3);
const HEX: string[] = [];
for (let i = 0; i < 256; i++) HEX.push(i.toString(16).padStart(2, '0'));

/** Neumaier's compensated sums (Neumaier 1974, ZAMM 54, 39) of several quantities at once. */
class Sums {
  readonly s: Float64Array;
  readonly c: Float64Array;
  constructor(n: number) {
    this.s = new Float64Array(n);
    this.c = new Float64Array(n);
  }
  reset(): void {
    this.s.fill(0);
    this.c.fill(0);
  }
  add(k: number, v: number): void {
    const s = this.s[k];
    const t = s + v;
    this.c[k] += Math.abs(s) >= Math.abs(v) ? s - t + v : v - t + s;
    this.s[k] = t;
  }
  get(k: number): number {
    return this.s[k] + this.c[k];
  }
}

const WD = PHASE_INDEX['white-dwarf'];
const NS = PHASE_INDEX['neutron-star'];
const BH = PHASE_INDEX['black-hole'];
const UNBORN = 255;
const isRemnant = (p: number) => p === WD || p === NS || p === BH;

/**
 * The population of a scenario followed over its history grid (`scenario.history`): at each
 * time t (yr since star formation began) the stars born by t (birthTime ≤ t) are evaluated at
 * ages t − birthTime through the grid interpolator, and summed:
 *
 * - `counts`: stars per phase (PHASES of lib/model/phases.ts);
 * - `remnantsBorn`, `supernovae`: stars whose phase became white-dwarf, neutron-star or
 *   black-hole since the previous time (at the first time: since time 0, so a star born and
 *   dead inside one interval is counted too); supernovae are those becoming a neutron star or a
 *   black hole (core collapse). Their running sums equal the remnants present;
 * - `luminosity`: Σ L, Lsun (compensated summation);
 * - `bv`: flux-weighted integrated colour (standard practice in population synthesis for
 *   integrated photometry of star clusters and galaxies): each star's V flux 10^(−0.4 M_V)
 *   ({@link absoluteVisualMagnitude}) and B flux 10^(−0.4 (M_V + (B−V))) ({@link bvColor}) are
 *   summed, and B−V = −2.5 log10(ΣF_B / ΣF_V). Black holes (no light) add nothing;
 * - `color`: the blend as seen: each star's blackbody chromaticity x, y, z (CIE 1931,
 *   {@link blackbodyXyz}) scaled to tristimulus values with Y equal to its V flux (CIE Y and
 *   Johnson V both peak near 550 nm; a common-practice approximation), summed, then the same
 *   path as lib/physics/blackbodyColor: XYZ → linear sRGB (IEC 61966-2-1) → negatives clipped →
 *   largest channel scaled to 1 → sRGB transfer → '#rrggbb';
 * - `turnoffMass`: the main-sequence turnoff of the oldest stars, age t − (earliest birth),
 *   at the population's median z, from {@link isochrone} (bisection on phase, to 1e-6 dex),
 *   within the IMF's mass limits (so it is `imf.maxMass` while every mass is still on the main
 *   sequence).
 *
 * Speed: one columnar grid query of the born stars per time, with preallocated columns.
 *
 * @param scenario from {@link parseScenario}
 * @param query a grid interpolator ({@link createGridQuery})
 * @param options `sample`: a birth table to use instead of sampling the scenario (e.g. a few
 *   hand-picked stars); its initial masses and z must lie inside the grid
 * @returns the history
 * @throws RangeError naming the star, its value and the grid's range when a star's initial mass
 *   or z lies outside the grid, or when the sample's columns differ in length
 * @example populationHistory(parseScenario(doc), createGridQuery(loadBuiltinGrid())).supernovae
 */
export function populationHistory(
  scenario: Scenario, query: GridQuery, options: { sample?: PopulationSample } = {},
): PopulationHistory {
  const sample = options.sample ?? samplePopulation(scenario);
  const n = sample.birthTime.length;
  if (sample.initialMass.length !== n || sample.z.length !== n || sample.index.length !== n) {
    throw new RangeError(`sample columns differ in length (birthTime ${n}, initialMass ${sample.initialMass.length}, z ${sample.z.length}, index ${sample.index.length})`);
  }
  const { massRange, zRange, source } = query.grid;
  for (let i = 0; i < n; i++) {
    const m = sample.initialMass[i];
    const z = sample.z[i];
    if (!(m >= massRange.min && m <= massRange.max)) {
      throw new RangeError(`star ${sample.index[i]}: initialMass ${m} outside the ${source} grid's ${massRange.min}–${massRange.max} Msun`);
    }
    if (!(z >= zRange.min && z <= zRange.max)) {
      throw new RangeError(`star ${sample.index[i]}: z ${z} outside the ${source} grid's ${zRange.min}–${zRange.max}`);
    }
    if (!Number.isFinite(sample.birthTime[i])) throw new RangeError(`star ${sample.index[i]}: birthTime ${sample.birthTime[i]} is not finite`);
  }
  // stars in birth order (ties by position), so the born stars at t are a prefix
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => sample.birthTime[a] - sample.birthTime[b] || a - b);
  const birth = Float64Array.from(order, (i) => sample.birthTime[i]);
  const mass = Float64Array.from(order, (i) => sample.initialMass[i]);
  const zs = Float64Array.from(order, (i) => sample.z[i]);
  const ages = new Float64Array(n);
  // the same stars at every time: their mass blends are found once, their EEPs followed
  const evaluator = createPopulationEvaluator(query.grid, mass, zs);
  const out = allocateStateColumns(n);
  const prev = new Uint8Array(n).fill(UNBORN);
  const sortedZ = Float64Array.from(sample.z).sort();
  const medianZ = n === 0 ? 0 : n % 2 ? sortedZ[(n - 1) >> 1] : 0.5 * (sortedZ[n / 2 - 1] + sortedZ[n / 2]);
  const turnoffMin = Math.max(scenario.imf.minMass, massRange.min);
  const turnoffMax = Math.min(scenario.imf.maxMass, massRange.max);

  const times = historyTimes(scenario.history);
  const steps = times.length;
  const counts = Object.fromEntries(PHASES.map((p) => [p, new Array<number>(steps).fill(0)])) as Record<Phase, number[]>;
  const countsByCode = PHASES.map((p) => counts[p]);
  const remnantsBorn = new Array<number>(steps).fill(0);
  const supernovae = new Array<number>(steps).fill(0);
  const luminosity = new Array<number>(steps).fill(0);
  const bv: (number | null)[] = new Array(steps).fill(null);
  const color: (string | null)[] = new Array(steps).fill(null);
  const turnoffMass: (number | null)[] = new Array(steps).fill(null);
  // 0 L, 1 F_V, 2 F_B, 3 X, 4 Y, 5 Z
  const sums = new Sums(6);
  const rgb = new Float64Array(3);
  let born = 0;
  for (let k = 0; k < steps; k++) {
    const t = times[k];
    while (born < n && birth[born] <= t) born++;
    for (let i = 0; i < n; i++) ages[i] = t - birth[i]; // negative for stars not yet born (status 3, not read)
    evaluator.evaluate(ages, out);
    sums.reset();
    let newRemnants = 0;
    let newCollapses = 0;
    const { phase, luminosity: L, teff, status } = out;
    for (let i = 0; i < born; i++) {
      if (status[i] !== 0) {
        throw new RangeError(`star ${sample.index[order[i]]}: age ${ages[i]} yr at history time ${t} yr is outside the ${source} grid (status ${status[i]})`);
      }
      const p = phase[i];
      countsByCode[p][k]++;
      if (isRemnant(p) && !isRemnant(prev[i])) {
        newRemnants++;
        if (p !== WD) newCollapses++;
      }
      prev[i] = p;
      const l = L[i];
      if (!(l > 0)) continue;
      sums.add(0, l);
      const T = teff[i];
      const fv = 10 ** (-0.4 * absoluteVisualMagnitude(l, T));
      sums.add(1, fv);
      sums.add(2, fv * 10 ** (-0.4 * bvColor(T)));
      planckianXyz(T, XYZ);
      const cx = XYZ[0];
      const cy = XYZ[1];
      const cz = XYZ[2];
      const s = fv / cy;
      sums.add(3, cx * s);
      sums.add(4, fv);
      sums.add(5, cz * s);
    }
    remnantsBorn[k] = newRemnants;
    supernovae[k] = newCollapses;
    luminosity[k] = sums.get(0);
    const fV = sums.get(1);
    if (fV > 0) {
      bv[k] = -2.5 * Math.log10(sums.get(2) / fV);
      xyzToLinearSrgb(sums.get(3), sums.get(4), sums.get(5), rgb);
      const r = rgb[0] > 0 ? rgb[0] : 0;
      const gg = rgb[1] > 0 ? rgb[1] : 0;
      const b = rgb[2] > 0 ? rgb[2] : 0;
      const m = r > gg ? (r > b ? r : b) : gg > b ? gg : b;
      color[k] = m > 0
        ? '#' + HEX[Math.round(255 * srgbTransfer(r / m))] + HEX[Math.round(255 * srgbTransfer(gg / m))] + HEX[Math.round(255 * srgbTransfer(b / m))]
        : '#000000';
    }
    const oldest = born > 0 ? t - birth[0] : 0;
    if (oldest > 0 && turnoffMax > turnoffMin) {
      turnoffMass[k] = isochrone(query, oldest, medianZ, { count: 2, minMass: turnoffMin, maxMass: turnoffMax }).turnoffMass;
    }
  }
  return { times, counts, remnantsBorn, supernovae, luminosity, bv, color, turnoffMass };
}
