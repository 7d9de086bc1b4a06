import { knotCurve } from './knotCurve.js';
import { composition } from './composition.js';
import { SOLAR_Z } from './limits.js';

/*
 * Main-sequence relations of the analytic model.
 *
 * Zero-age main sequence (ZAMS) luminosity and radius at solar metallicity are smooth
 * curves through knots in log M. The knots were set so that the model star at a typical
 * field age reproduces the detached-eclipsing-binary mass–luminosity relation of Eker et al.
 * 2018 (MNRAS 479, 5491), the dwarf sequence of Pecaut & Mamajek 2013 (ApJS 208, 9) and the
 * mass–radius relation of Demircan & Kahraman 1991 (Ap&SS 181, 313); above 31 Msun, where
 * those relations end, they follow the general run of detailed ZAMS models (from memory:
 * log L ≈ 5.35 at 40 Msun, 6.1 at 100 Msun). The Sun's ZAMS luminosity, 0.714 Lsun, is
 * Gough 1981 (Sol. Phys. 74, 21) at t = 0.
 *
 * Calibration fixes from the published checks (test/model-mainSequence.test.ts): log L at
 * 7–30 Msun raised by 0.05–0.06 dex (model stars at 0.4 t_MS fell 0.15–0.17 dex below Eker
 * et al. 2018 at 7.5–31 Msun) and at 0.86 Msun by 0.04 dex (the K0V row of Pecaut & Mamajek
 * came out K2V); ZAMS radii at 0.2–0.7 Msun raised 8–12 % (they were 15–21 % below
 * Demircan & Kahraman 1991 and ≈ 10 % below the M0V and M4V rows of Pecaut & Mamajek).
 */

const ZAMS_MASS = [0.075, 0.1, 0.2, 0.3, 0.45, 0.6, 0.7, 0.86, 1.0, 1.2, 1.6, 2.0, 2.33, 3.0, 4.7, 7.0, 10, 15, 20, 30, 40, 60, 100, 150];
const ZAMS_LOGL = [-3.45, -3.05, -2.4, -2.04, -1.68, -1.15, -0.86, -0.41, -0.146, 0.23, 0.76, 1.18, 1.46, 1.87, 2.63, 3.31, 3.78, 4.33, 4.67, 5.13, 5.35, 5.72, 6.12, 6.4];
const ZAMS_R = [0.1, 0.12, 0.235, 0.315, 0.44, 0.615, 0.69, 0.77, 0.89, 1.07, 1.45, 1.62, 1.78, 2.05, 2.65, 3.3, 4.0, 5.0, 5.8, 7.2, 8.4, 10.3, 13.5, 16.5];

const zamsLogLSolar = knotCurve(ZAMS_MASS, ZAMS_LOGL);
const zamsLogRSolar = knotCurve(ZAMS_MASS, ZAMS_R.map(Math.log10));

/*
 * Metallicity: radiative homology gives L ∝ μ⁴ M³ / κ (Kippenhahn, Weigert & Weiss 2012,
 * "Stellar Structure and Evolution", §20.2). The opacity is split into a part that does not
 * depend on metals (electron scattering, H⁻ and free–free) and a metal-driven bound–free part
 * that scales as Z^0.7 (a softened Kramers κ ∝ Z); the metal-free share `f` grows with mass as
 * electron scattering takes over in hot interiors. κ/κ☉ = f + (1 − f)(Z/Z☉)^0.7. Radii shrink
 * weakly with the opacity (R ∝ κ^0.1 here; calibration, common practice). The split and the
 * exponents are this model's calibration; the direction (lower Z → brighter, hotter,
 * shorter-lived) and size (≈ +0.25 dex in L and −45 % in lifetime at [Fe/H] = −1 for 1 Msun)
 * follow detailed metal-poor models (from memory). The metal-free share at ≤ 1.5 Msun was
 * lowered from 0.5 to 0.4 so that the model meets that size (it gave +0.17 dex and −30 %).
 */
const opacityFreeShare = knotCurve([1.5, 10], [0.4, 0.85]);

/** log10 of the opacity ratio κ(Z)/κ(Z☉) at the given mass. */
export function opacityFactorLog(mass: number, z: number): number {
  const f = opacityFreeShare(mass);
  return Math.log10(f + (1 - f) * (z / SOLAR_Z) ** 0.7);
}

/**
 * ZAMS luminosity, log10 L/Lsun, of a star of initial mass `mass` (Msun) and metal
 * fraction `z` (calibrated knots above; homology opacity scaling for Z).
 * @example zamsLogL(1, 0.014) // ≈ -0.146 (0.714 Lsun, Gough 1981)
 */
export function zamsLogL(mass: number, z: number): number {
  const comp = composition(z);
  const sol = composition(SOLAR_Z);
  const mu = 4 / (3 + 5 * comp.x - comp.z);
  const muSol = 4 / (3 + 5 * sol.x - sol.z);
  return zamsLogLSolar(mass) - opacityFactorLog(mass, z) + 4 * Math.log10(mu / muSol);
}

/**
 * ZAMS radius, log10 R/Rsun (calibrated knots above; R ∝ κ^0.1 for Z).
 * @example 10 ** zamsLogR(1, 0.014) // 0.89
 */
export function zamsLogR(mass: number, z: number): number {
  return zamsLogRSolar(mass) + 0.1 * opacityFactorLog(mass, z);
}

