/**
 * Rows of the dwarf (luminosity class V) sequence used as anchors by the colour, bolometric
 * correction and spectral-class relations: Pecaut & Mamajek 2013, ApJS 208, 9, as updated in
 * the online table version 2024.05.15 (rows as transcribed in the project's REFERENCES.md).
 * Columns are parallel arrays in order of decreasing Teff; no further rows are added here.
 *
 * Columns: `type` MK type; `teff` K; `bv` B−V mag; `bcv` BC_V mag; `mv` M_V mag;
 * `logL` log10(L/Lsun); `radius` Rsun; `mass` Msun.
 *
 * @example
 * DWARF_TABLE.teff[4]; // 5770 (G2V)
 */
export const DWARF_TABLE = Object.freeze({
  version: 'Pecaut & Mamajek 2013 dwarf table, v2024.05.15',
  type: Object.freeze(['O9V', 'B5V', 'A0V', 'F0V', 'G2V', 'K0V', 'M0V', 'M4V']),
  teff: Float64Array.of(33300, 15700, 9700, 7220, 5770, 5290, 3850, 3210),
  bv: Float64Array.of(-0.312, -0.156, 0.0, 0.295, 0.65, 0.816, 1.42, 1.65),
  bcv: Float64Array.of(-3.11, -1.34, -0.21, 0.01, -0.085, -0.195, -1.15, -2.51),
  mv: Float64Array.of(-4.2, -0.85, 0.99, 2.57, 4.8, 5.78, 8.8, 12.61),
  logL: Float64Array.of(4.82, 2.772, 1.584, 0.864, 0.01, -0.324, -1.164, -2.144),
  radius: Float64Array.of(7.72, 3.36, 2.193, 1.728, 1.012, 0.813, 0.588, 0.274),
  mass: Float64Array.of(20.2, 4.7, 2.33, 1.6, 1.0, 0.86, 0.585, 0.24),
});
