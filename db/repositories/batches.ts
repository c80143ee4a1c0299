/**
 * Store for batch design: the reagent catalog with revisions (seeded from the built-in reagent list),
 * saved batches (inputs + computed JSON + status + lineage + lots + stock dates) and the inventory.
 */
import type { BatchStatus, BatchSummary, CatalogReagent, InventoryRecord, MeasuredSeeds, ReagentLot } from '../../shared-model/api/batches';
import { DomainError } from '../../shared-model/api/result';
import type { BatchDesign } from '../../shared-model/recipes/design';
import type { BatchDesignInput, StockRecord } from '../../shared-model/recipes/design-input';
import { prepareReagent, type Reagent } from '../../shared-model/recipes/reagent';
import type { InventoryUnit } from '../../shared-model/recipes/reagent-list';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';
import { nowIso, type SqliteDatabase } from '../store';

// ── Catalog ───────────────────────────────────────────────────────────────────

interface ReagentRow {
  key: string;
  data: string;
  revision: number;
  built_in: number;
  updated_at: string;
}

let preparedSeed: Reagent[] | null = null;
function seedReagents(): Reagent[] {
  preparedSeed ??= REAGENT_SEED.map((reagent) => prepareReagent(reagent));
  return preparedSeed;
}

function toCatalogReagent(row: ReagentRow): CatalogReagent {
  return { ...(JSON.parse(row.data) as Reagent), revision: row.revision, builtIn: row.built_in === 1, updatedAt: row.updated_at };
}

/** Writes the built-in reagents that are not in the catalog yet (first use, or a newer Pairwright). */
export function ensureCatalogSeeded(db: SqliteDatabase): void {
  const present = db.prepare('SELECT count(*) AS n FROM reagents WHERE built_in = 1').get() as { n: number };
  if (present.n >= REAGENT_SEED.length) return;
  const now = nowIso();
  const insert = db.prepare('INSERT OR IGNORE INTO reagents (key, data, revision, built_in, created_at, updated_at) VALUES (?, ?, 1, 1, ?, ?)');
  const history = db.prepare('INSERT OR IGNORE INTO reagent_revisions (reagent_key, revision, data, saved_at) VALUES (?, 1, ?, ?)');
  db.transaction(() => {
    for (const reagent of seedReagents()) {
      const data = JSON.stringify(reagent);
      const info = insert.run(reagent.key, data, now, now);
      if (info.changes > 0) history.run(reagent.key, data, now);
    }
  })();
}

export function listCatalog(db: SqliteDatabase): CatalogReagent[] {
  ensureCatalogSeeded(db);
  const rows = db.prepare('SELECT key, data, revision, built_in, updated_at FROM reagents ORDER BY key').all() as ReagentRow[];
  return rows.map(toCatalogReagent);
}

export function findCatalogReagent(db: SqliteDatabase, key: string): CatalogReagent | null {
  ensureCatalogSeeded(db);
  const row = db.prepare('SELECT key, data, revision, built_in, updated_at FROM reagents WHERE key = ?').get(key) as ReagentRow | undefined;
  return row ? toCatalogReagent(row) : null;
}

export function addCatalogReagent(db: SqliteDatabase, reagent: Reagent): CatalogReagent {
  ensureCatalogSeeded(db);
  if (findCatalogReagent(db, reagent.key)) throw new DomainError('conflict', `a reagent with key "${reagent.key}" is already in the catalog; edit it instead`, 'key');
  const now = nowIso();
  const data = JSON.stringify(reagent);
  db.transaction(() => {
    db.prepare('INSERT INTO reagents (key, data, revision, built_in, created_at, updated_at) VALUES (?, ?, 1, 0, ?, ?)').run(reagent.key, data, now, now);
    db.prepare('INSERT INTO reagent_revisions (reagent_key, revision, data, saved_at) VALUES (?, 1, ?, ?)').run(reagent.key, data, now);
  })();
  return findCatalogReagent(db, reagent.key) as CatalogReagent;
}

