import { readScenario, type ScenarioIssue } from './readScenario.js';

/**
 * Every problem in a scenario document (layout: lib/population/scenario.ts), in document
 * order; empty when it is valid. Each issue names the key path (e.g. `imf.slopes[1]`), the
 * value found and what is allowed.
 *
 * @param json the parsed JSON document
 * @returns the issues
 * @throws nothing
 * @example validateScenario({ name: 'A', seed: 1, size: 0, imf: { kind: 'salpeter' },
 *   starFormation: { kind: 'constant' }, now: '1Gyr' })[0].message
 * // 'size: 0 is out of range; allowed: an integer 1–4294967295'
 */
export function validateScenario(json: unknown): ScenarioIssue[] {
  return readScenario(json).issues;
}
