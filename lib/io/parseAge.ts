/** Powers of ten (years) of the age units this project accepts. */
const UNIT_EXPONENT: ReadonlyMap<string, number> = new Map([
  ['yr', 0],
  ['kyr', 3],
  ['Myr', 6],
  ['Gyr', 9],
]);

/** The accepted forms, quoted in every error message. */
export const AGE_FORMS =
  'a number with an optional unit yr, kyr, Myr or Gyr (e.g. 4.6Gyr, 300Myr, 12kyr, 5e9yr); a bare number is Gyr';

// Sign and digits, optional exponent, optional blanks, optional unit letters, nothing else.
const AGE_PATTERN = /^\s*([+-]?(?:\d+\.?\d*|\.\d+))(?:[eE]([+-]?\d+))?\s*([A-Za-z]*)\s*$/;

/**
 * Parses an age written with a unit into years.
 *
 * Accepts a decimal number (exponents allowed) followed, with or without a blank,
 * by one of the units `yr`, `kyr`, `Myr`, `Gyr` written in exactly that case; a
 * bare number is read as Gyr (DESIGN.md, "The star state"). The unit is applied as
 * a power of ten to the decimal text, so `4.6Gyr` is exactly the double nearest
 * 4.6e9. Zero and negative values are returned as they are: range checks belong to
 * the caller, which knows the valid range and names it in its own message.
 *
 * @param text the age as typed, e.g. `4.6Gyr`, `300 Myr`, `5e9yr`
 * @returns the age in yr
 * @throws TypeError if `text` is not a string
 * @throws RangeError if `text` is empty, not a number with one accepted unit, or
 *   not finite (`NaN`, `Infinity`, `1e999Gyr`); the message quotes `text` and
 *   lists the accepted forms
 * @example parseAge('4.6Gyr') // 4.6e9
 * @example parseAge('300Myr') // 3e8
 * @example parseAge('2')      // 2e9
 */
export function parseAge(text: string): number {
  if (typeof text !== 'string') {
    throw new TypeError(`age must be a string, got ${typeof text}; expected ${AGE_FORMS}`);
  }
  const match = AGE_PATTERN.exec(text);
  if (match === null) {
    throw new RangeError(`age '${text}' is not understood; expected ${AGE_FORMS}`);
  }
  const [, mantissa, exponentText, unitText] = match;
  const unit = unitText === '' ? 'Gyr' : unitText;
  const unitExponent = UNIT_EXPONENT.get(unit);
  if (unitExponent === undefined) {
    throw new RangeError(`age '${text}' has an unknown unit '${unitText}'; expected ${AGE_FORMS}`);
  }
  const exponent = (exponentText === undefined ? 0 : Number(exponentText)) + unitExponent;
  const years = Number(`${mantissa}e${exponent}`);
  if (!Number.isFinite(years)) {
    throw new RangeError(`age '${text}' is not a finite number of years; expected ${AGE_FORMS}`);
  }
  return years;
}
