/**
 * A user in Debian's Chromium designs batches (errors beside the fields, nothing saved until valid), saves
 * them, totals their reagents against the inventory, exports CSV and looks at the print layout.
 * Screenshots go to test-output/screenshots/. Each test has its own host, store and page
 * (test/support/browser-test.ts) and makes the batches it needs.
 */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect } from 'vitest';
import { browserAvailable, screenshotPath } from '../support/browser';
import { browserTest as it, openApp, type BrowserTestHost } from '../support/browser-test';

const available = browserAvailable();

const form = (page: Page) => page.getByRole('form', { name: 'Batch design' });

/** Opens Batch design with its example (4 nm Pt75Ni25 alloy) once the catalog has loaded. */
async function openDesign(page: Page, host: BrowserTestHost): Promise<void> {
  await openApp(page, host, { view: 'batch-design' });
  await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Batch design');
  await expect.poll(() => form(page).locator('select[name="precursorA"] option').count()).toBeGreaterThan(1);
}

/** Saves the example as "PtNi-01 4 nm alloy" and a 0.3 mmol scale-up as "PtNi-02 scale-up", as a user would. */
async function saveTwoPtNiBatches(page: Page): Promise<void> {
  await form(page).getByRole('button', { name: 'Reset to example' }).click();
  await form(page).locator('input[name="name"]').fill('PtNi-01 4 nm alloy');
  await form(page).getByRole('button', { name: 'Save as planned batch' }).click();
  await expect.poll(() => page.locator('tr[data-batch="PtNi-01 4 nm alloy"]').count()).toBe(1);
  await form(page).locator('input[name="amount"]').fill('0.3');
  await form(page).locator('input[name="name"]').fill('PtNi-02 scale-up');
  await form(page).getByRole('button', { name: 'Save as planned batch' }).click();
  await expect.poll(() => page.locator('tr[data-batch="PtNi-02 scale-up"]').count()).toBe(1);
}

