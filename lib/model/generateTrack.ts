import { TrackBuilder } from './trackBuilder.js';
import { MASS_RANGE, Z_RANGE, SOLAR_Z, MAX_AGE } from './limits.js';
import { composition } from './composition.js';
import { knotCurve } from './knotCurve.js';
import { msLifetime, msLogLRise, msLogRRise, tamsCoreMass, zamsLogL, zamsLogR } from './mainSequence.js';
import {
  agbLuminosity, flashCoreMass, hayashiLogTeff, heliumFlashMass, HYDROGEN_BURN_RATE, rgbLuminosity,
  whiteDwarfUpperMass,
} from './giantBranch.js';
import { luminousBlueVariableRate, nieuwenhuijzenDeJagerRate, reimersRate, vassiliadisWoodRate, wolfRayetRate } from './massLoss.js';
import { CHANDRASEKHAR_MASS, mestelCoolingAge, mestelLuminosity, nauenbergRadius } from './whiteDwarf.js';
import { coreCollapseRemnant } from './coreCollapseRemnant.js';
import { brownDwarfCooling, brownDwarfRadius, HYDROGEN_BURNING_LIMIT } from './brownDwarf.js';
import { NEUTRON_STAR_RADIUS, neutronStarTeff, schwarzschildRadius } from './neutronStar.js';
import type { Track } from '../tracks/track.js';
import type { RemnantKind } from './phases.js';

const LOG_TEFF_SUN = Math.log10(5772);
/** log10 Teff from L (Lsun) and R (Rsun) by Stefan–Boltzmann with the IAU 2015 nominal Sun. */
const logTeffOf = (logL: number, logR: number) => LOG_TEFF_SUN + 0.25 * (logL - 2 * logR);
/** log10 R from L and Teff (Stefan–Boltzmann). */
const logROf = (logL: number, logTeff: number) => 0.5 * logL - 2 * (logTeff - LOG_TEFF_SUN);

/** Thermal (Kelvin–Helmholtz) time scale G M☉²/(R☉ L☉) in yr. */
const KELVIN_HELMHOLTZ_SUN = (1.3271244e20 * 1.98841e30) / (6.957e8 * 3.828e26) / (365.25 * 86400);

/*
 * Calibration curves of the later phases (all in initial mass, Msun).
 */
/** Pre-main-sequence duration in units of the ZAMS thermal time: ≈ 0.14 for fully convective contraction at constant Teff (n = 1.5 polytrope, Kippenhahn, Weigert & Weiss 2012 §28), ≈ 0.8 when a radiative core forms (gives ≈ 40 Myr for the Sun). */
const pmsFactor = knotCurve([0.3, 0.9], [0.143, 0.8]);
/** Onset of the Henyey (radiative) part of the pre-main sequence as a fraction of its duration (from memory of PMS tracks: ≈ 0.15–0.2 for the Sun; late for fully convective stars). */
const henyeyOnset = knotCurve([0.35, 0.6, 1.0, 3.0], [0.7, 0.3, 0.18, 0.1]);
/** Hertzsprung-gap (subgiant) duration over t_MS: ≈ 10 % for Sun-like stars, a thermal time scale (≈ 1 %) for massive stars (from memory). */
const gapFraction = knotCurve([1.0, 1.5, 2.5, 5, 15], [0.1, 0.06, 0.02, 0.008, 0.006]);
/** Core-helium-burning duration over t_MS for quiet ignition (He/H burning lifetime ratio, from memory: ≈ 0.2 at 2–5 Msun, ≈ 0.1 for massive stars). */
const heliumBurningFraction = knotCurve([2, 5, 15, 40], [0.22, 0.2, 0.12, 0.1]);
/** Blue-loop depth during core helium burning, as a fraction of the way from the Hayashi line to the ZAMS at solar Z (from memory of intermediate-mass tracks: loops for ≈ 4–12 Msun). */
const blueLoopDepth = knotCurve([2.5, 4, 6, 9, 12, 20, 25], [0, 0.45, 0.6, 0.6, 0.45, 0.15, 0]);
/**
 * Core mass at the first thermal pulse, Msun. Set so that the white-dwarf masses that emerge
 * from the TP-AGB core growth and Vassiliadis & Wood mass loss follow the initial–final mass
 * relation of Cummings et al. 2018 (ApJ 866, 21); the first-pulse core masses themselves
 * follow detailed AGB models (≈ 0.53 Msun at 1 Msun, ≈ 0.8 at 4 Msun; from memory).
 */
