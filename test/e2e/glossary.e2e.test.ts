/** The help panel with the glossary is reachable from every view and closes with Escape. */
import { describe, expect, it } from 'vitest';
import { VIEWS } from '../../renderer/src/navigation';
import { browserAvailable, launchBrowser, newTestPage, screenshotPath } from '../support/browser';
import { startTestHost, tempDataDir } from '../support/host-fixture';

const available = browserAvailable();

describe.skipIf(!available)('glossary in the browser host', () => {
  it('opens from every view, filters, and closes with Escape', async () => {
    const browser = await launchBrowser();
    const fixture = await startTestHost(tempDataDir());
    try {
      const page = await newTestPage(browser, { viewport: { width: 1400, height: 900 } });
      await page.goto(fixture.host.url);
      for (const view of VIEWS.filter((v) => v.ready)) {
        await page.locator(`button[data-view="${view.id}"]`).click();
        await page.getByTestId('open-glossary').click();
        await expect.poll(() => page.getByTestId('glossary').isVisible(), { message: view.id }).toBe(true);
        await page.keyboard.press('Escape');
        await expect.poll(() => page.getByTestId('glossary').count(), { message: view.id }).toBe(0);
      }
      await page.getByTestId('open-glossary').click();
      await page.getByLabel('Find a term').fill('Warren');
      await expect.poll(() => page.locator('.glossary__item').count()).toBe(1);
      await expect.poll(() => page.locator('.glossary__item dt').textContent()).toBe('Warren–Cowley α');
      await page.getByLabel('Find a term').fill('');
      await page.screenshot({ path: screenshotPath('glossary'), fullPage: false });
    } finally {
      await browser.close();
      await fixture.stop();
    }
  });
});
