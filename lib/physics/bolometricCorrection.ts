import { assertInRange } from './assertInRange.js';
import { TEFF_MAX, TEFF_MIN } from './constants.js';
import { DWARF_TABLE } from './dwarfTable.js';
import { logPlanckLambda } from './logPlanckLambda.js';
import { monotoneCubic } from '../interp/monotoneCubic.js';
import { smoothBlend } from './smoothBlend.js';

/**
 * Flower 1996 BC_V polynomials as corrected by Torres 2010 (AJ 140, 1158, Table 1):
 * BC_V = Σ c_k x^k, x = log10 Teff. Coefficients transcribed exactly (REFERENCES.md).
 */
const TORRES_COOL = [
  -0.190537291496456e5, 0.155144866764412e5, -0.421278819301717e4, 0.381476328422343e3,
];
const TORRES_MID = [
  -0.370510203809015e5, 0.385672629965804e5, -0.150651486316025e5, 0.261724637119416e4,
  -0.170623810323864e3,
];
const TORRES_HOT = [
  -0.118115450538963e6, 0.137145973583929e6, -0.636233812100225e5, 0.147412923562646e5,
  -0.170587278406872e4, 0.788731721804990e2,
];

function horner(c: readonly number[], x: number): number {
  let r = 0;
  for (let k = c.length - 1; k >= 0; k--) r = r * x + c[k];
  return r;
}

/** Half-width, dex in log Teff, over which adjacent Torres pieces are blended (their 0.022
 * and 0.003 mag steps at log T = 3.70 and 3.90 would otherwise be discontinuities). */
const PIECE_BLEND = 0.005;

function torres(x: number): number {
  if (x < 3.7 - PIECE_BLEND) return horner(TORRES_COOL, x);
  if (x < 3.7 + PIECE_BLEND) {
    const w = smoothBlend(x, 3.7 - PIECE_BLEND, 3.7 + PIECE_BLEND);
    return (1 - w) * horner(TORRES_COOL, x) + w * horner(TORRES_MID, x);
  }
  if (x < 3.9 - PIECE_BLEND) return horner(TORRES_MID, x);
  if (x < 3.9 + PIECE_BLEND) {
    const w = smoothBlend(x, 3.9 - PIECE_BLEND, 3.9 + PIECE_BLEND);
    return (1 - w) * horner(TORRES_MID, x) + w * horner(TORRES_HOT, x);
  }
  return horner(TORRES_HOT, x);
}

// Dwarf-table BC_V, monotone cubic in log Teff (knots in increasing Teff).
const N = DWARF_TABLE.teff.length;
const LOG_T = new Float64Array(N);
const BC = new Float64Array(N);
for (let i = 0; i < N; i++) {
  LOG_T[i] = Math.log10(DWARF_TABLE.teff[N - 1 - i]);
  BC[i] = DWARF_TABLE.bcv[N - 1 - i];
}
const table = monotoneCubic(LOG_T, BC);
const LOG_T_COOLEST = LOG_T[0]; // M4V, 3210 K
const LOG_T_HOTTEST = LOG_T[N - 1]; // O9V, 33300 K
const BC_COOLEST = BC[0];
const BC_HOTTEST = BC[N - 1];

/** Cool join: the table alone below M0V (3850 K), Torres alone above 4150 K. */
const COOL_A = Math.log10(3850);
const COOL_B = Math.log10(4150);
/** Hot join: Torres alone below 30000 K, the table alone from O9V (33300 K). */
const HOT_A = Math.log10(30000);
const HOT_B = LOG_T_HOTTEST;

/** Effective wavelength of the Johnson V band, m (≈ 545–551 nm; 550 nm is common practice). */
const LAMBDA_V = 550e-9;
const LN10 = Math.LN10;

/**
 * Blackbody BC_V up to a constant: BC = M_bol − M_V = −2.5 log10(σT⁴) + 2.5 log10 B_λ(λ_V, T)
 * + const. In the Rayleigh–Jeans limit B_λ ∝ T, so BC → −7.5 log10 T + const; in the Wien
 * limit it falls as −1.086 c2/(λ_V T).
 */
function bbShape(teff: number): number {
  return -10 * Math.log10(teff) + (2.5 / LN10) * logPlanckLambda(LAMBDA_V, teff);
}
const BB_AT_COOLEST = bbShape(10 ** LOG_T_COOLEST);
const BB_AT_HOTTEST = bbShape(10 ** LOG_T_HOTTEST);

/**
 * Bolometric correction in the Johnson V band, BC_V = M_bol − M_V, from effective
 * temperature, for dwarfs (gravity dependence neglected, as in the sources).
 *
 * Pieces, each where it is valid, joined continuously (C¹ smoothstep blends):
 * - 4150–30000 K: Flower 1996 polynomials in log10 Teff as corrected by Torres 2010
 *   (AJ 140, 1158, Table 1), their piece steps at log T 3.70 and 3.90 blended over ±0.005 dex;
 * - 3210–3850 K and 30000–33300 K: monotone cubic (Steffen 1990) in log Teff through the dwarf
 *   table of Pecaut & Mamajek 2013 (ApJS 208, 9), v2024.05.15; blended into Torres over
 *   3850–4150 K and 30000–33300 K;
 * - beyond the table (below 3210 K, above 33300 K): the blackbody BC_V shape, offset to equal
 *   the end row — derived here: BC_bb(T) = −10 log10 T + 2.5 log10 B_λ(550 nm, T) + const,
 *   which tends to −7.5 log10 T + const (Rayleigh–Jeans, hot) and −1.086·c2/(λ_V T) (Wien,
 *   cool). For cool dwarfs molecular bands make the real BC_V more negative than this.
 *
 * @param teff effective temperature, K, in [10, 1e9]
 * @returns BC_V, mag
 * @throws {RangeError} when teff is not finite or outside [10, 1e9] K
 * @example
 * bolometricCorrection(5772);  // ≈ −0.081
 * bolometricCorrection(10000); // ≈ −0.249
 */
export function bolometricCorrection(teff: number): number {
  assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
  const x = Math.log10(teff);
  if (x < LOG_T_COOLEST) return BC_COOLEST + bbShape(teff) - BB_AT_COOLEST;
  if (x > LOG_T_HOTTEST) return BC_HOTTEST + bbShape(teff) - BB_AT_HOTTEST;
  if (x <= COOL_A) return table(x);
  if (x < COOL_B) {
    const w = smoothBlend(x, COOL_A, COOL_B);
    return (1 - w) * table(x) + w * torres(x);
  }
  if (x <= HOT_A) return torres(x);
  const w = smoothBlend(x, HOT_A, HOT_B);
  return (1 - w) * torres(x) + w * table(x);
}