const firstPulseCoreMass = knotCurve([0.8, 1.0, 1.5, 2.0, 2.85, 3.6, 4.5, 6.0, 7.2, 8.5], [0.52, 0.545, 0.53, 0.53, 0.6, 0.78, 0.865, 0.975, 1.04, 1.12]);
/**
 * Third-dredge-up efficiency λ (mass dredged up per mass of core growth) on the TP-AGB;
 * net core growth is (1 − λ) of the burning rate. λ ≈ 0 at 1 Msun, rising to ≈ 0.9
 * at 5 Msun (Karakas, Lattanzio & Pols 2002, PASA 19, 515; from memory).
 */
const dredgeUpEfficiency = knotCurve([1.0, 1.5, 2.0, 3.0, 5], [0, 0.4, 0.6, 0.8, 0.9]);

/** Lowest envelope mass, Msun, at which a giant still counts as a giant: below it the envelope is lost. */
const ENVELOPE_FLOOR = 0.005;

/** Options of {@link generateTrack}. */
export interface GenerateTrackOptions {
  /** Keep the life beyond 100 Gyr (default false: cut at 100 Gyr). */
  fullLife?: boolean;
}

/** Age, yr, to which a remnant or brown dwarf born at `birth` is followed: 100 Gyr, or 1 Gyr past a later birth. */
function remnantEndAge(birth: number): number {
  return Math.max(MAX_AGE, birth + 1e9);
}

interface Ctx {
  b: TrackBuilder;
  m: number;
  z: number;
  zr: number;
  x: number;
  massive: boolean;
}

/**
 * Generates the evolution track of a star of initial mass `initialMass` (Msun) and metal
 * fraction `z` from the analytic model: pre-main sequence, main sequence, subgiant, giant
 * branches, helium burning, AGB, remnant formation and cooling, as columns over age with the
 * primary EEPs marked, cut at 100 Gyr. Every relation used is documented (with its published
 * source) in the module that defines it.
 *
 * @param initialMass Msun, 0.01–150
 * @param z metal mass fraction, 1e-4–0.03 (default 0.014)
 * @param options `fullLife: true` keeps the whole life even beyond 100 Gyr (the grid uses
 *   it, so that every track of a kind has the same EEPs); otherwise the track is cut at 100 Gyr.
 * @throws RangeError naming the argument, its value and the valid range
 * @example generateTrack(1).msLifetime // ≈ 9.9e9
 */
export function generateTrack(initialMass: number, z: number = SOLAR_Z, options: GenerateTrackOptions = {}): Track {
  if (!Number.isFinite(initialMass) || initialMass < MASS_RANGE.min || initialMass > MASS_RANGE.max) {
    throw new RangeError(`initialMass ${initialMass} outside the model's ${MASS_RANGE.min}–${MASS_RANGE.max} Msun`);
  }
  if (!Number.isFinite(z) || z < Z_RANGE.min || z > Z_RANGE.max) {
    throw new RangeError(`z ${z} outside the model's ${Z_RANGE.min}–${Z_RANGE.max}`);
  }
  const b = new TrackBuilder(initialMass, z, options.fullLife === true);
  if (initialMass < HYDROGEN_BURNING_LIMIT) return brownDwarfTrack(b, initialMass, z);

  const ctx: Ctx = { b, m: initialMass, z, zr: z / SOLAR_Z, x: composition(z).x, massive: initialMass > whiteDwarfUpperMass(z) };
  const tMS = msLifetime(initialMass, z);
  const tZams = preMainSequence(ctx);
  const tams = mainSequence(ctx, tZams, tMS);

  if (initialMass < 0.35) {
    // Fully convective red dwarfs burn almost all their hydrogen and end as helium white
    // dwarfs of about their own mass (Laughlin, Bodenheimer & Adams 1997, ApJ 482, 420),
    // long after 100 Gyr; the track ends on the main sequence.
    return b.build(tMS, 'white-dwarf', initialMass * 0.97);
  }
  subgiant(ctx, tams, tMS);
  if (ctx.massive) return massiveHeliumBurning(ctx, tMS);
  const lowMass = initialMass < heliumFlashMass(z);
  const envelopeKept = redGiantBranch(ctx, tMS, lowMass);
  if (!envelopeKept) return whiteDwarf(ctx, tMS);
  coreHeliumBurning(ctx, tMS, lowMass);
  asymptoticGiantBranch(ctx);
  postAgb(ctx);
  return whiteDwarf(ctx, tMS);
}

