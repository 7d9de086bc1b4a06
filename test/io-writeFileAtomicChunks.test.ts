import { mkdtempSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { writeFileAtomicChunks } from '../lib/io/writeFileAtomicChunks.js';

const fresh = (): string => mkdtempSync(join(tmpdir(), 'starclock-chunks-'));

describe('writeFileAtomicChunks(path, chunks, inputs)', () => {
  test('writes every chunk in order and leaves no temporary file', async () => {
    const dir = fresh();
    await writeFileAtomicChunks(join(dir, 'g.csv'), ['a,b\n', '1,2\n', new TextEncoder().encode('3,4\n')]);
    expect(readFileSync(join(dir, 'g.csv'), 'utf8')).toBe('a,b\n1,2\n3,4\n');
    expect(readdirSync(dir)).toEqual(['g.csv']);
  });

  test('pulls an async sequence one chunk at a time', async () => {
    const dir = fresh();
    async function* chunks() {
      for (let i = 0; i < 100; i++) yield `${i}\n`;
    }
    await writeFileAtomicChunks(join(dir, 'n.txt'), chunks());
    expect(readFileSync(join(dir, 'n.txt'), 'utf8').split('\n')).toHaveLength(101);
  });

  test('a chunk source that throws leaves the old file as it was and no temporary file', async () => {
    const dir = fresh();
    writeFileSync(join(dir, 'g.csv'), 'old');
    function* chunks() {
      yield 'new part\n';
      throw new RangeError('model failed');
    }
    await expect(writeFileAtomicChunks(join(dir, 'g.csv'), chunks())).rejects.toThrow('model failed');
    expect(readFileSync(join(dir, 'g.csv'), 'utf8')).toBe('old');
    expect(readdirSync(dir)).toEqual(['g.csv']);
  });

  test('refuses to write over an input, also through a symbolic link', async () => {
    const dir = fresh();
    const input = join(dir, 'in.csv');
    writeFileSync(input, 'keep');
    symlinkSync(input, join(dir, 'alias.csv'));
    await expect(writeFileAtomicChunks(join(dir, 'alias.csv'), ['lost'], [input])).rejects.toThrow(/input file/);
    expect(readFileSync(input, 'utf8')).toBe('keep');
  });
});
