/**
 * Model review with a trained model, in Debian's Chromium: the demo history (docs/demo-history.csv, invented
 * demo data) goes in, the model is trained from the view, and the review shows the leave-one-pair-out table
 * (learned model, physics alone, the most common class) with numbers and no NaN, per-class recall, the
 * reliability diagram, the discriminant scatter and the stated physics-prior weight. Screenshot:
 * test-output/screenshots/view-model-review-trained.png. Own host, store and page (test/support/browser-test.ts).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect } from 'vitest';
import type { Campaign } from '../../shared-model/api/campaigns';
import { browserAvailable, screenshotPath } from '../support/browser';
import { browserTest as it, openApp } from '../support/browser-test';
import { TIMEOUTS } from '../support/timeouts';

const available = browserAvailable();
const DEMO_HISTORY = join(import.meta.dirname, '../../docs/demo-history.csv');

describe.skipIf(!available)('Model review with a trained model', () => {
  it('shows the leave-one-pair-out figures, recall, reliability, the discriminant view and the prior weight', async ({
    page,
    host,
  }) => {
    const campaign = await host.api<Campaign>('campaigns.create', { name: 'Review screen' });
    await host.api('learn.importHistory', {
      campaignId: campaign.id,
      csvText: readFileSync(DEMO_HISTORY, 'utf8'),
      fileName: 'demo-history.csv',
    });
    await openApp(page, host, { campaignId: campaign.id, view: 'model-review' });
    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Model review');
    await expect.poll(() => page.getByTestId('model-status').textContent()).toMatch(/^No learned model yet/);
    await page.getByRole('region', { name: 'Learned model' }).getByRole('button', { name: 'Train the model' }).click();
    await expect
      .poll(() => page.getByTestId('model-status').textContent(), { timeout: TIMEOUTS.longWaitMs })
      .toMatch(/trained on 70 outcomes/);

    const table = page.getByTestId('headline-table');
    await expect.poll(() => table.locator('tbody tr[data-predictor]').count()).toBe(3);
    expect(
      await table.locator('tbody tr[data-predictor]').evaluateAll((trs) => trs.map((t) => t.dataset.predictor)),
    ).toEqual(['model', 'physics', 'majority']);
    for (const predictor of ['model', 'physics', 'majority']) {
      const row = table.locator(`tr[data-predictor="${predictor}"]`);
      expect(await row.locator('[data-cell="accuracy"]').textContent()).toMatch(/^\d{1,3}\.\d %$/);
      expect(await row.locator('[data-cell="balanced"]').textContent()).toMatch(/^\d{1,3}\.\d %$/);
      expect(await row.locator('[data-cell="errors"]').textContent()).toMatch(/^\d+ of \d+$/);
      expect(await row.locator('[data-cell="logloss"]').textContent()).toMatch(/^\d+\.\d{3}$/);
      expect(await row.locator('[data-cell="brier"]').textContent()).toMatch(/^\d\.\d{3}$/);
    }
    // ln K for the uniform guess: K classes seen at least twice
    const classes = Number(/(\d+) classes\)/.exec((await page.locator('main h2').allTextContents()).join(' '))?.[1]);
    expect(classes).toBeGreaterThanOrEqual(2);
    expect(Number(await table.locator('[data-cell="uniform"]').textContent())).toBeCloseTo(Math.log(classes), 3);
    expect(await page.getByTestId('verdict').textContent()).toMatch(/^On pairs it has not seen, the learned model /);
    expect(await page.getByTestId('prior-weight').textContent()).toMatch(
      /^Physics prior: each physics pseudo-outcome weighs \d+(\.\d+)? of an observed outcome/,
    );

    const recall = page.getByRole('table', { name: 'Per-class recall' });
    expect(await recall.locator('tbody tr').count()).toBe(classes);

    // The figures are drawn: the reliability diagram has points, the discriminant scatter one series per class.
    await expect
      .poll(() => page.getByTestId('reliability-chart').locator('.recharts-scatter-symbol').count())
      .toBeGreaterThan(2);
    // the discriminant view keeps the architectures seen at least twice (one series each)
    const supports = await recall.locator('tbody tr td:nth-child(2)').allTextContents();
    const seenTwice = supports.filter((n) => Number(n) >= 2).length;
    expect(seenTwice).toBeGreaterThanOrEqual(2);
    await expect.poll(() => page.getByTestId('lda-scatter').locator('.recharts-scatter').count()).toBe(seenTwice);
    if (seenTwice < classes)
      expect(await page.getByTestId('lda-left-out').textContent()).toMatch(
        /^Architectures seen only once are left out of the discriminant view: /,
      );
    expect(await page.getByTestId('lda-scatter').locator('.recharts-scatter-symbol').count()).toBeGreaterThan(40);
    await expect
      .poll(() => page.getByTestId('loadings-chart').locator('.recharts-bar-rectangle').count())
      .toBeGreaterThan(3);
    // Every loadings bar is labelled: one descriptor name per row (none skipped) and a value on each bar.
    const loadings = page.getByTestId('loadings-chart');
    const bars = await loadings.locator('.recharts-bar-rectangle').count();
    const rows = await loadings.locator('.recharts-yAxis .recharts-cartesian-axis-tick').count();
    const axes = await page.getByTestId('loadings-legend').locator('li').count();
    expect(rows * axes).toBe(bars);
    const values = await loadings.locator('.recharts-label-list text').allTextContents();
    expect(values.length).toBe(bars);
    for (const v of values) expect(v).toMatch(/^−?-?\d\.\d\d$/);
    // One legend per chart, in the shared palette: the discriminant scatter names each class it draws.
    expect(await page.getByTestId('lda-legend').locator('li').count()).toBe(seenTwice);

    const text = (await page.locator('main').textContent()) ?? '';
    expect(text).not.toMatch(/NaN|undefined|Infinity/);
    await page.screenshot({ path: screenshotPath('view-model-review-trained'), fullPage: true });
  });
});
