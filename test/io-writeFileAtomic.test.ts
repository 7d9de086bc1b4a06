import { mkdirSync, mkdtempSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { writeFileAtomic } from '../lib/io/writeFileAtomic.js';

const fresh = (): string => mkdtempSync(join(tmpdir(), 'starclock-atomic-'));

describe('writeFileAtomic(path, data, inputs)', () => {
  test('writes the whole content and leaves no temporary file', async () => {
    const dir = fresh();
    await writeFileAtomic(join(dir, 'a.csv'), 'x,y\n1,2\n');
    expect(readFileSync(join(dir, 'a.csv'), 'utf8')).toBe('x,y\n1,2\n');
    expect(readdirSync(dir)).toEqual(['a.csv']);
  });

  test('replaces an existing output', async () => {
    const dir = fresh();
    writeFileSync(join(dir, 'a.csv'), 'old');
    await writeFileAtomic(join(dir, 'a.csv'), 'new');
    expect(readFileSync(join(dir, 'a.csv'), 'utf8')).toBe('new');
  });

  test('refuses to write over an input, also through another name, and leaves it untouched', async () => {
    const dir = fresh();
    const input = join(dir, 'stars.json');
    writeFileSync(input, '{"keep":true}');
    symlinkSync(input, join(dir, 'alias.json'));
    await expect(writeFileAtomic(input, 'lost', [input])).rejects.toThrow(/input file/);
    await expect(writeFileAtomic(join(dir, 'alias.json'), 'lost', [input])).rejects.toThrow(/input file/);
    await expect(writeFileAtomic(join(dir, '.', 'stars.json'), 'lost', [join(dir, 'alias.json')])).rejects.toThrow(/input file/);
    expect(readFileSync(input, 'utf8')).toBe('{"keep":true}');
    expect(readdirSync(dir).sort()).toEqual(['alias.json', 'stars.json']);
  });

  test('fails without leaving anything when the directory does not exist', async () => {
    const dir = fresh();
    await expect(writeFileAtomic(join(dir, 'missing', 'a.csv'), 'x')).rejects.toThrow();
    expect(readdirSync(dir)).toEqual([]);
  });

  test('leaves the old content and no temporary file when the rename fails', async () => {
    const dir = fresh();
    // A directory in the target's place makes rename fail after the data were written.
    const target = join(dir, 'occupied');
    mkdirSync(target);
    writeFileSync(join(target, 'inside'), 'keep');
    await expect(writeFileAtomic(target, 'data')).rejects.toThrow();
    expect(readFileSync(join(target, 'inside'), 'utf8')).toBe('keep');
    expect(readdirSync(dir).filter((name) => name.endsWith('.tmp'))).toEqual([]);
  });
});
