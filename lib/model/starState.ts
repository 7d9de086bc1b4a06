import type { Phase, RemnantKind } from './phases.js';

/**
 * The present state of one star: the project's one schema, used for JSON keys,
 * CSV headers, library fields and viewer fields alike (DESIGN.md, "The star state").
 *
 * Units: masses in Msun, age and lifetimes in yr, luminosity in Lsun, teff in K,
 * radius in Rsun, logg in dex (cgs), magnitudes in mag.
 * Keys that do not apply are `null` (a black hole has no colour or spectral type).
 * While the star lives, `remnant`/`remnantMass` say what it will become.
 */
export interface StarState {
  initialMass: number;
  z: number;
  age: number;
  phase: Phase;
  mass: number;
  coreMass: number;
  luminosity: number;
  teff: number;
  radius: number;
  logg: number;
  spectralType: string | null;
  bv: number | null;
  mbol: number | null;
  mv: number | null;
  color: string | null;
  msLifetime: number;
  remnant: RemnantKind;
  remnantMass: number;
}

/** The schema's keys in their documented order (CSV column order). */
export const STATE_KEYS = [
  'initialMass', 'z', 'age', 'phase', 'mass', 'coreMass', 'luminosity', 'teff', 'radius',
  'logg', 'spectralType', 'bv', 'mbol', 'mv', 'color', 'msLifetime', 'remnant', 'remnantMass',
] as const satisfies readonly (keyof StarState)[];

/** Units of each key, for human tables and headers. */
export const STATE_UNITS: Readonly<Record<keyof StarState, string>> = {
  initialMass: 'Msun', z: '', age: 'yr', phase: '', mass: 'Msun', coreMass: 'Msun',
  luminosity: 'Lsun', teff: 'K', radius: 'Rsun', logg: 'dex cgs', spectralType: '',
  bv: 'mag', mbol: 'mag', mv: 'mag', color: 'sRGB', msLifetime: 'yr', remnant: '',
  remnantMass: 'Msun',
};
