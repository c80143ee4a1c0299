/** `pairwright sizes`, `linescan` and `outcomes …` run as child processes on CSV files and a real store. */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { STORE_FILE_NAME } from '../../db/store';
import { fitLogNormal } from '../../shared-model/characterization/lognormal';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';
import { auPd } from '../support/sample-batches';
import { positions, syntheticScan } from '../shared-model/characterization/synthetic-line-scan';

const dir = tempDataDir('pairwright-cli-outcomes-');
const data = ['--data', join(dir, 'store')];

describe('pairwright sizes', () => {
  it('prints the statistics and log-normal fit as JSON', () => {
    const diameters = [4.8, 5.1, 5.3, 5.3, 5.6, 5.9, 6.0, 6.4, 7.2, 8.1];
    const file = join(dir, 'diameters.csv');
    // An export with a BOM, CRLF, a header, semicolons and decimal commas.
    writeFileSync(
      file,
      `\uFEFFParticle;Diameter (nm)\r\n${diameters.map((d, i) => `${i + 1};${String(d).replace('.', ',')}`).join('\r\n')}\r\n`,
    );
    const out = runPairwrightJson<{
      n: number;
      meanNm: number;
      sdNm: number;
      medianNm: number;
      cvPercent: number;
      lognormal: { mu: number; sigma: number };
    }>(['sizes', file, ...data]);
    expect(out.n).toBe(10);
    const mean = diameters.reduce((s, d) => s + d, 0) / 10;
    expect(out.meanNm).toBeCloseTo(mean, 10);
    expect(out.medianNm).toBeCloseTo(5.75, 10);
    expect(out.cvPercent).toBeCloseTo((100 * out.sdNm) / mean, 10);
    const fit = fitLogNormal(diameters);
    expect(out.lognormal.mu).toBeCloseTo(fit.mu, 10);
    expect(out.lognormal.sigma).toBeCloseTo(fit.sigma, 10);
  });

  it('names the line and value of a malformed row, exit code 2', () => {
    const file = join(dir, 'bad.csv');
    writeFileSync(file, 'd\n5\n6.x\n7\n');
    const run = runPairwright(['sizes', file, ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/line 3: "6.x"/);
  });
});

describe('pairwright linescan', () => {
  it('chooses the generating model and reports radius, core and shell with per-model BIC', () => {
    const scan = syntheticScan(
      {
        kind: 'B@A',
        centerNm: 10,
        radiusNm: 5,
        coreRadiusNm: 3.5,
        probeSigmaNm: 0.6,
        amplitudeA: 10,
        amplitudeB: 8,
        backgroundA: 5,
        backgroundB: 3,
        positionsNm: positions(0, 20, 0.4),
      },
      20,
      42,
    );
    const file = join(dir, 'scan.csv');
    writeFileSync(
      file,
      `Position (nm),Au M,Pd L\n${scan.positionsNm.map((x, i) => `${x},${scan.signalA[i]},${scan.signalB[i]}`).join('\n')}\n`,
    );
    const out = runPairwrightJson<{
      chosenModel: string;
      radiusNm: number;
      coreRadiusNm: number;
      shellThicknessNm: number;
      bic: Record<string, number>;
      models: { model: string; bic: number }[];
    }>(['linescan', file, '--pair', 'Au-Pd', ...data]);
    expect(out.chosenModel).toBe('Pd@Au');
    expect(Object.keys(out.bic).sort()).toEqual(['Au@Pd', 'Janus', 'Pd@Au', 'alloy']);
    expect(out.bic['Pd@Au']).toBe(Math.min(...Object.values(out.bic)));
    // Generated with R = 5 nm, core 3.5 nm; SNR 20 (tolerances as in the model tests).
    expect(Math.abs(out.radiusNm - 5)).toBeLessThan(0.5);
    expect(Math.abs(out.coreRadiusNm - 3.5)).toBeLessThan(0.6);
    expect(out.shellThicknessNm).toBeCloseTo(out.radiusNm - out.coreRadiusNm, 10);
    const text = runPairwright(['linescan', file, '--pair', 'Au-Pd', ...data]);
    expect(text.status).toBe(0);
    expect(text.stdout).toMatch(/chosen: Pd@Au/);
  }, 60_000);

  it('refuses a missing --pair and an unknown element', () => {
    const file = join(dir, 'scan.csv');
    expect(runPairwright(['linescan', file, ...data]).stderr).toMatch(/--pair is required/);
    const run = runPairwright(['linescan', file, '--pair', 'Au-Xx', ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/unknown element "Xx"/);
  }, 60_000);
});

describe('pairwright outcomes add / show / list / confusion', () => {
  it('records sizes, composition, a line scan and the confirmed architecture on a batch', async () => {
    const storeDir = join(dir, 'store-add');
    // The planning side (campaign, pair, saved batch) is set up in-process on the same store.
    const { openStore } = await import('../../db/store');
    const { dispatchValue } = await import('../support/dispatch');
    const store = openStore({ dataDir: storeDir });
    const call = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>({ store }, name, input);
    const campaign = await call<{ id: number }>('campaigns.create', { name: 'CLI screen' });
    const pair = await call<{ id: number }>('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd' });
    const batch = await call<{ id: number }>('batches.save', {
      name: 'AuPd cli',
      campaignId: campaign.id,
      pairId: pair.id,
      design: auPd,
    });
    store.close();
    const storeArgs = ['--data', storeDir];

    const scanFile = join(dir, 'add-scan.csv');
    const scan = syntheticScan(
      {
        kind: 'B@A',
        centerNm: 10,
        radiusNm: 5,
        coreRadiusNm: 3.5,
        probeSigmaNm: 0.6,
        amplitudeA: 10,
        amplitudeB: 8,
        backgroundA: 5,
        backgroundB: 3,
        positionsNm: positions(0, 20, 0.4),
      },
      20,
      43,
    );
    writeFileSync(
      scanFile,
      `Position (nm),Au M,Pd L\n${scan.positionsNm.map((x, i) => `${x},${scan.signalA[i]},${scan.signalB[i]}`).join('\n')}\n`,
    );
    const sizes = join(dir, 'add-sizes.csv');
    writeFileSync(sizes, '9.6\n10.1\n10.4\n10.8\n9.2\n11.3\n');
    const badScan = join(dir, 'short-scan.csv');
    writeFileSync(badScan, Array.from({ length: 14 }, (_, i) => `${i},${50 + i},${40 + i}`).join('\n'));
    // A bad line-scan file stops the whole command: the sizes, composition, notes and file given with it are
    // not stored either (one outcomes.record call, one transaction). Rows counted in the SQLite file itself.
    const outcomeRows = () => {
      const file = new Database(join(storeDir, STORE_FILE_NAME), { readonly: true });
      try {
        const tables = [
          'outcome_size_imports',
          'outcome_diameters',
          'outcome_compositions',
          'outcome_line_scans',
          'outcome_observations',
          'outcome_files',
        ];
        return Object.fromEntries(
          tables.map((t) => [t, (file.prepare(`SELECT count(*) AS n FROM ${t}`).get() as { n: number }).n]),
        );
      } finally {
        file.close();
      }
    };
    const before = outcomeRows();
    expect(Object.values(before).every((n) => n === 0)).toBe(true);
    const refused = runPairwright([
      'outcomes',
      'add',
      String(batch.id),
      '--sizes',
      sizes,
      '--icp',
      '48±2',
      '--notes',
      'grid 2',
      '--file',
      '/data/tem/img_000.dm4',
      '--linescan',
      badScan,
      ...storeArgs,
    ]);
    expect(refused.status).toBe(2);
    expect(refused.stderr).toMatch(/line scan: .*shorter than the particle/);
    expect(outcomeRows()).toEqual(before);
    const empty = runPairwrightJson<{ sizes: unknown[]; compositions: unknown[]; notes: string }>([
      'outcomes',
      'show',
      String(batch.id),
      ...storeArgs,
    ]);
    expect([empty.sizes, empty.compositions, empty.notes]).toEqual([[], [], '']);

    const out = runPairwrightJson<{
      added: string[];
      outcome: {
        sizes: { statistics: { n: number } }[];
        observed: { label: string; decision: string };
        compositions: { comparison: { rows: { flagged: boolean | null }[] } }[];
      };
    }>([
      'outcomes',
      'add',
      String(batch.id),
      '--sizes',
      sizes,
      '--linescan',
      scanFile,
      '--icp',
      '48±2',
      '--edx',
      '39±4',
      '--grid',
      'Cu',
      '--confirm',
      '--file',
      '/data/tem/img_001.dm4',
      ...storeArgs,
    ]);
    expect(out.added).toEqual(['sizes', 'composition', 'line scan', 'observed (confirmed)', 'files']);
    expect(out.outcome.sizes[0]?.statistics.n).toBe(6);
    expect(out.outcome.observed).toMatchObject({ label: 'Pd@Au', decision: 'confirmed' });
    expect(out.outcome.compositions[0]?.comparison.rows.map((r) => r.flagged)).toEqual([false, true]);

    const rows = runPairwrightJson<{ observed: string; predicted: string | null }[]>([
      'outcomes',
      'list',
      'CLI screen',
      ...storeArgs,
    ]);
    expect(rows).toHaveLength(1);
    expect(rows[0]?.observed).toBe('Pd@Au');
    const confusion = runPairwright(['outcomes', 'confusion', 'CLI screen', ...storeArgs]);
    expect(confusion.status).toBe(0);
    // No prediction was saved for this pair, so nothing can be compared yet.
    expect(confusion.stdout).toMatch(/no batch has both an observed architecture and a prediction yet/);
    expect(runPairwright(['outcomes', 'add', String(batch.id), '--icp', 'about half', ...storeArgs]).stderr).toMatch(
      /--icp must be at.% of B/,
    );
    // Seven child processes; generous limit for a loaded machine.
  }, 180_000);
});
