/**
 * Statuses that follow the work, through the dispatcher every transport uses, on a real SQLite file:
 * made takes the batch's reagents from the inventory (converted by each row's unit), back to planned gives
 * them back, a stock below zero is allowed with a warning, each move leaves a history line; recording an
 * outcome moves the batch and its campaign pair to characterized; batch lists follow the campaign.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { listInventory } from '../../db/repositories/inventory';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import type { BatchSummary, InventoryRecord, SavedBatch, StatusChange } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { RecordedOutcome } from '../../shared-model/api/outcomes';
import type { CandidatePair } from '../../shared-model/api/pairs';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { auPd, auSeeds, ptNi } from '../support/sample-batches';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(() => store.close());

const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);
const amounts = () => new Map(listInventory(store.db).map((row) => [row.id, row.amount]));
/** The saved design's mass of one reagent (mg): what marking the batch made must take. */
const massOf = (batch: SavedBatch, key: string) =>
  batch.design.reagents.filter((r) => r.key === key).reduce((sum, r) => sum + (r.massMg ?? 0), 0);
const SIZES = { csvText: 'd (nm)\n9.5\n10.2\n10.9\n11.4\n', sourceFile: 'sizes.csv' };

async function stock(reagentKey: string, amount: number, unit: string, location = ''): Promise<InventoryRecord> {
  return ok<InventoryRecord>('inventory.upsert', { reagentKey, amount, unit, location });
}

