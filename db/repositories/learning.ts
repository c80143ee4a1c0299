/**
 * Learning tables (migration 0010_learning.sql): imported history tables and their rows, metal prices, fitted
 * models with the outcome ids they were trained on, and proposals made from a model. An import writes its
 * table row and all its outcome rows in one transaction.
 */
import type { HistoryRow } from '../../shared-model/learn/history-table';
import type { MetalPrice } from '../../shared-model/learn/proposals';
import type { LearningOutcome } from '../../shared-model/learn/outcome-model';
import type { SynthesisRoute } from '../../shared-model/recipes/design-input';
import { DomainError } from '../../shared-model/api/result';
import { nowIso, type SqliteDatabase } from '../store';

export interface HistoryImportRecord {
  id: number;
  campaignId: number;
  fileName: string | null;
  fingerprint: string;
  rowCount: number;
  createdAt: string;
}

interface ImportRow {
  id: number;
  campaign_id: number;
  file_name: string | null;
  fingerprint: string;
  row_count: number;
  created_at: string;
}

const toImport = (r: ImportRow): HistoryImportRecord => ({
  id: r.id,
  campaignId: r.campaign_id,
  fileName: r.file_name,
  fingerprint: r.fingerprint,
  rowCount: r.row_count,
  createdAt: r.created_at,
});

export function findImportByFingerprint(
  db: SqliteDatabase,
  campaignId: number,
  fingerprint: string,
): HistoryImportRecord | null {
  const row = db
    .prepare('SELECT * FROM history_imports WHERE campaign_id = ? AND fingerprint = ? ORDER BY id LIMIT 1')
    .get(campaignId, fingerprint) as ImportRow | undefined;
  return row ? toImport(row) : null;
}

export function listHistoryImports(db: SqliteDatabase, campaignId: number): HistoryImportRecord[] {
  const rows = db
    .prepare('SELECT * FROM history_imports WHERE campaign_id = ? ORDER BY id')
    .all(campaignId) as ImportRow[];
  return rows.map(toImport);
}

