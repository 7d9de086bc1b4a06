import { randomBytes } from 'node:crypto';
import { createReadStream, statSync } from 'node:fs';
import { open, rename, stat, unlink, type FileHandle } from 'node:fs/promises';
import { basename, dirname, extname, join, resolve } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { Readable } from 'node:stream';
import type { GridQuery } from '../lib/interp/gridQuery.js';
import { planBatch, type BatchPlan, type TableFormat } from '../lib/io/batchPlan.js';
import { createRecordCutter } from '../lib/io/csvRecordCutter.js';
import { emptyCsvRecord, nextCsvRecord } from '../lib/io/nextCsvRecord.js';
import type { BatchChunkResult } from '../lib/io/processBatchChunk.js';
import { SOLAR_Z, UNIVERSE_AGE } from '../lib/model/limits.js';
import type { Grid } from '../lib/tracks/grid.js';
import type { Io } from './io.js';
import { diagnostic, processIo } from './io.js';
import { packageInfo } from './packageRoot.js';

/** What `starclock batch` was asked to do (already parsed by cli/commands/batch.ts). */
export interface BatchRunOptions {
  /** input path, or `-` for standard input */
  input: string;
  /** output path; undefined or `-` for standard output */
  output?: string;
  /** rejects file; default OUT.rejects.csv (or .ndjson) beside a file output, stderr lines with stdout output */
  rejects?: string;
  /** input format; default from the extension, else from the content */
  format?: TableFormat;
  /** output format; default from OUT's extension, else the input's */
  outputFormat?: TableFormat;
  /** headerless line filter: the input's column names */
  columnsIn?: string[];
  massCol?: string;
  ageCol?: string;
  zCol?: string;
  ageUnit?: string;
  z?: number;
  columns?: string[];
  workers: number;
  progress: boolean;
  /** the grid to use (null: the built-in one, loaded where it is needed) and, for workers, its serialized bytes (null: the built-in grid) */
  grid: Grid | null;
  gridBytes: Uint8Array | null;
}

/** What a run did. */
export interface BatchSummary {
  read: number;
  written: number;
  rejected: number;
  seconds: number;
  /** where rejected rows went: a file, or 'stderr' */
  rejectsTo: string;
  beyondUniverse: number;
  filter: boolean;
}

/** Bytes of input per chunk computed in this thread (whole records; about 30 000 rows of a small table). */
const CHUNK = 1 << 20;
/**
 * Bytes per chunk handed to a worker: smaller, so that the last chunks, computed while the other
 * workers may have run dry, are short, and no worker waits long on another's chunk.
 */
const WORKER_CHUNK = 1 << 18;
/** A record longer than this is taken for an unclosed quote rather than buffered further. */
const MAX_RECORD = 64 << 20;

const EXTENSIONS: Readonly<Record<string, TableFormat>> = { '.csv': 'csv', '.ndjson': 'ndjson', '.jsonl': 'ndjson', '.json': 'ndjson' };

