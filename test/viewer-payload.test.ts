import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { createGridQuery } from '../lib/interp/gridQuery.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { viewerPayload, type ViewerPayloadInput } from '../lib/io/viewerPayload.js';
import { encodeViewerGrid } from '../lib/io/viewerPayloadGrid.js';
import { VIEWER_PAYLOAD_PLACEHOLDER, viewerHtml } from '../lib/io/viewerPayloadHtml.js';
import { decodeViewerGrid, readViewerPayload } from '../lib/io/viewerPayloadRead.js';
import { jsonForScript } from '../lib/io/viewerPayloadScript.js';

const HOSTILE = '</script><img src=x onerror=alert(1)>';

const time = { from: 1e6, to: 1e9, steps: 10, spacing: 'log' as const, now: 5e8, start: 5e8, clock: 'elapsed' as const };
const grid = { bytes: 8, data: 'AAAA' };
const input = (over: Partial<ViewerPayloadInput> = {}): ViewerPayloadInput => ({
  title: 'Lantern Drift', source: 'scenario', time, initialMass: [1, 2, 0.5], birthTime: [0, 1e6, 2e6], z: [0.014, 0.01, 0.02], grid, ...over,
});

describe('jsonForScript(value)', () => {
  test.each([
    ['a closing script tag', HOSTILE],
    ['an HTML comment opener', '<!-- x'],
    ['a character reference', '&lt;&#x3c;'],
    ['line and paragraph separators', 'a\u2028b\u2029c'],
    ['a CDATA end', ']]>'],
  ])('escapes %s so no <, >, & or U+2028/2029 is left', (_name, text) => {
    const out = jsonForScript({ name: text });
    expect(out).not.toMatch(/[<>&\u2028\u2029]/);
    expect(JSON.parse(out)).toEqual({ name: text });
  });

  test('round-trips any JSON value exactly (property)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const out = jsonForScript(v);
        expect(out).not.toMatch(/[<>&\u2028\u2029]/);
        expect(JSON.parse(out)).toEqual(JSON.parse(JSON.stringify(v)));
      }),
      { numRuns: 300 },
    );
  });

  test('round-trips strings made of the dangerous characters (property)', () => {
    const chars = fc.constantFrom('<', '>', '&', '/', '!', '-', '"', '\\', '\u2028', '\u2029', 's', 'c', 'r', 'i', 'p', 't', ' ');
    fc.assert(
      fc.property(fc.array(chars).map((a) => a.join('')), (text) => {
        const out = jsonForScript([text]);
        expect(out.toLowerCase()).not.toContain('</script');
        expect(JSON.parse(out)).toEqual([text]);
      }),
    );
  });

  test('refuses non-finite numbers, naming the key', () => {
    expect(() => jsonForScript({ age: NaN })).toThrow(/age is NaN/);
    expect(() => jsonForScript([Infinity])).toThrow(RangeError);
  });

  test('refuses what JSON cannot hold', () => {
    expect(() => jsonForScript(undefined)).toThrow(TypeError);
  });
});

describe('viewerHtml(template, payload)', () => {
  const template = `<!doctype html><p>x</p><script type="application/json" id="starclock-data">${VIEWER_PAYLOAD_PLACEHOLDER}</script><script>app()</script>`;

  test('puts the escaped payload into the data element and nothing else', () => {
    const payload = viewerPayload(input({ name: [HOSTILE, 'Brim', 'a&b'] }));
    const html = viewerHtml(template, payload);
    expect(html.startsWith('<!doctype html><p>x</p><script type="application/json" id="starclock-data">{')).toBe(true);
    expect(html.endsWith('}</script><script>app()</script>')).toBe(true);
    // the hostile name cannot close the element: exactly the template's two closing tags remain
    expect(html.match(/<\/script/gi)).toHaveLength(2);
    expect(html).not.toContain('<img');
    const data = html.slice(html.indexOf('{'), html.indexOf('</script>'));
    expect(readViewerPayload(data).stars.name).toEqual([HOSTILE, 'Brim', 'a&b']);
  });

  test('does not read $-patterns in the payload as replacement patterns', () => {
    const html = viewerHtml(template, viewerPayload(input({ title: "$& $' $` $$" })));
    expect(html).toContain('"title":"$\\u0026 $\' $` $$"');
  });

  test.each([
    ['no placeholder', '<html></html>', /0 times/],
    ['two placeholders', `${VIEWER_PAYLOAD_PLACEHOLDER}${VIEWER_PAYLOAD_PLACEHOLDER}`, /2 times/],
  ])('throws RangeError for a template with %s', (_n, t, message) => {
    expect(() => viewerHtml(t, viewerPayload(input()))).toThrow(message);
  });
});