/**
 * Mass after losing mass at `rate` (Msun/yr) for `dt` yr, taking the rate proportional to
 * the mass over the step (M e^(−Ṁ dt/M)): never negative however long the step.
 */
function afterWind(M: number, rate: number, dt: number): number {
  return M * Math.exp((-rate * dt) / M);
}

/** Wind of the present state, Msun/yr, by the prescription of its mass class and phase. */
function windRate(ctx: Ctx, L: number, R: number, M: number, Mc: number, agbPulsing = false): number {
  if (ctx.massive) {
    const stripped = M - Mc < 0.02 * M;
    const base = nieuwenhuijzenDeJagerRate(L, R, M, ctx.zr) + luminousBlueVariableRate(L, R);
    return stripped ? Math.max(base, wolfRayetRate(L) * Math.sqrt(ctx.zr)) : base;
  }
  const reimers = reimersRate(L, R, M);
  return agbPulsing ? Math.max(reimers, vassiliadisWoodRate(L, R, M)) : reimers;
}

function brownDwarfTrack(b: TrackBuilder, m: number, z: number): Track {
  const zr = z / SOLAR_Z;
  const n = 60;
  for (let i = 0; i <= n; i++) {
    const age = 10 ** (5 + (6 * i) / n);
    const { luminosity } = brownDwarfCooling(age, m, zr);
    const logL = Math.log10(luminosity);
    b.push(age, m, 0, logL, logTeffOf(logL, Math.log10(brownDwarfRadius(age, m))), 'brown-dwarf');
    if (i === 0) b.mark('pms-start');
  }
  return b.build(0, 'brown-dwarf', m);
}

/**
 * Pre-main sequence: Kelvin–Helmholtz contraction onto the ZAMS. The radius contracts as
 * R = R_ZAMS [1 + k (t_PMS/t − 1)]^(1/3) (R ∝ t^(-1/3) early, the Hayashi-track solution of
 * virialised contraction at constant Teff), first at the Hayashi temperature
 * Teff ≈ 4300 K (M/Msun)^0.22 (from memory of PMS tracks), then heating at near-constant L
 * on the Henyey track to the ZAMS (Henyey, Lelevier & Levée 1955, PASP 67, 154). Duration
 * t_PMS = f(M) G M²/(R L) at the ZAMS. Returns the ZAMS age.
 */
function preMainSequence(ctx: Ctx): number {
  const { b, m, z } = ctx;
  const logLz = zamsLogL(m, z);
  const logRz = zamsLogR(m, z);
  const logTz = logTeffOf(logLz, logRz);
  const tPms = pmsFactor(m) * KELVIN_HELMHOLTZ_SUN * (m * m) / (10 ** logRz * 10 ** logLz);
  const logTh = Math.min(logTz, Math.log10(4300 * m ** 0.22));
  const sH = henyeyOnset(m);
  const k = 0.3;
  const n = 40;
  for (let i = 0; i <= n; i++) {
    const s = i === 0 ? 1e-3 : 10 ** (-3 + (3 * i) / n);
    const logR = logRz + Math.log10(1 + k * (1 / s - 1)) / 3;
    const u = Math.max(0, (s - sH) / (1 - sH));
    const w = u * u * (3 - 2 * u);
    const logT = logTh + (logTz - logTh) * w;
    const logL = 2 * logR + 4 * (logT - LOG_TEFF_SUN);
    b.push(s * tPms, m, 0, logL, logT, 'pre-main-sequence');
    if (i === 0) b.mark('pms-start');
  }
  return tPms;
}

/**
 * Main sequence: L and R rise from the ZAMS (mainSequence.ts); winds for massive stars,
 * which can strip a very massive star down to its hydrogen-burning core but not below it.
 * Returns the TAMS age.
 */
function mainSequence(ctx: Ctx, tZams: number, tMS: number): number {
  const { b, m, z } = ctx;
  const logLz = zamsLogL(m, z);
  const logRz = zamsLogR(m, z);
  const n = 48;
  let M = m;
  let prevAge = tZams;
  b.event('zams', tZams);
  for (let i = 0; i <= n; i++) {
    const tau = i / n;
    const age = tZams + tau * tMS;
    const logL = logLz + msLogLRise(m, tau);
    const logR = logRz + msLogRRise(m, tau);
    if (ctx.massive && i > 0) M = Math.max(afterWind(M, windRate(ctx, 10 ** logL, 10 ** logR, M, 0), age - prevAge), tamsCoreMass(m));
    prevAge = age;
    b.push(age, M, 0, logL, logTeffOf(logL, logR), 'main-sequence');
    if (i === 0) b.mark('zams');
    if (i === n / 2) b.mark('ms-mid');
  }
  b.mark('tams');
  b.event('core-hydrogen-exhausted', tZams + tMS);
  return tZams + tMS;
}

