/**
 * Formats a number for human tables with a given count of significant digits.
 *
 * Magnitudes from 1e-3 up to (not including) 1e6 are written in positional
 * notation (`0.0123`, `5772`, `123400`); smaller and larger ones in exponent
 * notation without a plus sign (`1.23e-5`, `4.5e+7` → `4.5e7`). With `trim`,
 * trailing zeros after the decimal point are dropped (`1.000` → `1`), which suits
 * values a user typed in; computed values keep them to show their precision.
 * Zero is `0`; non-finite values are written as `NaN`, `Infinity`, `-Infinity` so
 * that a bug shows instead of hiding.
 *
 * @param x the value
 * @param digits significant digits, 1–17
 * @param trim drop trailing zeros after the decimal point
 * @throws RangeError if `digits` is not an integer in 1–17
 * @example formatSignificant(5772.4, 4) // '5772'
 * @example formatSignificant(0.0001234, 3) // '1.23e-4'
 * @example formatSignificant(1, 4, true) // '1'
 */
export function formatSignificant(x: number, digits: number, trim = false): string {
  if (!Number.isInteger(digits) || digits < 1 || digits > 17) {
    throw new RangeError(`digits ${digits} outside 1–17`);
  }
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const rounded = Number(x.toPrecision(digits));
  const magnitude = Math.abs(rounded);
  let text: string;
  if (magnitude >= 1e-3 && magnitude < 1e6) {
    const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(magnitude)));
    text = rounded.toFixed(decimals);
  } else {
    text = rounded.toExponential(digits - 1).replace('e+', 'e');
  }
  if (trim) text = trimZeros(text);
  return text;
}

// Drops trailing zeros of the mantissa, and a bare trailing point.
function trimZeros(text: string): string {
  const e = text.indexOf('e');
  const mantissa = e < 0 ? text : text.slice(0, e);
  const exponent = e < 0 ? '' : text.slice(e);
  if (!mantissa.includes('.')) return text;
  return mantissa.replace(/0+$/, '').replace(/\.$/, '') + exponent;
}
