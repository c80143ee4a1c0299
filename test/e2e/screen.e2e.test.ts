/**
 * A user in Debian's Chromium screens the current campaign from the Simulation view: the pairs without
 * parameters are listed as skipped, progress runs to the end, the pair × pair matrix shows each run's
 * architecture beside the analytic prediction with a legend in words, and a cell opens its stored run.
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dispatch } from '../../electron/services/dispatch';
import { queueFor } from '../../electron/workers/montecarlo-queue';
import { browserAvailable, launchBrowser, newTestPage, screenshotPath } from '../support/browser';
import { startTestHost, type HostFixture } from '../support/host-fixture';

const available = browserAvailable();

describe.skipIf(!available)('campaign screen in the browser host', () => {
  let browser: Browser;
  let fixture: HostFixture;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser();
    fixture = await startTestHost();
    const context = { store: fixture.store };
    const created = await dispatch(context, 'campaigns.create', { name: 'Screened in the browser' });
    if (!created.ok) throw new Error(created.error.message);
    for (const pair of ['Ag-Pd', 'Pd-Fe']) {
      const added = await dispatch(context, 'pairs.add', { campaignId: (created.value as { id: number }).id, pair });
      if (!added.ok) throw new Error(added.error.message);
    }
    page = await newTestPage(browser, { viewport: { width: 1500, height: 1400 } });
  });
  afterAll(async () => {
    await browser?.close();
    if (fixture) await queueFor(fixture.store).close();
    await fixture?.stop();
  });

  it('screens the campaign, shows the matrix with the prediction and opens a cell', { timeout: 120_000 }, async () => {
    await page.goto(`${fixture.host.url}#/simulation`);
    const panel = page.getByTestId('screen-panel');
    // An empty field is named in words under the field itself (DEVELOPERS.md: messages speak to the user).
    await panel.locator('input[name="screenXB"]').fill('');
    await panel.getByRole('button', { name: 'Screen this campaign' }).click();
    await expect
      .poll(() => panel.locator('[data-error-for="screenXB"]').textContent())
      .toMatch(/Give at least one composition, e\.g\. 25 50 75/);
    await panel.locator('input[name="screenXB"]').fill('50');
    await panel.locator('input[name="screenDiameter"]').fill('1,2');
    await panel.getByRole('button', { name: 'Screen this campaign' }).click();
    await expect
      .poll(() => page.getByTestId('screen-skipped').textContent())
      .toMatch(/skipped Ag-Fe: Fe has no tight-binding/);
    await expect
      .poll(() => page.getByTestId('screen-summary').textContent(), { timeout: 90_000 })
      .toMatch(/1 of 1 finished/);
    // Every run finished: the bar reads 100 % and fills its track (from memory: WAI-ARIA progressbar valuenow).
    const progress = page.getByTestId('screen-progress');
    await expect.poll(() => progress.getAttribute('aria-valuenow')).toBe('100');
    await expect
      .poll(async () => {
        const track = await progress.boundingBox();
        const bar = await progress.locator('.sim-progress__bar').boundingBox();
        return track && bar ? Math.round((100 * bar.width) / track.width) : -1;
      })
      .toBe(100);
    const matrix = page.getByTestId('screen-matrix-1.2-50');
    await expect.poll(() => matrix.textContent()).toMatch(/analytic: /);
    await expect.poll(() => page.getByTestId('screen-legend').textContent()).toMatch(/:/);
    await page.screenshot({ path: screenshotPath('simulation-screen'), fullPage: true });
    await matrix.locator('button').first().click();
    await expect.poll(() => page.getByTestId('sim-result').isVisible(), { timeout: 20_000 }).toBe(true);
    await expect.poll(() => page.getByTestId('sim-kinetic-note').textContent()).toMatch(/equilibrium arrangement/);
    await expect.poll(() => page.getByTestId('sim-relaxation').textContent()).toMatch(/Rigid lattice/);
  });
});