describe('marking a batch made takes its reagents from the inventory; back to planned gives them back', () => {
  it('converts by each row’s unit, warns on a stock below zero, says what it could not match, and undoes', async () => {
    const batch = await ok<SavedBatch>('batches.save', { name: 'PtNi A', design: ptNi });
    const platinum = await stock('h2ptcl6-6h2o', 1, 'g', 'cabinet 2');
    const nickelSmall = await stock('nicl2-6h2o', 2, 'mg');
    const nickelLast = await stock('nicl2-6h2o', 1, 'mg', 'shelf 4');
    const borohydride = await stock('nabh4', 10, 'mL'); // a solid kept "in mL": no density to convert with
    const before = amounts();
    const ptMg = massOf(batch, 'h2ptcl6-6h2o');
    const niMg = massOf(batch, 'nicl2-6h2o');
    expect(ptMg).toBeGreaterThan(0);
    expect(niMg).toBeGreaterThan(3); // more than the 2 + 1 mg on hand, so the last row goes below zero

    const made = await ok<StatusChange>('batches.setStatus', { id: batch.id, status: 'made' });
    expect(made.status).toBe('made');
    const after = amounts();
    expect(after.get(platinum.id)).toBeCloseTo(1 - ptMg / 1000, 9); // g row: mass in g
    expect(after.get(nickelSmall.id)).toBe(0); // first row emptied
    expect(after.get(nickelLast.id)).toBeCloseTo(1 - (niMg - 2), 9); // the rest from the last row: below zero
    expect(after.get(borohydride.id)).toBe(10);
    expect(made.inventoryEffect?.kind).toBe('used');
    expect(made.inventoryEffect?.warnings).toHaveLength(1);
    expect(made.inventoryEffect?.warnings[0]).toMatch(/Nickel.*now shows −?-?\d/);
    expect(made.inventoryEffect?.unmatched).toEqual([
      expect.objectContaining({ reagentKey: 'nabh4', reason: expect.stringMatching(/no density/) }),
    ]);
    expect(made.history.map((line) => line.event)).toEqual(['stock-taken', 'status']);
    expect(made.history[0]?.text).toMatch(/^Inventory: took .*−[0-9.]+ g \(now 0\.9/);

    const planned = await ok<StatusChange>('batches.setStatus', { id: batch.id, status: 'planned' });
    expect(planned.inventoryEffect?.kind).toBe('restored');
    const restored = amounts();
    for (const [id, amount] of before) expect(restored.get(id)).toBeCloseTo(amount, 9);
    expect(planned.history.map((line) => line.event)).toEqual(['stock-taken', 'status', 'stock-returned', 'status']);
    expect(planned.history[0]?.restoredBy).toBe(planned.history[2]?.id);

    // a second back-and-forth takes and gives back again; characterized → planned gives back too
    await ok('batches.setStatus', { id: batch.id, status: 'made' });
    await ok('batches.setStatus', { id: batch.id, status: 'characterized' });
    expect(amounts().get(platinum.id)).toBeCloseTo(1 - ptMg / 1000, 9);
    const back = await ok<StatusChange>('batches.setStatus', { id: batch.id, status: 'planned' });
    expect(back.inventoryEffect?.kind).toBe('restored');
    expect(amounts().get(platinum.id)).toBeCloseTo(1, 9);
  });

  it('leaves the inventory alone when asked, and a refused move changes nothing', async () => {
    const batch = await ok<SavedBatch>('batches.save', { name: 'PtNi B', design: ptNi });
    const platinum = await stock('h2ptcl6-6h2o', 500, 'mg');
    const refused = await dispatch(context, 'batches.setStatus', { id: batch.id, status: 'characterized' });
    expect(refused).toMatchObject({ ok: false, error: { field: 'status' } });
    const byHand = await ok<StatusChange>('batches.setStatus', { id: batch.id, status: 'made', inventory: false });
    expect(byHand.inventoryEffect).toBeNull();
    expect(amounts().get(platinum.id)).toBe(500);
    expect(byHand.history.at(-1)?.text).toMatch(/inventory left as it was/);
    // nothing was taken, so going back gives nothing back
    const back = await ok<StatusChange>('batches.setStatus', { id: batch.id, status: 'planned' });
    expect(back.inventoryEffect).toBeNull();
    expect(amounts().get(platinum.id)).toBe(500);
  });

  it('a row removed before the undo is named in a warning; the others come back', async () => {
    const batch = await ok<SavedBatch>('batches.save', { name: 'PtNi C', design: ptNi });
    const platinum = await stock('h2ptcl6-6h2o', 500, 'mg');
    const nickel = await stock('nicl2-6h2o', 500, 'mg');
    await ok('batches.setStatus', { id: batch.id, status: 'made' });
    await ok('inventory.remove', { id: nickel.id });
    const back = await ok<StatusChange>('batches.setStatus', { id: batch.id, status: 'planned' });
    expect(back.inventoryEffect?.warnings).toEqual([expect.stringMatching(new RegExp(`#${nickel.id} was removed`))]);
    expect(amounts().get(platinum.id)).toBeCloseTo(500, 9);
  });
});

describe('recording an outcome moves the statuses', () => {
  async function campaignWithPair(): Promise<{ campaign: Campaign; pair: CandidatePair }> {
    const campaign = await ok<Campaign>('campaigns.create', { name: 'Au–Pd week' });
    const pair = await ok<CandidatePair>('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd', target: 'alloy' });
    return { campaign, pair };
  }

  it('a made batch becomes characterized, and its campaign pair too, in the same transaction', async () => {
    const { campaign, pair } = await campaignWithPair();
    const batch = await ok<SavedBatch>('batches.save', { name: 'AuPd 1', campaignId: campaign.id, design: auPd });
    await ok('batches.setStatus', { id: batch.id, status: 'made' });
    const notesOnly = await ok<RecordedOutcome>('outcomes.record', { batchId: batch.id, notes: 'looked brown' });
    expect(notesOnly.statusChanges).toEqual({ batch: null, pair: null });
    const recorded = await ok<RecordedOutcome>('outcomes.record', { batchId: batch.id, sizes: SIZES });
    expect(recorded.statusChanges).toEqual({
      batch: { from: 'made', to: 'characterized' },
      pair: { id: pair.id, from: 'candidate', to: 'characterized' },
    });
    expect((await ok<SavedBatch>('batches.get', { id: batch.id })).status).toBe('characterized');
    const pairs = await ok<CandidatePair[]>('pairs.list', { campaignId: campaign.id });
    expect(pairs[0]?.status).toBe('characterized');
    // the user can still set them by hand
    await ok('pairs.update', { id: pair.id, status: 'in synthesis' });
    expect((await ok<CandidatePair[]>('pairs.list', { campaignId: campaign.id }))[0]?.status).toBe('in synthesis');
  });

  it('a planned batch goes straight to characterized without touching the inventory; a failed record moves nothing', async () => {
    const { campaign, pair } = await campaignWithPair();
    const batch = await ok<SavedBatch>('batches.save', { name: 'AuPd 2', campaignId: campaign.id, design: auPd });
    const gold = await stock('haucl4-3h2o', 1, 'g');
    const failed = await dispatch(context, 'outcomes.record', {
      batchId: batch.id,
      sizes: SIZES,
      observed: { decision: 'confirmed' },
    });
    expect(failed.ok).toBe(false);
    expect((await ok<SavedBatch>('batches.get', { id: batch.id })).status).toBe('planned');
    expect((await ok<CandidatePair[]>('pairs.list', { campaignId: campaign.id }))[0]?.status).toBe('candidate');
    await ok('pairs.update', { id: pair.id, status: 'dropped' });
    const recorded = await ok<RecordedOutcome>('outcomes.record', { batchId: batch.id, sizes: SIZES });
    expect(recorded.statusChanges).toEqual({ batch: { from: 'planned', to: 'characterized' }, pair: null });
    const saved = await ok<SavedBatch>('batches.get', { id: batch.id });
    expect(saved.history.at(-1)?.text).toMatch(/never marked made: no reagents were taken/);
    expect(amounts().get(gold.id)).toBe(1);
    expect((await ok<CandidatePair[]>('pairs.list', { campaignId: campaign.id }))[0]?.status).toBe('dropped');
  });
});

