// Writes docs/viewer.png, the README's picture of the viewer: the Greywake Cluster demo scenario
// at 12 Gyr in headless Chromium, isochrone off. Run after `npm run build`: node viewer/screenshot.mjs
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { viewerPage, viewerPayloadFromText } from '../dist/cli/commands/view.js';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const dir = mkdtempSync(join(tmpdir(), 'starclock-shot-'));
const file = join(dir, 'page.html');
const scenario = await import('node:fs').then((fs) => fs.readFileSync(join(root, 'tracks-demo', 'scenarios', 'greywake-cluster.json'), 'utf8'));
writeFileSync(file, await viewerPage(await viewerPayloadFromText(scenario, 'greywake-cluster.json')));
const context = await chromium.launchPersistentContext(join(dir, 'profile'), {
  executablePath: '/usr/bin/chromium', headless: true, viewport: { width: 1200, height: 880 }, deviceScaleFactor: 1,
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
});
try {
  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto(pathToFileURL(file).href);
  await page.evaluate(() => window.starclockViewer.ready);
  await page.evaluate(() => window.starclockViewer.setTime(1.2e10));
  await page.uncheck('#show-isochrone'); // the stars themselves, in their own colours
  await page.screenshot({ path: join(root, 'docs', 'viewer.png') });
} finally {
  await context.close();
  rmSync(dir, { recursive: true, force: true });
}
process.stderr.write('wrote docs/viewer.png\n');
