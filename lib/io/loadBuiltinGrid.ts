import { openSync, readSync } from 'node:fs';
import { openGridCache } from '../tracks/gridCache.js';
import type { Grid } from '../tracks/grid.js';
import { builtinGridPath } from './builtinGridPath.js';

let cached: Grid | undefined;

/**
 * The built-in grid (analytic model, 11 metallicities), opened once from the cache that
 * `npm run build` writes: the header and the slabs' track masses are read now, each run of
 * tracks on its first use (openGridCache), through a file descriptor kept open for the life of
 * the process — so a rebuilt cache (written to a temporary file and renamed) never mixes with
 * the one already open.
 * @throws Error naming the missing file and how to make it
 */
export function loadBuiltinGrid(): Grid {
  if (cached) return cached;
  const path = builtinGridPath();
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch {
    throw new Error(`the built-in grid ${path.pathname} is missing: run \`npm run build\` (it generates it reproducibly from the model)`);
  }
  cached = openGridCache((position, length) => {
    const bytes = new Uint8Array(length);
    let got = 0;
    while (got < length) {
      const n = readSync(fd, bytes, got, length - got, position + got);
      if (n === 0) throw new Error(`the built-in grid ${path.pathname} is truncated: run \`npm run build\``);
      got += n;
    }
    return bytes;
  });
  return cached;
}
