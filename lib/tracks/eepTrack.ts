import type { RemnantKind } from '../model/phases.js';
import type { Eep } from './track.js';

/**
 * A track resampled onto equivalent evolutionary points (EEPs, Dotter 2016, ApJS 222, 8):
 * point k of every track with the same `layout` is the same evolutionary stage, so tracks
 * of neighbouring masses can be interpolated point by point. Columns have length `n`.
 */
export interface EepTrack {
  initialMass: number;
  z: number;
  n: number;
  /** log10 age/yr */
  logAge: Float64Array;
  mass: Float64Array;
  coreMass: Float64Array;
  logL: Float64Array;
  logTeff: Float64Array;
  phase: Uint8Array;
  /** primary EEPs with their index in these columns */
  primary: Eep[];
  /**
   * Key of the EEP layout: tracks share it exactly when they pass through the same phases,
   * primary EEPs and kind of helium ignition and end as the same kind of remnant. Only
   * tracks of one layout are ever blended.
   */
  layout: string;
  msLifetime: number;
  remnant: RemnantKind;
  remnantMass: number;
}
