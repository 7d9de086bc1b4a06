import { gridOfSlabs, indexSlabMasses, VALUE_COLUMNS, type Grid, type GridRun, type GridSlab } from './grid.js';

const MAGIC = 'starclock-grid-cache 2';
const RUN_F64 = ['logM', 'values', 'logMsLifetime', 'remnantMass'] as const;

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
 * columns in a fixed order. Loading it back (deserializeGrid) makes typed-array views with no
 * copying, so a grid is ready in the time it takes to read the file.
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
    for (const r of s.runs) {
      bytes += 8 * (r.count + VALUE_COLUMNS.length * r.count * r.n + 2 * r.count) + Math.ceil(r.n / 8) * 8;
    }
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
      for (const k of RUN_F64) put(r[k]);
      out.set(r.phase, off);
      off += Math.ceil(r.n / 8) * 8;
    }
  }
  return out;
}

/**
 * Reads a grid written by {@link serializeGrid}. The buffer must start at an 8-byte aligned
 * offset of its ArrayBuffer (a whole file read is).
 * @throws RangeError if the buffer is not a grid cache of this version
 */
export function deserializeGrid(bytes: Uint8Array): Grid {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const len = view.getUint32(0, true);
  let header: Header;
  try {
    header = JSON.parse(new TextDecoder().decode(bytes.subarray(8, 8 + len))) as Header;
  } catch {
    throw new RangeError('grid cache: unreadable header');
  }
  if (header.magic !== MAGIC) throw new RangeError(`grid cache: expected "${MAGIC}", found "${header.magic}"`);
  if (bytes.byteOffset % 8 !== 0) bytes = bytes.slice();
  let off = bytes.byteOffset + 8 + Math.ceil(len / 8) * 8;
  const take = (n: number) => {
    const a = new Float64Array(bytes.buffer, off, n);
    off += n * 8;
    return a;
  };
  const slabs: GridSlab[] = header.slabs.map((hs) => {
    const logM = take(hs.tracks);
    const runOf = new Int32Array(hs.tracks);
    const indexInRun = new Int32Array(hs.tracks);
    let t = 0;
    const runs: GridRun[] = hs.runs.map((hr, ri) => {
      const f = (n: number) => take(n);
      const cn = hr.count * hr.n;
      const run: GridRun = {
        layout: hr.layout, n: hr.n, count: hr.count, remnant: hr.remnant,
        logM: f(hr.count), values: f(VALUE_COLUMNS.length * cn),
        rec: new Float64Array(0), ageIndex: new Int16Array(0),
        logMsLifetime: f(hr.count), remnantMass: f(hr.count),
        phase: new Uint8Array(bytes.buffer, off, hr.n),
      };
      off += Math.ceil(hr.n / 8) * 8;
      // the age index is built on a run's first use (GridRun.ageIndex), so loading stays a read
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
