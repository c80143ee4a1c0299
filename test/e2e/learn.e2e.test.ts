/**
 * A group lead in Debian's Chromium brings the group's history in and asks what to make next: picks the demo
 * history table (docs/demo-history.csv, invented demo data) in Results → Import history, enters metal prices,
 * trains the model in Next batches, gets six proposals with reasons and costs, and plans one in Batch design
 * with one click; a bad row is refused with its line number and nothing is stored; the same table a second
 * time asks first, and an imported table can be removed after a question. Screenshots go to
 * test-output/screenshots/. Each test has its own host, store and page (test/support/browser-test.ts).
 */
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect } from 'vitest';
import type { Campaign } from '../../shared-model/api/campaigns';
import { browserAvailable, screenshotPath } from '../support/browser';
import { browserTest as it, openApp, type BrowserTestHost } from '../support/browser-test';
import { TIMEOUTS } from '../support/timeouts';

const available = browserAvailable();
const DEMO_HISTORY = join(import.meta.dirname, '../../docs/demo-history.csv');

/** Creates a campaign through the API and opens Results → Import history on it. */
async function openImport(page: Page, host: BrowserTestHost): Promise<Campaign> {
  const campaign = await host.api<Campaign>('campaigns.create', { name: 'History screen' });
  await openApp(page, host, { campaignId: campaign.id, view: 'results' });
  await page.getByRole('group', { name: 'Results scope' }).getByRole('button', { name: 'Import history' }).click();
  await expect.poll(() => page.getByRole('region', { name: 'Import history' }).count()).toBe(1);
  return campaign;
}

async function pickDemoHistory(page: Page): Promise<void> {
  const panel = page.getByRole('region', { name: 'Import history' });
  await panel.locator('input[type="file"][name="historyFile"]').setInputFiles(DEMO_HISTORY);
  await expect.poll(() => panel.locator('textarea[name="csvText"]').inputValue()).toMatch(/^pair,xB_at_pct/);
  await panel.getByRole('button', { name: 'Import history' }).click();
}

