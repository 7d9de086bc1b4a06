import type { StarState } from '../model/starState.js';
import { STATE_KEYS } from '../model/starState.js';
import { formatStateValue } from './formatStateValue.js';
import { formatTable } from './formatTable.js';

/**
 * Writes one star state as a three-column human table — key, value, unit — with
 * every key of the schema in `STATE_KEYS` order, so the table and `--json` show
 * the same words. Precision per quantity as in `formatStateValue`.
 *
 * @param state the star state
 * @returns the table text, lines ending in `\n`
 * @example formatStateTable(starAt(generateTrack(1), 4.57e9)) // 'key  value  unit\n…teff  5772  K\n…'
 */
export function formatStateTable(state: StarState): string {
  const rows = STATE_KEYS.map((key) => {
    const { text, unit } = formatStateValue(key, state[key]);
    return [key, text, unit];
  });
  return formatTable(['key', 'value', 'unit'], rows, ['left', 'right', 'left']);
}
