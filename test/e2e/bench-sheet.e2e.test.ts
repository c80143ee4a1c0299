/**
 * The bench sheet in Chromium: a saved batch of the current campaign shows its sheet with the GHS pictograms as
 * SVG; printing the page to PDF (page.pdf, the browser's print path) keeps the sheet and drops the sidebar.
 */
import { execFileSync } from 'node:child_process';
import { rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dispatchValue } from '../support/dispatch';
import { browserAvailable, launchBrowser, newTestPage, screenshotPath } from '../support/browser';
import { startTestHost, tempDataDir } from '../support/host-fixture';
import { referenceAvailable } from '../support/reference-tools';
import { ptNi } from '../support/sample-batches';
import type { Campaign } from '../../shared-model/api/campaigns';

const available = browserAvailable() && referenceAvailable({ command: 'pdftotext' });

describe.skipIf(!available)('bench sheet in the browser host', () => {
  it('shows the current campaign batch sheet with SVG pictograms and prints it without the sidebar', async () => {
    const dataDir = tempDataDir();
    const fixture = await startTestHost(dataDir);
    const browser = await launchBrowser();
    try {
      const context = { store: fixture.store };
      const campaign = await dispatchValue<Campaign>(context, 'campaigns.create', { name: 'Sheet campaign' });
      await dispatchValue(context, 'batches.save', { name: 'PtNi-e2e', campaignId: campaign.id, design: ptNi });
      const page = await newTestPage(browser, { viewport: { width: 1400, height: 900 } });
      await page.goto(fixture.host.url);
      await page.evaluate((id) => window.localStorage.setItem('pairwright.campaignId', String(id)), campaign.id);
      await page.goto(`${fixture.host.url}#/bench-sheet`);
      await page.reload();
      const sheet = page.getByTestId('bench-sheet');
      await expect.poll(() => sheet.locator('h1').textContent()).toBe('Bench sheet — PtNi-e2e');
      await expect.poll(() => sheet.locator('svg[data-pictogram]').count()).toBeGreaterThanOrEqual(3);
      expect(await sheet.locator('svg[data-pictogram="GHS02"] title').textContent()).toBe('GHS02 Flame');
      await page.screenshot({ path: screenshotPath('bench-sheet'), fullPage: true });
      const pdfPath = join(dataDir, 'printed.pdf');
      writeFileSync(pdfPath, await page.pdf({ format: 'A4' }));
      const text = execFileSync('pdftotext', [pdfPath, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      expect(text).toContain('Bench sheet — PtNi-e2e');
      expect(text).toContain('Sheet campaign');
      expect(text).toContain('In contact with water releases flammable gases');
      expect(text).toContain('Do not allow contact with water.');
      expect(text).toContain('safety data sheet (SDS)');
      expect(text).not.toContain('Terms and symbols');
    } finally {
      await browser.close();
      await fixture.stop();
      rmSync(dataDir, { recursive: true, force: true });
    }
  });
});
