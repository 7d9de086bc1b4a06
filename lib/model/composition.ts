import { SOLAR_Z } from './limits.js';

/** Primordial helium mass fraction (Big-Bang nucleosynthesis; Planck Collaboration 2020, A&A 641, A6: Y_p ≈ 0.247; from memory). */
export const PRIMORDIAL_Y = 0.247;
/** Helium-to-metal enrichment ratio ΔY/ΔZ (common practice: values 1.4–2 are used; 1.6 puts the Sun near Y = 0.27). */
export const HELIUM_ENRICHMENT = 1.6;

/** Initial composition of a star: mass fractions of hydrogen, helium and metals. */
export interface Composition {
  x: number;
  y: number;
  z: number;
}

/**
 * Initial composition from the metal fraction by the linear helium-enrichment law
 * Y = Y_p + (ΔY/ΔZ) Z (Peimbert & Torres-Peimbert 1974 form; constants above), X = 1 − Y − Z.
 *
 * @param z metal mass fraction
 * @example composition(0.014) // { x: 0.7166, y: 0.2694, z: 0.014 } (rounded)
 */
export function composition(z: number): Composition {
  const y = PRIMORDIAL_Y + HELIUM_ENRICHMENT * z;
  return { x: 1 - y - z, y, z };
}

/** Solar hydrogen fraction implied by {@link composition} at {@link SOLAR_Z}. */
export const SOLAR_X = composition(SOLAR_Z).x;
