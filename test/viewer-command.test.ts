import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { slugify } from '../cli/commands/view.js';
import { BIN, lines, ROOT, runBin } from './cli-run.js';

let dir: string;
let scenarioPath: string;
let tablePath: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'starclock-view-'));
  const doc = { ...JSON.parse(readFileSync(join(ROOT, 'tracks-demo', 'scenarios', 'tessel-cluster.json'), 'utf8')), size: 400 };
  scenarioPath = join(dir, 'tessel.json');
  writeFileSync(scenarioPath, JSON.stringify(doc));
  tablePath = join(dir, 'Reach Stars.csv');
  writeFileSync(tablePath, 'name,initialMass,age_Gyr\nWendhal,1,4.1\nSaffrel,3.2,0.35\n');
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

const page = (path: string) => readFileSync(path, 'utf8');

describe('starclock view', () => {
  test('writes <scenario name>.html in the current folder by default, one self-contained page', () => {
    const r = runBin(['view', scenarioPath], dir);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
    expect(lines(r.stderr)).toEqual([expect.stringMatching(/^starclock: wrote tessel-cluster\.html: 400 stars, \d+\.\d MB; open it in a browser$/)]);
    const html = page(join(dir, 'tessel-cluster.html'));
    expect(html.startsWith('<!doctype html>')).toBe(true);
    expect(html).not.toContain('__STARCLOCK');
    // nothing is fetched: no external script, style, image or link
    expect(html).not.toMatch(/<(script|link|img|iframe)[^>]+(src|href)=/i);
    expect(html).toContain("default-src 'none'");
  });

  test('names a table\u2019s page after its file, and -o writes where it is told', () => {
    expect(runBin(['view', tablePath], dir).code).toBe(0);
    expect(existsSync(join(dir, 'reach-stars.html'))).toBe(true);
    const out = join(dir, 'orvel.html');
    const r = runBin(['view', join(ROOT, 'tracks-demo', 'orvel-catalogue.csv'), '-o', out], dir);
    expect(r.code).toBe(0);
    expect(page(out)).toContain('orvel-catalogue.csv');
  });

  test('never writes over its input', () => {
    const before = readFileSync(tablePath, 'utf8');
    const r = runBin(['view', tablePath, '-o', tablePath], dir);
    expect(r.code).not.toBe(0);
    expect(lines(r.stderr)).toEqual([expect.stringMatching(/refusing to write .*Reach Stars\.csv: it is an input file/)]);
    expect(readFileSync(tablePath, 'utf8')).toBe(before);
  });

  test.each([
    ['a port out of range', ['--serve', '--port', '70000'], /^starclock: --port '70000' must be an integer in 0–65535/],
    ['an unknown age unit', ['--age-unit', 'fortnight'], /^starclock: --age-unit 'fortnight' must be one of yr, kyr, Myr, Gyr/],
  ])('exits 2 with one line for %s', (_n, args, message) => {
    const r = runBin(['view', tablePath, ...args], dir);
    expect(r.code).toBe(2);
    expect(lines(r.stderr)).toEqual([expect.stringMatching(message)]);
  });

  test.each([
    ['a star outside the grid', 'initialMass,age\n500,1e9\n', /^starclock: table row 1: initialMass 500 outside the built-in grid's 0\.01–150 Msun\n$/],
    ['no age column', 'initialMass\n1\n', /^starclock: table: no age column/],
    ['a bad value', 'initialMass,age\n1,soon\n', /^starclock: table line 2: age 'soon' is not an age; expected a number \(in yr\) or a number with a unit/],
    ['a scenario with an unknown key', '{"name":"x","seed":1,"size":5,"imf":{"kind":"kroupa"},"starFormation":{"kind":"constant"},"now":"1Gyr","colour":"red"}', /^starclock: scenario has 1 problem/],
  ])('exits 2 naming the problem for %s', (_n, text, message) => {
    const file = join(dir, `bad-${Math.random().toString(36).slice(2)}.txt`);
    writeFileSync(file, text);
    const r = runBin(['view', file, '-o', join(dir, 'bad.html')], dir);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(existsSync(join(dir, 'bad.html'))).toBe(false);
  });

  test('--help names the options and the keys', () => {
    const r = runBin(['view', '--help']);
    expect(r.code).toBe(0);
    for (const word of ['--output', '--serve', '--port', '--age-unit', '--until', '--grid', 'space plays and pauses']) expect(r.stdout).toContain(word);
  });

  test('--serve serves the page at / on 127.0.0.1 only, 404 for anything else, and stops on SIGINT', async () => {
    const filesBefore = readdirSync(dir).sort();
    const child = spawn(process.execPath, [BIN, 'view', tablePath, '--serve'], { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'] });
    let stdout = '';
    let stderr = '';
    child.stderr.on('data', (d) => (stderr += d));
    const url = await new Promise<string>((resolve, reject) => {
      child.stdout.on('data', (d) => {
        stdout += d;
        const m = /^(http:\/\/127\.0\.0\.1:\d+\/)\n/.exec(stdout);
        if (m) resolve(m[1]);
      });
      child.on('exit', () => reject(new Error(`view --serve exited early: ${stderr}`)));
    });
    const get = (path: string, method = 'GET') => new Promise<{ status: number; type: string; body: string }>((resolve, reject) => {
      const req = request(new URL(path, url), { method }, (res) => {
        let body = '';
        res.on('data', (c) => (body += c));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, type: String(res.headers['content-type']), body }));
      });
      req.on('error', reject);
      req.end();
    });
    const home = await get('/');
    expect(home.status).toBe(200);
    expect(home.type).toBe('text/html; charset=utf-8');
    expect(home.body).toContain('Wendhal');
    for (const path of ['/x', '/Reach%20Stars.csv', '/%2e%2e/%2e%2e/etc/passwd', '/index.html']) expect((await get(path)).status, path).toBe(404);
    expect((await get('/', 'POST')).status).toBe(404);
    // without -o, nothing is written
    expect(readdirSync(dir).sort()).toEqual(filesBefore);
    const code = await new Promise<number | null>((resolve) => {
      child.on('exit', (c) => resolve(c));
      child.kill('SIGINT');
    });
    expect(code).toBe(0);
    expect(stderr).toContain('stopped serving');
  });
});

describe('slugify(name)', () => {
  test.each([
    ['Tessel Cluster', 'tessel-cluster'],
    ["Korrund's Pyre", 'korrund-s-pyre'],
    ['Ørvel Reach ✦', 'rvel-reach'],
    ['../../etc', 'etc'],
    ['', 'population'],
  ])('slugify(%j) is %j', (name, slug) => {
    expect(slugify(name)).toBe(slug);
  });
});
