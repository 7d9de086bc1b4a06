import { describe, expect, test } from 'vitest';
import type { StarState } from '../lib/model/starState.js';
import { STATE_KEYS } from '../lib/model/starState.js';
import { formatStateTable } from '../lib/io/formatStateTable.js';
import { formatStateValue } from '../lib/io/formatStateValue.js';

// A hand-written state (not model output) to test layout only.
const state: StarState = {
  initialMass: 1, z: 0.014, age: 4.57e9, phase: 'main-sequence', mass: 0.99987, coreMass: 0,
  luminosity: 1.0023, teff: 5771.6, radius: 1.0004, logg: 4.43812, spectralType: 'G2V', bv: 0.6512,
  mbol: 4.7375, mv: 4.8123, color: '#fff1ea', msLifetime: 9.83e9, remnant: 'white-dwarf', remnantMass: 0.5688,
};

describe('formatStateValue(key, value)', () => {
  test.each([
    { key: 'initialMass', value: 1, text: '1', unit: 'Msun' },
    { key: 'z', value: 0.014, text: '0.014', unit: '' },
    { key: 'age', value: 4.57e9, text: '4.57', unit: 'Gyr' },
    { key: 'age', value: 3e8, text: '300', unit: 'Myr' },
    { key: 'msLifetime', value: 9.834e9, text: '9.83', unit: 'Gyr' },
    { key: 'teff', value: 5771.6, text: '5772', unit: 'K' },
    { key: 'teff', value: 812.34, text: '812.3', unit: 'K' },
    { key: 'luminosity', value: 1.0023, text: '1.002', unit: 'Lsun' },
    { key: 'luminosity', value: 3.2e-5, text: '3.200e-5', unit: 'Lsun' },
    { key: 'logg', value: 4.43812, text: '4.438', unit: 'dex cgs' },
    { key: 'bv', value: 0.6512, text: '0.651', unit: 'mag' },
    { key: 'mv', value: 4.8123, text: '4.81', unit: 'mag' },
    { key: 'spectralType', value: 'G2V', text: 'G2V', unit: '' },
    { key: 'color', value: null, text: '—', unit: 'sRGB' },
  ] as { key: keyof StarState; value: never; text: string; unit: string }[])(
    'formatStateValue($key, $value) is $text $unit',
    ({ key, value, text, unit }) => {
      expect(formatStateValue(key, value)).toEqual({ text, unit });
    },
  );
});

describe('formatStateTable(state)', () => {
  test('has a header, a rule and one row per schema key in order, with units', () => {
    const rows = formatStateTable(state).trimEnd().split('\n');
    expect(rows[0]).toMatch(/^key\s+value\s+unit$/);
    expect(rows[1]).toMatch(/^-+\s+-+\s+-+$/);
    expect(rows.slice(2).map((row) => row.split(/\s+/)[0])).toEqual([...STATE_KEYS]);
    expect(rows.some((row) => /^teff\s+5772\s+K$/.test(row))).toBe(true);
    expect(rows.some((row) => /^radius\s+1\.000\s+Rsun$/.test(row))).toBe(true);
  });

  test('writes — for keys that do not apply', () => {
    const hole: StarState = { ...state, phase: 'black-hole', spectralType: null, bv: null, mbol: null, mv: null, color: null };
    const out = formatStateTable(hole);
    for (const key of ['spectralType', 'bv', 'mbol', 'mv', 'color']) {
      expect(out).toMatch(new RegExp(`^${key}\\s+—`, 'm'));
    }
  });
});