/** Saves a new revision of a catalog reagent; batches saved earlier keep their values. */
export function editCatalogReagent(db: SqliteDatabase, reagent: Reagent): CatalogReagent {
  const current = findCatalogReagent(db, reagent.key);
  if (!current) throw new DomainError('not_found', `no reagent "${reagent.key}" in the catalog`, 'key');
  const now = nowIso();
  const data = JSON.stringify(reagent);
  const revision = current.revision + 1;
  db.transaction(() => {
    db.prepare('UPDATE reagents SET data = ?, revision = ?, updated_at = ? WHERE key = ?').run(data, revision, now, reagent.key);
    db.prepare('INSERT INTO reagent_revisions (reagent_key, revision, data, saved_at) VALUES (?, ?, ?, ?)').run(reagent.key, revision, data, now);
  })();
  return findCatalogReagent(db, reagent.key) as CatalogReagent;
}

// ── Batches ───────────────────────────────────────────────────────────────────

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
  const lots = db.prepare('SELECT reagent_key, lot FROM batch_lots WHERE batch_id = ? ORDER BY reagent_key').all(row.id) as { reagent_key: string; lot: string }[];
  const stocks = db.prepare('SELECT reagent_key, prepared_at, freshness_hours FROM batch_stocks WHERE batch_id = ? ORDER BY reagent_key').all(row.id) as {
    reagent_key: string;
    prepared_at: string;
    freshness_hours: number | null;
  }[];
  const measured = row.measured_diameter_nm !== null || row.measured_particles_per_ml !== null ? { diameterNm: row.measured_diameter_nm, particlesPerMl: row.measured_particles_per_ml } : null;
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
    stocks: stocks.map((s) => ({ reagentKey: s.reagent_key, preparedAt: s.prepared_at, ...(s.freshness_hours !== null ? { freshnessHours: s.freshness_hours } : {}) })),
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

export function listBatchSummaries(db: SqliteDatabase, filter: { campaignId?: number; status?: BatchStatus }): BatchSummary[] {
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
  const rows = db
    .prepare(`SELECT id, name, campaign_id, element_a, element_b, target, route, status, seed_batch_id, catalog_revisions, json_extract(computed, '$.diameterNm') AS diameter_nm, created_at FROM batches ${where.length ? `WHERE ${where.join(' AND ')}` : ''} ORDER BY id DESC`)
    .all(...params) as (Pick<BatchRow, 'id' | 'name' | 'campaign_id' | 'element_a' | 'element_b' | 'target' | 'route' | 'status' | 'seed_batch_id' | 'catalog_revisions' | 'created_at'> & { diameter_nm: number })[];
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
    catalogChanged: Object.entries(JSON.parse(row.catalog_revisions) as Record<string, number>).some(([key, revision]) => revisions.get(key) !== revision),
    createdAt: row.created_at,
  }));
}

