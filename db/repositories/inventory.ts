/**
 * What the group holds (migration 0004: `inventory`): amount on hand, where, which lot, per catalog
 * reagent. Reagent names come from the catalog repository, which owns the reagent rows.
 */
import type { InventoryRecord } from '../../shared-model/api/batches';
import { DomainError } from '../../shared-model/api/result';
import type { InventoryUnit } from '../../shared-model/recipes/reagent-list';
import { nowIso, type SqliteDatabase } from '../store';
import { findCatalogReagent, listCatalog } from './catalog';

interface InventoryRow {
  id: number;
  reagent_key: string;
  amount: number;
  unit: InventoryUnit;
  location: string;
  lot: string;
  updated_at: string;
}

function toInventoryRecord(row: InventoryRow, reagentName: string): InventoryRecord {
  return {
    id: row.id,
    reagentKey: row.reagent_key,
    reagentName,
    amount: row.amount,
    unit: row.unit,
    location: row.location,
    lot: row.lot,
    updatedAt: row.updated_at,
  };
}

/** Every inventory row, by reagent name, then in the order entered. */
export function listInventory(db: SqliteDatabase): InventoryRecord[] {
  const names = new Map(listCatalog(db).map((reagent) => [reagent.key, reagent.name]));
  const rows = db.prepare('SELECT * FROM inventory ORDER BY id').all() as InventoryRow[];
  return rows
    .map((row) => toInventoryRecord(row, names.get(row.reagent_key) ?? row.reagent_key))
    .sort((a, b) => (a.reagentName < b.reagentName ? -1 : a.reagentName > b.reagentName ? 1 : a.id - b.id));
}

export interface InventoryEntry {
  id?: number | undefined;
  reagentKey: string;
  amount: number;
  unit: InventoryUnit;
  location: string;
  lot: string;
}

export function upsertInventory(db: SqliteDatabase, item: InventoryEntry): InventoryRecord {
  const reagent = findCatalogReagent(db, item.reagentKey);
  if (!reagent) throw new DomainError('invalid_input', `no reagent "${item.reagentKey}" in the catalog`, 'reagentKey');
  const now = nowIso();
  let id = item.id;
  if (id !== undefined) {
    const info = db
      .prepare(
        `UPDATE inventory SET reagent_key = ?, amount = ?, unit = ?, location = ?, lot = ?, updated_at = ?
         WHERE id = ?`,
      )
      .run(item.reagentKey, item.amount, item.unit, item.location, item.lot, now, id);
    if (info.changes === 0) throw new DomainError('not_found', `no inventory entry with id ${id}`, 'id');
  } else {
    const info = db
      .prepare('INSERT INTO inventory (reagent_key, amount, unit, location, lot, updated_at) VALUES (?, ?, ?, ?, ?, ?)')
      .run(item.reagentKey, item.amount, item.unit, item.location, item.lot, now);
    id = Number(info.lastInsertRowid);
  }
  const row = db.prepare('SELECT * FROM inventory WHERE id = ?').get(id) as InventoryRow;
  return toInventoryRecord(row, reagent.name);
}

export function removeInventory(db: SqliteDatabase, id: number): void {
  const info = db.prepare('DELETE FROM inventory WHERE id = ?').run(id);
  if (info.changes === 0) throw new DomainError('not_found', `no inventory entry with id ${id}`, 'id');
}

/** Changes a row's amount by `delta` (in its unit; it may go below zero); null when the row is gone. */
export function adjustInventory(
  db: SqliteDatabase,
  id: number,
  delta: number,
): { before: number; after: number } | null {
  const row = db.prepare('SELECT amount FROM inventory WHERE id = ?').get(id) as { amount: number } | undefined;
  if (!row) return null;
  const after = row.amount + delta;
  db.prepare('UPDATE inventory SET amount = ?, updated_at = ? WHERE id = ?').run(after, nowIso(), id);
  return { before: row.amount, after };
}