/** Target of the subgiant crossing: luminosity at the base of the giant branch, Lsun. */
function baseGiantLuminosity(ctx: Ctx, lTams: number): number {
  if (ctx.massive) return 1.1 * lTams;
  if (ctx.m >= heliumFlashMass(ctx.z)) return 1.3 * lTams;
  return Math.max(rgbLuminosity(1.15 * tamsCoreMass(ctx.m)), 1.5 * lTams);
}

/**
 * Subgiant branch / Hertzsprung gap: the star crosses from the TAMS to the giant branch on
 * a thermal time scale (a fraction of t_MS, `gapFraction`); L moves log-linearly to the
 * base-giant luminosity, log Teff to the Hayashi line there, and the helium core grows
 * from its TAMS mass to the base-giant value set by the core-mass–luminosity relation.
 */
function subgiant(ctx: Ctx, tams: number, tMS: number): void {
  const { b, m, z } = ctx;
  const p = b.last();
  const L0 = 10 ** p.logL;
  const L1 = baseGiantLuminosity(ctx, L0);
  const mc0 = tamsCoreMass(m);
  const lowMass = !ctx.massive && m < heliumFlashMass(z);
  const mc1 = lowMass ? Math.max(mc0 * 1.02, (L1 / 2.3e5) ** (1 / 6)) : mc0 * 1.05;
  const dur = gapFraction(m) * tMS;
  const n = 16;
  let M = p.mass;
  b.push(tams, M, mc0, p.logL, p.logTeff, 'subgiant');
  for (let i = 1; i <= n; i++) {
    const f = i / n;
    const logL = p.logL + f * Math.log10(L1 / L0);
    const logTend = ctx.massive && L1 > 10 ** 5.8 ? p.logTeff - 0.1 : hayashiLogTeff(L1, M, z);
    const ease = f * f * (3 - 2 * f);
    const logT = p.logTeff + ease * (logTend - p.logTeff);
    M = Math.max(afterWind(M, windRate(ctx, 10 ** logL, 10 ** logROf(logL, logT), M, mc0), dur / n), mc1);
    b.push(tams + f * dur, M, mc0 + f * (mc1 - mc0), logL, logT, 'subgiant');
  }
  b.mark('rgb-base');
}

/**
 * Red giant branch. Below the helium-flash mass the degenerate helium core grows by shell
 * hydrogen burning, dMc/dt = L/(X · 0.007 c²), with L(Mc) from the Refsdal & Weigert
 * relation, integrated with RK4 in Mc up to the flash core mass (Sweigart & Gross 1978);
 * Teff on the Hayashi line; Reimers mass loss. If the envelope is lost first, the star
 * leaves the giant branch as a helium white dwarf (returns false). Above the flash mass the
 * branch is short: L rises to twice the TAMS value over 1 % of t_MS with quiet ignition.
 */
