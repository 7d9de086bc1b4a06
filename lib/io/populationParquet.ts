import { parquetWriteBuffer } from 'hyparquet-writer';
import type { Scenario } from '../population/scenario.js';
import { samplePopulation } from '../population/samplePopulation.js';
import type { GridQuery } from '../interp/gridQuery.js';
import { STATE_KEYS, type StarState } from '../model/starState.js';
import { stateRecord } from './stateRecord.js';
import { POPULATION_COLUMNS } from './populationRows.js';

const STRING_KEYS = new Set<string>(['phase', 'spectralType', 'color', 'remnant']);

/**
 * The rows of populationRows as one Apache Parquet file (columnar, for large runs read by
 * data tools): the same columns — index, birthTime, then the star state — with numbers as
 * DOUBLE and text as UTF-8 strings (null where a key does not apply), written by the
 * registry library hyparquet-writer (uncompressed pages are not needed: its default codec).
 * The file is built in memory (about 200 bytes a star), so for many millions of stars write
 * shards (`start`, `count`) to separate files.
 *
 * @param scenario a parsed scenario
 * @param query the grid interpolator
 * @param range the stars to write
 * @returns the file's bytes
 * @throws RangeError if a star falls outside the grid, naming the star
 */
export function populationParquet(scenario: Scenario, query: GridQuery, range: { start: number; count: number }): Uint8Array {
  const { start, count } = range;
  const cols = new Map<string, (number | string | null)[]>(POPULATION_COLUMNS.map((k) => [k, new Array(count)]));
  const BLOCK = 4096;
  for (let s = start; s < start + count; s += BLOCK) {
    const n = Math.min(BLOCK, start + count - s);
    const sample = samplePopulation(scenario, { start: s, count: n });
    for (let k = 0; k < n; k++) {
      let st: StarState;
      try {
        st = stateRecord(query.star(sample.initialMass[k], sample.age[k], sample.z[k]));
      } catch (error) {
        if (error instanceof RangeError) throw new RangeError(`star ${sample.index[k]}: ${error.message}`);
        throw error;
      }
      const row = s - start + k;
      cols.get('index')![row] = sample.index[k];
      cols.get('birthTime')![row] = sample.birthTime[k];
      for (const key of STATE_KEYS) cols.get(key)![row] = st[key] as number | string | null;
    }
  }
  const columnData = POPULATION_COLUMNS.map((name) => ({
    name,
    data: cols.get(name)!,
    type: STRING_KEYS.has(name) ? ('STRING' as const) : ('DOUBLE' as const),
    nullable: true,
  }));
  return new Uint8Array(parquetWriteBuffer({ columnData, rowGroupSize: 65536 }));
}
