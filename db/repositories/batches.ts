/**
 * Saved batches (migration 0004: `batches`, `batch_lots`, `batch_stocks`): inputs and computed JSON as
 * saved, status, lineage (growth batch → seed batch), reagent lots and stock-solution dates. The reagent
 * catalog and the inventory have their own repositories (catalog.ts, inventory.ts).
 */
import type { BatchStatus, BatchSummary, MeasuredSeeds, ReagentLot } from '../../shared-model/api/batches';
import { DomainError } from '../../shared-model/api/result';
import type { BatchDesign } from '../../shared-model/recipes/design';
import type { BatchDesignInput, StockRecord } from '../../shared-model/recipes/design-input';
import { nowIso, type SqliteDatabase } from '../store';
import { currentRevisions } from './catalog';

interface BatchRow {
  id: number;
  name: string;
  campaign_id: number | null;
  pair_id: number | null;
  element_a: string;
  element_b: string;
  target: string;
  route: string;
  status: BatchStatus;
  inputs: string;
  computed: string;
  model_version: string;
  catalog_revisions: string;
  seed_batch_id: number | null;
  measured_diameter_nm: number | null;
  measured_particles_per_ml: number | null;
  notes: string;
  created_at: string;
  updated_at: string;
  history_outcome_id: number | null;
}

export interface StoredBatch {
  id: number;
  name: string;
  campaignId: number | null;
  pairId: number | null;
  status: BatchStatus;
  input: BatchDesignInput;
  design: BatchDesign;
  modelVersion: string;
  catalogRevisions: Record<string, number>;
  seedBatchId: number | null;
  measured: MeasuredSeeds | null;
  lots: ReagentLot[];
  stocks: StockRecord[];
  notes: string;
  createdAt: string;
  updatedAt: string;
  /** A row of an imported history table (migration 0012): no design of ours, its outcome observed. */
  importedHistory: boolean;
}

function toStoredBatch(db: SqliteDatabase, row: BatchRow): StoredBatch {
  const lots = db
    .prepare('SELECT reagent_key, lot FROM batch_lots WHERE batch_id = ? ORDER BY reagent_key')
    .all(row.id) as { reagent_key: string; lot: string }[];
  const stocks = db
    .prepare(
      'SELECT reagent_key, prepared_at, freshness_hours FROM batch_stocks WHERE batch_id = ? ORDER BY reagent_key',
    )
    .all(row.id) as {
    reagent_key: string;
    prepared_at: string;
    freshness_hours: number | null;
  }[];
  const measured =
    row.measured_diameter_nm !== null || row.measured_particles_per_ml !== null
      ? { diameterNm: row.measured_diameter_nm, particlesPerMl: row.measured_particles_per_ml }
      : null;
  return {
    id: row.id,
    name: row.name,
    campaignId: row.campaign_id,
    pairId: row.pair_id,
    status: row.status,
    input: JSON.parse(row.inputs) as BatchDesignInput,
    design: JSON.parse(row.computed) as BatchDesign,
    modelVersion: row.model_version,
    catalogRevisions: JSON.parse(row.catalog_revisions) as Record<string, number>,
    seedBatchId: row.seed_batch_id,
    measured,
    lots: lots.map((l) => ({ reagentKey: l.reagent_key, lot: l.lot })),
    stocks: stocks.map((s) => ({
      reagentKey: s.reagent_key,
      preparedAt: s.prepared_at,
      ...(s.freshness_hours !== null ? { freshnessHours: s.freshness_hours } : {}),
    })),
    notes: row.notes,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    importedHistory: row.history_outcome_id !== null,
  };
}

export function getBatch(db: SqliteDatabase, id: number, field = 'id'): StoredBatch {
  const row = db.prepare('SELECT * FROM batches WHERE id = ?').get(id) as BatchRow | undefined;
  if (!row) throw new DomainError('not_found', `no batch with id ${id}`, field);
  return toStoredBatch(db, row);
}

