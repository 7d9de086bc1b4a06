// Helpers for the CLI tests: run the real binary, or main() in-process with captured output.
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import { main } from '../cli/main.js';
import { PHASES } from '../lib/model/phases.js';
import { STATE_KEYS } from '../lib/model/starState.js';

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
export const BIN = join(ROOT, 'bin', 'starclock.js');

export interface RunResult {
  code: number;
  stdout: string;
  stderr: string;
}

/** Spawns `node bin/starclock.js ...args` (needs `npm run build`; `npm test` builds first). */
export function runBin(args: readonly string[], cwd = ROOT): RunResult {
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd, encoding: 'utf8', timeout: 60000 });
  if (result.error) throw result.error;
  return { code: result.status ?? -1, stdout: result.stdout, stderr: result.stderr };
}

/** Calls `main(args)` in this process with stdout and stderr captured. */
export async function runMain(args: readonly string[]): Promise<RunResult> {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { out: (t) => void (stdout += t), err: (t) => void (stderr += t) });
  return { code, stdout, stderr };
}

/** The non-empty lines of a text. */
export function lines(text: string): string[] {
  return text.split('\n').filter((line) => line.length > 0);
}

const REMNANTS = ['white-dwarf', 'neutron-star', 'black-hole', 'brown-dwarf'];
// Keys the schema lets be null where they do not apply (lib/model/starState.ts).
const NULLABLE = new Set(['spectralType', 'bv', 'mbol', 'mv', 'color']);
const STRING_KEYS = new Set(['phase', 'spectralType', 'color', 'remnant']);

/** Checks one parsed state against the schema: every key, in order, of the right type. */
export function expectStateSchema(state: Record<string, unknown>): void {
  expect(Object.keys(state)).toEqual([...STATE_KEYS]);
  for (const key of STATE_KEYS) {
    const value = state[key];
    if (value === null) {
      expect(NULLABLE.has(key), `${key} is null`).toBe(true);
      continue;
    }
    if (STRING_KEYS.has(key)) {
      expect(typeof value, key).toBe('string');
    } else {
      expect(typeof value, key).toBe('number');
      expect(Number.isFinite(value), `${key} ${value}`).toBe(true);
    }
  }
  expect(PHASES).toContain(state.phase);
  expect(REMNANTS).toContain(state.remnant);
  if (state.color !== null) expect(state.color).toMatch(/^#[0-9a-f]{6}$/);
  for (const key of ['mass', 'coreMass', 'luminosity', 'teff', 'radius', 'msLifetime', 'remnantMass']) {
    expect(state[key] as number, key).toBeGreaterThanOrEqual(0);
  }
  expect(state.mass as number).toBeLessThanOrEqual((state.initialMass as number) * (1 + 1e-12));
}

