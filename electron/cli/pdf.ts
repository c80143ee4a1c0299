/**
 * HTML → PDF for the CLI, printed by a headless Chromium through playwright-core (the desktop app prints with
 * Electron's own printToPDF instead). Chromium is looked up at PAIRWRIGHT_CHROMIUM, then /usr/bin/chromium;
 * without one the command says how to get a printable page another way.
 */
import { existsSync } from 'node:fs';
import { CliError } from './command';

export function chromiumPath(env: NodeJS.ProcessEnv = process.env): string | null {
  for (const candidate of [env.PAIRWRIGHT_CHROMIUM, '/usr/bin/chromium', '/usr/bin/chromium-browser']) {
    if (candidate && existsSync(candidate)) return candidate;
  }
  return null;
}

/** Prints a self-contained HTML document to an A4 PDF; returns the PDF's bytes. */
export async function htmlToPdf(html: string): Promise<Buffer> {
  const executablePath = chromiumPath();
  if (executablePath === null) {
    throw new CliError(
      'writing a PDF needs Chromium (install it, e.g. apt-get install chromium, or set PAIRWRIGHT_CHROMIUM); ' +
        'or write the sheet with --html FILE and print it from a browser',
    );
  }
  const { chromium } = await import('playwright-core');
  const browser = await chromium.launch({
    executablePath,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-sync'],
  });
  try {
    const page = await browser.newPage();
    await page.setContent(html, { waitUntil: 'load' });
    return await page.pdf({ format: 'A4', printBackground: true, preferCSSPageSize: true });
  } finally {
    await browser.close();
  }
}
