/**
 * A coordinate for SVG markup: at most `decimals` decimals (default 2, 0.01 px), trailing
 * zeros dropped, never `-0`, never exponent notation.
 *
 * @throws RangeError for a non-finite value (a figure never draws NaN silently)
 * @example svgNumber(12.3456) // '12.35'
 */
export function svgNumber(x: number, decimals = 2): string {
  if (!Number.isFinite(x)) throw new RangeError(`SVG coordinate ${x} is not finite`);
  const text = x.toFixed(decimals);
  const trimmed = text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
  return trimmed === '-0' ? '0' : trimmed;
}
