/**
 * Batch design service: validate → store → model. Resolves lineage (a growth batch's seeds from its seed
 * batch, measured values first), asks the thermodynamic model where the pair's surface element sits,
 * designs the batch, and keeps saved batches as computed (catalog edits are shown, never applied).
 */
import { listBatchHistory } from '../../db/repositories/batch-history';
import { getCampaign, listCampaigns } from '../../db/repositories/campaigns';
import { getPair } from '../../db/repositories/pairs';
import {
  getBatch,
  insertBatch,
  listBatchSummaries,
  removeBatch,
  updateBatchRecords,
  type StoredBatch,
} from '../../db/repositories/batches';
import { addCatalogReagent, currentRevisions, editCatalogReagent, listCatalog } from '../../db/repositories/catalog';
import { listInventory, removeInventory, upsertInventory } from '../../db/repositories/inventory';
import { nowIso, type SqliteDatabase } from '../../db/store';
import type { batchOperations, CatalogChange, SavedBatch } from '../../shared-model/api/batches';
import { DomainError, invalid } from '../../shared-model/api/result';
import { asMadeForBatch } from '../../shared-model/prediction/as-made';
import {
  designBatch,
  type BatchDesign,
  type SurfaceAnswer,
  type SurfaceQuestion,
} from '../../shared-model/recipes/design';
import type { BatchDesignInput, StockRecord } from '../../shared-model/recipes/design-input';
import { seedBatchMetal, seedsFromBatch } from '../../shared-model/recipes/lineage';
import { prepareReagent } from '../../shared-model/recipes/reagent';
import { buildReagentList, reagentListCsv, type ReagentList } from '../../shared-model/recipes/reagent-list';
import { stockAges } from '../../shared-model/recipes/stocks';
import { setBatchStatus } from './batch-status';
import type { HandlerMap } from './context';

/** Replaces the seeds of a growth batch by its seed batch's measured (else planned) size and concentration. */
export function resolveLineage(db: SqliteDatabase, input: BatchDesignInput): BatchDesignInput {
  const seeds = input.seeds;
  if (!seeds?.seedBatchId) return input;
  const seedBatch = getBatch(db, seeds.seedBatchId, 'seeds.seedBatchId');
  if (seedBatch.importedHistory) {
    throw invalid(
      'seeds.seedBatchId',
      `batch #${seedBatch.id} "${seedBatch.name}" is a row of imported history: it has no design or measured ` +
        'seeds to grow on; choose a batch made here',
    );
  }
  if (seedBatch.status === 'planned') {
    throw invalid(
      'seeds.seedBatchId',
      `batch #${seedBatch.id} "${seedBatch.name}" is still planned: only a made or characterized batch can give ` +
        'seeds (mark it made first)',
    );
  }
  const metal = seedBatchMetal({ id: seedBatch.id, name: seedBatch.name, design: seedBatch.design });
  if (metal !== seeds.metal)
    throw invalid('seeds.metal', `batch #${seedBatch.id} made ${metal} seeds, not ${seeds.metal}`);
  const resolved = seedsFromBatch(
    { id: seedBatch.id, name: seedBatch.name, design: seedBatch.design, measured: seedBatch.measured },
    metal,
    seeds.volumeMl,
  );
  return { ...input, seeds: resolved.seeds };
}

/**
 * Where the thermodynamic model (shared-model/prediction) puts the surface element for this pair at the
 * designed composition, size and temperature; undefined when there is nothing to compare (one metal) or
 * the model cannot answer for this pair (the reason is returned for the view).
 */
export function thermodynamicSurface(particle: SurfaceQuestion): SurfaceAnswer {
  if (particle.architecture === 'single-metal') return { element: undefined, note: null };
  const { xB } = particle;
  if (!(xB > 0 && xB < 1)) return { element: undefined, note: null };
  try {
    const expected = asMadeForBatch({
      elementA: particle.elementA,
      elementB: particle.elementB,
      xB,
      diameterNm: particle.diameterNm,
      route: particle.route,
      temperatureK: particle.temperatureC + 273.15,
      ...(particle.seedElement !== null ? { seedElement: particle.seedElement } : {}),
    });
    const { label, basis, afterAnnealing, text, oxidation } = expected;
    return {
      element: expected.equilibrium.surfaceElement,
      note: null,
      asMade: { label, basis, afterAnnealing, text, oxidation },
    };
  } catch (error) {
    if (error instanceof DomainError)
      return { element: undefined, note: `thermodynamic prediction unavailable: ${error.message}` };
    throw error;
  }
}

