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
         json_extract(computed, '$.diameterNm') AS diameter_nm, created_at
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
