import { writeFileAtomicChunks } from './writeFileAtomicChunks.js';

/**
 * Writes a file whole or not at all: the data go to a temporary file beside the
 * target (same directory, so the rename stays on one file system), which is
 * flushed to disk and then renamed over the target. On any failure the temporary
 * file is removed and the target is left as it was. (The one-chunk case of
 * writeFileAtomicChunks.)
 *
 * @param path the file to write
 * @param data its whole content (UTF-8 for strings)
 * @param inputs files this run reads; writing over one of them is refused
 * @throws Error (code `EINPUT`) if `path` is one of `inputs`; file-system errors as thrown by Node
 * @example await writeFileAtomic('out/present-states.csv', csv, ['tracks-demo/demo-stars.json'])
 */
export async function writeFileAtomic(path: string, data: string | Uint8Array, inputs: readonly string[] = []): Promise<void> {
  await writeFileAtomicChunks(path, [data], inputs);
}
