import { createImf } from './createImf.js';
import { createMetallicityModel } from './createMetallicityModel.js';
import { createStarFormationHistory } from './createStarFormationHistory.js';
import { rng } from './rng.js';
import type { Scenario } from './scenario.js';

/** A sampled population as columns, one entry per star (the birth table). */
export interface PopulationSample {
  /** star index within the whole population */
  index: Uint32Array;
  /** yr since star formation began */
  birthTime: Float64Array;
  /** Msun */
  initialMass: Float64Array;
  /** yr, now − birthTime */
  age: Float64Array;
  /** metal mass fraction */
  z: Float64Array;
}

/**
 * Samples stars `start` … `start + count − 1` of a scenario's population: each star's initial
 * mass from the IMF ({@link createImf}), birth time from the star-formation history
 * ({@link createStarFormationHistory}), and metal fraction from the metallicity model at the
 * star's age ({@link createMetallicityModel}), each by its exact inverse CDF.
 *
 * Star i draws three uniforms from its own stream {@link rng}(seed, i), in this order: mass,
 * birth time, metallicity (the third is drawn, and unused, even when Z is fixed, so the layout
 * never shifts). Its values therefore depend only on (scenario, i): the same seed gives the same
 * columns on every run, and shards ({@link shardRange}) concatenate to the whole population.
 *
 * @param scenario from {@link parseScenario}
 * @param range first star (default 0) and number of stars (default: the rest of the population)
 * @returns the columns; birthTime and age in yr, initialMass in Msun
 * @throws RangeError when start or count is not an integer or the range leaves the population
 * @example samplePopulation(parseScenario(doc), { start: 0, count: 3 }).initialMass.length // 3
 */
export function samplePopulation(scenario: Scenario, range: { start?: number; count?: number } = {}): PopulationSample {
  const { size, seed, now } = scenario;
  const start = range.start ?? 0;
  if (!Number.isSafeInteger(start) || start < 0 || start > size) {
    throw new RangeError(`start ${start} must be an integer 0–${size} (the population has ${size} stars)`);
  }
  const count = range.count ?? size - start;
  if (!Number.isSafeInteger(count) || count < 0 || start + count > size) {
    throw new RangeError(`count ${count} must be an integer 0–${size - start} (stars ${start}… of ${size})`);
  }
  const imf = createImf(scenario.imf);
  const sfh = createStarFormationHistory(scenario.starFormation, now);
  const metal = createMetallicityModel(scenario.metallicity);
  const index = new Uint32Array(count);
  const birthTime = new Float64Array(count);
  const initialMass = new Float64Array(count);
  const age = new Float64Array(count);
  const z = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const i = start + k;
    const r = rng(seed, i);
    const m = imf.quantile(r.uniform());
    const t = sfh.quantile(r.uniform());
    const a = now - t;
    index[k] = i;
    initialMass[k] = m;
    birthTime[k] = t;
    age[k] = a;
    z[k] = metal.z(a, r.uniform());
  }
  return { index, birthTime, initialMass, age, z };
}
