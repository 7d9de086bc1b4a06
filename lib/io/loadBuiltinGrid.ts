import { readFileSync } from 'node:fs';
import { deserializeGrid } from '../tracks/gridCache.js';
import type { Grid } from '../tracks/grid.js';
import { builtinGridPath } from './builtinGridPath.js';

let cached: Grid | undefined;

/**
 * The built-in grid (analytic model, 11 metallicities), read once from the cache that
 * `npm run build` writes — a file read and typed-array views, no computation.
 * @throws Error naming the missing file and how to make it
 */
export function loadBuiltinGrid(): Grid {
  if (cached) return cached;
  const path = builtinGridPath();
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch {
    throw new Error(`the built-in grid ${path.pathname} is missing: run \`npm run build\` (it generates it reproducibly from the model)`);
  }
  cached = deserializeGrid(bytes);
  return cached;
}
