/**
 * A user in Debian's Chromium: creates a campaign, adds pairs, reloads, restarts the host, and types
 * bad input. Screenshots of every view go to test-output/screenshots/. Each test has its own host, store
 * and page (test/support/browser-test.ts) and sets up what it needs.
 */
import type { Page } from 'playwright-core';
import { describe, expect } from 'vitest';
import { VIEWS } from '../../renderer/src/navigation';
import type { Campaign } from '../../shared-model/api/campaigns';
import { browserAvailable, screenshotPath } from '../support/browser';
import { browserTest as it, openApp, type BrowserTestHost } from '../support/browser-test';
import { TIMEOUTS } from '../support/timeouts';

const available = browserAvailable();

const pairRows = (page: Page) => page.locator('table[aria-label="Candidate pairs"] tbody tr');

async function addPair(page: Page, a: string, b: string, target?: string): Promise<void> {
  const form = page.getByRole('form', { name: 'Add pair' });
  await form.locator('input[name="elementA"]').fill(a);
  await form.locator('input[name="elementB"]').fill(b);
  if (target) await form.locator('select[name="target"]').selectOption(target);
  await form.getByRole('button', { name: 'Add pair' }).click();
}

/** A campaign with the pairs Pt-Ni (target Ni@Pt) and Au-Pd, stored through the API. */
async function campaignWithTwoPairs(host: BrowserTestHost): Promise<Campaign> {
  const campaign = await host.api<Campaign>('campaigns.create', { name: 'Fuel-cell cathode screen' });
  await host.api('pairs.add', { campaignId: campaign.id, pair: 'Pt-Ni', target: 'Ni@Pt' });
  await host.api('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd', target: 'alloy' });
  return campaign;
}

