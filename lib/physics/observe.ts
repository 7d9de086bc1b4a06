import { assertInRange } from './assertInRange.js';
import { blackbodyColor } from './blackbodyColor.js';
import { bolometricCorrection } from './bolometricCorrection.js';
import { bolometricMagnitude } from './bolometricMagnitude.js';
import { bvColor } from './bvColor.js';
import { TEFF_MAX, TEFF_MIN } from './constants.js';
import { spectralType } from './spectralType.js';
import { surfaceGravity } from './surfaceGravity.js';
import { whiteDwarfClass } from './whiteDwarfClass.js';

/** What an observer would measure of one object; `null` where it does not apply. */
export interface Observables {
  /** surface gravity, log10 cgs */
  logg: number;
  /** MK type with luminosity class, or white-dwarf class; null for neutron stars and black holes */
  spectralType: string | null;
  /** B−V, mag */
  bv: number | null;
  /** absolute bolometric magnitude, mag (IAU 2015 B2) */
  mbol: number | null;
  /** absolute V magnitude, mag */
  mv: number | null;
  /** '#rrggbb' blackbody colour as seen */
  color: string | null;
}

/** Kinds of object the model hands over. */
export type ObservedKind = 'star' | 'brown-dwarf' | 'white-dwarf' | 'neutron-star' | 'black-hole';

/**
 * Observables of one object from its physical state: log g ({@link surfaceGravity}),
 * spectral class ({@link spectralType} for stars and brown dwarfs, {@link whiteDwarfClass}
 * for white dwarfs, none for neutron stars), B−V ({@link bvColor}), M_bol
 * ({@link bolometricMagnitude}, IAU 2015 B2), M_V = M_bol − BC_V ({@link bolometricCorrection})
 * and the blackbody colour ({@link blackbodyColor}). Neutron stars use the same relations,
 * which at their temperatures (≳ 1e5 K) are the blackbody rules of those functions.
 * A black hole emits no light: only logg (from the mass and the radius passed, e.g. the
 * Schwarzschild radius) is given; its luminosity and teff may be 0 and are not used.
 * All tables are precomputed at module load; a call allocates only its result.
 *
 * @param kind object kind
 * @param luminosity bolometric luminosity, Lsun (> 0; ≥ 0 for black holes)
 * @param teff effective temperature, K, in [10, 1e9] (≥ 0, unused, for black holes)
 * @param radius radius, Rsun (> 0)
 * @param mass mass, Msun (> 0)
 * @returns the observables
 * @throws {RangeError} on an unknown kind, or any input non-finite, non-positive or outside
 *   its range
 * @example
 * observe('star', 1, 5772, 1, 1);
 * // { logg: 4.438, spectralType: 'G2V', bv: 0.652, mbol: 4.74, mv: 4.821, color: '#fff0e9' }
 */
export function observe(kind: ObservedKind, luminosity: number, teff: number, radius: number, mass: number): Observables {
  switch (kind) {
    case 'black-hole': {
      assertInRange('luminosity', luminosity, 0, Infinity, 'Lsun');
      assertInRange('teff', teff, 0, TEFF_MAX, 'K');
      const logg = surfaceGravity(mass, radius);
      return { logg, spectralType: null, bv: null, mbol: null, mv: null, color: null };
    }
    case 'star':
    case 'brown-dwarf':
    case 'white-dwarf':
    case 'neutron-star': {
      assertInRange('luminosity', luminosity, 0, Infinity, 'Lsun', true);
      assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
      const logg = surfaceGravity(mass, radius);
      const mbol = bolometricMagnitude(luminosity);
      const type = kind === 'neutron-star' ? null
        : kind === 'white-dwarf' ? whiteDwarfClass(teff)
        : spectralType(teff, logg < -3 ? -3 : logg > 10 ? 10 : logg);
      return {
        logg,
        spectralType: type,
        bv: bvColor(teff),
        mbol,
        mv: mbol - bolometricCorrection(teff),
        color: blackbodyColor(teff),
      };
    }
    default:
      throw new RangeError(
        `kind ${String(kind)} is not one of star, brown-dwarf, white-dwarf, neutron-star, black-hole`,
      );
  }
}
