import { inverseNormal } from './inverseNormal.js';
import { normalCdf } from './normalCdf.js';
import type { ImfSpec } from './scenario.js';

/** A normalised initial mass function over [minMass, maxMass] (Msun). */
export interface Imf {
  readonly minMass: number;
  readonly maxMass: number;
  /** probability density dN/dm per Msun (integrates to 1 over the limits; 0 outside) */
  pdf(m: number): number;
  /** fraction of stars with initial mass ≤ m */
  cdf(m: number): number;
  /** the mass m with cdf(m) = u, 0 < u < 1: the exact inverse CDF */
  quantile(u: number): number;
  /** mean initial mass, Msun (exact integral) */
  readonly meanMass: number;
}

/** Kroupa 2001 (MNRAS 322, 231, eq. 2): α per segment and the break masses (Msun). */
const KROUPA_SLOPES = [0.3, 1.3, 2.3];
const KROUPA_BREAKS = [0.08, 0.5];
/** Salpeter 1955 (ApJ 121, 161): dN/dm ∝ m^-2.35. */
const SALPETER_SLOPE = 2.35;
/** Chabrier 2003 (PASP 115, 763, Table 1, single stars): per log10 m, A exp[−(log m − log mc)²/(2σ²)] below 1 Msun. */
const CHABRIER_A = 0.158;
const CHABRIER_MC = 0.079;
const CHABRIER_SIGMA = 0.69;
/** Chabrier 2003: dN/dlog m ∝ m^−x above 1 Msun, x = 1.3, i.e. dN/dm ∝ m^−2.3. */
const CHABRIER_X = 1.3;

const LN10 = Math.LN10;
const SQRT_2PI = Math.sqrt(2 * Math.PI);

/**
 * One piece of the IMF over [m0, m1], with unnormalised number weight `n` and mass weight `w`:
 * kind 0 a power law dN/dm = e^lnA m^−α; kind 1 Chabrier's lognormal in x = log10 m.
 */
interface Piece {
  kind: 0 | 1;
  m0: number;
  m1: number;
  alpha: number;
  lnA: number;
  n: number;
  w: number;
  // lognormal: Φ at both ends of the piece, in standard scores of log10 m
  p0: number;
  p1: number;
}

/** (e^(βr) − 1)/β, and r at β = 0 (the log case), without cancellation near β = 0. */
function expm1Over(beta: number, r: number): number {
  return beta === 0 ? r : Math.expm1(beta * r) / beta;
}

function powerPiece(m0: number, m1: number, alpha: number, lnA: number): Piece {
  const r = Math.log(m1 / m0);
  // ∫ A m^−α dm = A m0^(1−α) (e^((1−α) r) − 1)/(1−α); the mass moment likewise with 2 − α
  const n = Math.exp(lnA + (1 - alpha) * Math.log(m0)) * expm1Over(1 - alpha, r);
  const w = Math.exp(lnA + (2 - alpha) * Math.log(m0)) * expm1Over(2 - alpha, r);
  return { kind: 0, m0, m1, alpha, lnA, n, w, p0: 0, p1: 0 };
}

function lognormalPiece(m0: number, m1: number): Piece {
  const mu = Math.log10(CHABRIER_MC);
  const s = CHABRIER_SIGMA;
  const z0 = (Math.log10(m0) - mu) / s;
  const z1 = (Math.log10(m1) - mu) / s;
  const p0 = normalCdf(z0);
  const p1 = normalCdf(z1);
  // number: ∫ A exp(−(x−μ)²/2σ²) dx = A σ √(2π) [Φ(z1) − Φ(z0)]
  const n = CHABRIER_A * s * SQRT_2PI * (p1 - p0);
  // mass: ∫ 10^x A exp(−(x−μ)²/2σ²) dx; completing the square with k = ln 10:
  // = A σ √(2π) exp(kμ + k²σ²/2) [Φ(z1 − kσ) − Φ(z0 − kσ)]
  const k = LN10;
  const w = CHABRIER_A * s * SQRT_2PI * Math.exp(k * mu + 0.5 * k * k * s * s) * (normalCdf(z1 - k * s) - normalCdf(z0 - k * s));
  return { kind: 1, m0, m1, alpha: 0, lnA: 0, n, w, p0, p1 };
}

