import { gzipSync } from 'node:zlib';
import type { Grid } from '../tracks/grid.js';
import { serializeGrid } from '../tracks/gridCache.js';
import { subsetGrid } from '../tracks/subsetGrid.js';

/**
 * The grid slabs a population of metallicities zMin…zMax needs (subsetGrid: the slabs inside
 * the range and one on either side), serialised (serializeGrid), gzip-compressed and written in
 * base64 — the `grid` field of a viewer payload. Node only (zlib); the page decodes it with
 * decodeViewerGrid.
 *
 * @param grid the full grid (e.g. loadBuiltinGrid())
 * @param zMin lowest z of the population
 * @param zMax highest z of the population
 * @returns `bytes` (the serialised size before compression) and `data` (base64 text)
 * @throws RangeError from subsetGrid when the range is outside the grid
 * @example encodeViewerGrid(loadBuiltinGrid(), 0.014, 0.014).bytes // 2492496 (one slab)
 */
export function encodeViewerGrid(grid: Grid, zMin: number, zMax: number): { bytes: number; data: string } {
  const bytes = serializeGrid(subsetGrid(grid, zMin, zMax));
  const packed = gzipSync(bytes, { level: 6 });
  return { bytes: bytes.length, data: Buffer.from(packed.buffer, packed.byteOffset, packed.byteLength).toString('base64') };
}
