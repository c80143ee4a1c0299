/**
 * A user in Debian's Chromium: creates a campaign, adds pairs, reloads, restarts the host, and types
 * bad input. Screenshots of every view go to test-output/screenshots/.
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { VIEWS } from '../../renderer/src/navigation';
import { browserAvailable, launchBrowser, screenshotPath } from '../support/browser';
import { startTestHost, tempDataDir, type HostFixture } from '../support/host-fixture';

const available = browserAvailable();

describe.skipIf(!available)('campaigns in the browser host', () => {
  let browser: Browser;
  let fixture: HostFixture;
  let page: Page;
  const dataDir = tempDataDir();

  beforeAll(async () => {
    browser = await launchBrowser();
    fixture = await startTestHost(dataDir);
    page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    page.setDefaultTimeout(8000);
    page.on('pageerror', (error) => {
      throw error;
    });
  });
  afterAll(async () => {
    await browser?.close();
    await fixture?.stop();
  });

  const pairRows = () => page.locator('table[aria-label="Candidate pairs"] tbody tr');
  const countRows = (table: string) => fixture.store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number };

  async function addPair(a: string, b: string, target?: string): Promise<void> {
    const form = page.getByRole('form', { name: 'Add pair' });
    await form.locator('input[name="elementA"]').fill(a);
    await form.locator('input[name="elementB"]').fill(b);
    if (target) await form.locator('select[name="target"]').selectOption(target);
    await form.getByRole('button', { name: 'Add pair' }).click();
  }

  it('shows the empty state with the demo offer on a fresh store', async () => {
    await page.goto(fixture.host.url);
    await expect.poll(() => page.getByTestId('empty-state').isVisible()).toBe(true);
    await page.screenshot({ path: screenshotPath('campaigns-empty'), fullPage: true });
  });

  it('refuses an empty campaign name beside the field, storing nothing', async () => {
    await page.getByRole('button', { name: 'Create campaign' }).click();
    const error = page.locator('[data-error-for="name"]');
    await expect.poll(() => error.textContent()).toMatch(/must not be empty/);
    expect(countRows('campaigns').n).toBe(0);
  });

  it('creates a campaign and adds two pairs', async () => {
    await page.locator('form[aria-label="New campaign"] input[name="name"]').fill('Fuel-cell cathode screen');
    await page.getByRole('button', { name: 'Create campaign' }).click();
    await expect.poll(() => page.locator('.card__title', { hasText: 'Fuel-cell cathode screen' }).count()).toBe(1);
    await addPair('Pt', 'Ni', 'Ni@Pt');
    await expect.poll(() => pairRows().count()).toBe(1);
    await addPair('Au', 'Pd');
    await expect.poll(() => pairRows().count()).toBe(2);
    await page.screenshot({ path: screenshotPath('campaigns-with-pairs'), fullPage: true });
  });

  it('refuses an unknown element and a repeated pair beside the field, storing nothing', async () => {
    await addPair('Pt', 'Xx');
    await expect.poll(() => page.locator('[data-error-for="pair"]').textContent()).toMatch(/unknown element "Xx"/);
    await addPair('Ni', 'Pt');
    await expect.poll(() => page.locator('[data-error-for="pair"]').textContent()).toMatch(/already in/);
    expect(countRows('pairs').n).toBe(2);
    await page.screenshot({ path: screenshotPath('campaigns-pair-error'), fullPage: true });
  });

  it('keeps everything after a reload', async () => {
    await page.reload();
    await expect.poll(() => pairRows().count()).toBe(2);
    expect(await pairRows().first().textContent()).toContain('Pt–Ni');
  });

  it('keeps everything after the host restarts on the same data folder', async () => {
    const port = fixture.host.port;
    await fixture.stop();
    fixture = await startTestHost(dataDir, port);
    await page.goto(fixture.host.url);
    await expect.poll(() => pairRows().count()).toBe(2);
  });

  it('removes a pair only after confirmation', async () => {
    await page.getByRole('button', { name: 'Remove Au-Pd' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    expect(await pairRows().count()).toBe(2);
    await page.getByRole('button', { name: 'Remove Au-Pd' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Remove pair' }).click();
    await expect.poll(() => pairRows().count()).toBe(1);
    expect(countRows('pairs').n).toBe(1);
  });

  it('loads the demo campaign, labelled as demo, and it populates Results and Reagents', async () => {
    const demoStore = await startTestHost();
    const demoPage = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    // The demo runs two line-scan fits; the suite shares two cores with other browsers and fits.
    demoPage.setDefaultTimeout(30000);
    demoPage.on('pageerror', (error) => {
      throw error;
    });
    try {
      await demoPage.goto(demoStore.host.url);
      await demoPage.getByRole('button', { name: 'Load demo campaign' }).click();
      await expect.poll(() => demoPage.locator('table[aria-label="Candidate pairs"] tbody tr').count(), { timeout: 30000 }).toBe(5);
      expect(await demoPage.locator('.banner--demo').textContent()).toMatch(/Invented demo data/);
      await demoPage.screenshot({ path: screenshotPath('campaigns-demo'), fullPage: true });

      // Results opens on the newest demo batch: the characterized Pd@Au growth batch with its invented outcomes.
      await demoPage.locator('[data-view="results"]').click();
      await expect.poll(() => demoPage.getByTestId('batch-heading').textContent()).toMatch(/^Demo Pd@Au.*Pd–Au, target Pd@Au/);
      await expect.poll(() => demoPage.locator('[data-stat="n"]').first().textContent()).toBe('180');
      await expect.poll(() => demoPage.getByTestId('chosen-model').textContent()).toMatch(/Pd@Au/);
      await expect.poll(() => demoPage.getByTestId('observed-label').textContent()).toMatch(/Pd@Au \(confirmed suggestion\)/);
      await expect.poll(() => demoPage.locator('[data-testid="composition-table"] tbody tr').count()).toBeGreaterThan(0);
      await demoPage.screenshot({ path: screenshotPath('results-demo'), fullPage: true });
      await demoPage.getByRole('button', { name: 'Per campaign' }).click();
      const rows = demoPage.locator('table[aria-label="Prediction vs outcome table"] tbody tr');
      await expect.poll(() => rows.count()).toBe(4);
      expect((await rows.locator('td:first-child').allTextContents()).every((name) => name.startsWith('Demo '))).toBe(true);
      await expect.poll(() => demoPage.getByTestId('agreement-summary').textContent()).toMatch(/2 batches compared/);
      const cells = await demoPage.locator('[data-testid="confusion-heatmap"] [data-cell] text').allTextContents();
      expect(cells.map(Number).reduce((s, v) => s + v, 0)).toBe(2);
      await demoPage.screenshot({ path: screenshotPath('results-demo-campaign'), fullPage: true });

      // Reagents lists the planned demo batch; ticking it totals its reagents against the demo inventory, with a shortfall.
      await demoPage.locator('[data-view="reagents"]').click();
      const picker = demoPage.locator('[aria-label="Choose batches"] input[type="checkbox"][aria-label^="Batch "]');
      await expect.poll(() => picker.count()).toBe(1);
      expect(await picker.first().getAttribute('aria-label')).toMatch(/Demo Ag–Pd/);
      const inventory = demoPage.locator('table[aria-label="Inventory entries"] tbody tr');
      await expect.poll(() => inventory.count()).toBeGreaterThanOrEqual(2);
      expect((await inventory.allTextContents()).every((row) => /Demo shelf \(invented\)/.test(row))).toBe(true);
      await picker.first().check();
      await expect.poll(() => demoPage.locator('table[aria-label="Reagent totals"] tr[data-reagent="agno3"]').getAttribute('data-status')).toBe('short');
      expect(await demoPage.locator('table[aria-label="Reagent totals"] tr[data-status="enough"]').count()).toBeGreaterThan(0);
      await demoPage.screenshot({ path: screenshotPath('reagents-demo'), fullPage: true });
    } finally {
      await demoPage.close();
      await demoStore.stop();
    }
  }, 90_000);

  it('opens every view without errors (screenshot of each)', async () => {
    for (const view of VIEWS) {
      await page.locator(`[data-view="${view.id}"]`).click();
      await expect.poll(() => page.locator('main h1').first().isVisible()).toBe(true);
      await page.screenshot({ path: screenshotPath(`view-${view.id}`), fullPage: true });
    }
  });
});
