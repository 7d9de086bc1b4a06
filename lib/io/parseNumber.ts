// Optional sign, digits with an optional point, optional exponent; blanks around allowed.
const NUMBER_PATTERN = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;

/**
 * Reads a decimal number from text, strictly: unlike `Number()` it refuses the
 * empty string, blanks, `NaN`, `Infinity`, hexadecimal and trailing text, and
 * unlike `parseFloat()` it refuses `12abc`. Used at every edge where numbers are
 * typed or read from files, so nothing is silently coerced.
 *
 * @param text the number as written, e.g. `0.014`, `1e-4`, `-0.5`
 * @returns the finite number
 * @throws TypeError if `text` is not a string
 * @throws RangeError if `text` is not a finite decimal number; the message quotes it
 * @example parseNumber('1.5e-3') // 0.0015
 */
export function parseNumber(text: string): number {
  if (typeof text !== 'string') throw new TypeError(`expected a number as text, got ${typeof text}`);
  if (!NUMBER_PATTERN.test(text)) throw new RangeError(`'${text}' is not a number`);
  const x = Number(text);
  if (!Number.isFinite(x)) throw new RangeError(`'${text}' is not a finite number`);
  return x;
}
