import type { RemnantKind } from '../model/phases.js';

/**
 * Primary equivalent evolutionary points (EEPs), in life order. A track carries
 * the subset its star passes through; secondary EEPs are placed between them later
 * (Dotter 2016, ApJS 222, 8 — the EEP method).
 */
export const PRIMARY_EEPS = [
  'pms-start',
  'zams',
  'ms-mid',
  'tams',
  'rgb-base',
  'he-ignition',
  'cheb-start',
  'cheb-end',
  'first-thermal-pulse',
  'agb-end',
  'remnant-birth',
  'track-end',
] as const;

export type EepName = (typeof PRIMARY_EEPS)[number];

/** One primary EEP: its name and the index of the track point it sits on. */
export interface Eep {
  name: EepName;
  index: number;
}

/** Key moments of a star's life (the `life` timeline), in life order. */
export const LIFE_EVENTS = [
  'zams',
  'core-hydrogen-exhausted',
  'helium-flash',
  'helium-ignition',
  'first-thermal-pulse',
  'envelope-lost',
  'planetary-nebula',
  'supernova',
  'remnant-birth',
  'white-dwarf-10000K',
  'white-dwarf-6000K',
  'white-dwarf-4000K',
] as const;

export type LifeEventName = (typeof LIFE_EVENTS)[number];

export interface LifeEvent {
  event: LifeEventName;
  /** yr since birth */
  age: number;
}

/**
 * An evolution track: columns over age (yr), one entry per track point, with the
 * primary EEPs marked. Columns are `Float64Array`s of equal length `n`; `phase`
 * holds `PHASE_INDEX` codes. At a phase boundary two consecutive points share the
 * same age (the end of one phase and the start of the next), so a state that jumps
 * there (the helium flash, remnant birth) is represented exactly.
 */
export interface Track {
  initialMass: number;
  z: number;
  n: number;
  age: Float64Array;
  mass: Float64Array;
  coreMass: Float64Array;
  /** log10 L/Lsun */
  logL: Float64Array;
  /** log10 Teff/K */
  logTeff: Float64Array;
  phase: Uint8Array;
  eeps: Eep[];
  events: LifeEvent[];
  /** yr, main-sequence lifetime (ZAMS to TAMS) of this initial mass and z */
  msLifetime: number;
  remnant: RemnantKind;
  remnantMass: number;
}
