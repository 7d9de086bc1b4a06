/**
 * Weight of a C¹ blend between two relations over [a, b]: 0 at and below a, 1 at and above b,
 * the cubic smoothstep 3u² − 2u³ in between (u = (t − a)/(b − a)). Used to join published
 * relations continuously where their validity ranges meet (common practice).
 *
 * @param t position (any unit, typically log10 Teff)
 * @param a start of the blend interval
 * @param b end of the blend interval (> a)
 * @returns weight in [0, 1]
 * @throws nothing
 * @example
 * smoothBlend(0.5, 0, 1); // 0.5
 */
export function smoothBlend(t: number, a: number, b: number): number {
  if (t <= a) return 0;
  if (t >= b) return 1;
  const u = (t - a) / (b - a);
  return u * u * (3 - 2 * u);
}