export function listBatchSummaries(
  db: SqliteDatabase,
  filter: {
    campaignId?: number | undefined;
    status?: BatchStatus | undefined;
    statuses?: readonly BatchStatus[] | undefined;
    /** Batches of these campaigns are left out (archived campaigns); batches of no campaign stay. */
    excludeCampaignIds?: readonly number[] | undefined;
  },
): BatchSummary[] {
  const where: string[] = [];
  const params: (string | number)[] = [];
  if (filter.campaignId !== undefined) {
    where.push('campaign_id = ?');
    params.push(filter.campaignId);
  }
  if (filter.status !== undefined) {
    where.push('status = ?');
    params.push(filter.status);
  }
  if (filter.statuses !== undefined) {
    where.push('status IN (SELECT value FROM json_each(?))');
    params.push(JSON.stringify(filter.statuses));
  }
  if (filter.excludeCampaignIds !== undefined && filter.excludeCampaignIds.length > 0) {
    where.push('(campaign_id IS NULL OR campaign_id NOT IN (SELECT value FROM json_each(?)))');
    params.push(JSON.stringify(filter.excludeCampaignIds));
  }
  const rows = db
    .prepare(
      `SELECT id, name, campaign_id, element_a, element_b, target, route, status, seed_batch_id, catalog_revisions,
         json_extract(computed, '$.diameterNm') AS diameter_nm, created_at, history_outcome_id
       FROM batches ${where.length ? `WHERE ${where.join(' AND ')}` : ''} ORDER BY id DESC`,
    )
    .all(...params) as (Pick<
    BatchRow,
    | 'id'
    | 'name'
    | 'campaign_id'
    | 'element_a'
    | 'element_b'
    | 'target'
    | 'route'
    | 'status'
    | 'seed_batch_id'
    | 'catalog_revisions'
    | 'created_at'
    | 'history_outcome_id'
  > & { diameter_nm: number })[];
  const revisions = currentRevisions(db);
  return rows.map((row) => ({
    id: row.id,
    name: row.name,
    campaignId: row.campaign_id,
    elementA: row.element_a,
    elementB: row.element_b,
    target: row.target,
    route: row.route,
    status: row.status,
    diameterNm: row.diameter_nm,
    seedBatchId: row.seed_batch_id,
    catalogChanged: Object.entries(JSON.parse(row.catalog_revisions) as Record<string, number>).some(
      ([key, revision]) => revisions.get(key) !== revision,
    ),
    createdAt: row.created_at,
    importedHistory: row.history_outcome_id !== null,
  }));
}

/** One row of an imported history table, kept as a characterized batch of its campaign. */
export interface NewHistoryBatch {
  campaignId: number;
  pairId: number | null;
  historyOutcomeId: number;
  importId: number;
  fileName: string | null;
  line: number;
  elementA: string;
  elementB: string;
  xB: number;
  diameterNm: number;
  temperatureK: number;
  route: string;
  observed: string;
  madeOn: string | null;
  notes: string;
}

export const HISTORY_BATCH_MODEL_VERSION = 'imported history';

/**
 * Writes the batch of an imported history row: characterized, with the conditions of the row as its
 * `computed` record (no reagents: it was not designed here) and the observed label as its target.
 */
export function insertHistoryBatch(db: SqliteDatabase, batch: NewHistoryBatch): number {
  const now = nowIso();
  const origin = { importedHistory: true, importId: batch.importId, line: batch.line };
  const computed = {
    ...origin,
    fileName: batch.fileName,
    elementA: batch.elementA,
    elementB: batch.elementB,
    target: batch.observed,
    route: batch.route,
    xB: batch.xB,
    diameterNm: batch.diameterNm,
    temperatureK: batch.temperatureK,
    temperatureC: batch.temperatureK - 273.15,
    madeOn: batch.madeOn,
    modelVersion: HISTORY_BATCH_MODEL_VERSION,
  };
  const info = db
    .prepare(
      `INSERT INTO batches (name, campaign_id, pair_id, element_a, element_b, target, route, status, inputs, computed,
         model_version, catalog_revisions, notes, created_at, updated_at, history_outcome_id)
       VALUES (?, ?, ?, ?, ?, ?, ?, 'characterized', ?, ?, ?, '{}', ?, ?, ?, ?)`,
    )
    .run(
      `History ${batch.elementA}-${batch.elementB} line ${batch.line}`,
      batch.campaignId,
      batch.pairId,
      batch.elementA,
      batch.elementB,
      batch.observed,
      batch.route,
      JSON.stringify(origin),
      JSON.stringify(computed),
      HISTORY_BATCH_MODEL_VERSION,
      batch.notes,
      now,
      now,
      batch.historyOutcomeId,
    );
  return Number(info.lastInsertRowid);
}

/** The batch id of each imported history row of a campaign (history outcome id → batch id). */
export function historyBatchIds(db: SqliteDatabase, campaignId: number): Map<number, number> {
  const rows = db
    .prepare('SELECT id, history_outcome_id FROM batches WHERE campaign_id = ? AND history_outcome_id IS NOT NULL')
    .all(campaignId) as { id: number; history_outcome_id: number }[];
  return new Map(rows.map((r) => [r.history_outcome_id, r.id]));
}

