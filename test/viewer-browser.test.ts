// The viewer page in a real browser: written by `starclock view`'s own functions, opened from
// file:// in headless Chromium, driven through window.starclockViewer and the keyboard.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { viewerPage, viewerPayloadFromText } from '../cli/commands/view.js';
import { createGridQuery } from '../lib/interp/gridQuery.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { PHASES } from '../lib/model/phases.js';
import { parseScenario } from '../lib/population/parseScenario.js';
import { populationHistory, type PopulationHistory } from '../lib/population/populationHistory.js';
import { ROOT } from './cli-run.js';
import { browserTestsRun, openChromium } from './viewer-chromium.js';

const ARTIFACTS = join(ROOT, 'test-artifacts');
const HOSTILE = '</script><img src=x onerror=alert(1)>';

// a few thousand stars keep the page quick; Tessel (650 Myr, solar z) has every kind of remnant
const scenarioDoc = { ...JSON.parse(readFileSync(join(ROOT, 'tracks-demo', 'scenarios', 'tessel-cluster.json'), 'utf8')), size: 3000 };

interface Problems {
  errors: string[];
  requests: string[];
  dialogs: string[];
}

function watch(page: Page): Problems {
  const p: Problems = { errors: [], requests: [], dialogs: [] };
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warning') p.errors.push(`console ${m.type()}: ${m.text()}`);
  });
  page.on('pageerror', (e) => p.errors.push(`page error: ${e.message}`));
  page.on('request', (r) => {
    if (!/^(file|data|blob):/.test(r.url())) p.requests.push(r.url());
  });
  page.on('dialog', (d) => {
    p.dialogs.push(d.message());
    void d.dismiss();
  });
  return p;
}

const countsInDom = (page: Page) =>
  page.$$eval('#counts tbody tr', (rows) => Object.fromEntries(rows.map((r) => [(r as HTMLElement).dataset.phase, r.querySelector('td.num')?.textContent])));