describe.skipIf(!available)('batch design and reagents in the browser host', () => {
  it.override('pageOptions', { viewport: { width: 1500, height: 1000 }, acceptDownloads: true });

  it('computes the example batch with checks and hazards', async ({ page, host }) => {
    await openDesign(page, host);
    await form(page).getByRole('button', { name: 'Compute' }).click();
    // 4 nm Pt75Ni25: 2396.8 atoms (hand-worked in test/shared-model/recipes/particle.test.ts)
    await expect.poll(() => page.getByTestId('atoms-per-particle').textContent()).toContain('2,397');
    expect(await page.locator('[data-check="reduction-order"]').count()).toBeGreaterThan(0);
    expect(await page.locator('tr[data-hcode="H260"]').textContent()).toContain(
      'In contact with water releases flammable gases which may ignite spontaneously',
    );
    expect(await page.getByTestId('signal-word').first().textContent()).toBe('Danger');
    expect(await page.getByTestId('standing-caution').first().textContent()).toContain('never replace');
    expect(await page.locator('[data-warning="borohydride-hydrolysis"]').textContent()).toMatch(
      /mL H2 at 25 °C, 1 atm/,
    );
    await page.screenshot({ path: screenshotPath('batch-design-ptni'), fullPage: true });
  });

  it('shows bad input beside the field and saves nothing', async ({ page, host }) => {
    await openDesign(page, host);
    await form(page).locator('input[name="size.xB"]').fill('120');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect.poll(() => page.locator('[data-error-for="size.xB"]').textContent()).toMatch(/0 and 100 at\.%/);
    await form(page).locator('input[name="name"]').fill('should not exist');
    await form(page).getByRole('button', { name: 'Save as planned batch' }).click();
    await expect.poll(() => page.locator('[data-error-for="size.xB"]').textContent()).toMatch(/0 and 100 at\.%/);
    await form(page).locator('input[name="size.xB"]').fill('25');
    await form(page).locator('select[name="reducer"]').selectOption('');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect.poll(() => page.locator('[data-error-for="reducer"]').textContent()).toMatch(/choose a reducer/);
    await form(page).locator('select[name="precursorB"]').selectOption('');
    await form(page).locator('select[name="reducer"]').selectOption('nabh4');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect
      .poll(() => page.locator('[data-error-for="precursors"]').textContent())
      .toMatch(/choose a Ni precursor/);
    await page.screenshot({ path: screenshotPath('batch-design-errors'), fullPage: true });
    expect(host.count('batches')).toBe(0);
  });

  it('switching the pair resets the precursors; a failed compute says so in the result pane', async ({
    page,
    host,
  }) => {
    await openDesign(page, host);
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect.poll(() => page.getByTestId('atoms-per-particle').textContent()).toContain('2,397');
    // particles per mL as printed: "… × 10¹³"-style, never "e+13" or "10^13"
    const particles = await page.getByTestId('batch-result').textContent();
    expect(particles).toMatch(/\d × 10[⁰¹²³⁴⁵⁶⁷⁸⁹]+/);
    expect(particles).not.toMatch(/\de\+\d|10\^/);
    await form(page).locator('input[name="elementA"]').fill('Au');
    await form(page).locator('input[name="elementB"]').fill('Pd');
    await expect.poll(() => form(page).locator('select[name="precursorA"]').inputValue()).toBe('haucl4-3h2o');
    await expect.poll(() => form(page).locator('select[name="precursorB"]').inputValue()).toBe('na2pdcl4');
    // the Pt–Ni result is no longer for these inputs, and says so
    await expect.poll(() => page.getByTestId('result-stale').count()).toBe(1);
    // a reducer chosen anew: its common-practice excess is assumed and stated
    await form(page).locator('select[name="reducer"]').selectOption('ascorbic-acid');
    await expect.poll(() => form(page).locator('input[name="reducer.excess"]').inputValue()).toBe('');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect.poll(() => page.getByTestId('reducer-excess-assumed').textContent()).toMatch(/common practice/);
    expect(await page.getByTestId('result-stale').count()).toBe(0);
    // capping as final mM: the field the message names is on the form
    await form(page).locator('select[name="capping"]').selectOption('ctab');
    await form(page).locator('select[name="capping.amountKind"]').selectOption('final-mM');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect
      .poll(() => page.getByTestId('compute-failure').textContent())
      .toMatch(/^Not computed: capping final concentration \(mM\): .*marked in the form/);
    expect(await page.getByTestId('batch-result').count()).toBe(0);
    await form(page).locator('input[name="capping.molPerMolMetal"]').fill('0,5');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    await expect.poll(() => page.locator('tr[data-reagent="ctab"]').count()).toBe(1);
    expect(await page.getByTestId('compute-failure').count()).toBe(0);
    await page.screenshot({ path: screenshotPath('batch-design-pair-switch'), fullPage: true });
  });

  it('saves two batches and lists them', async ({ page, host }) => {
    await openDesign(page, host);
    await saveTwoPtNiBatches(page);
    expect(host.count('batches')).toBe(2);
  });

  it('records lots and stock dates of a saved batch; an old borohydride stock is flagged', async ({ page, host }) => {
    await openDesign(page, host);
    await saveTwoPtNiBatches(page);
    await page.locator('tr[data-batch="PtNi-01 4 nm alloy"]').getByRole('button', { name: 'Open' }).click();
    await expect.poll(() => page.getByTestId('opened-batch').textContent()).toContain('PtNi-01');
    await page.getByLabel('Lot of Sodium borohydride').fill('BCBX9');
    const fiveHoursAgo = new Date(Date.now() - 5 * 3600_000);
    const local = new Date(fiveHoursAgo.getTime() - fiveHoursAgo.getTimezoneOffset() * 60_000)
      .toISOString()
      .slice(0, 16);
    await page.getByLabel('Stock of Sodium borohydride prepared').fill(local);
    await page.getByRole('button', { name: 'Save lots and dates' }).click();
    // NaBH4 stock limit 0.5 h (catalog, common practice: made fresh)
    await expect.poll(() => page.locator('tr[data-record="nabh4"] td.stale').textContent()).toMatch(/make it fresh/);
    expect(host.count('batch_lots')).toBe(1);
    expect(host.count('batch_stocks')).toBe(1);
    await page.screenshot({ path: screenshotPath('batch-design-records'), fullPage: true });
  });

  it('warns of galvanic replacement for a gold shell on silver seeds', async ({ page, host }) => {
    await openDesign(page, host);
    await form(page).locator('input[name="elementA"]').fill('Ag');
    await form(page).locator('input[name="elementB"]').fill('Au');
    await form(page).locator('select[name="route"]').selectOption('seed-mediated');
    await form(page).locator('select[name="target"]').selectOption('Ag@Au');
    await form(page).locator('input[name="shell"]').fill('2');
    await form(page).locator('input[name="seeds.diameterNm"]').fill('20');
    await form(page).locator('input[name="seeds.particlesPerMl"]').fill('1e11');
    await form(page).locator('input[name="seeds.volumeMl"]').fill('5');
    await form(page).locator('select[name="precursorB"]').selectOption('haucl4-3h2o');
    await form(page).locator('input[name="stockB"]').fill('10');
    await form(page).locator('select[name="reducer"]').selectOption('ascorbic-acid');
    await form(page).locator('input[name="reducer.excess"]').fill('4');
    await form(page).getByRole('button', { name: 'Compute' }).click();
    const galvanic = page.locator('[data-check="galvanic-replacement"]');
    await expect.poll(() => galvanic.textContent()).toMatch(/3\.00 Ag atoms dissolve per Au atom/);
    expect(await galvanic.getAttribute('data-severity')).toBe('warning');
    await page.screenshot({ path: screenshotPath('batch-design-galvanic'), fullPage: true });
  });

  it('totals the reagents of chosen batches against the inventory, with shortfalls, CSV and print layout', async ({
    page,
    host,
  }) => {
    await openDesign(page, host);
    await saveTwoPtNiBatches(page);
    await page.locator('[data-view="reagents"]').click();
    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Reagents');
    await page.getByRole('checkbox', { name: /PtNi-01/ }).check();
    await page.getByRole('checkbox', { name: /PtNi-02/ }).check();
    const ptRow = page.locator('tr[data-reagent="h2ptcl6-6h2o"]');
    await expect.poll(() => ptRow.getAttribute('data-status')).toBe('not in inventory');
    const inventory = page.getByRole('form', { name: 'Add to inventory' });
    await inventory.locator('select[name="reagentKey"]').selectOption('h2ptcl6-6h2o');
    await inventory.locator('input[name="amount"]').fill('-5');
    await inventory.getByRole('button', { name: 'Add to inventory' }).click();
    await expect.poll(() => page.locator('[data-error-for="amount"]').textContent()).toMatch(/≥ 0/);
    await inventory.locator('input[name="amount"]').fill('100');
    await inventory.locator('select[name="unit"]').selectOption('mg');
    await inventory.locator('input[name="location"]').fill('desiccator 2');
    await inventory.getByRole('button', { name: 'Add to inventory' }).click();
    // 0.075 + 0.225 mmol × 517.91 g/mol = 155.4 mg needed, 100 mg on hand
    await expect.poll(() => ptRow.getAttribute('data-status')).toBe('short');
    expect(await ptRow.getAttribute('class')).toContain('row--short');
    expect(await page.locator('[aria-label^="Hazard summary across the list"] tr[data-hcode="H334"]').count()).toBe(1);
    await page.screenshot({ path: screenshotPath('reagents-list'), fullPage: true });

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export CSV' }).click(),
    ]);
    const csv = readFileSync((await download.path()) as string, 'utf8');
    expect(csv.split('\n')[0]).toContain('reagent,formula,roles,total_mmol,total_mass_mg');
    expect(csv).toMatch(/Chloroplatinic acid hexahydrate,H2PtCl6·6H2O/);

    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('nav.sidebar').isVisible()).toBe(false);
    expect(await page.getByRole('form', { name: 'Add to inventory' }).isVisible()).toBe(false);
    expect(await ptRow.isVisible()).toBe(true);
    await page.screenshot({ path: screenshotPath('reagents-print'), fullPage: true });
    await page.emulateMedia({ media: 'screen' });
  });

  it('refuses an unparseable formula in the catalog beside the field', async ({ page, host }) => {
    await openApp(page, host, { view: 'reagents' });
    await expect.poll(() => page.locator('main h1').first().textContent()).toBe('Reagents');
    await page.locator('.catalog-editor > summary').click();
    const editor = page.getByRole('form', { name: 'Catalog reagent' });
    await editor.locator('input[name="key"]').fill('bad-salt');
    await editor.locator('input[name="name"]').fill('Bad salt');
    await editor.locator('input[name="formula"]').fill('K2PdCl4)');
    await editor.locator('input[name="metalSymbol"]').fill('Pd');
    await editor.locator('input[name="oxidationState"]').fill('2');
    await editor.locator('select[name="coupleId"]').selectOption('PdCl4/Pd');
    await editor.getByRole('button', { name: 'Add reagent' }).click();
    await expect.poll(() => page.locator('[data-error-for="formula"]').textContent()).toMatch(/not a chemical formula/);
    await editor.locator('input[name="formula"]').fill('K2PdCl4');
    await editor.getByRole('button', { name: 'Add reagent' }).click();
    await expect.poll(() => editor.locator('.banner--info').textContent()).toMatch(/326\.4/);
    await page.screenshot({ path: screenshotPath('reagents-catalog'), fullPage: true });
  });
});
