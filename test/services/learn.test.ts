/**
 * Learning services through the dispatcher every transport uses, on a real SQLite file: history import (all
 * rows or none, the same table twice refused unless duplicates are allowed), prices, a retrain job in a
 * worker thread (progress, result stored with the ids it was trained on, cancel), and proposals stored with
 * the model version. The history is the demo history (demo data, invented).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import { shutdownServices } from '../../electron/services/lifecycle';
import { learnJobsFor } from '../../electron/workers/learn-jobs';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { HistoryImportResult, LearnJob, ProposalSet, StoredReview } from '../../shared-model/api/learn';
import { demoHistoryCsv, DEMO_HISTORY_ROWS } from '../../shared-model/learn/demo-history';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
let context: ServiceContext;
let closed = false;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
  closed = false;
});
afterEach(async () => {
  if (!closed) await shutdownServices(store);
});

const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);
async function failure(name: string, input: unknown): Promise<{ code: string; message: string; field?: string }> {
  const result = await dispatch(context, name, input);
  if (result.ok) throw new Error(`${name} should have failed`);
  return result.error;
}
const count = (table: string) => (store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
const campaign = () => ok<Campaign>('campaigns.create', { name: 'History' });

describe('learn.importHistory', () => {
  it('imports all rows, refuses the same table twice unless duplicates are allowed', async () => {
    const c = await campaign();
    const csv = demoHistoryCsv();
    const first = await ok<HistoryImportResult>('learn.importHistory', {
      campaignId: c.id,
      csvText: csv,
      fileName: 'demo.csv',
    });
    expect(first.rows).toBe(DEMO_HISTORY_ROWS);
    expect(count('history_outcomes')).toBe(DEMO_HISTORY_ROWS);
    const again = await failure('learn.importHistory', { campaignId: c.id, csvText: csv });
    expect(again.code).toBe('conflict');
    expect(again.message).toContain('already imported');
    expect(count('history_outcomes')).toBe(DEMO_HISTORY_ROWS);
    const dup = await ok<HistoryImportResult>('learn.importHistory', {
      campaignId: c.id,
      csvText: csv,
      allowDuplicates: true,
    });
    expect(dup.duplicateOf?.id).toBe(first.import.id);
    expect(count('history_outcomes')).toBe(2 * DEMO_HISTORY_ROWS);
  });

  it('a bad row stores nothing and names line, column and value', async () => {
    const c = await campaign();
    const csv = `${demoHistoryCsv().trimEnd()}\nPt-Ni,30,5,298,polyol,Au@Pt,,\n`;
    const error = await failure('learn.importHistory', { campaignId: c.id, csvText: csv });
    expect(error.field).toBe('csvText');
    expect(error.message).toContain(`line ${DEMO_HISTORY_ROWS + 2}, column observed, value "Au@Pt"`);
    expect(count('history_imports')).toBe(0);
    expect(count('history_outcomes')).toBe(0);
  });
});

describe('learn.retrain, learn.review, learn.propose', () => {
  it('retrains off the main thread, stores the model with its outcome ids, proposes and stores the set', async () => {
    const c = await campaign();
    await ok('learn.importHistory', { campaignId: c.id, csvText: demoHistoryCsv() });
    const before = await ok<{ stored: StoredReview | null }>('learn.review', { campaignId: c.id });
    expect(before.stored).toBeNull();
    const job = await ok<LearnJob>('learn.retrain', { campaignId: c.id, priorWeight: 0.05 });
    expect(job.status).toBe('running');
    const done = await learnJobsFor(store).whenDone(job.id);
    expect(done.error).toBeNull();
    expect(done.status).toBe('done');
    const { stored } = await ok<{ stored: StoredReview | null }>('learn.review', { campaignId: c.id });
    expect(stored?.modelId).toBe(done.modelId);
    expect(stored?.trainedOn).toHaveLength(DEMO_HISTORY_ROWS);
    expect(stored?.newOutcomes).toBe(0);
    expect(stored?.review.status).toBe('ready');
    for (const symbol of ['Au', 'Pt', 'Pd', 'Ag', 'Cu', 'Ni', 'Rh']) {
      await ok('learn.setPrice', { symbol, pricePerGram: 10, currency: 'EUR', pricedOn: '2026-11-20' });
    }
    const set = await ok<ProposalSet>('learn.propose', { campaignId: c.id, target: 'core@shell', count: 6 });
    expect(set.proposals).toHaveLength(6);
    expect(new Set(set.proposals.map((p) => p.pair)).size).toBe(6);
    expect(set.proposals.every((p) => (p.costPerBatch ?? 0) > 0)).toBe(true);
    const row = store.db
      .prepare('SELECT model_id, model_version, trained_on FROM learn_proposals WHERE id = ?')
      .get(set.id) as {
      model_id: number;
      model_version: string;
      trained_on: string;
    };
    expect(row.model_id).toBe(done.modelId);
    expect(row.model_version).toBe(set.modelVersion);
    expect(JSON.parse(row.trained_on)).toEqual(stored?.trainedOn);
  });

  it('a retrain can be cancelled; nothing is stored', async () => {
    const c = await campaign();
    await ok('learn.importHistory', { campaignId: c.id, csvText: demoHistoryCsv() });
    const job = await ok<LearnJob>('learn.retrain', { campaignId: c.id });
    const cancelled = await ok<LearnJob>('learn.cancel', { jobId: job.id });
    expect(cancelled.id).toBe(job.id);
    const end = await learnJobsFor(store).whenDone(job.id);
    expect(end.status).toBe('cancelled');
    expect(count('learn_models')).toBe(0);
  });

  it('proposing before any model, and retraining without outcomes, say what to do', async () => {
    const c = await campaign();
    expect((await failure('learn.retrain', { campaignId: c.id })).message).toContain('import a history table');
    expect((await failure('learn.propose', { campaignId: c.id, target: 'alloy' })).message).toContain('retrain first');
    expect((await failure('learn.propose', { campaignId: c.id, target: 'spiky' })).field).toBe('target');
    expect((await failure('learn.setPrice', { symbol: 'Xx', pricePerGram: 1, pricedOn: '2026-01-01' })).field).toBe(
      'symbol',
    );
    await shutdownServices(store);
    closed = true;
  });
});
