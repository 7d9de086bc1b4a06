// Worker thread of `starclock batch --workers N`: computes chunks of records with its own grid
// and posts each result back with its sequence number; the main thread writes them in order.
import { parentPort, workerData } from 'node:worker_threads';
import { createGridQuery } from '../lib/interp/gridQuery.js';
import type { BatchPlan } from '../lib/io/batchPlan.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { processBatchChunk } from '../lib/io/processBatchChunk.js';
import { deserializeGrid } from '../lib/tracks/gridCache.js';

/** What the main thread hands each worker at start. */
export interface BatchWorkerData {
  plan: BatchPlan;
  /** a user's grid as serializeGrid bytes, or null for the built-in grid */
  grid: Uint8Array | null;
}

const data = workerData as BatchWorkerData;
const query = createGridQuery(data.grid === null ? loadBuiltinGrid() : deserializeGrid(data.grid));
const port = parentPort!;
port.on('message', (message: { seq: number; bytes: Uint8Array }) => {
  const text = Buffer.from(message.bytes.buffer, message.bytes.byteOffset, message.bytes.byteLength).toString('utf8');
  const result = processBatchChunk(text, data.plan, query);
  port.postMessage({ seq: message.seq, result }, [result.out.buffer as ArrayBuffer]);
});