describe.skipIf(!available)('learning from outcomes in the browser host', () => {
  it('imports the demo history, proposes six batches with reasons and costs, and plans one', async ({ page, host }) => {
    await openImport(page, host);
    await pickDemoHistory(page);
    await expect
      .poll(() => page.getByTestId('history-done').textContent())
      .toMatch(/^Imported 70 rows from demo-history\.csv as history: /);
    expect(host.count('history_imports')).toBe(1);
    await expect
      .poll(() => page.getByRole('table', { name: 'Imported history tables' }).locator('tbody tr').count())
      .toBe(1);
    await page.screenshot({ path: screenshotPath('results-import-history'), fullPage: true });

    // Prices per gram (illustrative magnitudes, from memory): five through the API, two typed in the view.
    for (const [symbol, pricePerGram] of [
      ['Pt', 31],
      ['Pd', 30],
      ['Au', 75],
      ['Ag', 0.9],
      ['Cu', 0.009],
    ] as const)
      await host.api('learn.setPrice', { symbol, pricePerGram, currency: 'EUR', pricedOn: '2026-12-01' });

    await page.locator('nav [data-view="next-batches"]').click();
    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Next batches');
    await expect
      .poll(() => page.getByTestId('missing-prices').textContent())
      .toMatch(/^No price per gram for Ni, Rh: /);
    const prices = page.getByRole('form', { name: 'Enter a metal price' });
    for (const [symbol, price] of [
      ['Ni', '0,016'],
      ['Rh', '140'],
    ]) {
      await prices.locator('input[name="symbol"]').fill(symbol as string);
      await prices.locator('input[name="pricePerGram"]').fill(price as string);
      await prices.getByRole('button', { name: 'Save price' }).click();
      await expect.poll(() => page.locator(`[data-price="${symbol}"]`).count()).toBe(1);
    }
    await expect.poll(() => page.getByTestId('missing-prices').count()).toBe(0);
    expect(await page.locator('[data-price="Ni"]').textContent()).toMatch(/^Ni0\.016 EUR\d{4}-\d{2}-\d{2}$/);

    await expect.poll(() => page.getByTestId('model-status').textContent()).toMatch(/^No learned model yet/);
    await page.getByRole('region', { name: 'Learned model' }).getByRole('button', { name: 'Train the model' }).click();
    await expect
      .poll(() => page.getByTestId('model-status').textContent(), { timeout: TIMEOUTS.longWaitMs })
      .toMatch(/trained on 70 outcomes/);

    await page.getByRole('form', { name: 'Propose next batches' }).getByRole('button', { name: 'Propose' }).click();
    const rows = page.getByRole('table', { name: 'Proposals' }).locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(6);
    const pairs = await rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-proposal')));
    expect(new Set(pairs).size).toBe(6); // at most one proposal per pair
    for (let i = 0; i < 6; i++) {
      const row = rows.nth(i);
      expect(await row.locator('[data-cell="reason"]').textContent()).toMatch(/^P\(.+\) \d\.\d\d ± \d\.\d\d; /);
      // two significant digits, printed scientific notation below 10⁻³ EUR (Cu at 0.009 EUR/g)
      expect(await row.locator('[data-cell="cost"]').textContent()).toMatch(/^\d+(\.\d+)?( × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+)? EUR$/);
      expect(await row.getAttribute('data-meets')).toBe('no');
      expect(await row.locator('[data-cell="meets"]').textContent()).toBe('no (P < 0.5)');
    }
    // Nothing is likely to be an alloy on this history (5 alloys among 61 labelled outcomes): the answer says so.
    await expect
      .poll(() => page.getByTestId('meeting-note').textContent())
      .toMatch(/^No untested candidate is likely to reach alloy \(P\(target\) ≥ 0\.5\); the closest 5 /);
    expect(await page.getByRole('region', { name: 'Proposed batches' }).locator('h2').textContent()).toBe(
      '0 of 6 proposals likely to reach alloy: the closest',
    );
    // The default exploration slot is the last one, marked.
    expect(await rows.nth(5).getAttribute('data-exploration')).toBe('yes');
    expect(await rows.nth(5).textContent()).toMatch(/exploration/);
    await page.screenshot({ path: screenshotPath('next-batches'), fullPage: true });

    const first = rows.first();
    const pair = (await first.getAttribute('data-proposal')) as string;
    const [elementA, elementB] = pair.split('-') as [string, string];
    const composition = (await first.locator('td').nth(2).textContent()) as string;
    const xBPct = new RegExp(`${elementB} (\\d+(?:\\.\\d+)?) at\\.%`).exec(composition)?.[1];
    const size = ((await first.locator('td').nth(3).textContent()) as string).replace(' nm', '');
    await first.getByRole('button', { name: 'Plan this' }).click();

    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Batch design');
    expect(page.url()).toMatch(/#\/batch-design$/);
    await expect
      .poll(() => page.getByTestId('batch-prefilled').textContent())
      .toMatch(new RegExp(`^Filled in from Next batches \\(target alloy, proposal ${pair}\\)`));
    expect(await page.locator('input[name="elementA"]').inputValue()).toBe(elementA);
    expect(await page.locator('input[name="elementB"]').inputValue()).toBe(elementB);
    const route = await page.locator('select[name="route"]').inputValue();
    if (route === 'seed-mediated') {
      expect(await page.locator('select[name="size.kind"]').count()).toBe(0);
      expect(Number(await page.locator('input[name="seeds.diameterNm"]').inputValue())).toBeLessThan(Number(size));
    } else {
      expect(await page.locator('input[name="size.diameterNm"]').inputValue()).toBe(size);
      expect(await page.locator('input[name="size.xB"]').inputValue()).toBe(xBPct);
    }
    await page.screenshot({ path: screenshotPath('next-batches-plan-this'), fullPage: true });
  });

  it('refuses a table with a bad row, naming its line, and stores nothing', async ({ page, host }) => {
    await openImport(page, host);
    const panel = page.getByRole('region', { name: 'Import history' });
    await panel
      .locator('textarea[name="csvText"]')
      .fill(
        'pair;xB_at_pct;diameter_nm;temperature_k;route;observed\n' +
          'Pt-Ni;25;4;423;polyol;alloy\n' +
          'Pt-Ni;25;4;423;polyol;Au@Pt\n' +
          'Pt-Ni;2,5e2;4;423;polyol;alloy\n',
      );
    await panel.getByRole('button', { name: 'Import history' }).click();
    const errors = page.getByTestId('history-errors');
    await expect
      .poll(() => errors.locator('li').allTextContents())
      .toEqual([
        'line 3, column observed, value "Au@Pt": the label names a metal not in the pair Pt-Ni',
        'line 4, column xB_at_pct, value "2,5e2": composition must lie strictly between 0 and 100 at.%',
      ]);
    expect(await errors.textContent()).toMatch(/^Nothing imported:/);
    expect(host.count('history_imports')).toBe(0);
    await panel.screenshot({ path: screenshotPath('results-import-history-error') });
  });

  it('asks before importing the same table twice, and removes a table after a question', async ({ page, host }) => {
    await openImport(page, host);
    await pickDemoHistory(page);
    await expect.poll(() => page.getByTestId('history-done').textContent()).toMatch(/^Imported 70 rows/);
    await pickDemoHistory(page);
    const dialog = page.getByRole('dialog', { name: 'Import the same table again?' });
    await expect.poll(() => dialog.textContent()).toMatch(/already imported into the campaign/);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    expect(host.count('history_imports')).toBe(1);

    await page.getByRole('region', { name: 'Import history' }).getByRole('button', { name: 'Import history' }).click();
    await dialog.getByRole('button', { name: 'Import again (duplicates)' }).click();
    await expect.poll(() => page.getByTestId('history-done').textContent()).toMatch(/they now count twice\.$/);
    expect(host.count('history_imports')).toBe(2);

    const table = page.getByRole('table', { name: 'Imported history tables' });
    await expect.poll(() => table.locator('tbody tr').count()).toBe(2);
    await table.locator('tbody tr').first().getByRole('button', { name: 'Remove' }).click();
    const question = page.getByRole('dialog', { name: 'Remove this history table?' });
    await expect.poll(() => question.textContent()).toMatch(/Remove demo-history\.csv and its 70 outcomes/);
    await question.getByRole('button', { name: 'Remove table' }).click();
    await expect.poll(() => table.locator('tbody tr').count()).toBe(1);
    expect(host.count('history_imports')).toBe(1);
  });
});
