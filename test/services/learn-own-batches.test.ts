/**
 * The learned model's training set (issue 11): the imported history plus the campaign's own batches with a
 * recorded observed architecture (outcomes.record), on a real SQLite file; the stored model lists the ids
 * of exactly those outcomes, and an imported row is counted once (as history, not again as a batch).
 * The history is the demo history (demo data, invented); the batch is the shared Pt-Ni sample design.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { campaignOutcomes } from '../../electron/services/learn';
import { shutdownServices } from '../../electron/services/lifecycle';
import { learnJobsFor } from '../../electron/workers/learn-jobs';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { HistoryImportResult, LearnJob, StoredReview } from '../../shared-model/api/learn';
import { demoHistoryCsv, DEMO_HISTORY_ROWS } from '../../shared-model/learn/demo-history';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { auPd, ptNi } from '../support/sample-batches';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(async () => {
  await shutdownServices(store);
});
const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);

describe('the training set of a campaign', () => {
  it('is the imported history plus its own batches with an observed architecture', async () => {
    const c = await ok<Campaign>('campaigns.create', { name: 'Own batches' });
    const imported = await ok<HistoryImportResult>('learn.importHistory', {
      campaignId: c.id,
      csvText: demoHistoryCsv(),
    });
    const observed = await ok<SavedBatch>('batches.save', { name: 'PtNi 1', campaignId: c.id, design: ptNi });
    const unobserved = await ok<SavedBatch>('batches.save', { name: 'AuPd 1', campaignId: c.id, design: auPd });
    await ok('outcomes.record', {
      batchId: observed.id,
      observed: { decision: 'override', label: 'Ni@Pt', reason: 'EDX line scan by hand' },
    });
    await ok('outcomes.record', { batchId: unobserved.id, notes: 'not looked at yet' });

    const outcomes = campaignOutcomes(store, c.id);
    expect(outcomes).toHaveLength(DEMO_HISTORY_ROWS + 1);
    const own = outcomes.find((o) => o.id === `b${observed.id}`);
    // the saved design's planned size, nominal composition and route (test/support/sample-batches.ts)
    expect(own).toMatchObject({ elementA: 'Pt', elementB: 'Ni', xB: 0.25, diameterNm: 4, route: 'co-reduction' });
    expect(own?.observed).toBe('Ni@Pt');
    expect(outcomes.some((o) => o.id === `b${unobserved.id}`)).toBe(false);
    for (const batchId of imported.batchIds ?? []) expect(outcomes.some((o) => o.id === `b${batchId}`)).toBe(false);

    const job = await ok<LearnJob>('learn.retrain', { campaignId: c.id, priorWeight: 0.05 });
    const done = await learnJobsFor(store).whenDone(job.id);
    expect(done.error).toBeNull();
    const { stored } = await ok<{ stored: StoredReview | null }>('learn.review', { campaignId: c.id });
    expect(stored?.trainedOn).toContain(`b${observed.id}`);
    expect(stored?.trainedOn).not.toContain(`b${unobserved.id}`);
    expect(stored?.trainedOn.filter((id) => id.startsWith('h'))).toHaveLength(DEMO_HISTORY_ROWS);
    expect(stored?.newOutcomes).toBe(0);

    // an observation recorded after the retrain is a new outcome for the stored model
    await ok('outcomes.record', {
      batchId: unobserved.id,
      observed: { decision: 'override', label: 'alloy', reason: 'by hand' },
    });
    const after = await ok<{ stored: StoredReview | null }>('learn.review', { campaignId: c.id });
    expect(after.stored?.newOutcomes).toBe(1);
  });
});
