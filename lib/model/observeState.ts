import { PHASES, type Phase, type RemnantKind } from './phases.js';
import type { StarState } from './starState.js';
import { observe } from '../physics/observe.js';
import { schwarzschildRadius } from './neutronStar.js';

const LOG_TEFF_SUN = Math.log10(5772);

/**
 * Assembles the full star state from model columns at one age: radius by Stefan–Boltzmann
 * (IAU 2015 nominal Sun), then the observables (lib/physics/observe). A black hole reports
 * L = 0, Teff = 0 and its Schwarzschild radius.
 *
 * @param initialMass Msun
 * @param z metal fraction
 * @param age yr
 * @param phaseCode index into PHASES
 * @param mass present mass, Msun
 * @param coreMass Msun (clipped to `mass`)
 * @param logL log10 L/Lsun
 * @param logTeff log10 Teff/K
 * @param msLifetime yr
 * @param remnant what the star ends (or ended) as
 * @param remnantMass Msun
 */
export function observeState(
  initialMass: number, z: number, age: number, phaseCode: number, mass: number, coreMass: number,
  logL: number, logTeff: number, msLifetime: number, remnant: RemnantKind, remnantMass: number,
): StarState {
  const phase: Phase = PHASES[phaseCode];
  let luminosity: number;
  let teff: number;
  let radius: number;
  if (phase === 'black-hole') {
    luminosity = 0;
    teff = 0;
    radius = schwarzschildRadius(mass);
  } else {
    luminosity = 10 ** logL;
    teff = 10 ** logTeff;
    radius = 10 ** (0.5 * logL - 2 * (logTeff - LOG_TEFF_SUN));
  }
  const kind = phase === 'black-hole' || phase === 'neutron-star' || phase === 'white-dwarf' || phase === 'brown-dwarf' ? phase : 'star';
  const obs = observe(kind, luminosity, teff, radius, mass);
  return {
    initialMass, z, age, phase, mass,
    coreMass: Math.min(coreMass, mass),
    luminosity, teff, radius,
    logg: obs.logg, spectralType: obs.spectralType, bv: obs.bv, mbol: obs.mbol, mv: obs.mv, color: obs.color,
    msLifetime, remnant, remnantMass,
  };
}
