/**
 * sRGB transfer function (IEC 61966-2-1:1999), linear component → encoded:
 * 12.92 c for c ≤ 0.0031308, else 1.055 c^(1/2.4) − 0.055. Negative inputs are mirrored
 * (sign-preserving, as CSS Color 4 does), so the function is odd and monotone.
 *
 * @param c linear component (1 = full)
 * @returns encoded component
 * @throws nothing
 * @example
 * srgbTransfer(0.5); // ≈ 0.7354
 */
export function srgbTransfer(c: number): number {
  const a = c < 0 ? -c : c;
  const e = a <= 0.0031308 ? 12.92 * a : 1.055 * Math.pow(a, 1 / 2.4) - 0.055;
  return c < 0 ? -e : e;
}
