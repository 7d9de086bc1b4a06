const UNSAFE = /[<>&\u2028\u2029]/g;
const ESCAPES: Readonly<Record<string, string>> = {
  '<': '\\u003c',
  '>': '\\u003e',
  '&': '\\u0026',
  '\u2028': '\\u2028',
  '\u2029': '\\u2029',
};

/**
 * JSON text that is safe as the content of an HTML `<script type="application/json">`
 * element: `JSON.stringify`, then every `<`, `>`, `&`, U+2028 and U+2029 written as a `\uXXXX`
 * escape. Those characters can occur only inside JSON strings, where the escape means the same
 * character, so `JSON.parse` of the element's `textContent` gives the value back exactly; and
 * the text can hold no `</script`, `<!--` or character reference, so no value can end the
 * element or start markup (HTML Living Standard, "Restrictions for contents of script
 * elements").
 *
 * @param value any JSON-serialisable value (non-finite numbers are refused)
 * @throws TypeError when the value cannot be written as JSON (undefined, a function, a cycle)
 * @throws RangeError naming the first non-finite number found
 * @example jsonForScript({ name: '</script>' }) // '{"name":"\\u003c/script\\u003e"}'
 */
export function jsonForScript(value: unknown): string {
  const text = JSON.stringify(value, (key, v) => {
    if (typeof v === 'number' && !Number.isFinite(v)) throw new RangeError(`jsonForScript: ${key || '(value)'} is ${v}; only finite numbers can be embedded`);
    return v;
  });
  if (typeof text !== 'string') throw new TypeError(`jsonForScript: a ${typeof value} cannot be written as JSON`);
  return text.replace(UNSAFE, (c) => ESCAPES[c]);
}
