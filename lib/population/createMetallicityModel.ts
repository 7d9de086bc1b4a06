import { Z_RANGE } from '../model/limits.js';
import { fehFromZ, zFromFeh } from '../model/zFromFeh.js';
import { inverseNormal } from './inverseNormal.js';
import { normalCdf } from './normalCdf.js';
import type { MetallicitySpec } from './scenario.js';

/** Metallicity of a population's stars. */
export interface MetallicityModel {
  /** mean [Fe/H] (dex) of stars of this age (yr), before truncation to the model's Z range */
  meanFeh(age: number): number;
  /** standard deviation of [Fe/H] before truncation, dex (0 for none) */
  readonly spread: number;
  /** the metal fraction Z of a star of this age (yr) from one uniform draw u in (0, 1) */
  z(age: number, u: number): number;
}

const FEH_MIN = fehFromZ(Z_RANGE.min);
const FEH_MAX = fehFromZ(Z_RANGE.max);
const clampZ = (z: number) => (z < Z_RANGE.min ? Z_RANGE.min : z > Z_RANGE.max ? Z_RANGE.max : z);

/**
 * Builds the metallicity model of a scenario: fixed Z; [Fe/H] normal about a fixed mean; or an
 * age–metallicity relation (mean [Fe/H] linear in the star's age between points, held at the end
 * values outside them), optionally with a normal spread about it. [Fe/H] → Z by
 * {@link zFromFeh} (solar-scaled: Z/X = (Z/X)☉ 10^[Fe/H]).
 *
 * The spread is truncated to the model's range Z 1e-4–0.03 ([Fe/H] ≈ −2.15 … +0.36) by
 * rejection, never by clipping: a draw outside is drawn again. Done exactly with one uniform
 * per star — the truncated normal's inverse CDF, [Fe/H] = μ + σ Φ⁻¹(Φ(a) + u (Φ(b) − Φ(a))),
 * a, b the range's ends in standard scores — which has the same distribution as
 * reject-and-redraw and keeps each star's number of draws fixed (so shards stay exact).
 *
 * @param spec from {@link parseScenario}
 * @returns the model
 * @throws RangeError when a value lies outside the model's Z range or the spread is not positive
 * @example createMetallicityModel({ kind: 'spread', feh: 0, spread: 0.2 }).z(1e9, 0.5) // 0.014 (the median)
 */
export function createMetallicityModel(spec: MetallicitySpec): MetallicityModel {
  const checkFeh = (path: string, feh: number) => {
    if (!(feh >= FEH_MIN && feh <= FEH_MAX)) {
      throw new RangeError(`${path} ${feh} outside [Fe/H] ${FEH_MIN.toFixed(3)}–${FEH_MAX.toFixed(3)} (Z ${Z_RANGE.min}–${Z_RANGE.max})`);
    }
  };
  const checkSpread = (s: number) => {
    if (!(s >= 0 && Number.isFinite(s))) throw new RangeError(`metallicity.spread ${s} must be a finite number ≥ 0 dex`);
  };
  /** Z from mean μ, spread σ and a uniform u: the truncated normal's inverse CDF. */
  const draw = (mu: number, sigma: number, u: number, pa = normalCdf((FEH_MIN - mu) / sigma), pb = normalCdf((FEH_MAX - mu) / sigma)) => {
    const q = pa + u * (pb - pa);
    const feh = q > 0 && q < 1 ? mu + sigma * inverseNormal(q) : mu;
    return clampZ(zFromFeh(feh < FEH_MIN ? FEH_MIN : feh > FEH_MAX ? FEH_MAX : feh));
  };
  switch (spec.kind) {
    case 'fixed': {
      const z = spec.z;
      if (!(z >= Z_RANGE.min && z <= Z_RANGE.max)) throw new RangeError(`metallicity.z ${z} outside ${Z_RANGE.min}–${Z_RANGE.max}`);
      const feh = fehFromZ(z);
      return { spread: 0, meanFeh: () => feh, z: () => z };
    }
    case 'spread': {
      const { feh, spread } = spec;
      checkFeh('metallicity.feh', feh);
      checkSpread(spread);
      if (spread === 0) {
        const z = clampZ(zFromFeh(feh));
        return { spread, meanFeh: () => feh, z: () => z };
      }
      const pa = normalCdf((FEH_MIN - feh) / spread);
      const pb = normalCdf((FEH_MAX - feh) / spread);
      return { spread, meanFeh: () => feh, z: (_age, u) => draw(feh, spread, u, pa, pb) };
    }
    case 'ageMetallicity': {
      const pts = spec.points;
      if (pts.length < 1) throw new RangeError('metallicity.ageMetallicity needs at least one [age, feh] pair');
      pts.forEach(([a, f], i) => {
        checkFeh(`metallicity.ageMetallicity[${i}][1]`, f);
        if (i > 0 && !(a > pts[i - 1][0])) throw new RangeError(`metallicity.ageMetallicity[${i}][0] ${a} yr is not above the previous age`);
      });
      checkSpread(spec.spread);
      const ages = Float64Array.from(pts, (p) => p[0]);
      const fehs = Float64Array.from(pts, (p) => p[1]);
      const n = ages.length;
      const meanFeh = (age: number) => {
        if (!(age > ages[0])) return fehs[0];
        if (age >= ages[n - 1]) return fehs[n - 1];
        let i = 0;
        while (age > ages[i + 1]) i++;
        return fehs[i] + ((fehs[i + 1] - fehs[i]) * (age - ages[i])) / (ages[i + 1] - ages[i]);
      };
      const sigma = spec.spread;
      if (sigma === 0) return { spread: 0, meanFeh, z: (age) => clampZ(zFromFeh(meanFeh(age))) };
      return { spread: sigma, meanFeh, z: (age, u) => draw(meanFeh(age), sigma, u) };
    }
    default:
      throw new RangeError(`metallicity kind ${String((spec as { kind: unknown }).kind)} is not one of fixed, spread, ageMetallicity`);
  }
}
