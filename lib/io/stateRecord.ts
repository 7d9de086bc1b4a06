import type { StarState } from '../model/starState.js';
import { STATE_KEYS } from '../model/starState.js';

/**
 * Copies a star state into a plain object with exactly the schema's keys in
 * `STATE_KEYS` order (the order of JSON output and CSV columns), so output does
 * not depend on how the model happened to build the object. It is also the guard
 * between the model and every output: a missing key or a non-finite number is a
 * failure of the program (plain `Error`, exit code 1), never written out.
 *
 * @param state the star state
 * @returns a new object, keys in schema order
 * @throws Error if a schema key is missing (`undefined`) — keys that do not apply must be `null` —
 *   or a number is not finite
 * @example Object.keys(stateRecord(state))[0] // 'initialMass'
 */
export function stateRecord(state: StarState): StarState {
  const record: Record<string, unknown> = {};
  for (const key of STATE_KEYS) {
    const value = state[key];
    if (value === undefined) throw new Error(`internal error: star state has no '${key}'`);
    if (typeof value === 'number' && !Number.isFinite(value)) {
      throw new Error(`internal error: star state has ${key} = ${value} (initialMass ${state.initialMass}, age ${state.age} yr)`);
    }
    record[key] = value;
  }
  return record as unknown as StarState;
}
