import type { Life } from '../model/life.js';
import type { StarState } from '../model/starState.js';
import { formatAge } from './formatAge.js';
import { formatStateValue } from './formatStateValue.js';
import { formatTable } from './formatTable.js';

/** The state columns shown at both ends of each phase and at each event. */
const KEY_COLUMNS = [
  { key: 'luminosity', title: 'L (Lsun)' },
  { key: 'teff', title: 'Teff (K)' },
  { key: 'radius', title: 'R (Rsun)' },
  { key: 'mass', title: 'mass (Msun)' },
  { key: 'spectralType', title: 'type' },
] as const satisfies readonly { key: keyof StarState; title: string }[];

function age(years: number): string {
  const { text, unit } = formatAge(years, 4);
  return `${text} ${unit}`;
}

function value(state: StarState, key: keyof StarState): string {
  return formatStateValue(key, state[key]).text;
}

/**
 * Writes a life (`lifeOf(track)`) as a human timeline: a one-line summary (birth
 * mass, z, main-sequence lifetime, remnant), a table with one row per phase —
 * start age, end age, duration, and luminosity, Teff, radius, mass and spectral
 * type at its start `→` its end — and a table of the key events with their ages
 * and states. Ages in yr/kyr/Myr/Gyr as in `formatAge`; other precisions as in
 * `formatStateValue`.
 *
 * @param life the timeline
 * @returns the text, lines ending in `\n`
 * @example formatLifeTimeline(lifeOf(generateTrack(1))) // 'Life of a 1 Msun star (z 0.014) …\n\nphase  start  end …'
 */
export function formatLifeTimeline(life: Life): string {
  const first = life.phases[0]?.start ?? life.events[0];
  const mass = formatStateValue('initialMass', life.initialMass).text;
  const z = formatStateValue('z', life.z).text;
  let summary = `Life of a ${mass} Msun star (z ${z})`;
  if (first !== undefined) {
    const lifetime = formatStateValue('msLifetime', first.msLifetime);
    const remnantMass = formatStateValue('remnantMass', first.remnantMass).text;
    summary += `: main-sequence lifetime ${lifetime.text} ${lifetime.unit}; ends as ${first.remnant} of ${remnantMass} Msun`;
  }
  const phaseRows = life.phases.map(({ phase, start, end }) => [
    phase,
    age(start.age),
    age(end.age),
    age(end.age - start.age),
    ...KEY_COLUMNS.map(({ key }) => `${value(start, key)} → ${value(end, key)}`),
  ]);
  const phases = formatTable(
    ['phase', 'start', 'end', 'duration', ...KEY_COLUMNS.map(({ title }) => `${title} start → end`)],
    phaseRows,
  );
  const eventRows = life.events.map((e) => [
    e.event,
    age(e.age),
    e.phase,
    ...KEY_COLUMNS.map(({ key }) => value(e, key)),
  ]);
  const events = formatTable(['event', 'age', 'phase', ...KEY_COLUMNS.map(({ title }) => title)], eventRows, [
    'left',
    'right',
    'left',
  ]);
  return `${summary}\n\nPhases\n${phases}\nEvents\n${events}`;
}
