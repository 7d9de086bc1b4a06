/**
 * The evolutionary phases of the star-state schema, in life order.
 *
 * The order is the order a single star passes through them; a star skips phases
 * (a brown dwarf never leaves `brown-dwarf`, a 20 Msun star has no AGB) but never
 * goes back. `PHASE_INDEX` gives each phase its position, which is also the code
 * stored in columnar tracks (`Uint8Array`).
 */
export const PHASES = [
  'pre-main-sequence',
  'main-sequence',
  'subgiant',
  'red-giant-branch',
  'core-helium-burning',
  'asymptotic-giant-branch',
  'post-asymptotic-giant-branch',
  'white-dwarf',
  'neutron-star',
  'black-hole',
  'brown-dwarf',
] as const;

export type Phase = (typeof PHASES)[number];

/** Remnant kinds a star can end as. */
export type RemnantKind = 'white-dwarf' | 'neutron-star' | 'black-hole' | 'brown-dwarf';

/** Position of each phase in life order. */
export const PHASE_INDEX: Readonly<Record<Phase, number>> = Object.freeze(
  Object.fromEntries(PHASES.map((p, i) => [p, i])) as Record<Phase, number>,
);

/** True for phases in which the star is a compact remnant (no nuclear burning). */
export function isRemnantPhase(phase: Phase): boolean {
  return phase === 'white-dwarf' || phase === 'neutron-star' || phase === 'black-hole';
}
