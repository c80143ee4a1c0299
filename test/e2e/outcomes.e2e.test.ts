/**
 * A user in Debian's Chromium records what characterization showed for a made Au–Pd batch: pastes TEM
 * diameters (first with a typo), records composition with a Cu grid, imports an EDX line scan, confirms the
 * suggested architecture and reads the campaign's prediction-vs-outcome table and confusion matrix.
 * Screenshots go to test-output/screenshots/. Each test has its own host, store and page
 * (test/support/browser-test.ts) and stores the planning side it needs through the API.
 */
import type { Page } from 'playwright-core';
import { describe, expect } from 'vitest';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { CandidatePair } from '../../shared-model/api/pairs';
import { browserAvailable, screenshotPath } from '../support/browser';
import { browserTest as it, openApp, type BrowserTestHost } from '../support/browser-test';
import { TIMEOUTS } from '../support/timeouts';
import { auPd } from '../support/sample-batches';
import { positions, syntheticScan } from '../shared-model/characterization/synthetic-line-scan';

const available = browserAvailable();

/** The planning side (campaign, pair, prediction, saved batch), stored through the API; opens Results on it. */
async function openResultsOfPlannedBatch(page: Page, host: BrowserTestHost): Promise<SavedBatch> {
  const campaign = await host.api<Campaign>('campaigns.create', { name: 'Au-Pd screen' });
  const pair = await host.api<CandidatePair>('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd', target: 'alloy' });
  await host.api('prediction.save', {
    pair: 'Au-Pd',
    conditions: { xB: 0.5, diameterNm: 10, temperatureK: 300 },
    pairId: pair.id,
  });
  const batch = await host.api<SavedBatch>('batches.save', {
    name: 'AuPd 10 nm',
    campaignId: campaign.id,
    pairId: pair.id,
    design: auPd,
  });
  await openApp(page, host, { campaignId: campaign.id, view: 'results' });
  await expect.poll(() => page.getByTestId('batch-heading').textContent()).toMatch(/^AuPd 10 nm/);
  return batch;
}

