import { randomBytes } from 'node:crypto';
import { realpathSync } from 'node:fs';
import { open, rename, unlink } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';

/**
 * Writes a file whole or not at all: the data go to a temporary file beside the
 * target (same directory, so the rename stays on one file system), which is
 * flushed to disk and then renamed over the target. On any failure the temporary
 * file is removed and the target is left as it was.
 *
 * @param path the file to write
 * @param data its whole content (UTF-8 for strings)
 * @param inputs files this run reads; writing over one of them is refused
 * @throws Error (code `EINPUT`) if `path` is one of `inputs`; file-system errors as thrown by Node
 * @example await writeFileAtomic('out/present-states.csv', csv, ['tracks-demo/demo-stars.json'])
 */
export async function writeFileAtomic(path: string, data: string | Uint8Array, inputs: readonly string[] = []): Promise<void> {
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
      await handle.writeFile(data);
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
