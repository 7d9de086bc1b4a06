import { BUILTIN_Z, builtinGridTracks } from './builtinGridTracks.js';
import { buildGrid, type Grid } from './grid.js';
import type { EepTrack } from './eepTrack.js';

/**
 * Builds the built-in grid from the analytic model: every metallicity of BUILTIN_Z, every
 * mass of builtinGridMasses plus the layout-boundary pairs, resampled onto EEPs. Pure and
 * deterministic: the same code gives the same bytes on any machine. Takes a few seconds;
 * `npm run build` runs it once and caches the result.
 */
export function buildBuiltinGrid(zs: readonly number[] = BUILTIN_Z): Grid {
  const tracks: EepTrack[] = [];
  for (const z of zs) tracks.push(...builtinGridTracks(z));
  return buildGrid(tracks, 'built-in');
}
