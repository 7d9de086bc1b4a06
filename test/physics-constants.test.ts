import { describe, expect, test } from 'vitest';
import {
  AU, C2_RADIATION, C_LIGHT, G_NEWTON, GM_SUN, H_PLANCK, K_BOLTZMANN, L0_BOL, L_SUN, M_SUN, R_SUN,
  SIGMA_SB, TEFF_SUN, YEAR,
} from '../lib/physics/constants.js';

describe('constants', () => {
  test.each([
    // IAU 2015 Resolution B3 (Prša et al. 2016, AJ 152, 41)
    { name: 'L_SUN', value: L_SUN, ref: 3.828e26 },
    { name: 'R_SUN', value: R_SUN, ref: 6.957e8 },
    { name: 'TEFF_SUN', value: TEFF_SUN, ref: 5772 },
    { name: 'GM_SUN', value: GM_SUN, ref: 1.3271244e20 },
    // CODATA 2018
    { name: 'SIGMA_SB', value: SIGMA_SB, ref: 5.670374419e-8 },
    { name: 'G_NEWTON', value: G_NEWTON, ref: 6.6743e-11 },
    { name: 'C_LIGHT', value: C_LIGHT, ref: 299792458 },
    { name: 'H_PLANCK', value: H_PLANCK, ref: 6.62607015e-34 },
    { name: 'K_BOLTZMANN', value: K_BOLTZMANN, ref: 1.380649e-23 },
    // IAU 2015 Resolution B2
    { name: 'L0_BOL', value: L0_BOL, ref: 3.0128e28 },
    // IAU 2012 Resolution B2
    { name: 'AU', value: AU, ref: 149597870700 },
    // Julian year, 365.25 d (IAU)
    { name: 'YEAR', value: YEAR, ref: 31557600 },
  ])('$name equals its published value $ref exactly', ({ value, ref }) => {
    expect(value).toBe(ref);
  });

  test('M_SUN = GM_SUN / G_NEWTON ≈ 1.98841e30 kg (IAU 2015 B3 / CODATA 2018, derived)', () => {
    expect(M_SUN).toBe(GM_SUN / G_NEWTON);
    expect(M_SUN / 1.98841e30 - 1).toBeLessThan(1e-5); // D: 1.3271244e20 / 6.6743e-11
  });

  test('C2_RADIATION = h c / k ≈ 1.438776877e-2 m K (CODATA 2018)', () => {
    expect(Math.abs(C2_RADIATION / 1.438776877e-2 - 1)).toBeLessThan(1e-9);
  });

  test('SIGMA_SB agrees with 2π⁵k⁴/(15h³c²) from the exact SI constants to 1e-9', () => {
    const s = (2 * Math.PI ** 5 * K_BOLTZMANN ** 4) / (15 * H_PLANCK ** 3 * C_LIGHT ** 2);
    expect(Math.abs(s / SIGMA_SB - 1)).toBeLessThan(1e-9);
  });
});
