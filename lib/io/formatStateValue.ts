import type { StarState } from '../model/starState.js';
import { STATE_UNITS } from '../model/starState.js';
import { formatAge } from './formatAge.js';
import { formatSignificant } from './formatSignificant.js';

/** One state value written for humans: text and unit. */
export interface FormattedValue {
  text: string;
  unit: string;
}

/** Text written where a key does not apply (`null`). */
export const NOT_APPLICABLE = '—';

/**
 * Writes one value of the star state for a human table, with a precision chosen
 * per quantity (common practice, about what the analytic model supports):
 * masses 4 significant digits, luminosity and radius 4, Teff to the kelvin
 * (4 digits below 1000 K), log g and B−V to 0.001, magnitudes to 0.01, z 3
 * digits; the birth mass and z are trimmed because they were typed in. Ages and
 * lifetimes are shown in yr, kyr, Myr or Gyr (see `formatAge`); every other unit is
 * the schema's (`STATE_UNITS`). `null` is written `—`.
 *
 * @param key a key of the star state
 * @param value its value
 * @example formatStateValue('teff', 5771.6) // { text: '5772', unit: 'K' }
 * @example formatStateValue('age', 4.57e9) // { text: '4.57', unit: 'Gyr' }
 */
export function formatStateValue<K extends keyof StarState>(key: K, value: StarState[K]): FormattedValue {
  const unit = STATE_UNITS[key];
  if (value === null) return { text: NOT_APPLICABLE, unit };
  if (typeof value === 'string') return { text: value, unit };
  const x = value as number;
  switch (key) {
    case 'age':
      return formatAge(x, 4);
    case 'msLifetime':
      return formatAge(x, 3);
    case 'initialMass':
      return { text: formatSignificant(x, 4, true), unit };
    case 'z':
      return { text: formatSignificant(x, 3, true), unit };
    case 'teff':
      return { text: Math.abs(x) >= 1000 ? Math.round(x).toFixed(0) : formatSignificant(x, 4), unit };
    case 'logg':
    case 'bv':
      return { text: x.toFixed(3), unit };
    case 'mbol':
    case 'mv':
      return { text: x.toFixed(2), unit };
    default:
      return { text: formatSignificant(x, 4), unit };
  }
}
