/**
 * A user in Debian's Chromium runs a lattice Monte Carlo: bad input is refused beside the field, a run
 * shows progress with live traces and can be cancelled, a finished run shows its result beside the
 * analytic prediction with the particle picture, exports extended XYZ, and re-opens after a reload; a
 * pair's detail in Candidates hands its pair and conditions to the form, and that run is stored as asked.
 * Screenshots go to test-output/screenshots/.
 */
import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { queueFor } from '../../electron/workers/montecarlo-queue';
import { readExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { browserAvailable, launchBrowser, screenshotPath } from '../support/browser';
import { startTestHost, type HostFixture } from '../support/host-fixture';

const available = browserAvailable();

describe.skipIf(!available)('simulation in the browser host', () => {
  let browser: Browser;
  let fixture: HostFixture;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser();
    fixture = await startTestHost();
    page = await browser.newPage({ viewport: { width: 1500, height: 1100 }, acceptDownloads: true });
    page.setDefaultTimeout(15_000);
    page.on('pageerror', (error) => {
      throw error;
    });
  });
  afterAll(async () => {
    await browser?.close();
    if (fixture) await queueFor(fixture.store).close();
    await fixture?.stop();
  });

  const runs = () => (fixture.store.db.prepare('SELECT count(*) AS n FROM simulation_runs').get() as { n: number }).n;
  const form = () => page.getByRole('form', { name: 'New simulation' });
  const setField = async (name: string, value: string) => form().locator(`input[name="${name}"]`).fill(value);

  it('refuses bad input beside the field and stores nothing', async () => {
    await page.goto(`${fixture.host.url}#/simulation`);
    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Simulation');
    await expect.poll(() => form().locator('select[name="elementA"] option').count()).toBe(10);
    await setField('temperatureK', '0');
    await form().getByRole('button', { name: 'Run' }).click();
    await expect.poll(() => page.locator('[data-error-for="temperatureK"]').textContent()).toMatch(/above 0 K/);
    await setField('temperatureK', '600');
    await setField('sweeps', '0');
    await form().getByRole('button', { name: 'Run' }).click();
    await expect.poll(() => page.locator('[data-error-for="sweeps"]').textContent()).toMatch(/at least 1/);
    await setField('sweeps', '100');
    await setField('shells', '40');
    await expect.poll(() => page.getByTestId('sim-plan').textContent()).toMatch(/limit is 50000 atoms/);
    await form().getByRole('button', { name: 'Run' }).click();
    await expect.poll(() => page.locator('[data-error-for="shells"]').textContent()).toMatch(/limit is 50000 atoms/);
    await page.screenshot({ path: screenshotPath('simulation-errors'), fullPage: true });
    expect(runs()).toBe(0);
  });

  it('shows progress of a long run with live traces, and Cancel stops it', async () => {
    await setField('shells', '7');
    await setField('sweeps', '60000');
    // Every sweep asked for (the default stops at the answer, long before 60,000).
    await form().locator('input[name="stopAtAnswer"]').uncheck();
    await form().getByRole('button', { name: 'Run' }).click();
    await expect.poll(() => page.getByTestId('sim-progress').isVisible()).toBe(true);
    await expect
      .poll(async () => Number(await page.getByTestId('sim-progress').getAttribute('aria-valuenow')), {
        timeout: 30_000,
      })
      .toBeGreaterThan(0);
    await expect.poll(() => page.getByTestId('sim-traces').isVisible(), { timeout: 30_000 }).toBe(true);
    // The window stays responsive while the worker computes: the form still reacts.
    await setField('seed', '42');
    expect(await form().locator('input[name="seed"]').inputValue()).toBe('42');
    await page.screenshot({ path: screenshotPath('simulation-running'), fullPage: true });
    await page.getByRole('button', { name: 'Cancel' }).click();
    await expect.poll(() => page.getByTestId('sim-status').textContent(), { timeout: 20_000 }).toBe('cancelled');
  });

  it('runs a small particle to the end and shows the result beside the prediction, with the picture', async () => {
    await setField('shells', '4');
    await setField('sweeps', '400');
    await setField('seed', '7');
    await form().getByRole('button', { name: 'Run' }).click();
    await expect.poll(() => page.getByTestId('sim-status').textContent(), { timeout: 60_000 }).toBe('done');
    await expect.poll(() => page.getByTestId('sim-architecture').textContent()).toMatch(/Ag|alloy/);
    expect(await page.getByTestId('sim-prediction-architecture').textContent()).toBeTruthy();
    // equilibrium vs what a 1 h synthesis at that temperature reaches (interdiffusion length vs radius)
    expect(await page.getByTestId('sim-kinetics').textContent()).toMatch(/L = √\(D̃t\) = .* vs radius/);
    expect(
      await page.getByTestId('radial-profile').locator('.recharts-xAxis .recharts-cartesian-axis-tick').count(),
    ).toBe(5); // centre, S−3 … surface
    // every bar carries its value
    expect(await page.getByTestId('radial-profile').locator('.recharts-label-list text').count()).toBe(5);
    // The averages start at the detected equilibration point, marked on the traces; the legend pairs each trace
    // with its average in the trace's colour.
    const averagedFrom = (await page.getByTestId('sim-result').textContent())?.match(/averages from sweep (\d+)/)?.[1];
    expect(Number(averagedFrom)).toBeGreaterThan(1); // never sweep 1 of the random start
    const surfaceLegend = page.getByTestId('sim-trace-surface').locator('[data-testid="chart-legend"] li');
    await expect.poll(() => surfaceLegend.count()).toBe(4);
    expect(await surfaceLegend.allTextContents()).toContain(`equilibrated from sweep ${averagedFrom}`);
    const trace = await surfaceLegend.filter({ hasText: 'per sweep' }).getAttribute('data-legend-colour');
    expect(await surfaceLegend.filter({ hasText: /^mean / }).getAttribute('data-legend-colour')).toBe(trace);
    expect(await page.getByTestId('particle-cross-section').locator('circle').count()).toBeGreaterThan(10);
    expect(await page.getByTestId('particle-surface').locator('circle').count()).toBeGreaterThan(50);
    expect(await page.getByTestId('particle-legend').textContent()).toMatch(/Ag.*Pd/);
    await page.screenshot({ path: screenshotPath('simulation-result'), fullPage: true });

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export extended XYZ' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^pairwright-run-\d+-AgPd\.xyz$/);
    const path = await download.path();
    const frame = readExtendedXyz(readFileSync(path, 'utf8'));
    expect(frame.symbols).toHaveLength(309);
    expect(new Set(frame.symbols)).toEqual(new Set(['Ag', 'Pd']));
  });

  it('re-opens stored runs after a reload', async () => {
    await page.reload();
    await expect.poll(() => page.locator('table[aria-label="Simulation runs"] tbody tr').count()).toBe(2);
    await page.locator('table[aria-label="Simulation runs"] tbody tr').first().click();
    await expect.poll(() => page.getByTestId('sim-status').textContent()).toBe('done');
    await expect.poll(() => page.getByTestId('particle-surface').isVisible()).toBe(true);
    await page.locator('table[aria-label="Simulation runs"] tbody tr').nth(1).click();
    await expect.poll(() => page.getByTestId('sim-status').textContent()).toBe('cancelled');
    await page.screenshot({ path: screenshotPath('simulation-reopened'), fullPage: true });
  });
  it('takes a pair and its conditions from the pair detail in Candidates, once, and runs them', async () => {
    const candidate = (name: string) => page.locator(`[data-testid="candidates-view"] [name="${name}"]`);
    const rows = () => page.locator('table[aria-label="Ranked candidates"] tbody tr');
    await page.locator('[data-view="candidates"]').click();
    await page.getByRole('button', { name: /^Show the rest/ }).click(); // every pair, whether or not it meets the target
    await candidate('atPercentB').fill('25');
    await candidate('diameterNm').fill('2.5');
    await candidate('shape').selectOption('icosahedron');
    await candidate('temperatureK').fill('700');
    // A pair with a metal outside the Gupta table: the button is there but disabled, and says why.
    await candidate('filter').fill('Pt-Co');
    await expect.poll(() => rows().count()).toBe(1);
    await rows().first().click();
    const coButton = page
      .getByRole('region', { name: 'Pair detail Pt-Co' })
      .getByRole('button', { name: 'Simulate this pair' });
    expect(await coButton.isDisabled()).toBe(true);
    expect(await coButton.getAttribute('title')).toMatch(
      /^Co has no Gupta .*parameters; the simulation supports Ni, Cu/,
    );

    await candidate('filter').fill('Pt-Ni');
    await expect.poll(() => rows().count()).toBe(1);
    await rows().first().click();
    await page
      .getByRole('region', { name: 'Pair detail Pt-Ni' })
      .getByRole('button', { name: 'Simulate this pair' })
      .click();

    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Simulation');
    expect(page.url()).toMatch(/#\/simulation$/);
    await expect.poll(() => form().locator('select[name="elementA"]').inputValue()).toBe('Pt');
    expect(await form().locator('select[name="elementB"]').inputValue()).toBe('Ni');
    expect(await form().locator('input[name="xB"]').inputValue()).toBe('0.25');
    expect(await form().locator('select[name="shape"]').inputValue()).toBe('icosahedron');
    expect(await form().locator('input[name="sizeMode"]').nth(1).isChecked()).toBe(true); // size given by diameter
    expect(await form().locator('input[name="diameterNm"]').inputValue()).toBe('2.5');
    expect(await form().locator('input[name="temperatureK"]').inputValue()).toBe('700');
    expect(await page.getByTestId('sim-prefilled').textContent()).toMatch(/^Filled in from the pair detail of Pt-Ni/);
    await expect.poll(() => page.getByTestId('sim-plan').textContent()).toMatch(/atoms, .* sweeps/);
    await page.screenshot({ path: screenshotPath('simulate-from-pair'), fullPage: true });

    // Run it (short): the stored spec is the pair detail's.
    await setField('sweeps', '100');
    await form().getByRole('button', { name: 'Run' }).click();
    await expect.poll(() => page.getByTestId('sim-status').textContent(), { timeout: 60_000 }).toBe('done');
    const stored = fixture.store.db
      .prepare('SELECT inputs_json FROM simulation_runs ORDER BY id DESC LIMIT 1')
      .get() as { inputs_json: string };
    expect(JSON.parse(stored.inputs_json)).toMatchObject({
      elementA: 'Pt',
      elementB: 'Ni',
      xB: 0.25,
      shape: 'icosahedron',
      diameterNm: 2.5,
      temperatureK: 700,
      sweeps: 100,
    });

    // The hand-off is taken once: opening Simulation again starts from the usual form.
    await page.locator('[data-view="candidates"]').click();
    await page.locator('[data-view="simulation"]').click();
    await expect.poll(() => form().locator('select[name="elementA"]').inputValue()).toBe('Ag');
    expect(await page.getByTestId('sim-prefilled').count()).toBe(0);
  });
});