function redGiantBranch(ctx: Ctx, tMS: number, lowMass: boolean): boolean {
  const { b, z, x } = ctx;
  const p = b.last();
  let M = p.mass;
  let mc = p.coreMass;
  let age = p.age;
  b.push(age, M, mc, p.logL, p.logTeff, 'red-giant-branch');
  if (lowMass) {
    const mcTip = flashCoreMass(ctx.m, z);
    const n = 80;
    const step = (mcTip - mc) / n;
    // dt/dMc and dM/dMc; RK4 in Mc
    const derivs = (mcv: number, Mv: number) => {
      const L = rgbLuminosity(mcv);
      const dtdmc = x / (HYDROGEN_BURN_RATE * L);
      const logT = hayashiLogTeff(L, Mv, z);
      const R = 10 ** logROf(Math.log10(L), logT);
      return { dtdmc, dMdmc: -windRate(ctx, L, R, Mv, mcv) * dtdmc };
    };
    for (let i = 1; i <= n; i++) {
      const k1 = derivs(mc, M);
      const k2 = derivs(mc + step / 2, M + (step / 2) * k1.dMdmc);
      const k3 = derivs(mc + step / 2, M + (step / 2) * k2.dMdmc);
      const k4 = derivs(mc + step, M + step * k3.dMdmc);
      age += (step / 6) * (k1.dtdmc + 2 * k2.dtdmc + 2 * k3.dtdmc + k4.dtdmc);
      M += (step / 6) * (k1.dMdmc + 2 * k2.dMdmc + 2 * k3.dMdmc + k4.dMdmc);
      mc += step;
      if (M - mc < ENVELOPE_FLOOR) {
        M = mc + ENVELOPE_FLOOR;
        const L = rgbLuminosity(mc);
        b.push(age, M, mc, Math.log10(L), hayashiLogTeff(L, M, z), 'red-giant-branch');
        b.event('envelope-lost', age);
        return false;
      }
      const L = rgbLuminosity(mc);
      b.push(age, M, mc, Math.log10(L), hayashiLogTeff(L, M, z), 'red-giant-branch');
    }
    b.mark('he-ignition');
    b.event('helium-flash', age);
    return true;
  }
  const L0 = 10 ** p.logL;
  const L1 = 2 * L0 / 1.3;
  const dur = 0.01 * tMS;
  const n = 16;
  for (let i = 1; i <= n; i++) {
    const f = i / n;
    const L = L0 * (L1 / L0) ** f;
    const dt = dur / n;
    const logT = hayashiLogTeff(L, M, z);
    M = afterWind(M, windRate(ctx, L, 10 ** logROf(Math.log10(L), logT), M, mc), dt);
    mc += (HYDROGEN_BURN_RATE * L * dt) / x;
    age += dt;
    b.push(age, M, mc, Math.log10(L), logT, 'red-giant-branch');
  }
  b.mark('he-ignition');
  b.event('helium-ignition', age);
  return true;
}

/**
 * Teff during core helium burning of low- and intermediate-mass stars. Low mass: the
 * horizontal branch / red clump, whose colour is set by the envelope mass left after the
 * red giant branch (less envelope → bluer; the effect is stronger at low Z, where even
 * 0.1–0.2 Msun envelopes sit on the blue HB — the trend of Dorman, Rood & O'Connell 1993,
 * ApJ 419, 596; scale from memory). Intermediate mass: a blue loop toward the ZAMS
 * temperature in mid-burning (deeper at low Z).
 */
function heliumBurningLogTeff(ctx: Ctx, L: number, M: number, mc: number, f: number, lowMass: boolean): number {
  const { z, zr } = ctx;
  const zeta = Math.log10(zr);
  if (lowMass) {
    const logRed = Math.min(3.72, 3.68 - 0.03 * zeta);
    const scale = 0.05 * zr ** -0.3;
    const blue = Math.exp(-Math.max(0, M - mc) / scale);
    return logRed + blue * (4.3 - logRed);
  }
  const logH = hayashiLogTeff(L, M, z);
  const logZams = logTeffOf(zamsLogL(ctx.m, z), zamsLogR(ctx.m, z));
  const depth = Math.min(0.9, blueLoopDepth(ctx.m) * (1 + 0.3 * Math.max(0, -zeta)));
  const bump = f < 0.2 || f > 0.8 ? 0 : Math.sin((Math.PI * (f - 0.2)) / 0.6) ** 2;
  return logH + depth * bump * (logZams - 0.05 - logH);
}

/**
 * Core helium burning. After the flash: the zero-age horizontal branch / red clump at
 * ≈ 45 Lsun, brightening to ≈ 80 Lsun over ≈ 100 Myr (the helium-burning life of a
 * 0.48 Msun core; e.g. Salaris & Cassisi 2005, "Evolution of Stars and Stellar
 * Populations", §5; from memory). After quiet ignition: L from 0.8 to 1.2 times the
 * ignition luminosity over `heliumBurningFraction` of t_MS. The helium core grows by the
 * hydrogen shell, taken to supply 40 % of L.
 */