describe('viewerPayload(input)', () => {
  test('keeps the columns and takes the median z for the isochrone', () => {
    const p = viewerPayload(input());
    expect(p.stars.initialMass).toEqual([1, 2, 0.5]);
    expect(p.isochroneZ).toBe(0.014);
    expect(viewerPayload(input({ z: [0.01, 0.02, 0.014, 0.03], initialMass: [1, 1, 1, 1], birthTime: [0, 0, 0, 0] })).isochroneZ).toBeCloseTo(0.017, 15);
    expect(p.massLimits).toEqual({ min: 0.5, max: 2 });
    expect(p.stars.name).toBeNull();
  });

  test.each([
    ['no stars', { initialMass: [], birthTime: [], z: [] }, /no stars/],
    ['a short column', { birthTime: [0, 0] }, /birthTime has 2 values for 3 stars/],
    ['a zero mass', { initialMass: [1, 0, 1] }, /star 1 initialMass 0 must be a positive number/],
    ['a NaN z', { z: [0.014, NaN, 0.014] }, /star 1 z NaN/],
    ['an infinite birth time', { birthTime: [0, Infinity, 0] }, /star 1 birthTime Infinity/],
    ['a name list of the wrong length', { name: ['a'] }, /name has 1 values for 3 stars/],
    ['a reversed time grid', { time: { ...time, from: 2e9 } }, /from < to/],
    ['a log grid from 0', { time: { ...time, from: 0 } }, /log time grid needs from > 0/],
    ['one step', { time: { ...time, steps: 1 } }, /steps 1 must be an integer ≥ 2/],
  ])('throws RangeError for %s', (_n, over, message) => {
    expect(() => viewerPayload(input(over as Partial<ViewerPayloadInput>))).toThrow(message);
  });
});

describe('readViewerPayload(text)', () => {
  test.each([
    ['text that is not JSON', '{', /not JSON/],
    ['the unbuilt placeholder', VIEWER_PAYLOAD_PLACEHOLDER, /expected format/],
    ['another version', JSON.stringify({ ...viewerPayload(input()), version: 99 }), /version 99/],
    ['columns of different lengths', JSON.stringify({ ...viewerPayload(input()), stars: { initialMass: [1], birthTime: [], z: [1], name: null } }), /differ in length/],
  ])('throws RangeError for %s', (_n, text, message) => {
    expect(() => readViewerPayload(text)).toThrow(message);
  });
});

describe('encodeViewerGrid(grid, zMin, zMax) and decodeViewerGrid', () => {
  const full = loadBuiltinGrid();

  test('round-trips the slabs a metallicity range needs, answering exactly as the full grid', async () => {
    const encoded = encodeViewerGrid(full, 0.009, 0.012);
    const grid = await decodeViewerGrid({ encoding: 'gzip-base64', ...encoded });
    // 0.009–0.012 lies between the 0.007, 0.01 and 0.014 slabs
    expect(grid.slabs.map((s) => s.z)).toEqual([0.007, 0.01, 0.014]);
    const a = createGridQuery(full);
    const b = createGridQuery(grid);
    for (const [m, age, z] of [[1, 4.6e9, 0.01], [3.2, 3.5e8, 0.011], [18, 1.4e7, 0.012], [0.3, 1e10, 0.009]]) {
      expect(b.star(m, age, z)).toEqual(a.star(m, age, z));
    }
  });

  test('refuses data of the wrong size', async () => {
    const encoded = encodeViewerGrid(full, 0.014, 0.014);
    await expect(decodeViewerGrid({ encoding: 'gzip-base64', data: encoded.data, bytes: encoded.bytes + 8 })).rejects.toThrow(/expected/);
  });
});
