/**
 * `browserTest`: the vitest `test` of every browser test. Each test has its own host on its own temporary
 * store (`host`) and its own page (`page`: newTestPage, a fresh browser context with the suite's timeout
 * policy); only the Chromium process (`browser`) is shared by the tests of a file. A test sets up the data it
 * needs itself (through `host.api` or the page), so every test runs alone and in any order.
 */
import type { BrowserContextOptions, Page } from 'playwright-core';
import { test } from 'vitest';
import { launchBrowser, newTestPage } from './browser';
import { dispatchValue } from './dispatch';
import { startTestHost, type HostFixture } from './host-fixture';
import { removeTempDir, tempDirRemovedByCaller } from './temp-dirs';

/** The browser host of one test on its own temporary store; `restart()` keeps the data folder and port. */
export class BrowserTestHost {
  private constructor(
    readonly dataDir: string,
    private current: HostFixture,
  ) {}

  static async start(): Promise<BrowserTestHost> {
    const dataDir = tempDirRemovedByCaller('pairwright-e2e-');
    try {
      return new BrowserTestHost(dataDir, await startTestHost(dataDir));
    } catch (error) {
      removeTempDir(dataDir);
      throw error;
    }
  }

  get url(): string {
    return this.current.host.url;
  }

  get store(): HostFixture['store'] {
    return this.current.store;
  }

  /** Calls an operation on the host's store (set-up data, as the views would store it). */
  api<T>(name: string, input: unknown): Promise<T> {
    return dispatchValue<T>({ store: this.current.store }, name, input);
  }

  count(table: string): number {
    return (this.current.store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
  }

  /** Stops the host and starts it again on the same data folder and port. */
  async restart(): Promise<void> {
    const port = this.current.host.port;
    await this.current.stop();
    this.current = await startTestHost(this.dataDir, port);
  }

  async stop(): Promise<void> {
    try {
      await this.current.stop();
    } finally {
      removeTempDir(this.dataDir);
    }
  }
}

const DEFAULT_PAGE: BrowserContextOptions = { viewport: { width: 1400, height: 1000 } };

/**
 * vitest `test` with `browser` (per file), `host` and `page` (per test). Change the page options of a
 * file with `browserTest.override('pageOptions', { … })` inside its describe.
 */
export const browserTest = test
  // eslint-disable-next-line no-empty-pattern -- vitest reads a fixture's dependencies from its destructuring
  .extend('browser', { scope: 'file' }, async ({}, { onCleanup }) => {
    const browser = await launchBrowser();
    onCleanup(() => browser.close());
    return browser;
  })
  .extend('pageOptions', DEFAULT_PAGE)
  // eslint-disable-next-line no-empty-pattern -- as above
  .extend('host', async ({}, { onCleanup }) => {
    const host = await BrowserTestHost.start();
    onCleanup(() => host.stop());
    return host;
  })
  .extend('page', async ({ browser, pageOptions }, { onCleanup }) => {
    const page = await newTestPage(browser, pageOptions);
    onCleanup(() => page.context().close());
    return page;
  });

/**
 * Opens the app of `host` in `page`, on `view` (a navigation id) if given, with `campaignId` as the current
 * campaign (as if the user had chosen it earlier; set before the app starts, kept across reloads).
 */
export async function openApp(
  page: Page,
  host: BrowserTestHost,
  options: { view?: string; campaignId?: number } = {},
): Promise<void> {
  if (options.campaignId !== undefined) {
    await page.addInitScript(
      ([key, id]) => {
        if (window.localStorage.getItem(key) === null) window.localStorage.setItem(key, id);
      },
      ['pairwright.campaignId', String(options.campaignId)] as const,
    );
  }
  await page.goto(options.view === undefined ? host.url : `${host.url}#/${options.view}`);
}
