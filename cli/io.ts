import { once } from 'node:events';

/** Where a run's output goes: data to `out`, diagnostics to `err`. Tests pass collectors. */
export interface Io {
  out(text: string): void;
  err(text: string): void;
  /**
   * Resolves once the data written so far has left the process (backpressure for large
   * outputs written in chunks); absent for sinks that take everything at once.
   */
  drain?(): Promise<void>;
}

/** The process's own streams. */
export const processIo: Io = {
  out: (text) => void process.stdout.write(text),
  err: (text) => void process.stderr.write(text),
  // A pipe to a slow reader buffers every write in memory; wait for it to empty.
  drain: async () => {
    if (!process.stdout.writableNeedDrain) return;
    await Promise.race([once(process.stdout, 'drain'), once(process.stdout, 'close')]);
  },
};

/** Writes one diagnostic line, prefixed with the program's name. */
export function diagnostic(io: Io, message: string): void {
  io.err(`starclock: ${message}\n`);
}
