/**
 * A batch's history (migration 0009: `batch_history`): status moves, reagents taken from the inventory
 * when it was marked made and given back when that was undone, oldest first.
 */
import type { BatchHistoryLine, BatchStatus } from '../../shared-model/api/batches';
import type { InventoryUnit } from '../../shared-model/recipes/reagent-list';
import { nowIso, type SqliteDatabase } from '../store';

export interface StoredMovement {
  inventoryId: number;
  reagentKey: string;
  delta: number;
  unit: InventoryUnit;
}

interface HistoryRow {
  id: number;
  batch_id: number;
  event: BatchHistoryLine['event'];
  from_status: BatchStatus | null;
  to_status: BatchStatus | null;
  text: string;
  movements: string;
  restored_by: number | null;
  at: string;
}

function toLine(row: HistoryRow): BatchHistoryLine {
  return {
    id: row.id,
    event: row.event,
    fromStatus: row.from_status,
    toStatus: row.to_status,
    text: row.text,
    movements: JSON.parse(row.movements) as StoredMovement[],
    restoredBy: row.restored_by,
    at: row.at,
  };
}

export function listBatchHistory(db: SqliteDatabase, batchId: number): BatchHistoryLine[] {
  const rows = db.prepare('SELECT * FROM batch_history WHERE batch_id = ? ORDER BY id').all(batchId) as HistoryRow[];
  return rows.map(toLine);
}

export function addBatchHistory(
  db: SqliteDatabase,
  batchId: number,
  line: {
    event: BatchHistoryLine['event'];
    fromStatus?: BatchStatus | null;
    toStatus?: BatchStatus | null;
    text: string;
    movements?: readonly StoredMovement[];
  },
): number {
  const info = db
    .prepare(
      `INSERT INTO batch_history (batch_id, event, from_status, to_status, text, movements, at)
       VALUES (?, ?, ?, ?, ?, ?, ?)`,
    )
    .run(
      batchId,
      line.event,
      line.fromStatus ?? null,
      line.toStatus ?? null,
      line.text,
      JSON.stringify(line.movements ?? []),
      nowIso(),
    );
  return Number(info.lastInsertRowid);
}

/** The newest use of the inventory not yet given back, if any. */
export function inventoryUseInForce(db: SqliteDatabase, batchId: number): BatchHistoryLine | null {
  const row = db
    .prepare(
      `SELECT * FROM batch_history WHERE batch_id = ? AND event = 'stock-taken' AND restored_by IS NULL
       ORDER BY id DESC LIMIT 1`,
    )
    .get(batchId) as HistoryRow | undefined;
  return row ? toLine(row) : null;
}

export function markRestored(db: SqliteDatabase, usedId: number, restoredId: number): void {
  db.prepare('UPDATE batch_history SET restored_by = ? WHERE id = ?').run(restoredId, usedId);
}
