/**
 * Physical constants and nominal solar values, SI units unless the name says otherwise.
 *
 * Sources: IAU 2015 Resolution B3 (Prša et al. 2016, AJ 152, 41) for the nominal solar
 * values; IAU 2015 Resolution B2 for the bolometric zero point; CODATA 2018
 * (Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010) for σ, G, c, h, k_B; IAU 2012
 * Resolution B2 for the astronomical unit. The solar mass is derived as (GM)☉ / G, as
 * IAU 2015 B3 recommends, because G is known far less precisely than (GM)☉.
 *
 * @example
 * import { L_SUN, M_SUN } from './constants.js';
 * L_SUN; // 3.828e26
 * M_SUN; // ≈ 1.98841e30
 */

/** Nominal solar luminosity, W (IAU 2015 B3). */
export const L_SUN = 3.828e26;
/** Nominal solar radius, m (IAU 2015 B3). */
export const R_SUN = 6.957e8;
/** Nominal solar effective temperature, K (IAU 2015 B3). */
export const TEFF_SUN = 5772;
/** Nominal solar mass parameter (GM)☉, m³ s⁻² (IAU 2015 B3). */
export const GM_SUN = 1.3271244e20;

/** Stefan–Boltzmann constant σ, W m⁻² K⁻⁴ (CODATA 2018, exact from h, k_B, c). */
export const SIGMA_SB = 5.670374419e-8;
/** Newtonian constant of gravitation G, m³ kg⁻¹ s⁻² (CODATA 2018). */
export const G_NEWTON = 6.6743e-11;
/** Speed of light in vacuum c, m s⁻¹ (exact, SI). */
export const C_LIGHT = 299792458;
/** Planck constant h, J s (exact, SI 2019 / CODATA 2018). */
export const H_PLANCK = 6.62607015e-34;
/** Boltzmann constant k_B, J K⁻¹ (exact, SI 2019 / CODATA 2018). */
export const K_BOLTZMANN = 1.380649e-23;
/** Second radiation constant c2 = h c / k_B, m K (derived from the exact CODATA 2018 values). */
export const C2_RADIATION = (H_PLANCK * C_LIGHT) / K_BOLTZMANN;

/** Julian year, s (365.25 days of 86400 s; IAU). */
export const YEAR = 365.25 * 86400;
/** Solar mass, kg, derived as (GM)☉ / G (IAU 2015 B3 recommendation). */
export const M_SUN = GM_SUN / G_NEWTON;
/** Zero point of the absolute bolometric magnitude scale L0, W (IAU 2015 B2: M_bol = 0). */
export const L0_BOL = 3.0128e28;
/** Astronomical unit, m (exact, IAU 2012 B2). */
export const AU = 149597870700;

/**
 * Lowest and highest effective temperature, K, accepted by this project's observable
 * relations (colour, bolometric correction, spectral class). The published relations
 * cover about 2300–45000 K; outside they are extended by documented blackbody rules that
 * stay finite over this whole span (cold brown dwarfs to the hottest neutron-star surfaces).
 * Project choice.
 */
export const TEFF_MIN = 10;
/** See {@link TEFF_MIN}. */
export const TEFF_MAX = 1e9;
