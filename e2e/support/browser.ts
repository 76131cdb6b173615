import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

/** Where browser tests leave their screenshots. */
export const ARTIFACTS = resolve(__dirname, '..', '..', 'test-artifacts');

/** Debian's chromium binary; the tests never download a browser. */
const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

/**
 * Launches headless Chromium with the flags this closed network needs.
 * Playwright gives every launch a fresh, temporary user-data-dir of its own.
 */
export async function launchBrowser(): Promise<{ browser: Browser; close(): Promise<void> }> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    browser,
    async close() {
      await browser.close();
    },
  };
}

/** Collects console errors and uncaught page errors, for asserting a clean page. */
export function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
  page.on('pageerror', (e) => errors.push(e.message));
  return errors;
}

/** Saves a full-page screenshot under test-artifacts/. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const path = join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
