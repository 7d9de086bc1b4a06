import { describe, expect, test } from 'vitest';
import { validateScenario } from '../lib/population/validateScenario.js';

describe('validateScenario(json)', () => {
  test('validateScenario returns no issues for a valid scenario', () => {
    expect(validateScenario({ name: 'Tidewell', seed: 1, size: 10, imf: { kind: 'salpeter' }, starFormation: { kind: 'constant' }, now: '1Gyr' })).toEqual([]);
  });

  test('validateScenario lists each issue with its path, value and message', () => {
    const issues = validateScenario({ name: 'Tidewell', seed: 1, size: 0, imf: { kind: 'salpeter', minMass: 'low' }, starFormation: { kind: 'constant' }, now: '1Gyr' });
    expect(issues).toEqual([
      { path: 'size', value: 0, message: 'size: 0 is out of range; allowed: an integer 1–4294967295' },
      { path: 'imf.minMass', value: 'low', message: 'imf.minMass: "low" is a string, not a number; allowed: a mass in Msun, 0.01–150' },
    ]);
  });
});
