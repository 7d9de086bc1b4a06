import { describe, expect, test } from 'vitest';
import { parseScenario } from '../lib/population/parseScenario.js';
import { zFromFeh } from '../lib/model/zFromFeh.js';

const valid = {
  name: 'Lantern Reach', seed: 7, size: 20000,
  imf: { kind: 'kroupa' },
  starFormation: { kind: 'burst', duration: '5Myr' },
  metallicity: { z: 0.014 },
  now: '650Myr',
};
/** A copy of the valid scenario with one change at a key path ("a.b"), undefined deletes. */
function withChange(path: string, value: unknown): Record<string, unknown> {
  const doc = structuredClone(valid) as Record<string, unknown>;
  const keys = path.split('.');
  let o = doc as Record<string, unknown>;
  for (const k of keys.slice(0, -1)) o = o[k] as Record<string, unknown>;
  const last = keys[keys.length - 1];
  if (value === undefined) delete o[last];
  else o[last] = value;
  return doc;
}
const messageOf = (doc: unknown) => {
  try {
    parseScenario(doc);
  } catch (e) {
    expect(e).toBeInstanceOf(RangeError);
    return (e as Error).message;
  }
  throw new Error('parseScenario did not throw');
};

describe('parseScenario(json)', () => {
  test('parseScenario fills the defaults: IMF limits 0.08–120 Msun, history 1 Myr → now in 60 log steps', () => {
    const s = parseScenario(valid);
    expect(s).toEqual({
      name: 'Lantern Reach', seed: 7, size: 20000,
      imf: { kind: 'kroupa', minMass: 0.08, maxMass: 120 },
      starFormation: { kind: 'burst', duration: 5e6 },
      metallicity: { kind: 'fixed', z: 0.014 },
      now: 6.5e8,
      history: { from: 1e6, to: 6.5e8, steps: 60, spacing: 'log' },
    });
  });

  test('parseScenario defaults metallicity to solar z 0.014 and reads bare numbers as Gyr', () => {
    const s = parseScenario({ ...valid, metallicity: undefined, now: 2.5 });
    expect(s.metallicity).toEqual({ kind: 'fixed', z: 0.014 });
    expect(s.now).toBe(2.5e9);
  });

  test('parseScenario reads every form of every section', () => {
    const s = parseScenario({
      ...valid,
      imf: { kind: 'power-law', slopes: [1.3, 2.3], breaks: [0.5], minMass: 0.01, maxMass: 150 },
      starFormation: { kind: 'table', points: [[0, 1], ['1e8yr', 2], [0.5, 0]] },
      metallicity: { ageMetallicity: [[0, 0.1], ['10Gyr', -1]], spread: 0.1 },
      history: { from: '10kyr', steps: 5, spacing: 'linear' },
    });
    expect(s.imf).toEqual({ kind: 'power-law', minMass: 0.01, maxMass: 150, slopes: [1.3, 2.3], breaks: [0.5] });
    expect(s.starFormation).toEqual({ kind: 'table', points: [[0, 1], [1e8, 2], [5e8, 0]] });
    expect(s.metallicity).toEqual({ kind: 'ageMetallicity', points: [[0, 0.1], [1e10, -1]], spread: 0.1 });
    expect(s.history).toEqual({ from: 1e4, to: 6.5e8, steps: 5, spacing: 'linear' });
    expect(parseScenario({ ...valid, metallicity: { feh: -1 } }).metallicity).toEqual({ kind: 'fixed', z: zFromFeh(-1) });
    expect(parseScenario({ ...valid, metallicity: { feh: -1, spread: 0.2 } }).metallicity).toEqual({ kind: 'spread', feh: -1, spread: 0.2 });
    expect(parseScenario({ ...valid, starFormation: { kind: 'exponential', tau: '3Gyr' } }).starFormation).toEqual({ kind: 'exponential', tau: 3e9 });
    expect(parseScenario({ ...valid, starFormation: { kind: 'constant' } }).starFormation).toEqual({ kind: 'constant' });
    expect(parseScenario({ ...valid, now: '500kyr' }).history).toEqual({ from: 5e3, to: 5e5, steps: 60, spacing: 'log' });
  });

  // every error kind, with the key path and what is allowed
  test.each([
    { kind: 'unknown key (top level)', doc: { ...valid, colour: 'blue' }, path: 'colour', text: /colour: "blue" is an unknown key; allowed: keys name, seed/ },
    { kind: 'unknown key (nested)', doc: withChange('imf.slope', 2), path: 'imf.slope', text: /imf\.slope: 2 is an unknown key; allowed: keys kind, minMass, maxMass, slopes, breaks/ },
    { kind: 'wrong type', doc: withChange('seed', '7'), path: 'seed', text: /seed: "7" is a string, not a number; allowed: an integer 0–9007199254740991/ },
    { kind: 'wrong type (object)', doc: withChange('imf', 'kroupa'), path: 'imf', text: /imf: "kroupa" is a string, not an object/ },
    { kind: 'not an integer', doc: withChange('size', 2.5), path: 'size', text: /size: 2\.5 is not an integer; allowed: an integer 1–4294967295/ },
    { kind: 'out of range', doc: withChange('imf.maxMass', 300), path: 'imf.maxMass', text: /imf\.maxMass: 300 is out of range; allowed: a mass in Msun, 0\.01–150/ },
    { kind: 'out of range (z)', doc: withChange('metallicity.z', 0.2), path: 'metallicity.z', text: /metallicity\.z: 0\.2 is out of range; allowed: a metal mass fraction 0\.0001–0\.03/ },
    { kind: 'missing required key', doc: withChange('now', undefined), path: 'now', text: /now: missing; required: an age > 0/ },
    { kind: 'missing required key (nested)', doc: withChange('starFormation.duration', undefined), path: 'starFormation.duration', text: /starFormation\.duration: missing; required: an age ≥ 0/ },
    { kind: 'missing kind', doc: withChange('imf.kind', undefined), path: 'imf.kind', text: /imf\.kind: missing; required: one of salpeter, kroupa, chabrier, power-law/ },
    { kind: 'unknown choice', doc: withChange('imf.kind', 'lognormal'), path: 'imf.kind', text: /imf\.kind: "lognormal" is not a known choice; allowed: one of salpeter, kroupa, chabrier, power-law/ },
    { kind: 'bad age text', doc: withChange('now', '650 megayears'), path: 'now', text: /now: "650 megayears" is not an age; allowed: an age > 0, up to 100 Gyr, as a number with an optional unit/ },
    { kind: 'bad age text (nested)', doc: withChange('starFormation.duration', '5 My'), path: 'starFormation.duration', text: /starFormation\.duration: "5 My" is not an age/ },
    { kind: 'age out of range', doc: withChange('now', '200Gyr'), path: 'now', text: /now: "200Gyr" \(200000000000 yr\) is out of range/ },
    { kind: 'slopes/breaks length mismatch', doc: withChange('imf', { kind: 'power-law', slopes: [1, 2, 3], breaks: [0.5] }), path: 'imf.breaks', text: /imf\.breaks: \[0\.5\] has 1 entries for 3 slopes; allowed: exactly 2 breaks/ },
    { kind: 'bad slope entry', doc: withChange('imf', { kind: 'power-law', slopes: [1, 'x'], breaks: [0.5] }), path: 'imf.slopes[1]', text: /imf\.slopes\[1\]: "x" is a string, not a number/ },
    { kind: 'break outside the limits', doc: withChange('imf', { kind: 'power-law', slopes: [1, 2], breaks: [200] }), path: 'imf.breaks[0]', text: /imf\.breaks\[0\]: 200 is out of range/ },
    { kind: 'breaks not increasing', doc: withChange('imf', { kind: 'power-law', slopes: [1, 2, 3], breaks: [2, 1] }), path: 'imf.breaks[1]', text: /imf\.breaks\[1\]: 1 is not above imf\.breaks\[0\] 2/ },
    { kind: 'slopes with a fixed IMF', doc: withChange('imf.slopes', [2]), path: 'imf.slopes', text: /imf\.slopes: \[2\] is not used by imf\.kind "kroupa"/ },
    { kind: 'min not below max', doc: withChange('imf', { kind: 'salpeter', minMass: 5, maxMass: 2 }), path: 'imf.maxMass', text: /imf\.maxMass: 2 is not above imf\.minMass 5/ },
    { kind: 'key of another kind', doc: withChange('starFormation.tau', '1Gyr'), path: 'starFormation.tau', text: /starFormation\.tau: "1Gyr" is not used by starFormation\.kind burst/ },
    { kind: 'table times not increasing', doc: withChange('starFormation', { kind: 'table', points: [[0, 1], ['2Gyr', 1], ['1Gyr', 1]] }), path: 'starFormation.points[2][0]', text: /starFormation\.points\[2\]\[0\]: "1Gyr" is not after starFormation\.points\[1\]\[0\]/ },
    { kind: 'table not a pair', doc: withChange('starFormation', { kind: 'table', points: [[0, 1], [1]] }), path: 'starFormation.points[1]', text: /starFormation\.points\[1\]: \[1\] is not a \[time, rate\] pair/ },
    { kind: 'table forms no stars by now', doc: withChange('starFormation', { kind: 'table', points: [['1Gyr', 1], ['2Gyr', 1]] }), path: 'starFormation.points', text: /starFormation\.points: .* form no stars in \[0, now\]/ },
    { kind: 'negative rate', doc: withChange('starFormation', { kind: 'table', points: [[0, 1], [1, -1]] }), path: 'starFormation.points[1][1]', text: /starFormation\.points\[1\]\[1\]: -1 is out of range; allowed: a rate ≥ 0/ },
    { kind: 'two metallicity forms', doc: withChange('metallicity', { z: 0.01, feh: 0 }), path: 'metallicity', text: /metallicity: .* gives z and feh together; allowed: exactly one of/ },
    { kind: 'spread with z', doc: withChange('metallicity', { z: 0.01, spread: 0.1 }), path: 'metallicity.spread', text: /metallicity\.spread: 0\.1 is not used with z/ },
    { kind: 'spread out of range', doc: withChange('metallicity', { feh: 0, spread: 3 }), path: 'metallicity.spread', text: /metallicity\.spread: 3 is out of range; allowed: a standard deviation of \[Fe\/H\] in dex, > 0 and ≤ 1/ },
    { kind: 'feh out of range', doc: withChange('metallicity', { feh: 1 }), path: 'metallicity.feh', text: /metallicity\.feh: 1 is out of range; allowed: \[Fe\/H\] in dex, -2\.1\d*–0\.3\d*/ },
    { kind: 'age–metallicity entry', doc: withChange('metallicity', { ageMetallicity: [[0, 0], ['1Gyr', 'low']] }), path: 'metallicity.ageMetallicity[1][1]', text: /metallicity\.ageMetallicity\[1\]\[1\]: "low" is a string, not a number/ },
    { kind: 'history steps', doc: { ...valid, history: { steps: 1 } }, path: 'history.steps', text: /history\.steps: 1 is out of range; allowed: an integer 2–10000/ },
    { kind: 'history spacing', doc: { ...valid, history: { spacing: 'cubic' } }, path: 'history.spacing', text: /history\.spacing: "cubic" is not a known choice; allowed: one of log, linear/ },
    { kind: 'history empty span', doc: { ...valid, history: { from: '1Gyr' } }, path: 'history.from', text: /history\.from: "1Gyr" leaves no time between from/ },
    { kind: 'empty name', doc: withChange('name', ' '), path: 'name', text: /name: " " is empty; allowed: a non-empty string/ },
    { kind: 'not an object', doc: [1, 2], path: '(scenario)', text: /\(scenario\): \[1,2\] is an array, not an object/ },
  ])('parseScenario reports $kind at $path', ({ doc, path, text }) => {
    const message = messageOf(doc);
    expect(message).toMatch(text);
    expect(message).toContain(`  ${path}: `);
  });

  test('parseScenario collects every problem into one RangeError, one per line', () => {
    const message = messageOf({ name: '', seed: -1, size: 0, imf: { kind: 'kroupa', extra: 1 }, starFormation: { kind: 'burst' }, now: 'soon', wind: 3 });
    expect(message.split('\n')[0]).toBe('scenario has 7 problems:');
    for (const path of ['wind', 'name', 'seed', 'size', 'now', 'imf.extra', 'starFormation.duration']) expect(message).toContain(`  ${path}: `);
  });
});
