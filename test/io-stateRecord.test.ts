import { describe, expect, test } from 'vitest';
import type { StarState } from '../lib/model/starState.js';
import { STATE_KEYS } from '../lib/model/starState.js';
import { stateRecord } from '../lib/io/stateRecord.js';

// A hand-written state (not model output), keys deliberately out of schema order.
const state = {
  remnantMass: 0.57, remnant: 'white-dwarf', msLifetime: 9.9e9, color: '#fff0e9', mv: 4.83, mbol: 4.75,
  bv: 0.65, spectralType: 'G2V', logg: 4.44, radius: 1, teff: 5772, luminosity: 1, coreMass: 0, mass: 1,
  phase: 'main-sequence', age: 4.57e9, z: 0.014, initialMass: 1,
} as StarState;

describe('stateRecord(state)', () => {
  test('returns the same values with the keys in STATE_KEYS order', () => {
    const record = stateRecord(state);
    expect(Object.keys(record)).toEqual([...STATE_KEYS]);
    expect(record).toEqual(state);
  });

  test('keeps null for keys that do not apply', () => {
    expect(stateRecord({ ...state, color: null }).color).toBeNull();
  });

  test.each([
    { name: 'a missing key', patch: { teff: undefined }, message: /no 'teff'/ },
    { name: 'NaN', patch: { radius: Number.NaN }, message: /radius = NaN/ },
    { name: 'Infinity', patch: { luminosity: Number.POSITIVE_INFINITY }, message: /luminosity = Infinity/ },
  ])('throws a plain Error (a program failure) for $name', ({ patch, message }) => {
    const bad = { ...state, ...patch } as unknown as StarState;
    expect(() => stateRecord(bad)).toThrow(message);
    try {
      stateRecord(bad);
    } catch (error) {
      expect(error).not.toBeInstanceOf(RangeError);
      expect(error).not.toBeInstanceOf(TypeError);
    }
  });
});
