import { launchBrowser } from '../../test/support/browser';
const url = process.argv[2]!;
const out = process.argv[3]!;
const browser = await launchBrowser();
const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
await page.goto(url);
await page.waitForTimeout(800);
if (process.argv[4]) {
  await page.click(process.argv[4]);
  await page.waitForTimeout(800);
}
await page.screenshot({ path: out, fullPage: true });
await browser.close();
