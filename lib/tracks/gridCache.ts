import { gridOfSlabs, indexSlabMasses, loadRun, VALUE_COLUMNS, type Grid, type GridRun, type GridSlab } from './grid.js';

const MAGIC = 'starclock-grid-cache 2';
const RUN_F64 = ['logM', 'values', 'logMsLifetime', 'remnantMass'] as const;

/** Lengths of a run's RUN_F64 arrays in the cache, in that order, for `count` tracks of `n` EEPs. */
const runF64Lengths = (count: number, n: number): number[] => [count, VALUE_COLUMNS.length * count * n, count, count];
/** Bytes of a run's block in the cache: its RUN_F64 arrays, then its phase codes padded to 8 bytes. */
const runBlockBytes = (count: number, n: number): number =>
  8 * runF64Lengths(count, n).reduce((a, b) => a + b, 0) + Math.ceil(n / 8) * 8;

interface Header {
  magic: string;
  source: string;
  massRange: { min: number; max: number };
  zRange: { min: number; max: number };
  slabs: { z: number; tracks: number; runs: { layout: string; n: number; count: number; remnant: number }[] }[];
}

/**
 * Serialises a grid into one byte buffer: a JSON header, padded to 8 bytes, then each run's
 * stored values (not the slopes, which prepareRun derives on a run's first use) as Float64
 * columns in a fixed order. Reading it back (deserializeGrid over bytes in memory, openGridCache
 * through a reader of a file) makes typed-array views, each run's on its first use.
 */
export function serializeGrid(grid: Grid): Uint8Array {
  const header: Header = {
    magic: MAGIC,
    source: grid.source,
    massRange: grid.massRange,
    zRange: grid.zRange,
    slabs: grid.slabs.map((s) => ({ z: s.z, tracks: s.logM.length, runs: s.runs.map((r) => ({ layout: r.layout, n: r.n, count: r.count, remnant: r.remnant })) })),
  };
  const text = new TextEncoder().encode(JSON.stringify(header));
  const headLen = 8 + Math.ceil(text.length / 8) * 8;
  let bytes = headLen;
  for (const s of grid.slabs) {
    bytes += s.logM.length * 8;
    for (const r of s.runs) bytes += runBlockBytes(r.count, r.n);
  }
  const out = new Uint8Array(bytes);
  const view = new DataView(out.buffer);
  view.setUint32(0, text.length, true);
  out.set(text, 8);
  let off = headLen;
  const put = (a: Float64Array) => {
    new Float64Array(out.buffer, off, a.length).set(a);
    off += a.length * 8;
  };
  for (const s of grid.slabs) {
    put(s.logM);
    for (const r of s.runs) {
      loadRun(r);
      for (const k of RUN_F64) put(r[k]);
      out.set(r.phase, off);
      off += Math.ceil(r.n / 8) * 8;
    }
  }
  return out;
}

/**
 * Reads `length` bytes at byte `position` of a grid cache: a new array, or a view whose offset
 * in its buffer is a multiple of 8 (Float64 views are made on it).
 */
export type CacheReader = (position: number, length: number) => Uint8Array;

/**
 * Reads a grid written by {@link serializeGrid}. The buffer must start at an 8-byte aligned
 * offset of its ArrayBuffer (a whole file read is).
 * @throws RangeError if the buffer is not a grid cache of this version
 */
export function deserializeGrid(bytes: Uint8Array): Grid {
  if (bytes.byteOffset % 8 !== 0) bytes = bytes.slice();
  const b = bytes;
  return openGridCache((position, length) => {
    if (position + length > b.length) throw new RangeError('grid cache: truncated');
    return b.subarray(position, position + length);
  });
}

/**
 * A grid over a cache written by {@link serializeGrid}, read through `read`: the header and each
 * slab's track masses now, each run's values only on its first use (GridRun.load, called by
 * prepareRun) — so a grid is ready after a few small reads, and a program that asks about one
 * metallicity reads little more than that slab.
 * @throws RangeError if the bytes are not a grid cache of this version
 */
export function openGridCache(read: CacheReader): Grid {
  const len = new DataView(read(0, 8).slice().buffer).getUint32(0, true);
  let header: Header;
  try {
    header = JSON.parse(new TextDecoder().decode(read(8, len))) as Header;
  } catch {
    throw new RangeError('grid cache: unreadable header');
  }
  if (header.magic !== MAGIC) throw new RangeError(`grid cache: expected "${MAGIC}", found "${header.magic}"`);
  let off = 8 + Math.ceil(len / 8) * 8;
  const slabs: GridSlab[] = header.slabs.map((hs) => {
    const logM = new Float64Array(read(off, hs.tracks * 8).slice().buffer);
    off += hs.tracks * 8;
    const runOf = new Int32Array(hs.tracks);
    const indexInRun = new Int32Array(hs.tracks);
    let t = 0;
    const runs: GridRun[] = hs.runs.map((hr, ri) => {
      const start = off;
      const lengths = runF64Lengths(hr.count, hr.n);
      const blockBytes = runBlockBytes(hr.count, hr.n);
      off += blockBytes;
      const run: GridRun = {
        layout: hr.layout, n: hr.n, count: hr.count, phase: new Uint8Array(0),
        logM: new Float64Array(0), values: new Float64Array(0), rec: new Float64Array(0), ageIndex: new Int16Array(0),
        logMsLifetime: new Float64Array(0), remnantMass: new Float64Array(0), remnant: hr.remnant,
        load: () => {
          const block = read(start, blockBytes);
          let p = block.byteOffset;
          RUN_F64.forEach((key, i) => {
            run[key] = new Float64Array(block.buffer, p, lengths[i]);
            p += lengths[i] * 8;
          });
          run.phase = new Uint8Array(block.buffer, p, hr.n);
        },
      };
      for (let k = 0; k < hr.count; k++, t++) {
        runOf[t] = ri;
        indexInRun[t] = k;
      }
      return run;
    });
    return { z: hs.z, logZ: Math.log10(hs.z), logM, ...indexSlabMasses(logM), runOf, indexInRun, runs };
  });
  return gridOfSlabs(slabs, header.source);
}
