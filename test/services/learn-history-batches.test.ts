/**
 * Each imported history row becomes a batch of its campaign (issue 11: "Each row becomes a batch of that
 * campaign marked 'imported history' with its observed outcome"), written in the import's transaction, on a
 * real SQLite file: the batch list, the outcome rows the descriptor map reads and the confusion matrix see
 * them; removing the import removes them. The table below is invented for the test.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import { shutdownServices } from '../../electron/services/lifecycle';
import type { BatchSummary, SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { HistoryImportResult, HistoryOutcomeView } from '../../shared-model/api/learn';
import type { BatchOutcome, CampaignConfusion, OutcomeRow } from '../../shared-model/api/outcomes';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';

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
async function failure(name: string, input: unknown): Promise<{ code: string; message: string; field?: string }> {
  const result = await dispatch(context, name, input);
  if (result.ok) throw new Error(`${name} should have failed`);
  return result.error;
}
const count = (table: string) => (store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;

const TABLE = [
  'pair,xB_at_pct,diameter_nm,temperature_k,route,observed,made_on,notes',
  'Pt-Ni,25,5,473.15,oleylamine,alloy,2026-09-01,first',
  'Au-Ag,50,10,298.15,co-reduction,Ag@Au,2026-09-02,',
  'Au-Ag,30,3,298.15,seed-mediated,failed,2026-09-03,no particles',
].join('\n');

describe('imported history rows are batches', () => {
  it('each row is a characterized batch marked imported history with its observation, seen by every list', async () => {
    const c = await ok<Campaign>('campaigns.create', { name: 'History batches' });
    const pair = await ok<{ id: number }>('pairs.add', { campaignId: c.id, pair: 'Au-Ag', target: 'alloy' });
    await ok('prediction.save', {
      pair: 'Au-Ag',
      conditions: { xB: 0.5, diameterNm: 10, temperatureK: 298.15 },
      pairId: pair.id,
    });
    const imported = await ok<HistoryImportResult>('learn.importHistory', {
      campaignId: c.id,
      csvText: TABLE,
      fileName: 'history.csv',
    });
    expect(imported.batchIds).toHaveLength(3);
    const batchIds = imported.batchIds ?? [];

    const list = await ok<BatchSummary[]>('batches.list', { campaignId: c.id });
    expect(list.map((b) => b.id).sort()).toEqual([...batchIds].sort());
    expect(list.every((b) => b.status === 'characterized' && b.importedHistory)).toBe(true);
    const ptNi = list.find((b) => b.elementA === 'Pt');
    expect(ptNi?.diameterNm).toBe(5);
    expect(ptNi?.route).toBe('organic'); // the table's oleylamine route

    const [first, second, third] = batchIds as [number, number, number];
    const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: second });
    expect(outcome.observed?.label).toBe('Ag@Au');
    expect(outcome.nominalXB).toBeCloseTo(0.5, 12);
    // the failed synthesis has no architecture: its batch carries the note, no label
    const failed = await ok<BatchOutcome>('outcomes.get', { batchId: third });
    expect(failed.observed).toBeNull();
    expect(failed.notes).toContain('failed');

    // the outcome rows (what the descriptor map plots) and the confusion matrix
    const rows = await ok<OutcomeRow[]>('outcomes.listByCampaign', { campaignId: c.id });
    expect(rows.map((r) => [r.batchId, r.observed])).toEqual([
      [first, 'alloy'],
      [second, 'Ag@Au'],
      [third, null],
    ]);
    const confusion = await ok<CampaignConfusion>('outcomes.confusion', { campaignId: c.id, against: 'prediction' });
    // Au-Ag has a stored prediction (enters the matrix); Pt-Ni has none (unmatched)
    expect(confusion.matrix.total).toBe(1);
    expect(confusion.unmatched).toBe(1);

    const history = await ok<{ outcomes: HistoryOutcomeView[] }>('learn.history', { campaignId: c.id });
    expect(history.outcomes.map((o) => o.batchId)).toEqual(batchIds);
  });

  it('a bad row stores no batch; removing the import removes its batches and observations', async () => {
    const c = await ok<Campaign>('campaigns.create', { name: 'Remove' });
    const bad = await failure('learn.importHistory', {
      campaignId: c.id,
      csvText: `${TABLE}\nPt-Ni,130,5,300,polyol,alloy,,`,
    });
    expect(bad.message).toContain('line 5');
    expect(count('batches')).toBe(0);
    expect(count('outcome_observations')).toBe(0);

    const imported = await ok<HistoryImportResult>('learn.importHistory', { campaignId: c.id, csvText: TABLE });
    expect(count('batches')).toBe(3);
    expect(count('outcome_observations')).toBe(3);
    const removed = await ok<{ removed: number; batchesRemoved: number }>('learn.removeImport', {
      importId: imported.import.id,
    });
    expect(removed.batchesRemoved).toBe(3);
    expect(count('batches')).toBe(0);
    expect(count('outcome_observations')).toBe(0);
    expect(count('history_outcomes')).toBe(0);
  });

  it('an imported batch keeps its status, and is not removed alone', async () => {
    const c = await ok<Campaign>('campaigns.create', { name: 'Guards' });
    const imported = await ok<HistoryImportResult>('learn.importHistory', { campaignId: c.id, csvText: TABLE });
    const id = imported.batchIds?.[0] as number;
    const move = await failure('batches.setStatus', { id, status: 'planned' });
    expect(move.message).toContain('imported history');
    const remove = await failure('batches.remove', { id, confirm: true });
    expect(remove.code).toBe('conflict');
    expect(remove.message).toContain('remove its import');
    const saved = await ok<SavedBatch>('batches.get', { id });
    expect(saved.status).toBe('characterized');
  });
  it('an imported batch has no reagent list, CSV or bench sheet: each refuses, naming the batch and the field', async () => {
    const c = await ok<Campaign>('campaigns.create', { name: 'History reagents' });
    const imported = await ok<HistoryImportResult>('learn.importHistory', {
      campaignId: c.id,
      csvText: TABLE,
      fileName: 'history.csv',
    });
    const [first] = imported.batchIds ?? [];
    if (first === undefined) throw new Error('the import gave no batch ids');
    for (const name of ['reagents.list', 'reagents.csv']) {
      const error = await failure(name, { batchIds: [first] });
      expect(error).toMatchObject({ code: 'invalid_input', field: 'batchIds.0' });
      expect(error.message).toMatch(new RegExp(`batch #${first} .*imported history.*no design`));
    }
    const sheet = await failure('batches.sheet', { id: first });
    expect(sheet).toMatchObject({ code: 'invalid_input', field: 'id' });
    expect(sheet.message).toContain('imported history');
  });
});
