import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { BIN, lines, ROOT, runBin, runMain } from './cli-run.js';

const version = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string }).version;

describe('starclock (the program)', () => {
  test('--help lists the commands and exits 0', () => {
    const { code, stdout, stderr } = runBin(['--help']);
    expect(code).toBe(0);
    expect(stderr).toBe('');
    expect(stdout).toContain('Usage: starclock');
    for (const command of ['star', 'life', 'demo']) expect(stdout).toMatch(new RegExp(`^\\s+${command}\\b`, 'm'));
  });

  test('--version prints the package version', () => {
    const { code, stdout } = runBin(['--version']);
    expect(code).toBe(0);
    expect(stdout.trim()).toBe(version);
  });

  test('no command prints the help on stderr and exits 2', async () => {
    const { code, stdout, stderr } = await runMain([]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(stderr).toContain('Usage: starclock');
  });

  test('an unknown command exits 2 with one line naming it', async () => {
    const { code, stderr } = await runMain(['stars']);
    expect(code).toBe(2);
    expect(lines(stderr)).toHaveLength(1);
    expect(stderr).toContain("'stars'");
  });

  test('main() can run twice in one process (a fresh program each call)', async () => {
    const a = await runMain(['star', '--mass', '1', '--age', '1', '--json']);
    const b = await runMain(['star', '--mass', '1', '--age', '1', '--json']);
    expect(a.code).toBe(0);
    expect(b).toEqual(a);
  });

  test('a reader that closes the pipe early (| true) ends the run quietly with exit 0', () => {
    const script = `"${process.execPath}" "${BIN}" life --mass 1 | true; echo "status \${PIPESTATUS[0]}" >&2`;
    const result = spawnSync('bash', ['-c', script], { encoding: 'utf8', timeout: 60000 });
    expect(result.stderr).toBe('status 0\n');
  });
});
