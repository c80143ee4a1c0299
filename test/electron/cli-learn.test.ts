/**
 * `pairwright demo history`, `outcomes import-table`, `prices set`, `learn` and `propose` as child processes
 * on a real store, with the demo history (demo data, invented). The JSON names are those of issue 11.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoHistoryCsv, DEMO_HISTORY_ROWS } from '../../shared-model/learn/demo-history';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

const dir = tempDataDir('pairwright-cli-learn-');
const data = ['--data', join(dir, 'store')];

describe('pairwright learn and propose', () => {
  it('imports the demo history once, learns, and proposes six batches with the documented names', () => {
    const file = join(dir, 'history.csv');
    runPairwrightJson(['demo', 'history', file, ...data]);
    expect(readFileSync(file, 'utf8')).toBe(demoHistoryCsv());
    const campaign = runPairwrightJson<{ id: number }>(['campaigns', 'create', 'History', ...data]);
    const imported = runPairwrightJson<{ rows: number }>([
      'outcomes',
      'import-table',
      String(campaign.id),
      file,
      ...data,
    ]);
    expect(imported.rows).toBe(DEMO_HISTORY_ROWS);
    const again = runPairwright(['outcomes', 'import-table', String(campaign.id), file, ...data]);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already imported');
    for (const metal of ['Ag', 'Au', 'Cu', 'Ni', 'Pd', 'Pt', 'Rh'])
      runPairwrightJson(['prices', 'set', metal, '12,5', '--date', '2026-11-20', ...data]);

    const review = runPairwrightJson<{
      outcomes: number;
      classes: string[];
      validation: string;
      model: { accuracy: number; balancedAccuracy: number; logLoss: number; brier: number };
      physics: { accuracy: number; logLoss: number };
      majority: { accuracy: number };
      loadings: { descriptor: string; weight: number }[];
      prior: { pseudoOutcomes: number; fromMonteCarlo: number; fromAnalytic: number };
    }>(['learn', String(campaign.id), ...data]);
    expect(review.validation).toBe('leave-one-pair-out');
    expect(review.outcomes).toBeGreaterThan(50);
    expect(review.classes.length).toBeGreaterThanOrEqual(2);
    for (const v of [
      review.model.accuracy,
      review.model.balancedAccuracy,
      review.model.logLoss,
      review.model.brier,
      review.physics.accuracy,
      review.physics.logLoss,
      review.majority.accuracy,
    ]) {
      expect(Number.isFinite(v)).toBe(true);
    }
    expect(review.loadings.length).toBeGreaterThan(3);
    // No Monte Carlo run in this store: every pseudo-outcome of the prior is labelled by the analytic prediction.
    expect(review.prior.pseudoOutcomes).toBeGreaterThan(0);
    expect(review.prior).toMatchObject({ fromMonteCarlo: 0, fromAnalytic: review.prior.pseudoOutcomes });

    const out = runPairwrightJson<{ proposals: Record<string, unknown>[] }>([
      'propose',
      String(campaign.id),
      '--target',
      'core@shell',
      '--count',
      '6',
      ...data,
    ]);
    expect(out.proposals).toHaveLength(6);
    for (const p of out.proposals) {
      for (const key of [
        'pair',
        'xB',
        'diameterNm',
        'temperatureK',
        'route',
        'probability',
        'successProbability',
        'costPerBatch',
        'exploration',
        'reason',
      ]) {
        expect(p).toHaveProperty(key);
      }
      expect(p.costPerBatch as number).toBeGreaterThan(0);
      expect(typeof p.meetsTarget).toBe('boolean');
    }

    // Alloy on the demo history: nothing is likely (P(alloy) < 0.5 everywhere), and the answer says so.
    const alloy = runPairwrightJson<{ threshold: number; meeting: number; meetingNote: string | null }>([
      'propose',
      String(campaign.id),
      '--target',
      'alloy',
      ...data,
    ]);
    expect(alloy.threshold).toBe(0.5);
    expect(alloy.meeting).toBe(0);
    expect(alloy.meetingNote).toMatch(/^No untested candidate is likely to reach alloy/);
    const text = runPairwright(['propose', String(campaign.id), '--target', 'alloy', ...data]);
    expect(text.status).toBe(0);
    expect(text.stdout).toMatch(/^target: alloy; 0 of 6 proposals meet it \(posterior mean P\(target\) ≥ 0\.5\)/);
    expect(text.stdout).toContain('No untested candidate is likely to reach alloy (P(target) ≥ 0.5); the closest');
    expect(text.stdout).toContain('no (P < 0.5)');
    expect(text.stdout).not.toMatch(/\b0\.00 EUR/); // costs of a few cents or less keep two significant digits
  }, 120_000);

  it('a bad target names the field', () => {
    const campaign = runPairwrightJson<{ id: number }>(['campaigns', 'create', 'Empty', ...data]);
    const run = runPairwright(['propose', String(campaign.id), '--target', 'spiky', ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('target');
  });
});
