// Build step (npm run build): generate the built-in grid from the model and cache it in dist/grid/.
import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname } from 'node:path';
import { buildBuiltinGrid } from '../lib/tracks/buildBuiltinGrid.js';
import { serializeGrid } from '../lib/tracks/gridCache.js';
import { builtinGridPath } from '../lib/io/builtinGridPath.js';

const t0 = performance.now();
const bytes = serializeGrid(buildBuiltinGrid());
const file = fileURLToPath(builtinGridPath());
mkdirSync(dirname(file), { recursive: true });
writeFileSync(file + '.tmp', bytes);
renameSync(file + '.tmp', file);
process.stderr.write(`built-in grid: ${(bytes.length / 1e6).toFixed(1)} MB in ${((performance.now() - t0) / 1000).toFixed(1)} s → ${file}\n`);
