import type { Grid } from '../tracks/grid.js';
import { deserializeGrid } from '../tracks/gridCache.js';
import { VIEWER_PAYLOAD_FORMAT, VIEWER_PAYLOAD_VERSION, type ViewerPayload } from './viewerPayload.js';

/**
 * Reads the data of a viewer page from the text of its data element (`textContent`, never
 * markup): `JSON.parse`, then the layout name, version and the shape of the star columns are
 * checked. Browser-safe.
 *
 * @param text the element's text
 * @throws RangeError when the text is not this layout and version, or the columns disagree in length
 * @example readViewerPayload(document.getElementById('starclock-data').textContent)
 */
export function readViewerPayload(text: string): ViewerPayload {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new RangeError(`viewer data is not JSON: ${(error as Error).message}`);
  }
  const p = value as ViewerPayload;
  if (p === null || typeof p !== 'object' || p.format !== VIEWER_PAYLOAD_FORMAT) {
    throw new RangeError(`viewer data: expected format "${VIEWER_PAYLOAD_FORMAT}"`);
  }
  if (p.version !== VIEWER_PAYLOAD_VERSION) {
    throw new RangeError(`viewer data version ${String(p.version)} is not ${VIEWER_PAYLOAD_VERSION}; rewrite the page with this starclock`);
  }
  const s = p.stars;
  const n = s?.initialMass?.length;
  if (!(n >= 1) || s.birthTime?.length !== n || s.z?.length !== n || (s.name !== null && s.name?.length !== n)) {
    throw new RangeError('viewer data: star columns are missing or differ in length');
  }
  if (p.grid?.encoding !== 'gzip-base64' || typeof p.grid.data !== 'string') {
    throw new RangeError('viewer data: grid must be gzip-base64 text');
  }
  return p;
}

/**
 * The grid embedded in a viewer payload: base64 → gzip (DecompressionStream, in browsers and
 * Node ≥ 18) → deserializeGrid.
 *
 * @throws RangeError when the data do not decode to a grid of the stated size
 */
export async function decodeViewerGrid(grid: ViewerPayload['grid']): Promise<Grid> {
  const bin = atob(grid.data);
  const packed = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) packed[i] = bin.charCodeAt(i);
  const stream = new Blob([packed]).stream().pipeThrough(new DecompressionStream('gzip'));
  const bytes = new Uint8Array(await new Response(stream).arrayBuffer());
  if (bytes.length !== grid.bytes) throw new RangeError(`viewer data: grid decodes to ${bytes.length} bytes, expected ${grid.bytes}`);
  return deserializeGrid(bytes);
}
