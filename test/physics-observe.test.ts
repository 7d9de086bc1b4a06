import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { observe } from '../lib/physics/observe.js';

describe('observe(kind, luminosity, teff, radius, mass)', () => {
  test('gives the Sun: log g 4.438, G2V, M_bol 4.74, M_V 4.81–4.83 (IAU 2015 B2/B3; Willmer 2018; Mamajek 2012)', () => {
    const o = observe('star', 1, 5772, 1, 1);
    expect(Math.abs(o.logg - 4.438)).toBeLessThan(5e-4);
    expect(o.spectralType).toBe('G2V');
    expect(Math.abs(o.mbol! - 4.74)).toBeLessThan(1e-4);
    expect(Math.abs(o.mv! - 4.82)).toBeLessThan(0.05);
    expect(Math.abs(o.bv! - 0.65)).toBeLessThan(0.05); // G2V row, Pecaut & Mamajek 2013 v2024.05.15
    expect(o.color).toMatch(/^#[0-9a-f]{6}$/);
  });

  test('gives a white dwarf its Sion et al. 1983 class (25200 K → DA2.0)', () => {
    const o = observe('white-dwarf', 0.05, 25200, 0.0125, 0.6);
    expect(o.spectralType).toBe('DA2.0');
    expect(o.logg).toBeGreaterThan(7.5);
    expect(o.mv).not.toBeNull();
  });

  test('gives a neutron star magnitudes and colour but no spectral type', () => {
    const o = observe('neutron-star', 0.1, 1e6, 1.4e-5, 1.4);
    expect(o.spectralType).toBeNull();
    expect(o.bv).toBeCloseTo(-0.43, 2); // Rayleigh–Jeans limit of bvColor (derived)
    expect(Number.isFinite(o.mv!)).toBe(true);
    expect(o.color).toMatch(/^#[0-9a-f]{6}$/);
  });

  test('gives a black hole only log g; 0 luminosity and teff are accepted', () => {
    // Schwarzschild radius of 10 Msun: 2GM/c² = 29.53 km = 4.245e-5 Rsun (D, IAU 2015 B3)
    const o = observe('black-hole', 0, 0, 4.245e-5, 10);
    expect(o).toEqual({ logg: expect.any(Number), spectralType: null, bv: null, mbol: null, mv: null, color: null });
    expect(Number.isFinite(o.logg)).toBe(true);
  });

  test('gives a brown dwarf an L, T or Y type', () => {
    expect(observe('brown-dwarf', 1e-5, 1000, 0.1, 0.05).spectralType).toMatch(/^[LTY]\d(Ia|Ib|II|III|IV|V)$/);
  });

  test('returns finite, valid observables for stars over 300 K – 1e8 K (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: Math.log10(300), max: 8, noNaN: true }), fc.double({ min: -6, max: 7, noNaN: true }),
      fc.double({ min: 0.01, max: 100, noNaN: true }), (lt, lL, m) => {
        const teff = 10 ** lt;
        const L = 10 ** lL;
        const r = Math.sqrt(L) / (teff / 5772) ** 2;
        const o = observe('star', L, teff, r, m);
        return Number.isFinite(o.logg) && Number.isFinite(o.bv!) && Number.isFinite(o.mbol!) &&
          Number.isFinite(o.mv!) && /^#[0-9a-f]{6}$/.test(o.color!) &&
          /^[OBAFGKMLTY]\d(Ia|Ib|II|III|IV|V)$/.test(o.spectralType!);
      },
    ));
  });

  test.each([
    { kind: 'star', L: 0, teff: 5772, r: 1, m: 1, msg: /luminosity 0/ },
    { kind: 'star', L: 1, teff: NaN, r: 1, m: 1, msg: /teff NaN/ },
    { kind: 'star', L: 1, teff: 5772, r: 0, m: 1, msg: /radius 0/ },
    { kind: 'star', L: 1, teff: 5772, r: 1, m: -1, msg: /mass -1/ },
    { kind: 'white-dwarf', L: Infinity, teff: 5772, r: 1, m: 1, msg: /luminosity Infinity/ },
    { kind: 'black-hole', L: -1, teff: 0, r: 1, m: 1, msg: /luminosity -1/ },
    { kind: 'black-hole', L: 0, teff: 0, r: 1, m: 0, msg: /mass 0/ },
    { kind: 'planet', L: 1, teff: 5772, r: 1, m: 1, msg: /kind planet/ },
  ])('throws RangeError for $kind with L $L, teff $teff, radius $r, mass $m', ({ kind, L, teff, r, m, msg }) => {
    const call = () => observe(kind as 'star', L, teff, r, m);
    expect(call).toThrow(RangeError);
    expect(call).toThrow(msg);
  });
});