describe('batch lists follow the campaign', () => {
  it('hides archived campaigns’ batches unless asked, filters by status, and offers only made seeds', async () => {
    const current = await ok<Campaign>('campaigns.create', { name: 'Now' });
    const old = await ok<Campaign>('campaigns.create', { name: 'Last year' });
    const mine = await ok<SavedBatch>('batches.save', { name: 'now', campaignId: current.id, design: ptNi });
    const theirs = await ok<SavedBatch>('batches.save', { name: 'old', campaignId: old.id, design: ptNi });
    const loose = await ok<SavedBatch>('batches.save', { name: 'loose', design: ptNi });
    await ok('campaigns.archive', { id: old.id });
    const ids = (list: BatchSummary[]) => list.map((b) => b.id);
    expect(ids(await ok<BatchSummary[]>('batches.list', {}))).toEqual([loose.id, mine.id]);
    expect(ids(await ok<BatchSummary[]>('batches.list', { includeArchived: true }))).toEqual([
      loose.id,
      theirs.id,
      mine.id,
    ]);
    expect(ids(await ok<BatchSummary[]>('batches.list', { campaignId: old.id }))).toEqual([theirs.id]);

    const seeds = await ok<SavedBatch>('batches.save', { name: 'Au seeds', campaignId: current.id, design: auSeeds });
    const seedList = { campaignId: current.id, statuses: ['made', 'characterized'] };
    expect(ids(await ok<BatchSummary[]>('batches.list', seedList))).toEqual([]);
    const growth = {
      elementA: 'Au',
      elementB: 'Pt',
      target: 'Au@Pt',
      route: 'seed-mediated',
      size: { kind: 'core-shell', shellMonolayers: 1 },
      batchVolumeMl: 20,
      seeds: { metal: 'Au', volumeMl: 10, seedBatchId: seeds.id },
      precursors: [{ element: 'Pt', reagentKey: 'k2ptcl4', stockMm: 5 }],
      reducer: { reagentKey: 'ascorbic-acid', excess: 2, stockMm: 100 },
    };
    const refused = await dispatch(context, 'batches.design', growth);
    expect(refused).toMatchObject({
      ok: false,
      error: { field: 'seeds.seedBatchId', message: expect.stringMatching(/still planned/) },
    });
    await ok('batches.setStatus', { id: seeds.id, status: 'made' });
    expect(ids(await ok<BatchSummary[]>('batches.list', seedList))).toEqual([seeds.id]);
    expect((await dispatch(context, 'batches.design', growth)).ok).toBe(true);
  });
});