describe.runIf(browserTestsRun())('viewer page in Chromium', () => {
  let browser: Awaited<ReturnType<typeof openChromium>>;
  let scenarioFile: string;
  let tableFile: string;
  let history: PopulationHistory;

  beforeAll(async () => {
    mkdirSync(ARTIFACTS, { recursive: true });
    const grid = loadBuiltinGrid();
    history = populationHistory(parseScenario(scenarioDoc), createGridQuery(grid));
    scenarioFile = join(ARTIFACTS, 'viewer-tessel.html');
    writeFileSync(scenarioFile, await viewerPage(await viewerPayloadFromText(JSON.stringify(scenarioDoc), 'tessel.json', { grid })));
    const table = [
      'name,initialMass,age_Gyr,z',
      `"${HOSTILE.replace(/"/g, '""')}",1.0,4.6,0.014`,
      '"Brimlow & <b>Vane</b>",2.1,0.9,0.014',
      'Ossery Deep,0.8,11.5,0.014',
      'Kettle Hollow,12,0.012,0.014',
    ].join('\n');
    tableFile = join(ARTIFACTS, 'viewer-table.html');
    writeFileSync(tableFile, await viewerPage(await viewerPayloadFromText(table, 'hostile-names.csv', { grid })));
    browser = await openChromium();
  });

  afterAll(async () => {
    await browser?.close();
  });

  const open = async (file: string) => {
    const page = await browser.context.newPage();
    const problems = watch(page);
    await page.goto(pathToFileURL(file).href);
    await page.evaluate(() => window.starclockViewer.ready);
    return { page, problems };
  };

  test('opens from file:// with no network request, no console error and the counts of populationHistory at every time set', async () => {
    const { page, problems } = await open(scenarioFile);
    for (const k of [0, 7, 23, 41, 59]) {
      const t = history.times[k];
      await page.evaluate((yr) => window.starclockViewer.setTime(yr), t);
      const state = await page.evaluate(() => window.starclockViewer.state());
      expect(state.time).toBe(t);
      const expected = Object.fromEntries(PHASES.map((p) => [p, history.counts[p][k]]));
      expect(state.counts, `counts at ${t} yr`).toEqual(expected);
      const born = PHASES.reduce((s, p) => s + history.counts[p][k], 0);
      expect(state.unborn).toBe(3000 - born);
      const dom = await countsInDom(page);
      for (const p of PHASES) expect(dom[p], `${p} shown at ${t} yr`).toBe(String(history.counts[p][k]));
      // every star that has light is drawn; black holes and unborn stars are not
      expect(state.drawn).toBe(born - history.counts['black-hole'][k]);
      const turnoff = history.turnoffMass[k];
      if (turnoff === null) expect(state.turnoffMass).toBeNull();
      else expect(state.turnoffMass).toBeCloseTo(turnoff, 6);
    }
    expect(problems).toEqual({ errors: [], requests: [], dialogs: [] });
    await page.screenshot({ path: join(ARTIFACTS, 'viewer-hr.png') });
    await page.close();
  });

  test('space plays and pauses; the arrow keys step through the time grid and change the age shown', async () => {
    const { page, problems } = await open(scenarioFile);
    const label = () => page.$eval('#time-label', (e) => e.textContent);
    await page.evaluate((yr) => window.starclockViewer.setTime(yr), history.times[10]);
    const before = await label();
    await page.keyboard.press('ArrowRight');
    expect((await page.evaluate(() => window.starclockViewer.state())).time).toBe(history.times[11]);
    expect(await label()).not.toBe(before);
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('ArrowLeft');
    await page.keyboard.press('ArrowLeft');
    expect((await page.evaluate(() => window.starclockViewer.state())).time).toBe(history.times[10]);
    expect(await label()).toBe(before);

    await page.keyboard.press('Space');
    expect((await page.evaluate(() => window.starclockViewer.state())).playing).toBe(true);
    await page.waitForFunction((t0) => window.starclockViewer.state().time > t0, history.times[10]);
    await page.keyboard.press('Space');
    const paused = await page.evaluate(() => window.starclockViewer.state());
    expect(paused.playing).toBe(false);
    expect(await page.$eval('#play', (e) => e.textContent)).toBe('play');
    await page.waitForTimeout(150);
    expect((await page.evaluate(() => window.starclockViewer.state())).time).toBe(paused.time);
    // with the play button focused, space still toggles once (the button is not also clicked)
    await page.focus('#play');
    await page.keyboard.press('Space');
    expect((await page.evaluate(() => window.starclockViewer.state())).playing).toBe(true);
    await page.keyboard.press('Space');
    expect((await page.evaluate(() => window.starclockViewer.state())).playing).toBe(false);
    expect(problems.errors).toEqual([]);
    await page.close();
  });

  test('hovering a star shows its state, clicking chooses it; the colour–magnitude view shows the same stars', async () => {
    const { page, problems } = await open(scenarioFile);
    const spot = await page.evaluate(() => {
      const v = window.starclockViewer;
      for (let i = 0; i < 3000; i++) {
        const at = v.locate(i);
        if (at) return { i, ...at };
      }
      return null;
    });
    expect(spot).not.toBeNull();
    await page.mouse.move(spot!.x, spot!.y);
    const info = await page.$eval('#star-info dl', (e) => e.textContent);
    expect(info).toContain('phase');
    await page.mouse.click(spot!.x, spot!.y);
    const chosen = (await page.evaluate(() => window.starclockViewer.state())).chosen;
    // the nearest star to the pointer: the one located, or one drawn on the same pixel
    const again = await page.evaluate((c) => window.starclockViewer.locate(c!), chosen);
    expect(Math.hypot(again!.x - spot!.x, again!.y - spot!.y)).toBeLessThanOrEqual(6);
    expect(await page.$eval('#star-info dl', (e) => e.textContent)).toContain(`star ${chosen! + 1}`);

    const hr = await page.evaluate(() => window.starclockViewer.state());
    await page.check('input[name="diagram"][value="cmd"]');
    const cmd = await page.evaluate(() => window.starclockViewer.state());
    expect(cmd.diagram).toBe('cmd');
    expect(cmd.counts).toEqual(hr.counts);
    expect(cmd.drawn).toBe(hr.drawn);
    await page.screenshot({ path: join(ARTIFACTS, 'viewer-cmd.png') });
    expect(problems.errors).toEqual([]);
    await page.close();
  });

  test('setTime refuses a time outside the page\u2019s span, naming it and the span', async () => {
    const { page } = await open(scenarioFile);
    await expect(page.evaluate(() => window.starclockViewer.setTime(1e12))).rejects.toThrow(/setTime: time 1000000000000 yr outside the page's time span 1000000–650000000 yr/);
    await page.close();
  });

  test('a table with a hostile name: no dialog, no injected element, the name shown as text; time runs from the table\u2019s present', async () => {
    const { page, problems } = await open(tableFile);
    expect(await page.$$('img')).toHaveLength(0);
    expect(await page.$$('#star-info b, main b')).toHaveLength(0);
    const state = await page.evaluate(() => window.starclockViewer.state());
    expect(state.time).toBe(0);
    expect(await page.$eval('#time-label', (e) => e.textContent)).toBe('now');
    const at = await page.evaluate(() => window.starclockViewer.locate(0));
    expect(at).not.toBeNull();
    await page.mouse.move(at!.x, at!.y);
    const dd = await page.$$eval('#star-info dd', (els) => els.map((e) => e.textContent));
    expect(dd[0]).toBe(HOSTILE);
    // 5 Gyr ago only the 11.5 Gyr old star was born
    await page.evaluate(() => window.starclockViewer.setTime(-5e9));
    const past = await page.evaluate(() => window.starclockViewer.state());
    expect(past.unborn).toBe(3);
    expect(await page.$eval('#time-label', (e) => e.textContent)).toBe('now − 5 Gyr');
    await page.evaluate(() => window.starclockViewer.setTime(4e9));
    const future = await page.evaluate(() => window.starclockViewer.state());
    expect(future.unborn).toBe(0);
    expect(Object.values(future.counts).reduce((a, b) => a + b, 0)).toBe(4);
    expect(problems).toEqual({ errors: [], requests: [], dialogs: [] });
    await page.screenshot({ path: join(ARTIFACTS, 'viewer-table.png') });
    await page.close();
  });
});
