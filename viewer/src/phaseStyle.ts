import { PHASES, type Phase } from '../../lib/model/phases.js';

/** Categorical colours of the phases in the counts table and the history chart (not star colours). */
export const PHASE_COLORS: Readonly<Record<Phase, string>> = {
  'pre-main-sequence': '#9b8cff',
  'main-sequence': '#ffd27a',
  subgiant: '#ffb054',
  'red-giant-branch': '#ff7a45',
  'core-helium-burning': '#ff4f6d',
  'asymptotic-giant-branch': '#d0479c',
  'post-asymptotic-giant-branch': '#f0a0ff',
  'white-dwarf': '#9fd4ff',
  'neutron-star': '#5f8bff',
  'black-hole': '#a0a0a0',
  'brown-dwarf': '#a4674a',
};

/** Phases in life order, for tables and legends. */
export const PHASE_LIST: readonly Phase[] = PHASES;