function coreHeliumBurning(ctx: Ctx, tMS: number, lowMass: boolean): void {
  const { b, x } = ctx;
  const p = b.last();
  let M = p.mass;
  let mc = p.coreMass;
  let age = p.age;
  const L0 = lowMass ? 45 * (mc / 0.48) ** 2 : 0.8 * 10 ** p.logL;
  const L1 = lowMass ? 1.8 * L0 : 1.5 * L0;
  const dur = lowMass ? 1.0e8 * (0.48 / mc) ** 2 : heliumBurningFraction(ctx.m) * tMS;
  const n = 40;
  for (let i = 0; i <= n; i++) {
    const f = i / n;
    const L = L0 * (L1 / L0) ** f;
    const dt = i === 0 ? 0 : dur / n;
    const logT0 = heliumBurningLogTeff(ctx, L, M, mc, f, lowMass);
    M = afterWind(M, windRate(ctx, L, 10 ** logROf(Math.log10(L), logT0), M, mc), dt);
    mc += (0.4 * HYDROGEN_BURN_RATE * L * dt) / x;
    age += dt;
    b.push(age, M, mc, Math.log10(L), heliumBurningLogTeff(ctx, L, M, mc, f, lowMass), 'core-helium-burning');
    if (i === 0) b.mark('cheb-start');
  }
  b.mark('cheb-end');
}

/**
 * Asymptotic giant branch. Early AGB: the hydrogen-free core grows (dMc/dt = L/(X·0.007c²))
 * while L rises log-linearly in Mc to the Paczyński luminosity at the first thermal pulse.
 * Thermally pulsing AGB: L = 59250 (Mc − 0.522) Lsun (Paczyński 1970), core growth as above,
 * mass loss max(Reimers, Vassiliadis & Wood 1993 with superwind), until the envelope is
 * gone. Teff on the Hayashi line. The core never exceeds the Chandrasekhar mass.
 */
function asymptoticGiantBranch(ctx: Ctx): void {
  const { b, z, x } = ctx;
  const p = b.last();
  let M = p.mass;
  let mc = p.coreMass;
  let age = p.age;
  const mcPulse = Math.min(firstPulseCoreMass(ctx.m), 1.35);
  // Second dredge-up (Becker & Iben 1979, ApJ 232, 831): in stars whose helium core has
  // outgrown the first-pulse core mass, the convective envelope reaches down and mixes the
  // outer core away, leaving the hydrogen-free core at the first-pulse value.
  if (mc > mcPulse - 0.005) {
    mc = mcPulse - 0.005;
  }
  const mc1 = Math.max(mc + 0.005, mcPulse);
  const L0 = 10 ** p.logL;
  const L1 = agbLuminosity(mc1);
  const mc0 = mc;
  b.push(age, M, mc, p.logL, hayashiLogTeff(L0, M, z), 'asymptotic-giant-branch');
  const nE = 30;
  const stepE = (mc1 - mc0) / nE;
  let pulsed = false;
  for (let i = 1; i <= nE; i++) {
    const mid = mc + stepE / 2;
    const L = L0 * (L1 / L0) ** ((mid - mc0) / (mc1 - mc0));
    const dt = (x * stepE) / (HYDROGEN_BURN_RATE * L);
    const logT = hayashiLogTeff(L, M, z);
    M = afterWind(M, windRate(ctx, L, 10 ** logROf(Math.log10(L), logT), M, mc), dt);
    mc += stepE;
    age += dt;
    const Lc = L0 * (L1 / L0) ** ((mc - mc0) / (mc1 - mc0));
    if (M - mc < ENVELOPE_FLOOR) break;
    b.push(age, M, mc, Math.log10(Lc), hayashiLogTeff(Lc, M, z), 'asymptotic-giant-branch');
    if (i === nE) pulsed = true;
  }
  if (pulsed) {
    b.mark('first-thermal-pulse');
    b.event('first-thermal-pulse', age);
    const stepT = 0.001;
    const lambda = dredgeUpEfficiency(ctx.m);
    for (let i = 0; i < 2000 && M - mc >= ENVELOPE_FLOOR && mc < CHANDRASEKHAR_MASS - 0.02; i++) {
      const L = agbLuminosity(mc + stepT / 2);
      const dt = (x * stepT) / (HYDROGEN_BURN_RATE * L);
      const logT = hayashiLogTeff(L, M, z);
      const R = 10 ** logROf(Math.log10(L), logT);
      const dt1 = dt / (1 - lambda); // burning time for a net core growth of stepT
      let dM = windRate(ctx, L, R, M, mc, true) * dt1;
      let dmc = stepT;
      if (M - dM - (mc + dmc) < ENVELOPE_FLOOR) {
        // last step: shorten so the envelope ends at the floor
        const grow = ((1 - lambda) * HYDROGEN_BURN_RATE * L) / x;
        const rate = dM / dt1 + grow;
        const dtEnd = Math.max(0, (M - mc - ENVELOPE_FLOOR) / rate);
        dM = (dM / dt1) * dtEnd;
        dmc = grow * dtEnd;
        age += dtEnd;
        M -= dM;
        mc += dmc;
        const Lf = agbLuminosity(mc);
        b.push(age, M, mc, Math.log10(Lf), hayashiLogTeff(Lf, M, z), 'asymptotic-giant-branch');
        break;
      }
      M -= dM;
      mc += dmc;
      age += dt1;
      const Lc = agbLuminosity(mc);
      if (i % 5 === 4) b.push(age, M, mc, Math.log10(Lc), hayashiLogTeff(Lc, M, z), 'asymptotic-giant-branch');
    }
    const q = b.last();
    if (q.age < age) b.push(age, M, mc, Math.log10(agbLuminosity(mc)), hayashiLogTeff(agbLuminosity(mc), M, z), 'asymptotic-giant-branch');
  } else {
    // no pulse before the envelope was gone: the first-pulse EEP sits on the last AGB point
    b.mark('first-thermal-pulse');
  }
  b.mark('agb-end');
  b.event('envelope-lost', b.last().age);
}