describe.skipIf(!available)('results in the browser host', () => {
  it("opens the Results view on the campaign's batch", async ({ page, host }) => {
    await openResultsOfPlannedBatch(page, host);
    await expect
      .poll(() => page.getByTestId('batch-heading').textContent())
      .toMatch(/AuPd 10 nm: Au–Pd, target alloy, 10 nm, 50.0 at.% Pd/);
    expect(await page.locator('[data-testid="predicted-label"]').textContent()).toMatch(/analytic/);
  });

  it('shows a malformed row beside the field and stores nothing', async ({ page, host }) => {
    await openResultsOfPlannedBatch(page, host);
    const form = page.getByRole('form', { name: 'Import sizes' });
    await form.locator('textarea[name="csvText"]').fill('diameter\n9.6\n10.1\n1O.4\n10.8\n');
    await form.getByRole('button', { name: 'Import sizes' }).click();
    await expect
      .poll(() => form.locator('[data-error-for="csvText"]').textContent())
      .toBe('line 4: "1O.4" in column "diameter" is not a number');
    expect(host.count('outcome_size_imports')).toBe(0);
  });

  it('imports diameters and shows statistics with the histogram and fitted curve', async ({ page, host }) => {
    await openResultsOfPlannedBatch(page, host);
    const form = page.getByRole('form', { name: 'Import sizes' });
    const diameters = [9.6, 10.1, 10.4, 10.8, 9.2, 11.3, 10.0, 9.9, 10.6, 12.1, 9.4, 10.2, 10.7, 9.8, 11.0];
    await form
      .locator('textarea[name="csvText"]')
      .fill(`diameter;area\n${diameters.map((d) => `${String(d).replace('.', ',')};1`).join('\n')}\n`);
    await form.getByRole('button', { name: 'Import sizes' }).click();
    await expect.poll(() => page.locator('[data-stat="n"]').textContent()).toBe('15');
    // Charts draw after their container is measured: poll.
    await expect
      .poll(() => page.locator('[data-testid="size-histogram"] .recharts-reference-area').count())
      .toBeGreaterThan(2);
    await expect.poll(() => page.locator('[data-testid="size-histogram"] .recharts-line-curve').count()).toBe(1);
    // The bins and their fit share one colour, each with a legend entry and its marker (issue: "each fitted line
    // and its data share a colour and a legend entry with marker").
    const legend = page.locator('[data-testid="size-histogram"] [data-testid="chart-legend"] li');
    expect(await legend.count()).toBe(2);
    const bar = legend.filter({ hasText: 'particles per' });
    const fit = legend.filter({ hasText: 'log-normal fit' });
    expect(await bar.locator('svg[data-marker="bar"]').count()).toBe(1);
    expect(await fit.locator('svg[data-marker="line"]').count()).toBe(1);
    const colour = await bar.getAttribute('data-legend-colour');
    expect(await fit.getAttribute('data-legend-colour')).toBe(colour);
    expect(await page.locator('[data-testid="size-histogram"] .recharts-line-curve').getAttribute('stroke')).toBe(
      colour,
    );
    expect(host.count('outcome_diameters')).toBe(15);
    await page.locator('[aria-label="TEM sizes"]').screenshot({ path: screenshotPath('results-sizes') });
  });

  it('says what recording an outcome moved: the batch and the campaign pair to characterized', async ({
    page,
    host,
  }) => {
    const batch = await openResultsOfPlannedBatch(page, host);
    expect(await page.getByTestId('status-moves').count()).toBe(0);
    const form = page.getByRole('form', { name: 'Record composition' });
    await form.locator('input[name="xB-0"]').fill('48');
    await form.locator('input[name="uncertainty-0"]').fill('2');
    await form.getByRole('button', { name: 'Record composition' }).click();
    // The batch was saved as planned and the pair added as a candidate (the statuses the API gives them).
    await expect
      .poll(() => page.getByTestId('status-moves').textContent())
      .toMatch(
        /batch "AuPd 10 nm" moved from planned to characterized; the campaign pair Au–Pd moved from \w[\w ]* to characterized/,
      );
    const batches = await host.api<Array<{ id: number; status: string }>>('batches.list', {});
    expect(batches.find((b) => b.id === batch.id)?.status).toBe('characterized');
    await page.getByTestId('status-moves').screenshot({ path: screenshotPath('results-status-moves') });
  });

  it('records composition, flags a deviation and warns about nothing for an Au-Pd pair on Cu', async ({
    page,
    host,
  }) => {
    await openResultsOfPlannedBatch(page, host);
    const form = page.getByRole('form', { name: 'Record composition' });
    await form.locator('input[name="xB-0"]').fill('48');
    await form.locator('input[name="uncertainty-0"]').fill('2');
    await form.locator('input[name="xB-1"]').fill('150');
    await form.getByRole('button', { name: 'Record composition' }).click();
    await expect.poll(() => form.locator('[data-error-for="measurements.1.xB"]').textContent()).toMatch(/at most 1/);
    await form.locator('input[name="xB-1"]').fill('39');
    await form.locator('input[name="uncertainty-1"]').fill('4');
    await form.locator('input[name="gridMetal"]').fill('Cu');
    await form.getByRole('button', { name: 'Record composition' }).click();
    await expect.poll(() => page.locator('[data-testid="composition-table"] tr[data-flagged="true"]').count()).toBe(1);
    expect(await page.getByTestId('composition-warning-grid-metal').count()).toBe(0);
  });

  it('imports a line scan, shows each model fit and the chosen one, and confirms the suggestion', async ({
    page,
    host,
  }) => {
    await openResultsOfPlannedBatch(page, host);
    // Four model fits of a 51-point scan: background work on a shared machine.
    page.setDefaultTimeout(TIMEOUTS.longWaitMs);
    const scan = syntheticScan(
      {
        kind: 'B@A',
        centerNm: 10,
        radiusNm: 5,
        coreRadiusNm: 3.5,
        probeSigmaNm: 0.6,
        amplitudeA: 10,
        amplitudeB: 8,
        backgroundA: 5,
        backgroundB: 3,
        positionsNm: positions(0, 20, 0.4),
      },
      20,
      11,
    );
    const csv = `Position (nm),Au M,Pd L\n${scan.positionsNm.map((x, i) => `${x},${scan.signalA[i]!.toFixed(2)},${scan.signalB[i]!.toFixed(2)}`).join('\n')}`;
    const form = page.getByRole('form', { name: 'Import line scan' });
    await form.locator('textarea[name="lineScanCsv"]').fill(csv);
    await form.locator('input[name="scanName"]').fill('particle 1');
    await form.getByRole('button', { name: 'Import and fit' }).click();
    await expect.poll(() => page.getByTestId('chosen-model').textContent()).toMatch(/Pd@Au/);
    expect(await page.locator('table[aria-label="Line-scan models"] tbody tr').count()).toBe(4);
    await page.getByLabel('Model fits shown').selectOption('all');
    // Two data series plus A and B fits of four models.
    await expect.poll(() => page.locator('[data-testid="line-scan-chart"] .recharts-line').count()).toBe(10);
    // Each element's data and its fits share the element's colour, each with a legend entry and marker.
    const entries = page.locator('[data-testid="line-scan-chart"] [data-testid="chart-legend"] li');
    expect(await entries.count()).toBe(10);
    for (const element of ['Au', 'Pd']) {
      const data = entries.filter({ hasText: `${element} data` });
      expect(await data.locator('svg[data-marker="dot"]').count()).toBe(1);
      const colour = await data.getAttribute('data-legend-colour');
      const fits = entries.filter({ hasText: new RegExp(`fit, ${element}`) });
      expect(await fits.count()).toBe(4);
      for (const c of await fits.evaluateAll((els) => els.map((e) => e.getAttribute('data-legend-colour'))))
        expect(c).toBe(colour);
    }
    expect(await entries.filter({ hasText: '(chosen)' }).count()).toBe(2);
    await page.locator('[aria-label="EDX line scans"]').screenshot({ path: screenshotPath('results-line-scan') });
    await page.getByRole('button', { name: 'Confirm suggestion' }).click();
    await expect.poll(() => page.getByTestId('observed-label').textContent()).toMatch(/Pd@Au \(confirmed suggestion\)/);
    expect(host.count('outcome_line_scan_points')).toBe(51);
    await page.screenshot({ path: screenshotPath('results-batch'), fullPage: true });
  });

  it('shows the campaign table and the confusion heat-map with counts in the cells', async ({ page, host }) => {
    // Made and characterized: the observed architecture recorded through the API (as the Results view does).
    const batch = await openResultsOfPlannedBatch(page, host);
    const observed = { label: 'Pd@Au', decision: 'override', reason: 'EDX line scan: Au at the rim' };
    await host.api('outcomes.record', { batchId: batch.id, observed });
    await page.reload();
    await page.getByRole('button', { name: 'Per campaign' }).click();
    const row = page.locator('table[aria-label="Prediction vs outcome table"] tr[data-batch="AuPd 10 nm"]');
    await expect.poll(() => row.textContent()).toMatch(/Pd@Au/);
    await expect.poll(() => page.getByTestId('agreement-summary').textContent()).toMatch(/1 batch compared/);
    const cells = page.locator('[data-testid="confusion-heatmap"] [data-cell]');
    await expect.poll(() => cells.count()).toBeGreaterThan(0);
    const texts = await cells.locator('text').allTextContents();
    expect(texts.map(Number).reduce((s, v) => s + v, 0)).toBe(1);
    expect(await page.locator('[data-cell^="Pd@Au|"] text').textContent()).toBe('1');
    await page.screenshot({ path: screenshotPath('results-campaign'), fullPage: true });
  });
});
