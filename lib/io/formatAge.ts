import { formatSignificant } from './formatSignificant.js';

/** An age written for humans: the number as text and its unit. */
export interface FormattedAge {
  text: string;
  unit: 'yr' | 'kyr' | 'Myr' | 'Gyr';
}

/**
 * Writes an age (or a duration) in the largest of yr, kyr, Myr, Gyr in which it
 * is at least 1, with `digits` significant digits, trailing zeros dropped — the
 * convention of every human table of this tool (machine output keeps yr).
 *
 * @param years age or duration in yr
 * @param digits significant digits (default 4)
 * @example formatAge(4.57e9) // { text: '4.57', unit: 'Gyr' }
 * @example formatAge(1.23e7, 3) // { text: '12.3', unit: 'Myr' }
 * @example formatAge(0) // { text: '0', unit: 'yr' }
 */
export function formatAge(years: number, digits = 4): FormattedAge {
  const size = Math.abs(years);
  // Decide the unit on the rounded value so 999.96 Myr becomes 1 Gyr, not 1000 Myr.
  const rounded = size === 0 || !Number.isFinite(size) ? size : Number(size.toPrecision(digits));
  if (rounded >= 1e9) return { text: formatSignificant(years / 1e9, digits, true), unit: 'Gyr' };
  if (rounded >= 1e6) return { text: formatSignificant(years / 1e6, digits, true), unit: 'Myr' };
  if (rounded >= 1e3) return { text: formatSignificant(years / 1e3, digits, true), unit: 'kyr' };
  return { text: formatSignificant(years, digits, true), unit: 'yr' };
}
