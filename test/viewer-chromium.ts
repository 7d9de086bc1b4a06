// Opening viewer pages in the system's Chromium through playwright-core (no browser download).
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** Debian's Chromium (CI installs it with apt-get). */
export const CHROMIUM = '/usr/bin/chromium';

/** Flags for a headless run as root with no GPU and no background traffic. */
export const CHROMIUM_ARGS = [
  '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update',
  '--disable-sync', '--no-first-run', '--disable-quic',
];

/**
 * Whether the browser tests run: always in CI (CI=true), where a missing Chromium must fail
 * them; elsewhere only when /usr/bin/chromium exists (else they are skipped with a message).
 */
export function browserTestsRun(): boolean {
  if (process.env.CI === 'true') return true;
  if (existsSync(CHROMIUM)) return true;
  process.stderr.write(`viewer browser tests skipped: ${CHROMIUM} not found (apt-get install chromium); in CI they fail instead\n`);
  return false;
}

/** A fresh headless Chromium with its own profile folder, removed on close. */
export async function openChromium(viewport = { width: 1280, height: 900 }): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: the viewer's browser tests need Debian's chromium (apt-get install chromium)`);
  const profile = mkdtempSync(join(tmpdir(), 'starclock-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM, headless: true, args: CHROMIUM_ARGS, viewport, deviceScaleFactor: 1,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context, page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
