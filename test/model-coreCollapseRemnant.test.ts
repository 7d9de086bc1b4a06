import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { coreCollapseRemnant, MAX_NEUTRON_STAR_BARYONIC } from '../lib/model/coreCollapseRemnant.js';

describe('coreCollapseRemnant(coMass, finalMass)', () => {
  test('gives the doc example: a neutron star of ≈ 1.23 Msun for a 2 Msun CO core in a 12 Msun star (Fryer et al. 2012, from memory)', () => {
    const r = coreCollapseRemnant(2.0, 12);
    expect(r.remnant).toBe('neutron-star');
    expect(r.mass).toBeCloseTo(1.236, 2);
  });
  test('turns a baryonic mass above the neutron-star limit into a black hole of 0.9 of it', () => {
    const r = coreCollapseRemnant(12, 20); // total fallback (Fryer et al. 2012)
    expect(r.remnant).toBe('black-hole');
    expect(r.mass).toBeCloseTo(18, 10);
  });
  test('keeps every neutron star at or below the baryonic limit (Timmes, Woosley & Weaver 1996 conversion)', () => {
    for (let co = 0.5; co < 15; co += 0.25) {
      for (const fin of [co + 1, 2 * co + 2, 3 * co + 5]) {
        const r = coreCollapseRemnant(co, fin);
        expect(r.mass).toBeLessThanOrEqual(fin);
        if (r.remnant === 'neutron-star') expect(r.mass + 0.075 * r.mass ** 2).toBeLessThanOrEqual(MAX_NEUTRON_STAR_BARYONIC + 1e-12);
      }
    }
  });
});

describe('neutron stars of generateTrack', () => {
  // Thorsett & Chakrabarty 1999, ApJ 512, 288: 1.35 ± 0.04 Msun; accept 1.2–1.5 for 10–18 Msun (REFERENCES.md)
  test.each([10, 11, 12, 13, 14, 15, 16, 17, 18])('generateTrack(%s) ends as a 1.2–1.5 Msun neutron star (Thorsett & Chakrabarty 1999)', (m) => {
    const t = generateTrack(m);
    expect(t.remnant).toBe('neutron-star');
    expect(t.remnantMass).toBeGreaterThanOrEqual(1.2);
    expect(t.remnantMass).toBeLessThanOrEqual(1.5);
  });
  test.each([40, 60, 100, 150])('generateTrack(%s) at solar z ends as a black hole', (m) => {
    expect(generateTrack(m).remnant).toBe('black-hole');
  });
});