/**
 * Post-AGB: with the envelope gone the star leaves the AGB at constant luminosity, its
 * radius shrinking to the white-dwarf radius; the crossing time falls steeply with core mass,
 * ≈ 10⁴ yr (Mc/0.6 Msun)^-8 (the trend of Blöcker 1995, A&A 299, 755; from memory). The
 * ejected envelope is the planetary nebula.
 */
function postAgb(ctx: Ctx): void {
  const { b } = ctx;
  const p = b.last();
  const mc = Math.min(p.coreMass, CHANDRASEKHAR_MASS - 0.02);
  const logRwd = Math.log10(nauenbergRadius(mc));
  const logR0 = logROf(p.logL, p.logTeff);
  const dur = Math.min(1e5, Math.max(50, 1e4 * (mc / 0.6) ** -8));
  const n = 20;
  b.event('planetary-nebula', p.age);
  for (let i = 0; i <= n; i++) {
    const f = i / n;
    const logR = logR0 + (logRwd - logR0) * f;
    b.push(p.age + f * dur, mc, mc, p.logL, logTeffOf(p.logL, logR), 'post-asymptotic-giant-branch');
  }
}

/**
 * White dwarf: Nauenberg 1972 radius and Mestel 1952 cooling, the cooling clock offset so that
 * the white dwarf is born with the luminosity the star had when its envelope was lost.
 */
function whiteDwarf(ctx: Ctx, tMS: number): Track {
  const { b } = ctx;
  const p = b.last();
  const mwd = Math.min(p.coreMass, CHANDRASEKHAR_MASS - 0.02);
  const logR = Math.log10(nauenbergRadius(mwd));
  const tc0 = mestelCoolingAge(10 ** p.logL, mwd);
  const birth = p.age;
  b.event('remnant-birth', birth);
  const span = remnantEndAge(birth) - birth + tc0;
  const n = 60;
  for (let i = 0; i <= n; i++) {
    const tc = tc0 * (span / tc0) ** (i / n);
    const logL = Math.log10(mestelLuminosity(tc, mwd));
    b.push(birth + tc - tc0, mwd, mwd, logL, logTeffOf(logL, logR), 'white-dwarf');
    if (i === 0) b.mark('remnant-birth');
  }
  const rwd = 10 ** logR;
  for (const [ev, T] of [['white-dwarf-10000K', 1e4], ['white-dwarf-6000K', 6e3], ['white-dwarf-4000K', 4e3]] as const) {
    const L = rwd * rwd * (T / 5772) ** 4;
    const tc = mestelCoolingAge(L, mwd);
    if (tc > tc0) b.event(ev, birth + tc - tc0);
  }
  return b.build(tMS, 'white-dwarf', mwd);
}

/**
 * Helium burning and the end of a massive star. L rises from 1.1 to 1.6 times the TAMS
 * value; Teff on the Hayashi line (red supergiant) below the Humphreys–Davidson limit
 * (log L = 5.8), blue above it, with blue loops for 8–25 Msun; a star whose winds strip its
 * hydrogen envelope becomes a hot helium (Wolf–Rayet) star, Teff → 10^4.9 K. Carbon and later
 * burning stages (< 1 % of the life) are folded into the end of this phase. The CO core at
 * collapse is 0.65 of the helium core (from memory of pre-supernova models); the remnant
 * follows Fryer et al. 2012.
 */