export function currentRevisions(db: SqliteDatabase): Map<string, number> {
  const rows = db.prepare('SELECT key, revision FROM reagents').all() as { key: string; revision: number }[];
  return new Map(rows.map((r) => [r.key, r.revision]));
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
        `INSERT INTO batches (name, campaign_id, pair_id, element_a, element_b, target, route, status, inputs, computed, model_version, catalog_revisions, seed_batch_id, notes, created_at, updated_at)
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
  const insert = db.prepare('INSERT INTO batch_stocks (batch_id, reagent_key, prepared_at, freshness_hours) VALUES (?, ?, ?, ?)');
  for (const stock of stocks) insert.run(id, stock.reagentKey, stock.preparedAt, stock.freshnessHours ?? null);
}

export function updateBatchRecords(db: SqliteDatabase, id: number, changes: { lots?: readonly ReagentLot[]; stocks?: readonly StockRecord[]; notes?: string }): StoredBatch {
  getBatch(db, id);
  db.transaction(() => {
    if (changes.lots) writeLots(db, id, changes.lots);
    if (changes.stocks) writeStocks(db, id, changes.stocks);
    if (changes.notes !== undefined) db.prepare('UPDATE batches SET notes = ? WHERE id = ?').run(changes.notes, id);
    db.prepare('UPDATE batches SET updated_at = ? WHERE id = ?').run(nowIso(), id);
  })();
  return getBatch(db, id);
}

export function updateBatchStatus(db: SqliteDatabase, id: number, status: BatchStatus, measured?: { diameterNm?: number | null; particlesPerMl?: number | null }): StoredBatch {
  const current = getBatch(db, id);
  const diameter = measured && measured.diameterNm !== undefined ? measured.diameterNm : (current.measured?.diameterNm ?? null);
  const concentration = measured && measured.particlesPerMl !== undefined ? measured.particlesPerMl : (current.measured?.particlesPerMl ?? null);
  db.prepare('UPDATE batches SET status = ?, measured_diameter_nm = ?, measured_particles_per_ml = ?, updated_at = ? WHERE id = ?').run(status, diameter, concentration, nowIso(), id);
  return getBatch(db, id);
}

export function removeBatch(db: SqliteDatabase, id: number): void {
  getBatch(db, id);
  const children = db.prepare('SELECT id, name FROM batches WHERE seed_batch_id = ? ORDER BY id').all(id) as { id: number; name: string }[];
  if (children.length > 0) {
    throw new DomainError('conflict', `batch ${id} is the seed batch of ${children.map((c) => `#${c.id} ${c.name}`).join(', ')}; remove those first`, 'id');
  }
  db.prepare('DELETE FROM batches WHERE id = ?').run(id);
}

// ── Inventory ─────────────────────────────────────────────────────────────────

interface InventoryRow {
  id: number;
  reagent_key: string;
  amount: number;
  unit: InventoryUnit;
  location: string;
  lot: string;
  updated_at: string;
  data: string;
}

function toInventoryRecord(row: InventoryRow): InventoryRecord {
  return {
    id: row.id,
    reagentKey: row.reagent_key,
    reagentName: (JSON.parse(row.data) as Reagent).name,
    amount: row.amount,
    unit: row.unit,
    location: row.location,
    lot: row.lot,
    updatedAt: row.updated_at,
  };
}

const INVENTORY_SELECT = 'SELECT i.*, r.data FROM inventory i JOIN reagents r ON r.key = i.reagent_key';

export function listInventory(db: SqliteDatabase): InventoryRecord[] {
  const rows = db.prepare(`${INVENTORY_SELECT} ORDER BY json_extract(r.data, '$.name'), i.id`).all() as InventoryRow[];
  return rows.map(toInventoryRecord);
}

export function upsertInventory(
  db: SqliteDatabase,
  item: { id?: number | undefined; reagentKey: string; amount: number; unit: InventoryUnit; location: string; lot: string },
): InventoryRecord {
  if (!findCatalogReagent(db, item.reagentKey)) throw new DomainError('invalid_input', `no reagent "${item.reagentKey}" in the catalog`, 'reagentKey');
  const now = nowIso();
  let id = item.id;
  if (id !== undefined) {
    const info = db
      .prepare('UPDATE inventory SET reagent_key = ?, amount = ?, unit = ?, location = ?, lot = ?, updated_at = ? WHERE id = ?')
      .run(item.reagentKey, item.amount, item.unit, item.location, item.lot, now, id);
    if (info.changes === 0) throw new DomainError('not_found', `no inventory entry with id ${id}`, 'id');
  } else {
    const info = db
      .prepare('INSERT INTO inventory (reagent_key, amount, unit, location, lot, updated_at) VALUES (?, ?, ?, ?, ?, ?)')
      .run(item.reagentKey, item.amount, item.unit, item.location, item.lot, now);
    id = Number(info.lastInsertRowid);
  }
  return toInventoryRecord(db.prepare(`${INVENTORY_SELECT} WHERE i.id = ?`).get(id) as InventoryRow);
}

export function removeInventory(db: SqliteDatabase, id: number): void {
  const info = db.prepare('DELETE FROM inventory WHERE id = ?').run(id);
  if (info.changes === 0) throw new DomainError('not_found', `no inventory entry with id ${id}`, 'id');
}