/**
 * Continuous piecewise power law clipped to [lo, hi]: slope α_k between breaks, the first
 * segment's coefficient e^lnA0; continuity at each break b gives A_{k+1} = A_k b^(α_{k+1} − α_k).
 */
function powerLawPieces(slopes: readonly number[], breaks: readonly number[], lo: number, hi: number, lnA0 = 0): Piece[] {
  const pieces: Piece[] = [];
  let lnA = lnA0;
  const edges = [-Infinity, ...breaks, Infinity];
  for (let k = 0; k < slopes.length; k++) {
    if (k > 0) lnA += (slopes[k] - slopes[k - 1]) * Math.log(breaks[k - 1]);
    const a = Math.max(lo, edges[k]);
    const b = Math.min(hi, edges[k + 1]);
    if (b > a) pieces.push(powerPiece(a, b, slopes[k], lnA));
  }
  return pieces;
}

/**
 * Builds a normalised initial mass function (IMF) from its specification, with an exact
 * inverse CDF for sampling.
 *
 * - `salpeter`: dN/dm ∝ m^−2.35 (Salpeter 1955, ApJ 121, 161);
 * - `kroupa`: dN/dm ∝ m^−α, α = 0.3 (m < 0.08), 1.3 (0.08–0.5), 2.3 (> 0.5 Msun), continuous
 *   (Kroupa 2001, MNRAS 322, 231, eq. 2);
 * - `chabrier`: single-star IMF of Chabrier 2003 (PASP 115, 763, Table 1): per log10 m,
 *   0.158 exp[−(log m − log 0.079)²/(2·0.69²)] for m ≤ 1 Msun and a power law dN/dlog m ∝ m^−1.3
 *   above, its coefficient set so the two meet at 1 Msun (0.0441, vs 0.0443 printed in the paper);
 * - `power-law`: the user's slopes and breaks, continuous at the breaks.
 *
 * Method: the IMF is cut into pieces at the breaks and the limits, each piece's number and mass
 * integrals are exact — power laws in closed form, (m1^(1−α) − m0^(1−α))/(1−α) written with
 * expm1 and reducing to ln(m1/m0) at α = 1 (α = 2 for the mass); the lognormal through the normal
 * CDF ({@link normalCdf}), its mass moment by completing the square. A draw u picks its piece by
 * the cumulative weights, then inverts within it exactly: for a power law
 * m = m0 [1 + f ((m1/m0)^(1−α) − 1)]^(1/(1−α)) (m = m0 (m1/m0)^f at α = 1), for the lognormal
 * log m = log mc + σ Φ⁻¹(Φ(z0) + f (Φ(z1) − Φ(z0))) ({@link inverseNormal}).
 *
 * @param spec the IMF with its limits in Msun (from {@link parseScenario})
 * @returns the IMF
 * @throws RangeError when the limits or slopes are unusable (not finite, min ≥ max, breaks not inside)
 * @example createImf({ kind: 'salpeter', minMass: 0.1, maxMass: 100 }).meanMass // ≈ 0.3514
 */
