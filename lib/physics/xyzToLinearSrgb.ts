/**
 * CIE XYZ (D65 white, Y = 1 for white) to linear sRGB with the matrix of IEC 61966-2-1:1999:
 * [3.2406 −1.5372 −0.4986; −0.9689 1.8758 0.0415; 0.0557 −0.2040 1.0570].
 * Out-of-gamut colours give components outside [0, 1]; nothing is clipped here.
 * Writes into `out` (no allocation).
 *
 * @param X tristimulus X (dimensionless)
 * @param Y tristimulus Y
 * @param Z tristimulus Z
 * @param out array of length ≥ 3 receiving linear r, g, b
 * @returns out
 * @throws nothing
 * @example
 * xyzToLinearSrgb(0.95047, 1, 1.08883, [0, 0, 0]); // ≈ [1.000, 1.000, 1.000] (D65 white)
 */
export function xyzToLinearSrgb<T extends Float64Array | number[]>(X: number, Y: number, Z: number, out: T): T {
  out[0] = 3.2406 * X - 1.5372 * Y - 0.4986 * Z;
  out[1] = -0.9689 * X + 1.8758 * Y + 0.0415 * Z;
  out[2] = 0.0557 * X - 0.204 * Y + 1.057 * Z;
  return out;
}
