/**
 * Logging in to the browser host in Debian's Chromium: the printed one-time address logs a browser in (cookie
 * not readable by scripts), a browser without it sees only the login note, and a used address logs no one else in.
 */
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserAvailable, launchBrowser, newTestPage } from '../support/browser';
import { startTestHost, type HostFixture } from '../support/host-fixture';

const available = browserAvailable();

describe.skipIf(!available)('logging in to the browser host', () => {
  let browser: Browser;
  let fixture: HostFixture;

  beforeAll(async () => {
    browser = await launchBrowser();
    fixture = await startTestHost();
  });
  afterAll(async () => {
    await browser?.close();
    await fixture?.stop();
  });

  it('logs in with the printed address, drops the key from the address bar and hides the cookie from scripts', async () => {
    const page = await newTestPage(browser, {});
    const url = fixture.host.issueLoginUrl('/#/campaigns');
    await page.goto(url);
    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Campaigns');
    expect(page.url()).toBe(`${fixture.host.origin}/#/campaigns`);
    expect(await page.evaluate(() => document.cookie)).toBe('');
    const cookies = await page.context().cookies();
    expect(cookies.map((cookie) => [cookie.name, cookie.httpOnly, cookie.sameSite])).toEqual([
      [fixture.host.cookieName, true, 'Strict'],
    ]);
    await page.context().close();
  });

  it('shows a browser without the key only the login note, and a used key logs no one else in', async () => {
    const owner = await newTestPage(browser, {});
    const url = fixture.host.issueLoginUrl();
    await owner.goto(url);
    await expect.poll(() => owner.locator('main h1').first().textContent()).toBeTruthy();
    const stranger = await newTestPage(browser, {});
    await stranger.goto(fixture.host.origin);
    expect(await stranger.locator('h1').textContent()).toBe('Pairwright');
    expect(await stranger.locator('body').textContent()).toContain('not logged in');
    const reused = await stranger.goto(url);
    expect(reused?.status()).toBe(403);
    expect(await stranger.locator('body').textContent()).toContain('already used');
    expect(await stranger.locator('main').count()).toBe(0);
    await owner.context().close();
    await stranger.context().close();
  });

  it('backs up the store from the Campaigns view', async () => {
    const page = await newTestPage(browser, {});
    await page.goto(fixture.host.issueLoginUrl('/#/campaigns'));
    await page.getByRole('button', { name: 'Back up now' }).click();
    await expect
      .poll(() => page.getByTestId('backup-result').textContent())
      .toMatch(/Backed up to .*backups.*-manual\.sqlite/);
    expect(readdirSync(join(fixture.dataDir, 'backups')).filter((name) => name.endsWith('-manual.sqlite')).length).toBe(
      1,
    );
    await page.context().close();
  });
});
