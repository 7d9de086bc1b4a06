/**
 * Serialises a value as JSON, refusing what `JSON.stringify` would silently
 * change: a non-finite number (written `null` by the standard serialiser) or an
 * `undefined` property (dropped). A key that does not apply must be `null`
 * explicitly. The refusal is a plain `Error`, a failure of the program rather
 * than of the user's input.
 *
 * @param value the value to write
 * @param indent spaces per level (0: one line)
 * @returns the JSON text, without a trailing newline
 * @throws Error naming the path of the first non-finite or undefined value
 * @example toJson({ teff: 5772, bv: null }) // '{"teff":5772,"bv":null}'
 */
export function toJson(value: unknown, indent = 0): string {
  check(value, '$');
  return JSON.stringify(value, null, indent);
}

function check(value: unknown, path: string): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new Error(`internal error: ${path} is ${value}, not a finite number`);
  } else if (value === undefined) {
    throw new Error(`internal error: ${path} is undefined`);
  } else if (Array.isArray(value)) {
    value.forEach((item, i) => check(item, `${path}[${i}]`));
  } else if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) check(item, `${path}.${key}`);
  }
}
