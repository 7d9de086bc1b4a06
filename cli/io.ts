/** Where a run's output goes: data to `out`, diagnostics to `err`. Tests pass collectors. */
export interface Io {
  out(text: string): void;
  err(text: string): void;
}

/** The process's own streams. */
export const processIo: Io = {
  out: (text) => void process.stdout.write(text),
  err: (text) => void process.stderr.write(text),
};

/** Writes one diagnostic line, prefixed with the program's name. */
export function diagnostic(io: Io, message: string): void {
  io.err(`starclock: ${message}\n`);
}
