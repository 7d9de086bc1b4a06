import { assertInRange } from './assertInRange.js';
import { TEFF_MAX, TEFF_MIN } from './constants.js';

/**
 * White-dwarf spectral class after Sion et al. 1983 (ApJ 269, 253): 'D', a letter for the
 * spectral features, and the temperature index 50400/Teff to one decimal
 * (25200 K → 'DA2.0', 10080 K → 'DA5.0').
 *
 * The letter is a simple choice (common practice, not a model of atmospheres): 'DA'
 * (hydrogen Balmer lines) at and above 5000 K, 'DC' (no lines in the optical) below, where
 * hydrogen lines vanish from white-dwarf spectra. Helium-atmosphere classes (DO, DB, DQ, DZ)
 * need the atmosphere composition, which the model does not track. Indices that would round
 * to 0.0 (Teff above 504000 K) are written 0.1.
 *
 * @param teff effective temperature, K, in [10, 1e9]
 * @returns class such as 'DA2.0', matching /^D[AC]\d+\.\d$/
 * @throws {RangeError} when teff is not finite or outside [10, 1e9] K
 * @example
 * whiteDwarfClass(25200); // 'DA2.0'
 * whiteDwarfClass(4000);  // 'DC12.6'
 */
export function whiteDwarfClass(teff: number): string {
  assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
  const tenths = Math.max(1, Math.round(504000 / teff));
  const whole = Math.floor(tenths / 10);
  return `${teff >= 5000 ? 'DA' : 'DC'}${whole}.${tenths - whole * 10}`;
}