/** Batches seeded from a batch of this history import (they keep an import from being removed). */
export function batchesSeededFromImport(
  db: SqliteDatabase,
  historyOutcomeIds: readonly number[],
): { id: number; name: string }[] {
  return db
    .prepare(
      `SELECT c.id, c.name FROM batches c JOIN batches s ON s.id = c.seed_batch_id
       WHERE s.history_outcome_id IN (SELECT value FROM json_each(?)) ORDER BY c.id`,
    )
    .all(JSON.stringify(historyOutcomeIds)) as { id: number; name: string }[];
}

/**
 * The conditions of a campaign's own batches (not imported history) for learning: pair, route, planned
 * size, nominal composition (xB, or xBPct of designs saved before the fraction) and highest temperature.
 */
export interface BatchConditions {
  id: number;
  elementA: string;
  elementB: string;
  route: string;
  diameterNm: number | null;
  xB: number | null;
  temperatureC: number | null;
  createdAt: string;
}

export function listOwnBatchConditions(db: SqliteDatabase, campaignId: number): BatchConditions[] {
  const rows = db
    .prepare(
      `SELECT id, element_a, element_b, route, created_at,
         json_extract(computed, '$.diameterNm') AS diameter_nm,
         coalesce(json_extract(computed, '$.xB'), json_extract(computed, '$.xBPct') / 100.0) AS x_b,
         json_extract(computed, '$.temperatureC') AS temperature_c
       FROM batches WHERE campaign_id = ? AND history_outcome_id IS NULL ORDER BY id`,
    )
    .all(campaignId) as {
    id: number;
    element_a: string;
    element_b: string;
    route: string;
    created_at: string;
    diameter_nm: unknown;
    x_b: unknown;
    temperature_c: unknown;
  }[];
  const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  return rows.map((r) => ({
    id: r.id,
    elementA: r.element_a,
    elementB: r.element_b,
    route: r.route,
    diameterNm: num(r.diameter_nm),
    xB: num(r.x_b),
    temperatureC: num(r.temperature_c),
    createdAt: r.created_at,
  }));
}

export interface NewBatch {
  name: string;
  campaignId: number | null;
  pairId: number | null;
  input: BatchDesignInput;
  design: BatchDesign;
  catalogRevisions: Record<string, number>;
  seedBatchId: number | null;
  lots: readonly ReagentLot[];
  stocks: readonly StockRecord[];
  notes: string;
}

export function insertBatch(db: SqliteDatabase, batch: NewBatch): StoredBatch {
  const now = nowIso();
  const id = db.transaction(() => {
    const info = db
      .prepare(
        `INSERT INTO batches (name, campaign_id, pair_id, element_a, element_b, target, route, status, inputs, computed,
           model_version, catalog_revisions, seed_batch_id, notes, created_at, updated_at)
         VALUES (?, ?, ?, ?, ?, ?, ?, 'planned', ?, ?, ?, ?, ?, ?, ?, ?)`,
      )
      .run(
        batch.name,
        batch.campaignId,
        batch.pairId,
        batch.design.elementA,
        batch.design.elementB,
        batch.design.target,
        batch.design.route,
        JSON.stringify(batch.input),
        JSON.stringify(batch.design),
        batch.design.modelVersion,
        JSON.stringify(batch.catalogRevisions),
        batch.seedBatchId,
        batch.notes,
        now,
        now,
      );
    const newId = Number(info.lastInsertRowid);
    writeLots(db, newId, batch.lots);
    writeStocks(db, newId, batch.stocks);
    return newId;
  })();
  return getBatch(db, id);
}

function writeLots(db: SqliteDatabase, id: number, lots: readonly ReagentLot[]): void {
  db.prepare('DELETE FROM batch_lots WHERE batch_id = ?').run(id);
  const insert = db.prepare('INSERT INTO batch_lots (batch_id, reagent_key, lot) VALUES (?, ?, ?)');
  for (const lot of lots) if (lot.lot.length > 0) insert.run(id, lot.reagentKey, lot.lot);
}

function writeStocks(db: SqliteDatabase, id: number, stocks: readonly StockRecord[]): void {
  db.prepare('DELETE FROM batch_stocks WHERE batch_id = ?').run(id);
  const insert = db.prepare(
    'INSERT INTO batch_stocks (batch_id, reagent_key, prepared_at, freshness_hours) VALUES (?, ?, ?, ?)',
  );
  for (const stock of stocks) insert.run(id, stock.reagentKey, stock.preparedAt, stock.freshnessHours ?? null);
}

