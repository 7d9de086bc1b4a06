import type { RemnantKind } from './phases.js';

/** Largest baryonic remnant mass that stays a neutron star, Msun (≈ 2.3 Msun gravitational; common practice). */
export const MAX_NEUTRON_STAR_BARYONIC = 2.75;

/**
 * Remnant of a core-collapse supernova from the "delayed" prescription of Fryer et al. 2012
 * (ApJ 749, 91, §4.2; from memory): proto-compact mass M_proto = 1.15 / 1.2 / 1.3 / 1.4 Msun
 * for CO-core masses below 3.5 / 6 / 11 / above; fallback M_fb = 0.2 (M_CO < 2.5),
 * 0.5 M_CO − 1.05 (2.5–3.5), f_fb (M_f − M_proto) with f_fb = a₂ M_CO + b₂,
 * a₂ = 0.133 − 0.093/(M_f − M_proto), b₂ = −11 a₂ + 1 (3.5–11), and total fallback above
 * (a direct collapse). Baryonic to gravitational mass: neutron stars by
 * M_bar = M_grav + 0.075 M_grav² (Timmes, Woosley & Weaver 1996, ApJ 457, 834), black holes
 * M_grav = 0.9 M_bar.
 *
 * @param coMass carbon–oxygen core mass at collapse, Msun
 * @param finalMass total mass at collapse, Msun
 * @example coreCollapseRemnant(2.0, 12) // { remnant: 'neutron-star', mass: ≈ 1.23 }
 */
export function coreCollapseRemnant(coMass: number, finalMass: number): { remnant: RemnantKind; mass: number } {
  const proto = coMass < 3.5 ? 1.15 : coMass < 6 ? 1.2 : coMass < 11 ? 1.3 : 1.4;
  const available = Math.max(0, finalMass - proto);
  let fallback: number;
  if (coMass < 2.5) fallback = 0.2;
  else if (coMass < 3.5) fallback = 0.5 * coMass - 1.05;
  else if (coMass < 11) {
    const a2 = 0.133 - 0.093 / Math.max(available, 0.1);
    const b2 = -11 * a2 + 1;
    fallback = Math.min(1, Math.max(0, a2 * coMass + b2)) * available;
  } else fallback = available;
  const baryonic = Math.min(finalMass, proto + Math.min(fallback, available));
  if (baryonic <= MAX_NEUTRON_STAR_BARYONIC) {
    const grav = (-1 + Math.sqrt(1 + 4 * 0.075 * baryonic)) / (2 * 0.075);
    return { remnant: 'neutron-star', mass: grav };
  }
  return { remnant: 'black-hole', mass: 0.9 * baryonic };
}
