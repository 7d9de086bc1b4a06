import { generateTrack } from '../model/generateTrack.js';
import { MASS_RANGE } from '../model/limits.js';
import { resampleEeps } from './resampleEeps.js';
import type { EepTrack } from './eepTrack.js';

/** Metal fractions of the built-in grid: 1e-4 to 0.03, about 0.25–0.4 dex apart. */
export const BUILTIN_Z = [0.0001, 0.0002, 0.0005, 0.001, 0.002, 0.004, 0.007, 0.01, 0.014, 0.02, 0.03] as const;

/**
 * Initial masses of the built-in grid, Msun: 10 log-spaced brown dwarfs from 0.01 Msun,
 * then 40 per dex from 0.0755 Msun to 150 Msun. Every layout boundary (hydrogen-burning
 * limit, helium-white-dwarf / helium-flash / quiet-ignition / neutron-star / black-hole
 * transitions) gets two extra tracks found by bisection, 10⁻⁴ dex either side, so that the
 * interpolator never has to reach across one.
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
 * The built-in grid's EEP tracks at one metallicity, from the analytic model (full lives,
 * resampled onto EEPs), with the boundary pairs described at {@link builtinGridMasses}.
 */
export function builtinGridTracks(z: number): EepTrack[] {
  const eep = (m: number) => resampleEeps(generateTrack(m, z, { fullLife: true }));
  const base = builtinGridMasses().map(eep);
  const extra: EepTrack[] = [];
  for (let i = 1; i < base.length; i++) {
    if (base[i].layout === base[i - 1].layout) continue;
    let a = Math.log10(base[i - 1].initialMass);
    let b = Math.log10(base[i].initialMass);
    const layoutA = base[i - 1].layout;
    while (b - a > 2e-4) {
      const mid = 0.5 * (a + b);
      if (eep(10 ** mid).layout === layoutA) a = mid;
      else b = mid;
    }
    const ta = eep(10 ** a);
    const tb = eep(10 ** b);
    if (ta.layout === layoutA) extra.push(ta);
    if (tb.layout === base[i].layout) extra.push(tb);
  }
  return [...base, ...extra].sort((p, q) => p.initialMass - q.initialMass);
}