/** Writes the import and its rows in one transaction; `outcomeIds` are the row ids in the order of `rows`. */
export function insertHistoryImport(
  db: SqliteDatabase,
  input: { campaignId: number; fileName: string | null; fingerprint: string; rows: readonly HistoryRow[] },
): HistoryImportRecord & { outcomeIds: number[] } {
  const id = db.transaction(() => {
    const info = db
      .prepare(
        `INSERT INTO history_imports (campaign_id, file_name, fingerprint, row_count, created_at)
         VALUES (?, ?, ?, ?, ?)`,
      )
      .run(input.campaignId, input.fileName, input.fingerprint, input.rows.length, nowIso());
    const importId = Number(info.lastInsertRowid);
    const ids: number[] = [];
    const insert = db.prepare(
      `INSERT INTO history_outcomes (import_id, campaign_id, line, element_a, element_b, xb, diameter_nm, temperature_k,
         route, observed, made_on, notes) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
    );
    for (const r of input.rows) {
      const row = insert.run(
        importId,
        input.campaignId,
        r.line,
        r.elementA,
        r.elementB,
        r.xB,
        r.diameterNm,
        r.temperatureK,
        r.route,
        r.observed,
        r.madeOn,
        r.notes,
      );
      ids.push(Number(row.lastInsertRowid));
    }
    return { importId, ids };
  })();
  const row = db.prepare('SELECT * FROM history_imports WHERE id = ?').get(id.importId) as ImportRow;
  return { ...toImport(row), outcomeIds: id.ids };
}

/** The ids of the rows of one import (an unknown import is refused). */
export function historyOutcomeIdsOfImport(db: SqliteDatabase, importId: number): number[] {
  const found = db.prepare('SELECT id FROM history_imports WHERE id = ?').get(importId);
  if (!found) throw new DomainError('not_found', `no history import with id ${importId}`, 'importId');
  const rows = db.prepare('SELECT id FROM history_outcomes WHERE import_id = ? ORDER BY id').all(importId) as {
    id: number;
  }[];
  return rows.map((r) => r.id);
}

export function removeHistoryImport(db: SqliteDatabase, importId: number): number {
  const info = db.prepare('DELETE FROM history_imports WHERE id = ?').run(importId);
  if (info.changes === 0) throw new DomainError('not_found', `no history import with id ${importId}`, 'importId');
  return info.changes;
}

interface OutcomeRow {
  id: number;
  element_a: string;
  element_b: string;
  xb: number;
  diameter_nm: number;
  temperature_k: number;
  route: string;
  observed: string;
  made_on: string | null;
  notes: string;
  import_id: number;
  line: number;
}

export interface HistoryOutcomeRecord extends LearningOutcome {
  /** The row id in history_outcomes (the learning id is "h<rowId>"). */
  rowId: number;
  importId: number;
  line: number;
  notes: string;
}

/** Imported history outcomes of a campaign; ids are "h<row id>". */
export function listHistoryOutcomes(db: SqliteDatabase, campaignId: number): HistoryOutcomeRecord[] {
  const rows = db
    .prepare('SELECT * FROM history_outcomes WHERE campaign_id = ? ORDER BY id')
    .all(campaignId) as OutcomeRow[];
  return rows.map((r) => ({
    id: `h${r.id}`,
    elementA: r.element_a,
    elementB: r.element_b,
    xB: r.xb,
    diameterNm: r.diameter_nm,
    temperatureK: r.temperature_k,
    route: r.route as SynthesisRoute,
    observed: r.observed,
    madeOn: r.made_on,
    notes: r.notes,
    rowId: r.id,
    importId: r.import_id,
    line: r.line,
  }));
}

// ---------------------------------------------------------------- prices

export interface StoredMetalPrice extends MetalPrice {
  id: number;
  enteredAt: string;
}

interface PriceRow {
  id: number;
  symbol: string;
  price_per_gram: number;
  currency: string;
  priced_on: string;
  entered_at: string;
}

const toPrice = (r: PriceRow): StoredMetalPrice => ({
  id: r.id,
  symbol: r.symbol,
  pricePerGram: r.price_per_gram,
  currency: r.currency,
  pricedOn: r.priced_on,
  enteredAt: r.entered_at,
});

export function insertMetalPrice(db: SqliteDatabase, price: MetalPrice): StoredMetalPrice {
  const info = db
    .prepare(
      'INSERT INTO metal_prices (symbol, price_per_gram, currency, priced_on, entered_at) VALUES (?, ?, ?, ?, ?)',
    )
    .run(price.symbol, price.pricePerGram, price.currency, price.pricedOn, nowIso());
  return toPrice(db.prepare('SELECT * FROM metal_prices WHERE id = ?').get(Number(info.lastInsertRowid)) as PriceRow);
}

/** Every price entry, newest first per metal. */
export function listMetalPrices(db: SqliteDatabase): StoredMetalPrice[] {
  const rows = db.prepare('SELECT * FROM metal_prices ORDER BY symbol, priced_on DESC, id DESC').all() as PriceRow[];
  return rows.map(toPrice);
}

/** The latest price of each metal (by date, then by entry). */
export function latestMetalPrices(db: SqliteDatabase): StoredMetalPrice[] {
  const seen = new Set<string>();
  return listMetalPrices(db).filter((p) => (seen.has(p.symbol) ? false : (seen.add(p.symbol), true)));
}

// ---------------------------------------------------------------- models and proposals

export interface StoredModel<Review> {
  id: number;
  campaignId: number;
  modelVersion: string;
  trainedOn: string[];
  settings: unknown;
  review: Review;
  createdAt: string;
}

interface ModelRow {
  id: number;
  campaign_id: number;
  model_version: string;
  trained_on: string;
  options: string;
  review: string;
  created_at: string;
}

function toModel<Review>(r: ModelRow): StoredModel<Review> {
  return {
    id: r.id,
    campaignId: r.campaign_id,
    modelVersion: r.model_version,
    trainedOn: JSON.parse(r.trained_on) as string[],
    settings: JSON.parse(r.options) as unknown,
    review: JSON.parse(r.review) as Review,
    createdAt: r.created_at,
  };
}

export function insertModel(
  db: SqliteDatabase,
  input: { campaignId: number; modelVersion: string; trainedOn: readonly string[]; settings: unknown; review: unknown },
): number {
  const info = db
    .prepare(
      `INSERT INTO learn_models (campaign_id, model_version, trained_on, options, review, created_at)
       VALUES (?, ?, ?, ?, ?, ?)`,
    )
    .run(
      input.campaignId,
      input.modelVersion,
      JSON.stringify(input.trainedOn),
      JSON.stringify(input.settings),
      JSON.stringify(input.review),
      nowIso(),
    );
  return Number(info.lastInsertRowid);
}

export function latestModel<Review>(db: SqliteDatabase, campaignId: number): StoredModel<Review> | null {
  const row = db
    .prepare('SELECT * FROM learn_models WHERE campaign_id = ? ORDER BY id DESC LIMIT 1')
    .get(campaignId) as ModelRow | undefined;
  return row ? toModel<Review>(row) : null;
}

export function insertProposals(
  db: SqliteDatabase,
  input: {
    campaignId: number;
    modelId: number;
    modelVersion: string;
    trainedOn: readonly string[];
    target: string;
    settings: unknown;
    proposals: unknown;
  },
): number {
  const info = db
    .prepare(
      `INSERT INTO learn_proposals
         (campaign_id, model_id, model_version, trained_on, target, options, proposals, created_at)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?)`,
    )
    .run(
      input.campaignId,
      input.modelId,
      input.modelVersion,
      JSON.stringify(input.trainedOn),
      input.target,
      JSON.stringify(input.settings),
      JSON.stringify(input.proposals),
      nowIso(),
    );
  return Number(info.lastInsertRowid);
}

export function getProposalRecord(
  db: SqliteDatabase,
  id: number,
): { id: number; modelId: number; modelVersion: string; trainedOn: string[]; target: string } {
  const row = db
    .prepare('SELECT id, model_id, model_version, trained_on, target FROM learn_proposals WHERE id = ?')
    .get(id) as { id: number; model_id: number; model_version: string; trained_on: string; target: string } | undefined;
  if (!row) throw new DomainError('not_found', `no proposal set with id ${id}`, 'id');
  return {
    id: row.id,
    modelId: row.model_id,
    modelVersion: row.model_version,
    trainedOn: JSON.parse(row.trained_on) as string[],
    target: row.target,
  };
}