describe.skipIf(!available)('campaigns in the browser host', () => {
  it('shows the empty state with the demo offer on a fresh store', async ({ page, host }) => {
    await openApp(page, host);
    await expect.poll(() => page.getByTestId('empty-state').isVisible()).toBe(true);
    await page.screenshot({ path: screenshotPath('campaigns-empty'), fullPage: true });
  });

  it('refuses an empty campaign name beside the field, storing nothing', async ({ page, host }) => {
    await openApp(page, host);
    await page.getByRole('button', { name: 'Create campaign' }).click();
    const error = page.locator('[data-error-for="name"]');
    // the message speaks to the user, no code path in front ("name: must not be empty")
    await expect.poll(() => error.textContent()).toBe('Give the campaign a name');
    expect(host.count('campaigns')).toBe(0);
  });

  it('creates a campaign and adds two pairs, kept after a reload', async ({ page, host }) => {
    await openApp(page, host);
    await page.locator('form[aria-label="New campaign"] input[name="name"]').fill('Fuel-cell cathode screen');
    await page.getByRole('button', { name: 'Create campaign' }).click();
    await expect.poll(() => page.locator('.card__title', { hasText: 'Fuel-cell cathode screen' }).count()).toBe(1);
    await addPair(page, 'Pt', 'Ni', 'Ni@Pt');
    await expect.poll(() => pairRows(page).count()).toBe(1);
    await addPair(page, 'Au', 'Pd');
    await expect.poll(() => pairRows(page).count()).toBe(2);
    expect(host.count('pairs')).toBe(2);
    await page.screenshot({ path: screenshotPath('campaigns-with-pairs'), fullPage: true });
    await page.reload();
    await expect.poll(() => pairRows(page).count()).toBe(2);
    expect(await pairRows(page).first().textContent()).toContain('Pt–Ni');
  });

  it('refuses an unknown element and a repeated pair beside the field, storing nothing', async ({ page, host }) => {
    const campaign = await campaignWithTwoPairs(host);
    await openApp(page, host, { campaignId: campaign.id });
    await expect.poll(() => pairRows(page).count()).toBe(2);
    // the unknown second element: its message under the second element, none under the first
    await addPair(page, 'Pt', 'Xx');
    await expect
      .poll(() => page.locator('[data-error-for="elementB"]').textContent())
      .toMatch(/^The second element of "Pt-Xx" is not one of Pairwright's metals: unknown element "Xx"/);
    expect(await page.locator('[data-error-for="elementA"]').count()).toBe(0);
    await addPair(page, 'Xx', 'Pt');
    await expect.poll(() => page.locator('[data-error-for="elementA"]').textContent()).toMatch(/^The first element/);
    expect(await page.locator('[data-error-for="elementB"]').count()).toBe(0);
    // a missing element is asked for under its own field
    await addPair(page, 'Pt', '');
    await expect
      .poll(() => page.locator('[data-error-for="elementB"]').textContent())
      .toBe('Choose the second element of the pair');
    await addPair(page, 'Ni', 'Pt');
    await expect.poll(() => page.locator('[data-error-for="elementA"]').textContent()).toMatch(/already in/);
    expect(host.count('pairs')).toBe(2);
    await page.screenshot({ path: screenshotPath('campaigns-pair-error'), fullPage: true });
  });

  it('keeps everything after the host restarts on the same data folder', async ({ page, host }) => {
    const campaign = await campaignWithTwoPairs(host);
    await openApp(page, host, { campaignId: campaign.id });
    await expect.poll(() => pairRows(page).count()).toBe(2);
    await host.restart();
    await page.goto(host.url);
    await expect.poll(() => pairRows(page).count()).toBe(2);
  });

  it('removes a pair only after confirmation', async ({ page, host }) => {
    const campaign = await campaignWithTwoPairs(host);
    await openApp(page, host, { campaignId: campaign.id });
    await expect.poll(() => pairRows(page).count()).toBe(2);
    await page.getByRole('button', { name: 'Remove Au-Pd' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    expect(await pairRows(page).count()).toBe(2);
    await page.getByRole('button', { name: 'Remove Au-Pd' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Remove pair' }).click();
    await expect.poll(() => pairRows(page).count()).toBe(1);
    expect(host.count('pairs')).toBe(1);
  });

  it('loads the demo campaign, labelled as demo, and it populates Results and Reagents', async ({ page, host }) => {
    // The demo runs two line-scan fits; the suite shares two cores with other browsers and fits.
    page.setDefaultTimeout(TIMEOUTS.longWaitMs);
    await openApp(page, host);
    await page.getByRole('button', { name: 'Load demo campaign' }).click();
    const pairs = page.locator('table[aria-label="Candidate pairs"] tbody tr');
    await expect.poll(() => pairs.count(), { timeout: TIMEOUTS.longWaitMs }).toBe(5);
    expect(await page.locator('.banner--demo').textContent()).toMatch(/Invented demo data/);
    await page.screenshot({ path: screenshotPath('campaigns-demo'), fullPage: true });

    // Results opens on the newest demo batch: the characterized Pd@Au growth batch with its invented outcomes.
    await page.locator('[data-view="results"]').click();
    await expect
      .poll(() => page.getByTestId('batch-heading').textContent())
      .toMatch(/^Demo Pd@Au.*Pd–Au, target Pd@Au/);
    await expect.poll(() => page.locator('[data-stat="n"]').first().textContent()).toBe('180');
    await expect.poll(() => page.getByTestId('chosen-model').textContent()).toMatch(/Pd@Au/);
    await expect.poll(() => page.getByTestId('observed-label').textContent()).toMatch(/Pd@Au \(confirmed suggestion\)/);
    await expect.poll(() => page.locator('[data-testid="composition-table"] tbody tr').count()).toBeGreaterThan(0);
    await page.screenshot({ path: screenshotPath('results-demo'), fullPage: true });
    await page.getByRole('button', { name: 'Per campaign' }).click();
    const rows = page.locator('table[aria-label="Prediction vs outcome table"] tbody tr');
    await expect.poll(() => rows.count()).toBe(4);
    expect((await rows.locator('td:first-child').allTextContents()).every((name) => name.startsWith('Demo '))).toBe(
      true,
    );
    await expect.poll(() => page.getByTestId('agreement-summary').textContent()).toMatch(/2 batches compared/);
    const cells = await page.locator('[data-testid="confusion-heatmap"] [data-cell] text').allTextContents();
    expect(cells.map(Number).reduce((s, v) => s + v, 0)).toBe(2);
    await page.screenshot({ path: screenshotPath('results-demo-campaign'), fullPage: true });

    // Reagents lists the planned demo batch; ticking it totals its reagents against the demo inventory, with a shortfall.
    await page.locator('[data-view="reagents"]').click();
    const picker = page.locator('[aria-label="Choose batches"] input[type="checkbox"][aria-label^="Batch "]');
    await expect.poll(() => picker.count()).toBe(1);
    expect(await picker.first().getAttribute('aria-label')).toMatch(/Demo Ag–Pd/);
    const inventory = page.locator('table[aria-label="Inventory entries"] tbody tr');
    await expect.poll(() => inventory.count()).toBeGreaterThanOrEqual(2);
    expect((await inventory.allTextContents()).every((row) => /Demo shelf \(invented\)/.test(row))).toBe(true);
    await picker.first().check();
    const agno3 = page.locator('table[aria-label="Reagent totals"] tr[data-reagent="agno3"]');
    await expect.poll(() => agno3.getAttribute('data-status')).toBe('short');
    expect(await page.locator('table[aria-label="Reagent totals"] tr[data-status="enough"]').count()).toBeGreaterThan(
      0,
    );
    await page.screenshot({ path: screenshotPath('reagents-demo'), fullPage: true });
  });

  it('opens every view without errors (screenshot of each)', async ({ page, host }) => {
    const campaign = await campaignWithTwoPairs(host);
    await openApp(page, host, { campaignId: campaign.id });
    for (const view of VIEWS) {
      await page.locator(`[data-view="${view.id}"]`).click();
      await expect.poll(() => page.locator('main h1').first().isVisible()).toBe(true);
      await page.screenshot({ path: screenshotPath(`view-${view.id}`), fullPage: true });
    }
  });
});
