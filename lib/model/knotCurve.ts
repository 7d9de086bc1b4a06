import { monotoneCubic } from '../interp/monotoneCubic.js';

/**
 * A smooth calibration curve y(log10 M) through knots, built once: a Steffen (1990,
 * A&A 239, 443) monotone cubic in log10 of the initial mass, held constant beyond the
 * end knots. Used for the model's mass-dependent calibration tables, whose knots are
 * documented (with their sources) where each table is defined.
 *
 * @param masses knot masses, Msun, strictly increasing
 * @param values knot values (any unit)
 * @example knotCurve([1, 10], [0, 1])(3.1623) // 0.5
 */
export function knotCurve(masses: readonly number[], values: readonly number[]): (mass: number) => number {
  const f = monotoneCubic(masses.map(Math.log10), values);
  return (mass: number) => f(Math.log10(mass));
}
