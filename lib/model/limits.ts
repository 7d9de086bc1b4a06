/** Supported initial-mass range of the analytic model, Msun. */
export const MASS_RANGE = Object.freeze({ min: 0.01, max: 150 });
/** Supported metal mass fraction range. */
export const Z_RANGE = Object.freeze({ min: 1e-4, max: 0.03 });
/** Solar metal mass fraction (DESIGN.md default; Asplund et al. 2009 present-day photosphere, Z = 0.0134, rounded). */
export const SOLAR_Z = 0.014;
/** Oldest age a query may ask for, yr (100 Gyr). */
export const MAX_AGE = 1e11;
/** Age of the universe, yr (Planck Collaboration 2020, A&A 641, A6: 13.787 Gyr), rounded as in the CLI warning. */
export const UNIVERSE_AGE = 1.38e10;
