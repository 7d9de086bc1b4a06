/**
 * Checks that a numeric argument is a finite number inside [min, max] (or (min, max] when
 * `exclusiveMin` is set) and throws a message naming the argument, its value and the range.
 * This is the physics layer's one error policy (STYLE.md, habit 5).
 *
 * @param name argument name used in the message
 * @param value the value to check
 * @param min lower bound (same unit as value)
 * @param max upper bound (same unit as value)
 * @param unit unit written after the range in the message, e.g. 'K'
 * @param exclusiveMin true when `min` itself is not allowed (e.g. strictly positive)
 * @throws {TypeError} when value is not of type number
 * @throws {RangeError} when value is NaN, infinite or outside the range
 * @example
 * assertInRange('teff', 5772, 10, 1e9, 'K'); // returns 5772
 * assertInRange('teff', -1, 10, 1e9, 'K');   // throws RangeError "teff -1 outside the valid range [10, 1000000000] K"
 */
export function assertInRange(
  name: string,
  value: number,
  min: number,
  max: number,
  unit: string,
  exclusiveMin = false,
): number {
  if (typeof value !== 'number') {
    throw new TypeError(`${name} must be a number, got ${typeof value}`);
  }
  if (!Number.isFinite(value) || !(exclusiveMin ? value > min : value >= min) || !(value <= max)) {
    const u = unit ? ` ${unit}` : '';
    const range = max === Infinity
      ? `${exclusiveMin ? '>' : '≥'} ${min}${u} (finite)`
      : `${exclusiveMin ? '(' : '['}${min}, ${max}]${u}`;
    throw new RangeError(`${name} ${value} outside the valid range ${range}`);
  }
  return value;
}
