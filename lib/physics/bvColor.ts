import { assertInRange } from './assertInRange.js';
import { TEFF_MAX, TEFF_MIN } from './constants.js';
import { DWARF_TABLE } from './dwarfTable.js';
import { logPlanckLambda } from './logPlanckLambda.js';
import { monotoneCubic } from '../interp/monotoneCubic.js';
import { smoothBlend } from './smoothBlend.js';

// Dwarf-table B−V, monotone cubic in log Teff (knots in increasing Teff).
const N = DWARF_TABLE.teff.length;
const LOG_T = new Float64Array(N);
const BV = new Float64Array(N);
for (let i = 0; i < N; i++) {
  LOG_T[i] = Math.log10(DWARF_TABLE.teff[N - 1 - i]);
  BV[i] = DWARF_TABLE.bv[N - 1 - i];
}
const table = monotoneCubic(LOG_T, BV);
const LOG_T_COOLEST = LOG_T[0]; // M4V, 3210 K
const LOG_T_HOTTEST = LOG_T[N - 1]; // O9V, 33300 K
const BV_COOLEST = BV[0];
const BV_HOTTEST = BV[N - 1];

/** Where Ballesteros is used alone, and the blends into the table: it is calibrated on
 * A0–M0 dwarfs (9700–3850 K), so it hands over to the table at both ends of that range. */
const COOL_A = Math.log10(3850);
const COOL_B = Math.log10(4150);
const HOT_A = Math.log10(9000);
const HOT_B = Math.log10(9700);

/**
 * Inverse of Ballesteros 2012 (EPL 97, 34008, eq. 14):
 * T = 4600 K [1/(0.92 c + 1.7) + 1/(0.92 c + 0.62)], c = B−V. With u = 0.92 c and s = T/4600,
 * s u² + (2.32 s − 2) u + (1.054 s − 2.32) = 0; the larger root is the physical one.
 */
function ballesteros(teff: number): number {
  const s = teff / 4600;
  const b = 2.32 * s - 2;
  const c = 1.054 * s - 2.32;
  const u = (-b + Math.sqrt(b * b - 4 * s * c)) / (2 * s);
  return u / 0.92;
}

/** Effective wavelengths of the Johnson B and V bands, m (440 and 550 nm; common practice). */
const LAMBDA_B = 440e-9;
const LAMBDA_V = 550e-9;
const K = 2.5 / Math.LN10;

/** Blackbody B−V up to a constant: −2.5 log10[B_λ(λ_B, T) / B_λ(λ_V, T)]. */
function bbShape(teff: number): number {
  return -K * (logPlanckLambda(LAMBDA_B, teff) - logPlanckLambda(LAMBDA_V, teff));
}
const BB_AT_COOLEST = bbShape(10 ** LOG_T_COOLEST);
const BB_AT_HOTTEST = bbShape(10 ** LOG_T_HOTTEST);

/**
 * Johnson B−V colour of a star from its effective temperature, strictly decreasing in Teff.
 *
 * Pieces, each where it is valid, joined continuously by C¹ smoothstep blends in log Teff:
 * - 4150–9000 K: the inverse of Ballesteros 2012 (EPL 97, 34008), a blackbody-based fit good
 *   to ~5 % in Teff for A0–M0 dwarfs (B−V 0.65 ↔ 5778.4 K);
 * - 3210–3850 K and 9700–33300 K: monotone cubic (Steffen 1990) in log Teff through the dwarf
 *   table of Pecaut & Mamajek 2013 (ApJS 208, 9), v2024.05.15; blended into Ballesteros over
 *   3850–4150 K and 9000–9700 K;
 * - beyond the table (below 3210 K, above 33300 K): the blackbody colour shape
 *   −2.5 log10[B_λ(440 nm)/B_λ(550 nm)] offset to equal the end row (derived here). Hot end: it
 *   tends to the Rayleigh–Jeans limit, −0.312 − 0.122 = −0.434 mag (B_λ ∝ λ⁻⁴). Cool end: it
 *   grows like 7100 K / Teff (Wien), so brown dwarfs are very red; real late-M dwarfs saturate
 *   near B−V ≈ 2 from molecular bands, which this rule does not model.
 *
 * @param teff effective temperature, K, in [10, 1e9]
 * @returns B−V, mag
 * @throws {RangeError} when teff is not finite or outside [10, 1e9] K
 * @example
 * bvColor(5778.4); // ≈ 0.650
 */
export function bvColor(teff: number): number {
  assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
  const x = Math.log10(teff);
  if (x < LOG_T_COOLEST) return BV_COOLEST + bbShape(teff) - BB_AT_COOLEST;
  if (x > LOG_T_HOTTEST) return BV_HOTTEST + bbShape(teff) - BB_AT_HOTTEST;
  if (x <= COOL_A || x >= HOT_B) return table(x);
  if (x < COOL_B) {
    const w = smoothBlend(x, COOL_A, COOL_B);
    return (1 - w) * table(x) + w * ballesteros(teff);
  }
  if (x <= HOT_A) return ballesteros(teff);
  const w = smoothBlend(x, HOT_A, HOT_B);
  return (1 - w) * ballesteros(teff) + w * table(x);
}
