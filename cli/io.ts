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
  drain: () =>
    new Promise<void>((resolve) => {
      if (!process.stdout.writableNeedDrain) return resolve();
      const done = () => {
        process.stdout.off('drain', done);
        process.stdout.off('close', done);
        resolve();
      };
      process.stdout.on('drain', done);
      process.stdout.on('close', done);
    }),
};

/** Writes one diagnostic line, prefixed with the program's name. */
export function diagnostic(io: Io, message: string): void {
  io.err(`starclock: ${message}\n`);
}
