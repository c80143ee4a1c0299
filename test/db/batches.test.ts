/** The batch-design tables on a real SQLite file: catalog seeding and revisions, batches, lineage, inventory. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { getBatch, insertBatch, removeBatch } from '../../db/repositories/batches';
import {
  addCatalogReagent,
  editCatalogReagent,
  ensureCatalogSeeded,
  findCatalogReagent,
  listCatalog,
} from '../../db/repositories/catalog';
import { listInventory, upsertInventory } from '../../db/repositories/inventory';
import { openStore, type Store } from '../../db/store';
import { designBatch } from '../../shared-model/recipes/design';
import { batchDesignInputSchema } from '../../shared-model/recipes/design-input';
import { prepareReagent } from '../../shared-model/recipes/reagent';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
});
afterEach(() => store.close());

const input = batchDesignInputSchema.parse({
  elementA: 'Au',
  elementB: 'Ag',
  target: 'Au@Ag',
  route: 'co-reduction',
  size: { kind: 'single-metal', element: 'Au', diameterNm: 12 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.025 },
  batchVolumeMl: 100,
  precursors: [{ element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 25 }],
  reducer: { reagentKey: 'trisodium-citrate-2h2o', excess: 3 },
});

describe('batch-design store', () => {
  it('seeds the catalog idempotently and keeps every revision', () => {
    ensureCatalogSeeded(store.db);
    ensureCatalogSeeded(store.db);
    expect(listCatalog(store.db)).toHaveLength(REAGENT_SEED.length);
    const agno3 = findCatalogReagent(store.db, 'agno3');
    expect(agno3?.revision).toBe(1);
    const edited = editCatalogReagent(
      store.db,
      prepareReagent({ ...REAGENT_SEED.find((r) => r.key === 'agno3'), notes: 'amber bottle, shelf 3' }),
    );
    expect(edited.revision).toBe(2);
    expect(edited.notes).toBe('amber bottle, shelf 3');
    const history = store.db
      .prepare('SELECT revision FROM reagent_revisions WHERE reagent_key = ? ORDER BY revision')
      .all('agno3');
    expect(history).toEqual([{ revision: 1 }, { revision: 2 }]);
    expect(() => addCatalogReagent(store.db, prepareReagent(REAGENT_SEED[0]))).toThrow(/already in the catalog/);
  });

  it('stores inputs and computed JSON as saved; lineage is restricted', () => {
    const catalog = listCatalog(store.db);
    const design = designBatch(input, { catalog });
    const seeds = insertBatch(store.db, {
      name: 'Au seeds',
      campaignId: null,
      pairId: null,
      input,
      design,
      catalogRevisions: { 'haucl4-3h2o': 1 },
      seedBatchId: null,
      lots: [{ reagentKey: 'haucl4-3h2o', lot: 'SZBF1' }],
      stocks: [],
      notes: '',
    });
    const read = getBatch(store.db, seeds.id);
    expect(read.design).toEqual(JSON.parse(JSON.stringify(design)));
    expect(read.input).toEqual(JSON.parse(JSON.stringify(input)));
    expect(read.lots).toEqual([{ reagentKey: 'haucl4-3h2o', lot: 'SZBF1' }]);
    const child = insertBatch(store.db, {
      name: 'child',
      campaignId: null,
      pairId: null,
      input,
      design,
      catalogRevisions: {},
      seedBatchId: seeds.id,
      lots: [],
      stocks: [],
      notes: '',
    });
    expect(() => removeBatch(store.db, seeds.id)).toThrow(/seed batch/);
    removeBatch(store.db, child.id);
    removeBatch(store.db, seeds.id);
    expect(store.db.prepare('SELECT count(*) AS n FROM batch_lots').get()).toEqual({ n: 0 });
  });

  it('keeps the inventory with units the schema allows', () => {
    ensureCatalogSeeded(store.db);
    const item = upsertInventory(store.db, {
      reagentKey: 'nabh4',
      amount: 25,
      unit: 'g',
      location: 'flammables',
      lot: 'B1',
    });
    expect(item.reagentName).toBe('Sodium borohydride');
    upsertInventory(store.db, {
      id: item.id,
      reagentKey: 'nabh4',
      amount: 20,
      unit: 'g',
      location: 'flammables',
      lot: 'B1',
    });
    expect(listInventory(store.db).map((i) => i.amount)).toEqual([20]);
    expect(() =>
      store.db
        .prepare("INSERT INTO inventory (reagent_key, amount, unit, updated_at) VALUES ('nabh4', 1, 'lb', 'x')")
        .run(),
    ).toThrow(/CHECK/);
    // Since migration 0009 a stock may go below zero (a batch marked made took more than was on hand).
    store.db
      .prepare("INSERT INTO inventory (reagent_key, amount, unit, updated_at) VALUES ('nabh4', -1, 'g', 'x')")
      .run();
    expect(listInventory(store.db).map((i) => i.amount)).toEqual([20, -1]);
  });
});