/** Resolves the lineage and designs the batch once, the thermodynamic prediction asked on the way. */
export function computeDesign(
  db: SqliteDatabase,
  rawInput: BatchDesignInput,
): { input: BatchDesignInput; design: BatchDesign } {
  const input = resolveLineage(db, rawInput);
  const design = designBatch(input, { catalog: listCatalog(db), now: nowIso(), thermodynamicSurface });
  return { input, design };
}

function catalogChanges(db: SqliteDatabase, batch: StoredBatch): CatalogChange[] {
  const current = currentRevisions(db);
  const changes: CatalogChange[] = [];
  for (const [key, savedRevision] of Object.entries(batch.catalogRevisions)) {
    const now = current.get(key) ?? null;
    if (now !== savedRevision) {
      const name = batch.design.reagents.find((r) => r.key === key)?.name ?? key;
      changes.push({ reagentKey: key, name, savedRevision, currentRevision: now });
    }
  }
  return changes;
}

function toSavedBatch(db: SqliteDatabase, batch: StoredBatch): SavedBatch {
  const catalog = new Map(listCatalog(db).map((r) => [r.key, r]));
  const ages = stockAges(
    batch.stocks.map((stock) => {
      const reagent = catalog.get(stock.reagentKey);
      return {
        reagentKey: stock.reagentKey,
        name: reagent?.name ?? stock.reagentKey,
        preparedAt: stock.preparedAt,
        freshnessHours: stock.freshnessHours ?? reagent?.stockFreshnessHours ?? null,
      };
    }),
    // a stock dated after "now" by clock skew must not fail the read
    maxIso(nowIso(), ...batch.stocks.map((s) => s.preparedAt)),
  );
  return {
    id: batch.id,
    name: batch.name,
    campaignId: batch.campaignId,
    pairId: batch.pairId,
    status: batch.status,
    input: batch.input,
    design: batch.design,
    catalogRevisions: batch.catalogRevisions,
    catalogChanges: catalogChanges(db, batch),
    lots: batch.lots,
    stockAges: ages,
    seedBatchId: batch.seedBatchId,
    measured: batch.measured,
    notes: batch.notes,
    history: listBatchHistory(db, batch.id),
    createdAt: batch.createdAt,
    updatedAt: batch.updatedAt,
  };
}

function maxIso(...values: string[]): string {
  return values.reduce((latest, value) => (Date.parse(value) > Date.parse(latest) ? value : latest));
}

function checkLots(design: BatchDesign, lots: readonly { reagentKey: string }[]): void {
  const used = new Set(design.reagents.map((r) => r.key));
  lots.forEach((lot, index) => {
    if (!used.has(lot.reagentKey))
      throw invalid(`lots.${index}.reagentKey`, `"${lot.reagentKey}" is not a reagent of this batch`);
  });
}

function checkStocks(db: SqliteDatabase, stocks: readonly StockRecord[]): void {
  const keys = new Set(listCatalog(db).map((r) => r.key));
  stocks.forEach((stock, index) => {
    if (!keys.has(stock.reagentKey))
      throw invalid(`stocks.${index}.reagentKey`, `no reagent "${stock.reagentKey}" in the catalog`);
  });
}

/** A batch designed here: a row of imported history has no design, so no reagent list or bench sheet. */
export function getDesignedBatch(db: SqliteDatabase, id: number, field: string): StoredBatch {
  const batch = getBatch(db, id, field);
  if (batch.importedHistory) {
    throw invalid(
      field,
      `batch #${batch.id} "${batch.name}" is a row of imported history: it has no design here, so no reagents ` +
        'or bench sheet; choose a batch planned in Batch design',
    );
  }
  return batch;
}

function reagentListFor(db: SqliteDatabase, batchIds: readonly number[]): ReagentList {
  const batches = batchIds.map((id, index) => getDesignedBatch(db, id, `batchIds.${index}`));
  return buildReagentList(
    batches.map((b) => ({
      batchId: b.id,
      batchName: b.name,
      reagents: b.design.reagents,
      context: {
        temperatureC: b.design.temperatureC,
        metals: b.design.metals.map((m) => m.element),
        aqueous: b.design.aqueous,
      },
    })),
    listInventory(db),
    listCatalog(db),
  );
}

