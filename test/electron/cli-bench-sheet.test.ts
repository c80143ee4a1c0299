/**
 * `pairwright batches sheet <id> --pdf FILE` as a child process: the PDF is printed by Debian's Chromium, and its
 * text is read back with poppler's pdftotext (Debian poppler-utils; .ci/run installs both).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { browserAvailable } from '../support/browser';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { PT_NI_RECIPE as PT_NI } from '../support/cli-batches';
import { tempDataDir } from '../support/host-fixture';
import { referenceAvailable } from '../support/reference-tools';

const available = browserAvailable() && referenceAvailable({ command: 'pdftotext' });

describe('pairwright batches sheet', () => {
  it('refuses a batch id that is not a number, and an unknown batch, in one line', () => {
    const folder = tempDataDir();
    const bad = runPairwright(['batches', 'sheet', 'abc', '--data', folder]);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain('<batch> must be a batch id');
    const unknown = runPairwright(['batches', 'sheet', '41', '--data', folder]);
    expect(unknown.status).toBe(2);
    expect(unknown.stderr.trim().split('\n')).toHaveLength(1);
  });

  it.skipIf(!available)(
    'writes the bench sheet as a PDF whose text carries the batch, H- and P-statements and the SDS reminder',
    () => {
      const folder = tempDataDir();
      runPairwrightJson(['campaigns', 'create', 'Cathode screen', '--data', folder]);
      const recipe = runPairwrightJson<{ batchId: number }>([
        ...PT_NI,
        '--save',
        'PtNi-sheet',
        '--campaign',
        'Cathode screen',
        '--data',
        folder,
      ]);
      const pdf = join(folder, 'sheet.pdf');
      const html = join(folder, 'sheet.html');
      const run = runPairwright([
        'batches',
        'sheet',
        String(recipe.batchId),
        '--pdf',
        pdf,
        '--html',
        html,
        '--data',
        folder,
      ]);
      expect(run.stderr).toBe('');
      expect(run.status).toBe(0);
      expect(existsSync(pdf)).toBe(true);
      expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
      const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [pdf], { encoding: 'utf8' }))?.[1]);
      expect(pages).toBeGreaterThanOrEqual(1);
      expect(pages).toBeLessThanOrEqual(3);
      const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      expect(text).toContain('PtNi-sheet');
      expect(text).toContain('Cathode screen');
      // Sodium borohydride's H260 and its P223 (UN GHS Annex 3 texts).
      expect(text).toContain('In contact with water releases flammable gases which may ignite spontaneously');
      expect(text).toContain('Do not allow contact with water.');
      expect(text).toContain('safety data sheet (SDS)');
      expect(readFileSync(html, 'utf8')).toMatch(/<svg [^>]*data-pictogram="GHS02"/);
    },
  );
});
