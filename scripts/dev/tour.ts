// Developer aid: screenshots of every view of a running host (npx tsx scripts/dev/tour.ts URL OUTDIR).
import { launchBrowser } from '../../test/support/browser';

const [url, outDir] = [process.argv[2] ?? 'http://127.0.0.1:5178/', process.argv[3] ?? 'test-output/tour'];
const browser = await launchBrowser();
const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
await page.goto(url);
await page.waitForTimeout(1000);
const ids = await page
  .locator('[data-view]')
  .evaluateAll((buttons) => buttons.map((button) => button.getAttribute('data-view') ?? ''));
for (const id of ids) {
  await page.locator(`[data-view="${id}"]`).click();
  await page.waitForTimeout(1500);
  await page.screenshot({ path: `${outDir}/${id}.png`, fullPage: true });
}
await browser.close();
console.log(`screenshots of ${ids.length} views in ${outDir}`);
