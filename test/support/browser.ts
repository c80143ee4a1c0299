/**
 * Browser tier: Debian's Chromium driven by playwright-core. Skips with a printed reason where Chromium
 * is missing on a user's machine; with CI=true a missing browser is a failure.
 * `newTestPage` is the one page helper (browser-test.ts gives every browser test its page through it).
 */
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContextOptions, type Page } from 'playwright-core';
import { inCi } from './reference-tools';
import { TIMEOUTS } from './timeouts';

export const CHROMIUM_PATH = process.env.PAIRWRIGHT_CHROMIUM ?? '/usr/bin/chromium';
export const SCREENSHOT_DIR = join(process.cwd(), 'test-output', 'screenshots');

export function browserAvailable(): boolean {
  if (existsSync(CHROMIUM_PATH)) return true;
  const reason = `browser tier needs Chromium at ${CHROMIUM_PATH} (apt-get install chromium); .ci/run installs it`;
  if (inCi) throw new Error(`CI=true but ${reason}`);
  console.warn(`[skipped] ${reason}`);
  return false;
}

export async function launchBrowser(): Promise<Browser> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--disable-dev-shm-usage',
    ],
  });
}

/** A new page in its own context with the suite's page timeout; an uncaught error in the page fails the test. */
export async function newTestPage(browser: Browser, options: BrowserContextOptions): Promise<Page> {
  const context = await browser.newContext(options);
  const page = await context.newPage();
  page.setDefaultTimeout(TIMEOUTS.pageActionMs);
  page.on('pageerror', (error) => {
    throw error;
  });
  return page;
}

export function screenshotPath(name: string): string {
  return join(SCREENSHOT_DIR, `${name}.png`);
}