export function createImf(spec: ImfSpec): Imf {
  const { minMass: lo, maxMass: hi } = spec;
  if (!(lo > 0 && hi > lo && Number.isFinite(hi))) {
    throw new RangeError(`imf limits ${lo}–${hi} Msun: need 0 < minMass < maxMass, both finite`);
  }
  let pieces: Piece[];
  switch (spec.kind) {
    case 'salpeter':
      pieces = powerLawPieces([SALPETER_SLOPE], [], lo, hi);
      break;
    case 'kroupa':
      pieces = powerLawPieces(KROUPA_SLOPES, KROUPA_BREAKS, lo, hi);
      break;
    case 'power-law': {
      const { slopes, breaks } = spec;
      if (slopes.length < 1 || breaks.length !== slopes.length - 1 || !slopes.every(Number.isFinite)) {
        throw new RangeError(`imf: ${slopes.length} slopes need ${Math.max(0, slopes.length - 1)} breaks (got ${breaks.length}), all finite`);
      }
      for (let i = 0; i < breaks.length; i++) {
        if (!(breaks[i] > lo && breaks[i] < hi) || (i > 0 && !(breaks[i] > breaks[i - 1]))) {
          throw new RangeError(`imf.breaks[${i}] ${breaks[i]} must be strictly increasing and inside ${lo}–${hi} Msun`);
        }
      }
      pieces = powerLawPieces(slopes, breaks, lo, hi);
      break;
    }
    case 'chabrier': {
      pieces = [];
      if (lo < 1) pieces.push(lognormalPiece(lo, Math.min(hi, 1)));
      if (hi > 1) {
        // per log m at 1 Msun the lognormal gives A exp(−(log mc)²/2σ²); dN/dm = that / (m ln 10) · m^−x
        const u = Math.log10(CHABRIER_MC) / CHABRIER_SIGMA;
        const lnA = Math.log(CHABRIER_A) - 0.5 * u * u - Math.log(LN10);
        pieces.push(...powerLawPieces([CHABRIER_X + 1], [], Math.max(lo, 1), hi, lnA));
      }
      break;
    }
    default:
      throw new RangeError(`imf.kind ${String((spec as { kind: unknown }).kind)} is not one of salpeter, kroupa, chabrier, power-law`);
  }
  let total = 0;
  let mass = 0;
  for (const p of pieces) {
    total += p.n;
    mass += p.w;
  }
  const np = pieces.length;
  // cumulative number fractions at the start of each piece
  const cum = new Float64Array(np + 1);
  for (let i = 0; i < np; i++) cum[i + 1] = cum[i] + pieces[i].n / total;
  cum[np] = 1;
  const lnTotal = Math.log(total);
  const mu = Math.log10(CHABRIER_MC);

  const pieceAt = (m: number) => {
    let i = 0;
    while (i < np - 1 && m > pieces[i].m1) i++;
    return i;
  };
  /** Unnormalised number within piece p from p.m0 to m. */
  const partial = (p: Piece, m: number) => {
    if (p.kind === 0) return Math.exp(p.lnA + (1 - p.alpha) * Math.log(p.m0)) * expm1Over(1 - p.alpha, Math.log(m / p.m0));
    return CHABRIER_A * CHABRIER_SIGMA * SQRT_2PI * (normalCdf((Math.log10(m) - mu) / CHABRIER_SIGMA) - p.p0);
  };

  return {
    minMass: lo,
    maxMass: hi,
    meanMass: mass / total,
    pdf(m: number): number {
      if (!(m >= lo && m <= hi)) return 0;
      const p = pieces[pieceAt(m)];
      if (p.kind === 0) return Math.exp(p.lnA - p.alpha * Math.log(m) - lnTotal);
      const d = (Math.log10(m) - mu) / CHABRIER_SIGMA;
      return (CHABRIER_A * Math.exp(-0.5 * d * d)) / (m * LN10 * total);
    },
    cdf(m: number): number {
      if (!(m > lo)) return 0;
      if (m >= hi) return 1;
      const i = pieceAt(m);
      const v = cum[i] + partial(pieces[i], m) / total;
      return v < 0 ? 0 : v > 1 ? 1 : v;
    },
    quantile(u: number): number {
      if (!(u > 0 && u < 1)) throw new RangeError(`imf quantile: u ${u} must be strictly between 0 and 1`);
      let i = 0;
      while (i < np - 1 && u >= cum[i + 1]) i++;
      const p = pieces[i];
      const f = (u - cum[i]) / (cum[i + 1] - cum[i]);
      let m: number;
      if (p.kind === 0) {
        const beta = 1 - p.alpha;
        const r = Math.log(p.m1 / p.m0);
        m = p.m0 * Math.exp(beta === 0 ? f * r : Math.log1p(f * Math.expm1(beta * r)) / beta);
      } else {
        const q = p.p0 + f * (p.p1 - p.p0);
        m = q > 0 && q < 1 ? 10 ** (mu + CHABRIER_SIGMA * inverseNormal(q)) : q <= 0 ? p.m0 : p.m1;
      }
      return m < p.m0 ? p.m0 : m > p.m1 ? p.m1 : m;
    },
  };
}
