import type { ViewerPayload } from './viewerPayload.js';
import { jsonForScript } from './viewerPayloadScript.js';

/** The placeholder the viewer template holds, once, as the content of its data element. */
export const VIEWER_PAYLOAD_PLACEHOLDER = '"__STARCLOCK_VIEWER_DATA__"';

/**
 * The viewer page for a payload: the built template (dist/viewer/viewer-template.html, one
 * self-contained HTML file) with the payload written into its
 * `<script type="application/json" id="starclock-data">` element by {@link jsonForScript}, so
 * no name or other text from the input can end the element or add markup. The page reads it
 * back with `textContent` and `JSON.parse`.
 *
 * @param template the template text; must hold {@link VIEWER_PAYLOAD_PLACEHOLDER} exactly once
 * @param payload from viewerPayload
 * @throws RangeError when the template does not hold the placeholder exactly once
 * @example viewerHtml(template, payload).startsWith('<!doctype html>') // true
 */
export function viewerHtml(template: string, payload: ViewerPayload): string {
  const parts = template.split(VIEWER_PAYLOAD_PLACEHOLDER);
  if (parts.length !== 2) {
    throw new RangeError(`viewer template holds the data placeholder ${parts.length - 1} times; expected exactly once (rebuild with npm run build)`);
  }
  return parts[0] + jsonForScript(payload) + parts[1];
}