function massiveHeliumBurning(ctx: Ctx, tMS: number): Track {
  const { b, z, x, m } = ctx;
  const p = b.last();
  let M = p.mass;
  let mc = p.coreMass;
  let age = p.age;
  const L0 = 10 ** p.logL;
  const dur = heliumBurningFraction(m) * tMS;
  const logTblue = p.logTeff;
  const n = 50;
  const depth = blueLoopDepth(m) * (1 + 0.3 * Math.max(0, -Math.log10(ctx.zr)));
  const logZams = logTeffOf(zamsLogL(m, z), zamsLogR(m, z));
  const coFloor = 0.65 * mc;
  const teffAt = (L: number, Mv: number, mcv: number, f: number) => {
    const envFrac = Math.max(0, Mv - mcv) / Mv;
    let logGiant = L > 10 ** 5.8 ? logTblue : hayashiLogTeff(L, Mv, z);
    if (L <= 10 ** 5.8) {
      const bump = f < 0.2 || f > 0.8 ? 0 : Math.sin((Math.PI * (f - 0.2)) / 0.6) ** 2;
      logGiant += Math.min(0.9, depth) * bump * (logZams - 0.05 - logGiant);
    }
    const s = Math.min(1, envFrac / 0.1);
    return 4.9 + (logGiant - 4.9) * s;
  };
  // A star stripped to its helium core shines as a helium star of its present mass:
  // log L ≈ 2.3 + 2.7 log M (helium main sequence of detailed models; from memory),
  // blended in as the envelope fraction falls below 10 %.
  const luminosityAt = (f: number, Mv: number, mcv: number) => {
    const Lgiant = L0 * 1.1 * (1.6 / 1.1) ** f;
    const s = Math.min(1, Math.max(0, Mv - mcv) / Mv / 0.1);
    const Lhe = Math.min(Lgiant, 10 ** (2.3 + 2.7 * Math.log10(Mv)));
    return Lgiant ** s * Lhe ** (1 - s);
  };
  for (let i = 0; i <= n; i++) {
    const f = i / n;
    const L = luminosityAt(f, M, mc);
    const dt = i === 0 ? 0 : dur / n;
    const logT = teffAt(L, M, mc, f);
    M = afterWind(M, windRate(ctx, L, 10 ** logROf(Math.log10(L), logT), M, mc), dt);
    // winds may strip the star down to its carbon–oxygen core, never below it
    M = Math.max(M, coFloor);
    mc = Math.min(M, mc + (0.3 * HYDROGEN_BURN_RATE * L * dt) / x);
    age += dt;
    const Lnow = luminosityAt(f, M, mc);
    b.push(age, M, mc, Math.log10(Lnow), teffAt(Lnow, M, mc, f), 'core-helium-burning');
    if (i === 0) {
      b.mark('he-ignition');
      b.event('helium-ignition', age);
      b.mark('cheb-start');
    }
  }
  b.mark('cheb-end');
  b.event('supernova', age);
  const rem = coreCollapseRemnant(0.65 * mc, M);
  b.event('remnant-birth', age);
  compactRemnant(b, rem.remnant, rem.mass, age);
  return b.build(tMS, rem.remnant, rem.mass);
}

/** Neutron-star cooling or a black hole, from `birth` to 100 Gyr. */
function compactRemnant(b: TrackBuilder, kind: RemnantKind, mass: number, birth: number): void {
  const n = 40;
  for (let i = 0; i <= n; i++) {
    const tc = i === 0 ? 0 : 10 ** (1 + (Math.log10(remnantEndAge(birth) - birth) - 1) * (i / n));
    if (kind === 'neutron-star') {
      const logT = Math.log10(neutronStarTeff(tc));
      const logL = 2 * Math.log10(NEUTRON_STAR_RADIUS) + 4 * (logT - LOG_TEFF_SUN);
      b.push(birth + tc, mass, mass, logL, logT, 'neutron-star');
    } else {
      // A black hole emits nothing; the columns hold its Schwarzschild radius as logL = 2 log R
      // at Teff = Teff☉ so that R derived from them is the horizon (starAt reports L = 0, Teff = 0).
      const logR = Math.log10(schwarzschildRadius(mass));
      b.push(birth + tc, mass, mass, 2 * logR, LOG_TEFF_SUN, 'black-hole');
    }
    if (i === 0) b.mark('remnant-birth');
  }
}
