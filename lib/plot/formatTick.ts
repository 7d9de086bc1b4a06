/**
 * A tick value as printed on an axis: as many decimals as the step needs (step 0.2 → one,
 * step 5 → none), and a true minus sign (U+2212), as typeset figures use.
 *
 * @param value the tick value
 * @param step the axis' tick step (> 0)
 * @example formatTick(-2, 1) // '−2'
 * @example formatTick(3.6, 0.2) // '3.6'
 */
export function formatTick(value: number, step: number): string {
  const decimals = step > 0 ? Math.max(0, Math.min(12, -Math.floor(Math.log10(step) + 1e-9))) : 0;
  const text = Math.abs(value).toFixed(decimals);
  return value < 0 && Number(text) !== 0 ? `\u2212${text}` : text;
}
