/**
 * A user in Debian's Chromium: Candidates starts from the current campaign's elements with its own pairs
 * marked, every metal one click away and back; a campaign created in the page becomes the current one; a
 * row opened by click or Enter brings its pair detail into view; a large set is recomputed after a pause.
 */
import type { Page } from 'playwright-core';
import { describe, expect } from 'vitest';
import type { Campaign } from '../../shared-model/api/campaigns';
import { METAL_SYMBOLS } from '../../shared-model/elements/symbols';
import { browserAvailable, screenshotPath } from '../support/browser';
import { browserTest as it, openApp } from '../support/browser-test';

const available = browserAvailable();

const view = (page: Page) => page.getByTestId('candidates-view');
const elementsInput = (page: Page) => view(page).locator('input[name="elements"]');
const rows = (page: Page) => page.locator('table[aria-label="Ranked candidates"] tbody tr');
const count = (page: Page) => page.getByTestId('ranking-count');

/** True when the element's top edge lies inside the window (what a user sees without scrolling). */
const topInView = (page: Page, selector: string) =>
  page.locator(selector).evaluate((element) => {
    const box = element.getBoundingClientRect();
    return box.top >= 0 && box.top < window.innerHeight;
  });

describe.skipIf(!available)('Candidates follows the campaign', () => {
  // a laptop-height window: the detail starts below the fold unless it is brought into view
  it.override('pageOptions', { viewport: { width: 1400, height: 720 } });

  it("starts from the campaign's elements, marks its pairs, offers all metals and back", async ({ page, host }) => {
    const campaign = await host.api<Campaign>('campaigns.create', { name: 'Cathode screen' });
    await host.api('pairs.add', { campaignId: campaign.id, pair: 'Pt-Ni', target: 'Ni@Pt' });
    await host.api('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd', target: 'alloy' });
    await openApp(page, host, { view: 'candidates', campaignId: campaign.id });
    await expect.poll(() => elementsInput(page).inputValue()).toBe('Pt, Ni, Au, Pd');
    await expect.poll(() => page.getByTestId('candidates-scope').textContent()).toContain('Cathode screen');
    // four elements: six pairs, whether or not they meet the target
    await expect.poll(() => count(page).textContent()).toMatch(/of 6 pairs meet the target/);
    const rest = page.getByRole('button', { name: /^Show the rest/ });
    if ((await rest.count()) > 0) await rest.click();
    await expect.poll(() => rows(page).count()).toBe(6);
    const marked = await page
      .locator('tr:has([data-testid="in-campaign"])')
      .evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-pair')));
    expect(marked.sort()).toEqual(['Au-Pd', 'Pt-Ni']);

    await page.getByRole('button', { name: `All ${METAL_SYMBOLS.length} metals` }).click();
    expect(await elementsInput(page).inputValue()).toBe('all');
    // 30 metals: 435 pairs (30 × 29 / 2)
    await expect.poll(() => count(page).textContent()).toMatch(/of 435 pairs meet the target/);
    await page.screenshot({ path: screenshotPath('candidates-all-metals'), fullPage: true });
    await page.getByRole('button', { name: /^Back to the campaign's elements/ }).click();
    await expect.poll(() => elementsInput(page).inputValue()).toBe('Pt, Ni, Au, Pd');
    await expect.poll(() => count(page).textContent()).toMatch(/of 6 pairs meet the target/);
  });

  it('selects a campaign created in the page, and Candidates starts from its pairs', async ({ page, host }) => {
    await host.api<Campaign>('campaigns.create', { name: 'Older campaign' });
    await openApp(page, host);
    await page.locator('form[aria-label="New campaign"] input[name="name"]').fill('Fresh campaign');
    await page.getByRole('button', { name: 'Create campaign' }).click();
    await expect.poll(() => page.locator('.card__title', { hasText: 'Fresh campaign' }).count()).toBe(1);
    expect(await page.locator('[data-campaign="Fresh campaign"] [aria-pressed="true"]').count()).toBe(1);
    const form = page.getByRole('form', { name: 'Add pair' });
    await form.locator('input[name="elementA"]').fill('Ag');
    await form.locator('input[name="elementB"]').fill('Cu');
    await form.getByRole('button', { name: 'Add pair' }).click();
    await expect.poll(() => host.count('pairs')).toBe(1);
    await page
      .getByRole('navigation', { name: 'Views' })
      .getByRole('button', { name: 'Candidates', exact: true })
      .click();
    await expect.poll(() => elementsInput(page).inputValue()).toBe('Ag, Cu');
  });

  it('brings the pair detail into view when a row is opened by click or by Enter', async ({ page, host }) => {
    await openApp(page, host, { view: 'candidates' });
    await elementsInput(page).fill('all');
    await page.getByRole('button', { name: /^Show the rest/ }).click();
    await expect.poll(() => rows(page).count()).toBe(435);
    expect(await topInView(page, '[data-testid="pair-detail-anchor"]')).toBe(false);
    await rows(page).nth(2).click();
    await expect.poll(() => topInView(page, 'section.pair-detail')).toBe(true);
    const opened = await rows(page).nth(2).getAttribute('data-pair');
    expect(await page.locator('section.pair-detail').getAttribute('aria-label')).toBe(`Pair detail ${opened}`);
    await page.getByRole('button', { name: 'Close' }).click();
    await page.getByTestId('ranking-region').scrollIntoViewIfNeeded();
    await page.getByTestId('ranking-region').focus();
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('section.pair-detail').count()).toBe(1);
    await expect.poll(() => topInView(page, 'section.pair-detail')).toBe(true);
  });

  it('recomputes a large set after a pause in typing, not on every key', async ({ page, host }) => {
    await openApp(page, host, { view: 'candidates' });
    await elementsInput(page).fill('all');
    await expect.poll(() => count(page).textContent()).toMatch(/of 435 pairs/);
    const shown = await count(page).textContent();
    await view(page).locator('select[name="target"]').selectOption('Janus');
    // held back while the user may still be typing, then recomputed once
    expect(await page.getByTestId('ranking-pending').count()).toBe(1);
    expect(await count(page).textContent()).toBe(shown);
    await expect.poll(() => page.getByTestId('ranking-pending').count()).toBe(0);
    await expect.poll(() => page.locator('.card__title', { hasText: 'Best for' }).textContent()).toMatch(/Janus/);
    // a small set answers at once
    await elementsInput(page).fill('Pt, Ni, Au');
    expect(await page.getByTestId('ranking-pending').count()).toBe(0);
  });
});
