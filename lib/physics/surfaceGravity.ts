import { assertInRange } from './assertInRange.js';
import { GM_SUN, R_SUN } from './constants.js';

/** log10 of the nominal solar surface gravity in cgs, from (GM)☉ and R☉ (IAU 2015 B3). */
const LOGG_SUN = Math.log10((GM_SUN / (R_SUN * R_SUN)) * 100);

/**
 * Surface gravity log g = log10(G M / R²) in cgs (cm s⁻²), Newtonian, with the IAU 2015 B3
 * nominal (GM)☉ and R☉ (so the Sun gives 4.438).
 *
 * @param mass mass, Msun (> 0, finite)
 * @param radius radius, Rsun (> 0, finite)
 * @returns log g, dex (cgs)
 * @throws {RangeError} when mass or radius is not positive and finite
 * @example
 * surfaceGravity(1, 1); // ≈ 4.438
 */
export function surfaceGravity(mass: number, radius: number): number {
  assertInRange('mass', mass, 0, Infinity, 'Msun', true);
  assertInRange('radius', radius, 0, Infinity, 'Rsun', true);
  return LOGG_SUN + Math.log10(mass / (radius * radius));
}