export function updateBatchRecords(
  db: SqliteDatabase,
  id: number,
  changes: { lots?: readonly ReagentLot[]; stocks?: readonly StockRecord[]; notes?: string },
): StoredBatch {
  getBatch(db, id);
  db.transaction(() => {
    if (changes.lots) writeLots(db, id, changes.lots);
    if (changes.stocks) writeStocks(db, id, changes.stocks);
    if (changes.notes !== undefined) db.prepare('UPDATE batches SET notes = ? WHERE id = ?').run(changes.notes, id);
    db.prepare('UPDATE batches SET updated_at = ? WHERE id = ?').run(nowIso(), id);
  })();
  return getBatch(db, id);
}

export function updateBatchStatus(
  db: SqliteDatabase,
  id: number,
  status: BatchStatus,
  measured?: { diameterNm?: number | null; particlesPerMl?: number | null },
): StoredBatch {
  const current = getBatch(db, id);
  const diameter =
    measured && measured.diameterNm !== undefined ? measured.diameterNm : (current.measured?.diameterNm ?? null);
  const concentration =
    measured && measured.particlesPerMl !== undefined
      ? measured.particlesPerMl
      : (current.measured?.particlesPerMl ?? null);
  db.prepare(
    `UPDATE batches SET status = ?, measured_diameter_nm = ?, measured_particles_per_ml = ?, updated_at = ?
     WHERE id = ?`,
  ).run(status, diameter, concentration, nowIso(), id);
  return getBatch(db, id);
}

export function removeBatch(db: SqliteDatabase, id: number): void {
  getBatch(db, id);
  const children = db.prepare('SELECT id, name FROM batches WHERE seed_batch_id = ? ORDER BY id').all(id) as {
    id: number;
    name: string;
  }[];
  if (children.length > 0) {
    throw new DomainError(
      'conflict',
      `batch ${id} is the seed batch of ${children.map((c) => `#${c.id} ${c.name}`).join(', ')}; remove those first`,
      'id',
    );
  }
  db.prepare('DELETE FROM batches WHERE id = ?').run(id);
}

// ── What other areas read of a batch ──

/** What the outcome area reads of a batch: its pair, target and the planned size and composition. */
export interface BatchForOutcome {
  id: number;
  name: string;
  campaignId: number | null;
  pairId: number | null;
  elementA: string;
  elementB: string;
  target: string;
  diameterNm: number | null;
  /** Nominal (feed) atomic fraction of B, from the saved design. */
  nominalXB: number | null;
  createdAt: string;
}

interface BatchForOutcomeRow {
  id: number;
  name: string;
  campaign_id: number | null;
  pair_id: number | null;
  element_a: string;
  element_b: string;
  target: string;
  diameter_nm: unknown;
  x_b: unknown;
  created_at: string;
}

const BATCH_FOR_OUTCOME_SELECT = `SELECT id, name, campaign_id, pair_id, element_a, element_b, target,
  json_extract(computed, '$.diameterNm') AS diameter_nm, json_extract(computed, '$.xB') AS x_b, created_at
  FROM batches`;

function toBatchForOutcome(row: BatchForOutcomeRow): BatchForOutcome {
  return {
    id: row.id,
    name: row.name,
    campaignId: row.campaign_id,
    pairId: row.pair_id,
    elementA: row.element_a,
    elementB: row.element_b,
    target: row.target,
    diameterNm: typeof row.diameter_nm === 'number' ? row.diameter_nm : null,
    nominalXB: typeof row.x_b === 'number' ? row.x_b : null,
    createdAt: row.created_at,
  };
}

export function getBatchForOutcome(db: SqliteDatabase, batchId: number, field = 'batchId'): BatchForOutcome {
  const row = db.prepare(`${BATCH_FOR_OUTCOME_SELECT} WHERE id = ?`).get(batchId) as BatchForOutcomeRow | undefined;
  if (!row) throw new DomainError('not_found', `no batch with id ${batchId}`, field);
  return toBatchForOutcome(row);
}

/** The batches of a campaign, oldest first. */
export function listCampaignBatches(db: SqliteDatabase, campaignId: number): BatchForOutcome[] {
  const rows = db.prepare(`${BATCH_FOR_OUTCOME_SELECT} WHERE campaign_id = ? ORDER BY id`).all(campaignId);
  return (rows as BatchForOutcomeRow[]).map(toBatchForOutcome);
}
