import { randomBytes } from 'node:crypto';
import { realpathSync } from 'node:fs';
import { open, rename, unlink } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';

/**
 * Writes a file whole or not at all from a sequence of chunks, for outputs too large to hold
 * as one string (the built-in grid in the open layout is about 50 MB): the chunks go, in
 * order, to a temporary file beside the target (same directory, one file system), which is
 * flushed to disk and renamed over the target. The sequence is pulled one chunk at a time,
 * each written before the next is asked for, so memory holds one chunk. On any failure — a
 * chunk source that throws included — the temporary file is removed and the target is left as
 * it was. The streaming sibling of writeFileAtomic.
 *
 * @param path the file to write
 * @param chunks the content, in order (strings as UTF-8)
 * @param inputs files this run reads; writing over one of them is refused
 * @throws Error (code `EINPUT`) if `path` is one of `inputs`; file-system errors as thrown by
 *   Node; whatever `chunks` throws
 * @example await writeFileAtomicChunks('grid.csv', (function* () { yield 'a\n'; yield 'b\n'; })())
 */
export async function writeFileAtomicChunks(
  path: string,
  chunks: Iterable<string | Uint8Array> | AsyncIterable<string | Uint8Array>,
  inputs: readonly string[] = [],
): Promise<void> {
  const target = canonical(path);
  for (const input of inputs) {
    if (canonical(input) === target) {
      const error = new Error(`refusing to write ${path}: it is an input file of this run`) as NodeJS.ErrnoException;
      error.code = 'EINPUT';
      throw error;
    }
  }
  const temporary = join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
  const handle = await open(temporary, 'wx');
  try {
    try {
      for await (const chunk of chunks) {
        if (typeof chunk === 'string') await handle.write(chunk);
        else await handle.write(chunk);
      }
      await handle.sync();
    } finally {
      await handle.close();
    }
    await rename(temporary, target);
  } catch (error) {
    await unlink(temporary).catch(() => undefined);
    throw error;
  }
}

// Absolute path with symbolic links of the existing part resolved, so two names of one file compare equal.
function canonical(path: string): string {
  const absolute = resolve(path);
  try {
    return realpathSync(absolute);
  } catch {
    try {
      return join(realpathSync(dirname(absolute)), basename(absolute));
    } catch {
      return absolute;
    }
  }
}
