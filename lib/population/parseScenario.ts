import { readScenario } from './readScenario.js';
import type { Scenario } from './scenario.js';

/**
 * Reads and checks a scenario document (layout: lib/population/scenario.ts) and returns it with
 * defaults filled and every time in yr. Unknown keys at any depth are errors. All problems are
 * collected and reported together.
 *
 * @param json the parsed JSON document
 * @returns the scenario
 * @throws RangeError listing every problem, one per line, each as
 *   `<key path>: <value> <problem>; allowed: <what is allowed>`
 * @example parseScenario({ name: 'Lantern Reach', seed: 7, size: 20000, imf: { kind: 'kroupa' },
 *   starFormation: { kind: 'burst', duration: '5Myr' }, metallicity: { z: 0.014 }, now: '650Myr' })
 * // { …, imf: { kind: 'kroupa', minMass: 0.08, maxMass: 120 }, now: 6.5e8,
 * //   history: { from: 1e6, to: 6.5e8, steps: 60, spacing: 'log' } }
 */
export function parseScenario(json: unknown): Scenario {
  const { issues, scenario } = readScenario(json);
  if (scenario === undefined) {
    const n = issues.length;
    throw new RangeError(`scenario has ${n} problem${n === 1 ? '' : 's'}:\n${issues.map((i) => `  ${i.message}`).join('\n')}`);
  }
  return scenario;
}
