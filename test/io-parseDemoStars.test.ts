import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { parseDemoStars } from '../lib/io/parseDemoStars.js';
import { ROOT } from './cli-run.js';

const star = { name: 'Vesk', initialMass: 1, z: 0.014, age: 4e9 };
const text = (value: unknown): string => JSON.stringify(value);

describe('parseDemoStars(text, source)', () => {
  test('reads the bundled demo scenario', () => {
    const path = join(ROOT, 'tracks-demo', 'demo-stars.json');
    const scenario = parseDemoStars(readFileSync(path, 'utf8'), path);
    expect(scenario.region).toBe('Orvel Reach');
    expect(scenario.stars.length).toBeGreaterThanOrEqual(4);
    expect(scenario.stars.length).toBeLessThanOrEqual(6);
  });

  test('keeps name, initialMass, z, age and note', () => {
    const scenario = parseDemoStars(text({ region: 'R', stars: [{ ...star, note: 'n' }] }), 'x.json');
    expect(scenario).toEqual({ region: 'R', stars: [{ ...star, note: 'n' }] });
  });

  test.each([
    { name: 'bad JSON', input: '{', message: /x\.json: not valid JSON/ },
    { name: 'array at top', input: '[]', message: /expected a JSON object/ },
    { name: 'unknown top key', input: text({ region: 'R', stars: [star], seed: 1 }), message: /unknown key "seed"/ },
    { name: 'no stars', input: text({ region: 'R', stars: [] }), message: /"stars" must be a non-empty array/ },
    { name: 'no region', input: text({ stars: [star] }), message: /"region" must be a non-empty string/ },
    { name: 'unknown star key', input: text({ region: 'R', stars: [{ ...star, mass: 1 }] }), message: /stars\[0\]: unknown key "mass"/ },
    { name: 'mass out of range', input: text({ region: 'R', stars: [star, { ...star, name: 'B', initialMass: 200 }] }), message: /stars\[1\] \(B\): initialMass 200 is outside the valid range 0\.01–150 Msun/ },
    { name: 'z as text', input: text({ region: 'R', stars: [{ ...star, z: 'solar' }] }), message: /z "solar" is not a finite number; valid range 0\.0001–0\.03/ },
    { name: 'zero age', input: text({ region: 'R', stars: [{ ...star, age: 0 }] }), message: /age 0 is outside the valid range \(0, 100000000000\] yr/ },
    { name: 'duplicate name', input: text({ region: 'R', stars: [star, star] }), message: /stars\[1\] \(Vesk\): the name is used twice/ },
  ])('rejects $name with a message naming the file and the place', ({ input, message }) => {
    expect(() => parseDemoStars(input, 'x.json')).toThrow(message);
  });
});