/*
 * Brightening and swelling through the main sequence as functions of the fractional
 * main-sequence age τ = (t − t_ZAMS)/t_MS. For the Sun the luminosity shape is fitted to
 * Gough 1981, L(t) = L☉/[1 + 0.4(1 − t/t☉)], over 0–4.57 Gyr (log L/L_ZAMS = 0.257 τ + 0.126 τ²
 * with t_MS ≈ 9.9 Gyr), which gives L_TAMS ≈ 1.7 Lsun, as detailed solar models do. The
 * radius grows from 0.89 to 1.0 Rsun at the present Sun; more massive stars swell more over
 * their main sequence (from memory of detailed tracks: ≈ ×2 for 5 Msun, ≈ ×2.5 above 20 Msun).
 */
const msDeltaLogL = knotCurve([0.5, 1.2, 2.0, 15, 60], [0.3, 0.383, 0.33, 0.33, 0.3]);
const msDeltaLogR = knotCurve([0.5, 1.0, 1.5, 2.5, 15, 40], [0.06, 0.165, 0.26, 0.32, 0.38, 0.45]);

/** Luminosity shape s_L(τ), 0 at ZAMS, 1 at TAMS (Gough 1981 fit, see above). */
export function msLuminosityShape(tau: number): number {
  return 0.671 * tau + 0.329 * tau * tau;
}
/** Radius shape s_R(τ), 0 at ZAMS, 1 at TAMS (fit to the Sun's 0.89 → 1.0 Rsun at τ ≈ 0.46). */
export function msRadiusShape(tau: number): number {
  return 0.36 * tau + 0.64 * tau * tau;
}

/** log10 L/L_ZAMS over the main sequence at fractional age τ. */
export function msLogLRise(mass: number, tau: number): number {
  return msDeltaLogL(mass) * msLuminosityShape(tau);
}
/** log10 R/R_ZAMS over the main sequence at fractional age τ. */
export function msLogRRise(mass: number, tau: number): number {
  return msDeltaLogR(mass) * msRadiusShape(tau);
}

/** Mean of L/L_ZAMS over the main sequence, ∫₀¹ 10^(ΔlogL s_L(τ)) dτ (Simpson's rule, 64 intervals). */
export function msMeanLuminosityFactor(mass: number): number {
  const n = 64;
  const d = msDeltaLogL(mass);
  let s = 0;
  for (let i = 0; i <= n; i++) {
    const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
    s += w * 10 ** (d * msLuminosityShape(i / n));
  }
  return s / (3 * n);
}

/**
 * Fraction of the star's hydrogen burned on the main sequence, q(M). About 0.1 for stars
 * with radiative cores (the Schönberg & Chandrasekhar 1942, ApJ 96, 161, limit), close to 1
 * for fully convective red dwarfs, which mix their whole interior (Laughlin, Bodenheimer &
 * Adams 1997, ApJ 482, 420), and growing with the convective core above 1.2 Msun. The knots
 * are calibrated so that lifetimes (with the mean luminosity below) fall inside the ranges of detailed models in REFERENCES.md
 * (1 Msun ≈ 9.9 Gyr; 2 Msun ≈ 1.2 Gyr; 5 Msun ≈ 100 Myr; 15 Msun ≈ 11.5 Myr). Above
 * 30 Msun q exceeds the convective core: there it also absorbs the growth of L beyond the
 * mean-luminosity law, so that lifetimes flatten near 3 Myr as detailed models show (from memory).
 */
const BURN_MASS = [0.1, 0.3, 0.4, 0.6, 0.8, 1.0, 1.2, 1.6, 2.0, 3.0, 5.0, 7.0, 10, 15, 20, 30, 40, 60, 100, 150];
const BURN_FRACTION = [0.85, 0.8, 0.45, 0.275, 0.16, 0.145, 0.152, 0.172, 0.176, 0.172, 0.208, 0.226, 0.234, 0.283, 0.342, 0.45, 0.51, 0.622, 0.74, 0.845];
const burnFraction = knotCurve(BURN_MASS, BURN_FRACTION);

/** Nuclear time scale per unit mass: 0.007 c² M☉ / L☉ in yr (hydrogen burning releases 0.7 % of the rest mass). */
export const NUCLEAR_TIME_PER_X = (0.007 * 1.98841e30 * 299792458 ** 2) / 3.828e26 / (365.25 * 86400);

/**
 * Main-sequence lifetime, yr: the burned hydrogen divided by the mean luminosity,
 * t_MS = q(M) · X · 0.007 M c² / ⟨L⟩ (e.g. Kippenhahn, Weigert & Weiss 2012, §30.1, the
 * nuclear time scale), with ⟨L⟩ = L_ZAMS ⟨L/L_ZAMS⟩. Scales roughly as M^-2.5 for Sun-like
 * stars and flattens for massive stars as L ∝ M.
 *
 * @param mass initial mass, Msun
 * @param z metal fraction
 * @example msLifetime(1, 0.014) // ≈ 9.9e9
 */
export function msLifetime(mass: number, z: number): number {
  const { x } = composition(z);
  const meanL = 10 ** zamsLogL(mass, z) * msMeanLuminosityFactor(mass);
  return (burnFraction(mass) * x * NUCLEAR_TIME_PER_X * mass) / meanL;
}

/**
 * Helium-core mass at the end of the main sequence as a fraction of the initial mass:
 * ≈ 0.1 (Schönberg–Chandrasekhar) for low masses, rising with the convective core
 * (from memory of detailed models: ≈ 0.2 M at 15–20 Msun, ≈ 0.4 M at 100 Msun).
 */
const tamsCoreFraction = knotCurve([1.2, 2, 3, 5, 10, 20, 40, 100], [0.1, 0.11, 0.12, 0.14, 0.18, 0.24, 0.3, 0.4]);

/** Helium-core mass at TAMS, Msun. */
export function tamsCoreMass(mass: number): number {
  return tamsCoreFraction(mass) * mass;
}
