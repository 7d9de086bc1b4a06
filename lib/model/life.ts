import type { Phase } from './phases.js';
import type { StarState } from './starState.js';
import type { LifeEventName } from '../tracks/track.js';

/** One phase of a life: the full state at its start and at its end. */
export interface LifePhase {
  phase: Phase;
  start: StarState;
  end: StarState;
}

/** One key event of a life with the full state at that moment. */
export type LifeEventState = { event: LifeEventName } & StarState;

/** A star's whole life as a timeline (the `life` command's JSON). */
export interface Life {
  initialMass: number;
  z: number;
  phases: LifePhase[];
  events: LifeEventState[];
}