function csvQuote(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** True when both paths name one existing file (symbolic and hard links included). */
function sameFile(a: string, b: string): boolean {
  try {
    const x = statSync(a);
    const y = statSync(b);
    return x.dev === y.dev && x.ino === y.ino;
  } catch {
    return resolve(a) === resolve(b);
  }
}

/** A file written whole or not at all: a temporary file beside the target, renamed by commit(). */
class AtomicFile {
  private constructor(readonly path: string, private readonly temporary: string, private handle: FileHandle | null) {}
  static async create(path: string): Promise<AtomicFile> {
    const target = resolve(path);
    const temporary = join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
    try {
      return new AtomicFile(target, temporary, await open(temporary, 'wx'));
    } catch (error) {
      throw new RangeError(`cannot write ${path}: ${(error as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such folder' : (error as Error).message}`);
    }
  }
  async write(data: string | Uint8Array): Promise<void> {
    if (typeof data === 'string') {
      if (data.length > 0) await this.handle!.write(data);
      return;
    }
    let done = 0;
    while (done < data.length) done += (await this.handle!.write(data, done, data.length - done)).bytesWritten;
  }
  async close(): Promise<void> {
    const handle = this.handle!;
    this.handle = null;
    await handle.sync();
    await handle.close();
  }
  async commit(): Promise<void> {
    await rename(this.temporary, this.path);
  }
  async abort(): Promise<void> {
    if (this.handle !== null) await this.handle.close().catch(() => undefined);
    this.handle = null;
    await unlink(this.temporary).catch(() => undefined);
  }
}

interface Sink {
  write(data: string | Uint8Array): Promise<void>;
}

/** The pool of worker threads, or the main thread itself for one worker. */
interface Computer {
  submit(seq: number, bytes: Uint8Array): Promise<BatchChunkResult>;
  close(): Promise<void>;
}

async function inlineComputer(grid: Grid | null, plan: BatchPlan): Promise<Computer> {
  const [{ createGridQuery }, { processBatchChunk }, { loadBuiltinGrid }] = await Promise.all([
    import('../lib/interp/gridQuery.js'),
    import('../lib/io/processBatchChunk.js'),
    import('../lib/io/loadBuiltinGrid.js'),
  ]);
  const query: GridQuery = createGridQuery(grid ?? loadBuiltinGrid());
  return {
    submit: async (_seq, bytes) => processBatchChunk(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8'), plan, query),
    close: async () => undefined,
  };
}

function workerComputer(n: number, plan: BatchPlan, gridBytes: Uint8Array | null): Computer {
  const file = join(packageInfo().root, 'dist', 'cli', 'batchWorker.js');
  const waiting = new Map<number, { resolve: (r: BatchChunkResult) => void; reject: (e: Error) => void }>();
  let failure: Error | null = null;
  const fail = (error: Error) => {
    failure ??= error;
    for (const w of waiting.values()) w.reject(failure);
    waiting.clear();
  };
  // chunks each worker holds: a chunk goes to the worker with the fewest, so one that is slow
  // for a while (a chunk of costlier rows, the machine's other work) gets less
  const load = new Int32Array(n);
  const workers = Array.from({ length: n }, (_, id) => {
    const worker = new Worker(file, { workerData: { plan, grid: gridBytes } });
    worker.on('message', (m: { seq: number; result: BatchChunkResult }) => {
      load[id]--;
      const w = waiting.get(m.seq);
      waiting.delete(m.seq);
      w?.resolve(m.result);
    });
    worker.on('error', (error) => fail(new Error(`batch worker failed: ${error.message}`)));
    worker.on('exit', (code) => {
      if (code !== 0) fail(new Error(`batch worker stopped with code ${code}`));
    });
    return worker;
  });
  let closing = false;
  return {
    submit(seq, bytes) {
      if (failure !== null) return Promise.reject(failure);
      return new Promise<BatchChunkResult>((resolve, reject) => {
        waiting.set(seq, { resolve, reject });
        // a copy of its own, so the transfer takes nothing the reader still uses
        const copy = new Uint8Array(bytes);
        let id = 0;
        for (let i = 1; i < n; i++) if (load[i] < load[id]) id = i;
        load[id]++;
        workers[id].postMessage({ seq, bytes: copy }, [copy.buffer]);
      });
    },
    async close() {
      if (closing) return;
      closing = true;
      for (const w of workers) w.removeAllListeners('exit');
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}

function detectFormat(path: string, head: Buffer): TableFormat {
  const byExtension = path === '-' ? undefined : EXTENSIONS[extname(path).toLowerCase()];
  if (byExtension !== undefined) return byExtension;
  let i = head[0] === 0xef && head[1] === 0xbb && head[2] === 0xbf ? 3 : 0;
  while (i < head.length && (head[i] === 32 || head[i] === 9 || head[i] === 10 || head[i] === 13)) i++;
  return head[i] === 123 /* { */ ? 'ndjson' : 'csv';
}

/**
 * Runs `starclock batch`: streams the input in chunks of whole records (createRecordCutter),
 * computes them in order (processBatchChunk, in this thread or in N worker threads, each with
 * its own grid, results written in input order), and writes the output and the rejects file
 * through temporary files renamed at the end, so a failed run leaves no partial file behind.
 * Memory holds a few chunks at a time, whatever the input's size.
 *
 * @throws RangeError (exit 2) for unusable input or options: no such file, output = input,
 *   an empty input, a header without a mass or age column, ages without a unit, a record
 *   running on past 64 MiB (an unclosed quote)
 */
export async function runBatch(options: BatchRunOptions, io: Io): Promise<BatchSummary> {
  const t0 = performance.now();
  const filter = options.columnsIn !== undefined;
  const toStdout = options.output === undefined || options.output === '-';
  const fromStdin = options.input === '-';
  if (!fromStdin) {
    try {
      if (!(await stat(options.input)).isFile()) throw new RangeError(`input ${options.input} is not a file`);
    } catch (error) {
      if (error instanceof RangeError) throw error;
      throw new RangeError(`cannot read input ${options.input}: ${(error as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (error as Error).message}`);
    }
  }
  if (!toStdout && !fromStdin && sameFile(options.output!, options.input)) {
    throw new RangeError(`refusing to write ${options.output}: it is the input file; choose another -o`);
  }
  if (options.rejects !== undefined) {
    if (!fromStdin && sameFile(options.rejects, options.input)) throw new RangeError(`refusing to write --rejects ${options.rejects}: it is the input file`);
    if (!toStdout && sameFile(options.rejects, options.output!)) throw new RangeError(`--rejects ${options.rejects} is the output file; choose another`);
  }

  const chunkBytes = options.workers > 1 ? WORKER_CHUNK : CHUNK;
  const stream: Readable = fromStdin ? process.stdin : createReadStream(options.input, { highWaterMark: chunkBytes });
  const totalBytes = fromStdin ? 0 : (await stat(options.input)).size;
  let plan: BatchPlan | null = null;
  let out: Sink | null = null;
  let outFile = null as AtomicFile | null;
  let rejectsFile = null as AtomicFile | null;
  let rejectsSink: ((row: number, reason: string, raw: string) => Promise<void>) | null = null;
  let computer = null as Computer | null;
  const summary: BatchSummary = { read: 0, written: 0, rejected: 0, seconds: 0, rejectsTo: 'stderr', beyondUniverse: 0, filter };

  // input bytes not yet handed on, as a list to concatenate once per chunk
  let parts: Buffer[] = [];
  let partsLength = 0;
  let pending: Buffer = Buffer.alloc(0);
  let scanned = 0;
  let bytesRead = 0;
  let cutter = createRecordCutter(true);
  let seq = 0;
  let rowBase = 0; // records before the next chunk to write
  let firstDataSeen = false;
  const queue: Promise<BatchChunkResult>[] = [];
  let maxInFlight = 1;

  const progress = options.progress && io === processIo && process.stderr.isTTY === true;
  let lastProgress = 0;
  const showProgress = (force: boolean) => {
    if (!progress) return;
    const now = performance.now();
    if (!force && now - lastProgress < 250) return;
    lastProgress = now;
    const rate = summary.read / Math.max(1e-3, (now - t0) / 1000);
    const share = totalBytes > 0 ? ` ${Math.min(100, Math.floor((100 * bytesRead) / totalBytes))}%` : '';
    const width = 24;
    const bar = totalBytes > 0 ? ` [${'#'.repeat(Math.round((width * bytesRead) / totalBytes)).padEnd(width, '.')}]` : '';
    process.stderr.write(`\r\x1b[Kbatch${bar}${share} ${summary.read} rows, ${Math.round(rate)} rows/s`);
  };

  const take = () => {
    if (parts.length > 0) {
      pending = pending.length === 0 && parts.length === 1 ? parts[0] : Buffer.concat([pending, ...parts]);
      parts = [];
      partsLength = 0;
    }
  };

  // Writes one chunk's result: output text, rejects with absolute row numbers, counters.
  const writeResult = async (r: BatchChunkResult) => {
    if (!firstDataSeen && r.firstDataRow > 0) {
      firstDataSeen = true;
      if (r.firstBareAge === r.firstDataRow) {
        const reject = r.rejects.find((x) => x.row === r.firstBareAge);
        throw new RangeError(
          `column '${plan!.age.name}' has no unit (row ${rowBase + r.firstBareAge}: ${reject?.raw ?? ''}); ` +
            `give --age-unit yr|kyr|Myr|Gyr, or write the unit in the header (age_Gyr, age (Gyr), age[Gyr]) or in every cell (4.6Gyr)`,
        );
      }
    }
    await out!.write(r.out);
    for (const x of r.rejects) await rejectsSink!(rowBase + x.row, x.reason, x.raw);
    rowBase += r.records;
    summary.read += r.read;
    summary.written += r.written;
    summary.rejected += r.rejects.length;
    summary.beyondUniverse += r.beyondUniverse;
    showProgress(false);
  };

  const dispatch = async (bytes: Buffer) => {
    queue.push(computer!.submit(seq++, bytes));
    while (queue.length >= maxInFlight) await writeResult(await queue.shift()!);
  };

  // Hands on every whole record buffered so far (all of it at the end of the input).
  const pump = async (end: boolean) => {
    take();
    if (end) {
      if (pending.length > 0) await dispatch(pending);
      pending = Buffer.alloc(0);
      return;
    }
    const last = cutter.scan(pending, scanned);
    scanned = pending.length;
    if (last > 0) {
      const chunk = pending.subarray(0, last);
      pending = pending.subarray(last);
      cutter.shift(last);
      scanned -= last;
      await dispatch(chunk);
    } else if (pending.length > MAX_RECORD) {
      throw new RangeError(`row ${rowBase + 1 + (plan!.filter || plan!.input !== 'csv' ? 0 : 1)} or later: a record runs on past ${MAX_RECORD >> 20} MiB without ending; is a quote not closed?`);
    }
  };

  // Reads the header (CSV), the first object's keys (NDJSON) or --columns-in, then opens the outputs.
  const begin = async (end: boolean): Promise<boolean> => {
    take();
    const format = options.format ?? detectFormat(options.input, pending.subarray(0, 4096));
    const lineMode = filter || format === 'ndjson';
    let names: string[];
    let headerRaw: string | null = null;
    let bom = false;
    let eol: '\n' | '\r\n' = '\n';
    if (pending[0] === 0xef && pending[1] === 0xbb && pending[2] === 0xbf) {
      bom = true;
      pending = pending.subarray(3);
    }
    if (filter) names = options.columnsIn!;
    else if (format === 'csv') {
      const text = pending.toString('utf8');
      if (text.trim() === '') {
        if (!end) return false;
        throw new RangeError(`input ${options.input} is empty: a CSV table needs a header line naming its columns`);
      }
      const rec = emptyCsvRecord();
      const next = nextCsvRecord(text, 0, false, rec);
      if (!end && next >= text.length && !text.endsWith('\n')) {
        if (pending.length > MAX_RECORD) throw new RangeError(`the header runs on past ${MAX_RECORD >> 20} MiB; is a quote not closed?`);
        return false;
      }
      if (rec.error !== null) throw new RangeError(`the header (row 1) is malformed: ${rec.error}`);
      names = rec.fields;
      headerRaw = text.slice(0, rec.rawEnd);
      eol = rec.crlf ? '\r\n' : '\n';
      pending = pending.subarray(Buffer.byteLength(text.slice(0, next)));
      rowBase = 1;
    } else {
      const text = pending.toString('utf8');
      let start = 0;
      let line = 0;
      let found: string | null = null;
      for (;;) {
        const nl = text.indexOf('\n', start);
        if (nl < 0 && !end) return false;
        line++;
        const candidate = text.slice(start, nl < 0 ? text.length : nl).trim();
        if (candidate !== '') {
          found = candidate;
          break;
        }
        if (nl < 0) break;
        start = nl + 1;
      }
      if (found === null) throw new RangeError(`input ${options.input} is empty: no JSON object to read column names from`);
      let first: unknown;
      try {
        first = JSON.parse(found);
      } catch (error) {
        throw new RangeError(`row ${line} is not valid JSON (${(error as Error).message}); the first object names the columns`);
      }
      if (first === null || typeof first !== 'object' || Array.isArray(first)) throw new RangeError(`row ${line} is not a JSON object; the first object names the columns`);
      names = Object.keys(first);
    }
    const outputFormat =
      options.outputFormat ?? (toStdout ? undefined : EXTENSIONS[extname(options.output!).toLowerCase()]) ?? format;
    if (format === 'ndjson' && outputFormat === 'csv') {
      throw new RangeError('NDJSON input is written as NDJSON (its rows may differ in keys); use --output-format ndjson or an .ndjson output');
    }
    if (filter && outputFormat !== format) throw new RangeError('the line filter (--columns-in) writes the format it reads');
    plan = planBatch({
      input: format, output: outputFormat, filter, names, headerRaw, bom, eol,
      massCol: options.massCol, ageCol: options.ageCol, zCol: options.zCol, ageUnit: options.ageUnit, z: options.z,
      defaultZ: SOLAR_Z, columns: options.columns,
    });
    cutter = createRecordCutter(lineMode);
    scanned = 0;

    // outputs
    if (toStdout) {
      out = {
        write: async (data) => {
          if (data.length === 0) return;
          io.out(typeof data === 'string' ? data : Buffer.from(data.buffer, data.byteOffset, data.byteLength).toString('utf8'));
          await io.drain?.();
        },
      };
    } else {
      outFile = await AtomicFile.create(options.output!);
      out = outFile;
    }
    const rejectsPath = options.rejects ?? (toStdout ? undefined : `${options.output}.rejects.${format === 'csv' ? 'csv' : 'ndjson'}`);
    if (rejectsPath !== undefined) {
      rejectsFile = await AtomicFile.create(rejectsPath);
      summary.rejectsTo = rejectsPath;
      await rejectsFile.write(plan.rejectsHeader);
      const file = rejectsFile;
      const eolR = plan.eol;
      rejectsSink = format === 'csv'
        ? (row, reason, raw) => file.write(`${row},${csvQuote(reason)},${raw}${eolR}`)
        : (row, reason, raw) => file.write(JSON.stringify({ row, reason, input: raw }) + '\n');
    } else {
      rejectsSink = async (row, reason) => diagnostic(io, `row ${row}: ${reason}`);
    }
    await out.write(plan.header);
    computer = options.workers > 1 ? workerComputer(options.workers, plan, options.gridBytes) : await inlineComputer(options.grid, plan);
    maxInFlight = options.workers > 1 ? 4 * options.workers : 1;
    return true;
  };

  let started = false;
  try {
    for await (const data of stream) {
      const buffer = data as Buffer;
      bytesRead += buffer.length;
      parts.push(buffer);
      partsLength += buffer.length;
      if (!started) {
        if (partsLength + pending.length < CHUNK) continue;
        started = await begin(false);
        if (started) await pump(false);
        continue;
      }
      if (partsLength >= chunkBytes) await pump(false);
    }
    if (!started) started = await begin(true);
    await pump(true);
    while (queue.length > 0) await writeResult(await queue.shift()!);
    await computer?.close();
    if (progress) process.stderr.write('\r\x1b[K');
    await rejectsFile?.close();
    await outFile?.close();
    // the output first: if its rename fails, the rejects file is not left behind either
    await outFile?.commit();
    await rejectsFile?.commit();
  } catch (error) {
    if (progress) process.stderr.write('\r\x1b[K');
    stream.destroy();
    // results still in flight are not wanted any more
    for (const p of queue) p.catch(() => undefined);
    await computer?.close().catch(() => undefined);
    await outFile?.abort();
    await rejectsFile?.abort();
    throw error;
  }
  summary.seconds = (performance.now() - t0) / 1000;
  if (summary.beyondUniverse > 0) {
    diagnostic(io, `warning: ${summary.beyondUniverse} rows are older than the universe (${UNIVERSE_AGE / 1e9} Gyr); the model extrapolates`);
  }
  return summary;
}
