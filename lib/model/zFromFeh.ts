import { composition, HELIUM_ENRICHMENT, PRIMORDIAL_Y, SOLAR_X } from './composition.js';
import { SOLAR_Z } from './limits.js';

/**
 * Metal mass fraction from the iron abundance [Fe/H] (dex), assuming solar-scaled
 * abundances: Z/X = (Z/X)☉ · 10^[Fe/H] (the standard definition of [M/H]; e.g.
 * Bertelli et al. 1994, A&A Suppl. 106, 275, §2), with X = 1 − Y − Z and the helium law of
 * {@link composition}. Solving for Z: Z = r (1 − Y_p) / (1 + r (1 + ΔY/ΔZ)), r = (Z/X)☉ 10^[Fe/H].
 *
 * @param feh [Fe/H] in dex
 * @throws RangeError if feh is not finite
 * @example zFromFeh(0) // 0.014; zFromFeh(-1) // ≈ 0.00146
 */
export function zFromFeh(feh: number): number {
  if (!Number.isFinite(feh)) throw new RangeError(`feh ${feh} is not a finite number`);
  const r = (SOLAR_Z / SOLAR_X) * 10 ** feh;
  return (r * (1 - PRIMORDIAL_Y)) / (1 + r * (1 + HELIUM_ENRICHMENT));
}

/** Inverse of {@link zFromFeh}: [Fe/H] = log10[(Z/X) / (Z/X)☉]. */
export function fehFromZ(z: number): number {
  if (!(z > 0) || !Number.isFinite(z)) throw new RangeError(`z ${z} must be a positive finite number`);
  return Math.log10(z / composition(z).x / (SOLAR_Z / SOLAR_X));
}
