import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

let cached: { root: string; version: string } | undefined;

/**
 * The directory of starclock's package.json and its version, found by walking up
 * from this file — the same answer from the TypeScript sources (tests) and from the
 * compiled `dist/` (the binary).
 */
export function packageInfo(): { root: string; version: string } {
  if (cached !== undefined) return cached;
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const candidate = join(dir, 'package.json');
    if (existsSync(candidate)) {
      const pkg = JSON.parse(readFileSync(candidate, 'utf8')) as { name?: string; version?: string };
      if (pkg.name === 'starclock') {
        cached = { root: dir, version: pkg.version ?? '0.0.0' };
        return cached;
      }
    }
    const parent = dirname(dir);
    if (parent === dir) throw new Error('cannot find starclock package.json above ' + fileURLToPath(import.meta.url));
    dir = parent;
  }
}
