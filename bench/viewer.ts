// Viewer benchmark: `npm run build && node dist/bench/viewer.js [--json] [--frames N] [--play S]`.
// Writes viewer pages of 1e4 and 1e5 stars with `starclock view`'s own functions, opens each
// from file:// in headless Chromium (the system's /usr/bin/chromium, no GPU) and runs the page's
// own benchmark (window.starclockViewer.benchmark): milliseconds per frame, median over a sweep
// of the whole time span, against a baseline in the same page and run — the same loop clearing
// the same ImageData and filling as many fixed 3×3 squares, then putting it, with no physics.
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { viewerPage, viewerPayloadFromText } from '../cli/commands/view.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';

const CHROMIUM = '/usr/bin/chromium';
const ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'];

/** The part of the page's hook (viewer/src/main.ts, ViewerHook) this benchmark uses. */
interface PageHook {
  ready: Promise<void>;
  benchmark(o: { frames: number; playSeconds: number }): Promise<{
    stars: number; frameMs: number; starsMs: number; baselineMs: number; ratio: number; playFps: number | null; width: number; height: number;
  }>;
}

interface Row {
  case: string;
  stars: number;
  frameMs: number;
  starsMs: number;
  baselineMs: number;
  ratio: number;
  playFps: number | null;
  width: number;
  height: number;
}

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(name);
  if (i < 0) return fallback;
  const v = Number(process.argv[i + 1]);
  if (!(v >= 0)) throw new RangeError(`${name} '${process.argv[i + 1]}' must be a number ≥ 0`);
  return v;
}

/**
 * A cluster born in one 1 Myr burst (so every frame of the sweep, 1 Myr to 10 Gyr, evaluates
 * every star): Kroupa IMF; z fixed, or [Fe/H] spread over several grid slabs.
 */
function scenario(size: number, spread: boolean): object {
  return {
    name: 'Bench Cluster', seed: 1, size,
    imf: { kind: 'kroupa' },
    starFormation: { kind: 'burst', duration: '1Myr' },
    metallicity: spread ? { feh: -0.2, spread: 0.2 } : { z: 0.014 },
    now: '10Gyr',
    history: { from: '1Myr', to: '10Gyr', steps: 60, spacing: 'log' },
  };
}

async function main(): Promise<void> {
  const json = process.argv.includes('--json');
  const frames = option('--frames', 60);
  const playSeconds = option('--play', 3);
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: the viewer benchmark runs in Debian's chromium (apt-get install chromium)`);
  const grid = loadBuiltinGrid();
  const dir = mkdtempSync(join(tmpdir(), 'starclock-bench-viewer-'));
  const rows: Row[] = [];
  const context = await chromium.launchPersistentContext(join(dir, 'profile'), {
    executablePath: CHROMIUM, headless: true, args: ARGS, viewport: { width: 1280, height: 900 }, deviceScaleFactor: 1,
  });
  try {
    for (const [label, size, spread] of [['1e4 stars, z 0.014', 1e4, false], ['1e5 stars, z 0.014', 1e5, false], ['1e5 stars, [Fe/H] −0.2 ± 0.2', 1e5, true]] as const) {
      const file = join(dir, `bench-${size}-${spread ? 'spread' : 'fixed'}.html`);
      const payload = await viewerPayloadFromText(JSON.stringify(scenario(size, spread)), 'bench.json', { grid });
      writeFileSync(file, await viewerPage(payload));
      const page = await context.newPage();
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(pathToFileURL(file).href);
      await page.evaluate(() => (window as unknown as { starclockViewer: PageHook }).starclockViewer.ready);
      const r = await page.evaluate((o) => (window as unknown as { starclockViewer: PageHook }).starclockViewer.benchmark(o), { frames, playSeconds });
      if (errors.length > 0) throw new Error(`viewer page error: ${errors.join('; ')}`);
      rows.push({ case: label, stars: r.stars, frameMs: r.frameMs, starsMs: r.starsMs, baselineMs: r.baselineMs, ratio: r.ratio, playFps: r.playFps, width: r.width, height: r.height });
      await page.close();
    }
  } finally {
    await context.close();
    rmSync(dir, { recursive: true, force: true });
  }
  if (json) {
    process.stdout.write(`${JSON.stringify({ viewer: rows, frames, playSeconds })}\n`);
    return;
  }
  const f = (x: number) => (x >= 10 ? x.toFixed(1) : x.toFixed(2));
  process.stdout.write(`viewer frames in headless Chromium (${rows[0].width}×${rows[0].height} px star buffer), median of ${frames} frames over the time span\n\n`);
  process.stdout.write('| case | frame | stars only | baseline (clear + fixed pixels) | ratio | playing |\n|---|---|---|---|---|---|\n');
  for (const r of rows) {
    process.stdout.write(`| ${r.case} | ${f(r.frameMs)} ms (${f(1000 / r.frameMs)} fps) | ${f(r.starsMs)} ms | ${f(r.baselineMs)} ms | ${r.ratio.toFixed(1)}× | ${r.playFps === null ? '—' : `${r.playFps.toFixed(1)} fps`} |\n`);
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`bench/viewer: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 1;
});
