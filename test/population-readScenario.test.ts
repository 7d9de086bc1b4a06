import { describe, expect, test } from 'vitest';
import { readScenario } from '../lib/population/readScenario.js';

describe('readScenario(json)', () => {
  test('readScenario returns the scenario and no issues when valid, never throwing', () => {
    const r = readScenario({ name: 'Tidewell', seed: 1, size: 10, imf: { kind: 'salpeter' }, starFormation: { kind: 'constant' }, now: '1Gyr' });
    expect(r.issues).toEqual([]);
    expect(r.scenario?.imf).toEqual({ kind: 'salpeter', minMass: 0.08, maxMass: 120 });
  });

  test.each([null, 3, 'text', undefined, { name: 'x' }])('readScenario(%s) returns issues and no scenario', (doc) => {
    const r = readScenario(doc);
    expect(r.scenario).toBeUndefined();
    expect(r.issues.length).toBeGreaterThan(0);
  });
});
