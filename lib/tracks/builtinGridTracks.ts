import { generateTrack } from '../model/generateTrack.js';
import { MASS_RANGE } from '../model/limits.js';
import { resampleEeps } from './resampleEeps.js';
import type { EepTrack } from './eepTrack.js';
import type { Track } from './track.js';

/** Metal fractions of the built-in grid: 1e-4 to 0.03, about 0.25–0.4 dex apart. */
export const BUILTIN_Z = [0.0001, 0.0002, 0.0005, 0.001, 0.002, 0.004, 0.007, 0.01, 0.014, 0.02, 0.03] as const;

/**
 * Initial masses of the built-in grid, Msun: 10 log-spaced brown dwarfs from 0.01 Msun,
 * then 40 per dex from 0.0755 Msun to 150 Msun. Every layout boundary (hydrogen-burning
 * limit, helium-white-dwarf / helium-flash / quiet-ignition / neutron-star / black-hole
 * transitions) gets two extra tracks found by bisection, within 10⁻⁹ dex either side, so that
 * the interpolator never has to reach across one and round masses fall on the right side.
 */
export function builtinGridMasses(): number[] {
  const out: number[] = [];
  for (let i = 0; i < 10; i++) out.push(10 ** (-2 + (i * (Math.log10(0.074) + 2)) / 9));
  const lo = Math.log10(0.0755);
  const hi = Math.log10(MASS_RANGE.max);
  const steps = Math.round((hi - lo) * 40);
  for (let i = 0; i <= steps; i++) out.push(10 ** (lo + ((hi - lo) * i) / steps));
  out[out.length - 1] = MASS_RANGE.max;
  return out;
}

/**
 * The built-in grid's tracks at one metallicity, from the analytic model (full lives), with
 * the boundary pairs described at {@link builtinGridMasses}: the tracks `grid export` writes.
 */
export function builtinRawTracks(z: number): Track[] {
  const gen = (m: number) => generateTrack(m, z, { fullLife: true });
  const layoutOf = (t: Track) => resampleEeps(t).layout;
  const base = builtinGridMasses().map(gen);
  const layouts = base.map(layoutOf);
  const extra: Track[] = [];
  for (let i = 1; i < base.length; i++) {
    if (layouts[i] === layouts[i - 1]) continue;
    let a = Math.log10(base[i - 1].initialMass);
    let b = Math.log10(base[i].initialMass);
    while (b - a > 1e-9) {
      const mid = 0.5 * (a + b);
      if (layoutOf(gen(10 ** mid)) === layouts[i - 1]) a = mid;
      else b = mid;
    }
    const ta = gen(10 ** a);
    const tb = gen(10 ** b);
    if (layoutOf(ta) === layouts[i - 1]) extra.push(ta);
    if (layoutOf(tb) === layouts[i]) extra.push(tb);
  }
  return [...base, ...extra].sort((p, q) => p.initialMass - q.initialMass);
}

/** The built-in grid's EEP tracks at one metallicity (builtinRawTracks, resampled). */
export function builtinGridTracks(z: number): EepTrack[] {
  return builtinRawTracks(z).map(resampleEeps);
}
