import type { Scenario } from '../population/scenario.js';
import { samplePopulation } from '../population/samplePopulation.js';
import type { GridQuery } from '../interp/gridQuery.js';
import { STATE_KEYS, type StarState } from '../model/starState.js';
import { stateRecord } from './stateRecord.js';
import { formatCsv } from './formatCsv.js';

/** Columns of `population` output: the star's index and birth time, then the star state. */
export const POPULATION_COLUMNS = ['index', 'birthTime', ...STATE_KEYS] as const;

/** Stars sampled and answered per block. */
const BLOCK = 4096;
const HEADER_LENGTH = formatCsv(POPULATION_COLUMNS, []).length;

/**
 * The rows of a population at the scenario's `now`, as text chunks of CSV (RFC 4180, header
 * only when `header` is true) or NDJSON (one object per star, keys in POPULATION_COLUMNS
 * order), for stars `start … start + count − 1`. Each star is sampled from its own stream
 * (samplePopulation) and answered by the grid query, and numbers are written as the shortest
 * text that reads back to the same double, so the output is a pure function of the scenario
 * and the index range: shards concatenate to exactly one run's bytes.
 *
 * @param scenario a parsed scenario
 * @param query the grid interpolator
 * @param range the stars to write; format; whether to start with the CSV header
 * @throws RangeError if a star falls outside the grid (its mass or z), naming the star
 */
export function* populationRows(
  scenario: Scenario, query: GridQuery,
  range: { start: number; count: number; format: 'csv' | 'ndjson'; header: boolean },
): Generator<string> {
  const { start, count, format } = range;
  if (format === 'csv' && range.header) yield formatCsv(POPULATION_COLUMNS, []);
  for (let s = start; s < start + count; s += BLOCK) {
    const n = Math.min(BLOCK, start + count - s);
    const sample = samplePopulation(scenario, { start: s, count: n });
    const states: StarState[] = new Array(n);
    for (let k = 0; k < n; k++) {
      try {
        states[k] = stateRecord(query.star(sample.initialMass[k], sample.age[k], sample.z[k]));
      } catch (error) {
        if (error instanceof RangeError) throw new RangeError(`star ${sample.index[k]}: ${error.message}`);
        throw error;
      }
    }
    if (format === 'csv') {
      const rows = states.map((st, k) => [sample.index[k], sample.birthTime[k], ...STATE_KEYS.map((key) => st[key])]);
      yield formatCsv(POPULATION_COLUMNS, rows).slice(HEADER_LENGTH); // rows only
    } else {
      let text = '';
      for (let k = 0; k < n; k++) text += JSON.stringify({ index: sample.index[k], birthTime: sample.birthTime[k], ...states[k] }) + '\n';
      yield text;
    }
  }
}