export const batchHandlers: HandlerMap<keyof typeof batchOperations> = {
  'batches.design': (input, { store }) => computeDesign(store.db, input).design,

  'batches.save': (input, { store }) => {
    const db = store.db;
    if (input.campaignId !== null) getCampaign(db, input.campaignId);
    if (input.pairId !== null) {
      const pair = getPair(db, input.pairId);
      const samePair =
        [pair.elementA, pair.elementB].sort().join('-') ===
        [input.design.elementA, input.design.elementB].sort().join('-');
      if (!samePair)
        throw invalid(
          'pairId',
          `pair ${pair.id} is ${pair.elementA}-${pair.elementB}, not ${input.design.elementA}-${input.design.elementB}`,
        );
    }
    const { input: resolved, design } = computeDesign(db, input.design);
    checkLots(design, input.lots);
    checkStocks(db, resolved.stocks);
    const revisions = currentRevisions(db);
    const catalogRevisions: Record<string, number> = {};
    for (const line of design.reagents) {
      const revision = revisions.get(line.key);
      if (revision !== undefined) catalogRevisions[line.key] = revision;
    }
    const saved = insertBatch(db, {
      name: input.name,
      campaignId: input.campaignId,
      pairId: input.pairId,
      input: resolved,
      design,
      catalogRevisions,
      seedBatchId: resolved.seeds?.seedBatchId ?? null,
      lots: input.lots,
      stocks: resolved.stocks,
      notes: input.notes,
    });
    return toSavedBatch(db, saved);
  },

  'batches.list': (input, { store }) => {
    const { includeArchived, ...filter } = input;
    const archived =
      includeArchived || filter.campaignId !== undefined
        ? []
        : listCampaigns(store.db, true)
            .filter((c) => c.archived)
            .map((c) => c.id);
    return listBatchSummaries(store.db, { ...filter, excludeCampaignIds: archived });
  },

  'batches.get': (input, { store }) => toSavedBatch(store.db, getBatch(store.db, input.id)),

  'batches.setStatus': (input, { store }) => {
    const { batch, inventoryEffect } = setBatchStatus(store.db, input);
    return { ...toSavedBatch(store.db, batch), inventoryEffect };
  },

  'batches.record': (input, { store }) => {
    const current = getBatch(store.db, input.id);
    if (input.lots) checkLots(current.design, input.lots);
    if (input.stocks) checkStocks(store.db, input.stocks);
    return toSavedBatch(
      store.db,
      updateBatchRecords(store.db, input.id, {
        ...(input.lots ? { lots: input.lots } : {}),
        ...(input.stocks ? { stocks: input.stocks } : {}),
        ...(input.notes !== undefined ? { notes: input.notes } : {}),
      }),
    );
  },

  'batches.remove': (input, { store }) => {
    const batch = getBatch(store.db, input.id);
    if (batch.importedHistory) {
      throw new DomainError(
        'conflict',
        `batch #${batch.id} "${batch.name}" is a row of imported history; remove its import ` +
          '(Results → Import history) to take its rows away',
        'id',
      );
    }
    removeBatch(store.db, input.id);
    return { removed: input.id };
  },

  'reagents.catalog': (_input, { store }) => listCatalog(store.db),
  'reagents.add': (input, { store }) => addCatalogReagent(store.db, prepareReagent(input)),
  'reagents.edit': (input, { store }) => editCatalogReagent(store.db, prepareReagent(input)),

  'inventory.list': (_input, { store }) => {
    listCatalog(store.db);
    return listInventory(store.db);
  },
  'inventory.upsert': (input, { store }) => upsertInventory(store.db, input),
  'inventory.remove': (input, { store }) => {
    removeInventory(store.db, input.id);
    return { removed: input.id };
  },

  'reagents.list': (input, { store }) => reagentListFor(store.db, input.batchIds),
  'reagents.csv': (input, { store }) => ({
    csv: reagentListCsv(reagentListFor(store.db, input.batchIds)),
    filename: `pairwright-reagents-batches-${input.batchIds.join('-')}.csv`,
  }),
};
