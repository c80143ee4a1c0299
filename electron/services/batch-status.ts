/**
 * Batch statuses that follow the work, each move in one transaction with a line in the batch's history:
 * - planned → made takes the batch's reagents from the inventory (shared-model/recipes/inventory-use.ts);
 *   a stock may go below zero, and the answer then carries a warning;
 * - back to planned gives back what the newest "made" took (the undo), row by row;
 * - recording a measurement (outcome-record.ts) moves the batch to characterized and its campaign pair to
 *   characterized (a dropped pair stays dropped). The user can still set statuses by hand.
 */
import {
  addBatchHistory,
  inventoryUseInForce,
  markRestored,
  type StoredMovement,
} from '../../db/repositories/batch-history';
import { getBatch, updateBatchStatus, type StoredBatch } from '../../db/repositories/batches';
import { listCatalog } from '../../db/repositories/catalog';
import { adjustInventory, listInventory } from '../../db/repositories/inventory';
import { findPair, getPair, updatePair } from '../../db/repositories/pairs';
import type { SqliteDatabase } from '../../db/store';
import { statusMoveAllowed, type BatchStatus, type InventoryEffect } from '../../shared-model/api/batches';
import type { PairStatus } from '../../shared-model/api/pairs';
import { invalid } from '../../shared-model/api/result';
import { inventoryUse, type InventoryMovement } from '../../shared-model/recipes/inventory-use';

function allowedMoves(status: BatchStatus): string {
  if (status === 'planned') return 'made';
  return status === 'made' ? 'characterized (or back to planned)' : 'planned';
}

function shown(value: number): string {
  return Number(value.toPrecision(4)).toString();
}

function movementText(m: { reagentName: string; delta: number; unit: string; after: number }): string {
  return `${m.reagentName} ${m.delta < 0 ? '−' : '+'}${shown(Math.abs(m.delta))} ${m.unit} (now ${shown(m.after)} ${m.unit})`;
}

function takeFromInventory(db: SqliteDatabase, batch: StoredBatch): InventoryEffect {
  const catalog = listCatalog(db);
  const densities = new Map(catalog.map((reagent) => [reagent.key, reagent.densityGPerMl ?? null]));
  const rows = listInventory(db).map(({ id, reagentKey, amount, unit, location, lot }) => ({
    id,
    reagentKey,
    amount,
    unit,
    location,
    lot,
  }));
  const use = inventoryUse(batch.design.reagents, rows, densities);
  for (const movement of use.movements) adjustInventory(db, movement.inventoryId, movement.delta);
  const parts = [
    use.movements.length > 0 ? `took ${use.movements.map(movementText).join('; ')}` : 'took nothing from the inventory',
    ...use.unmatched.map((u) => `${u.reagentName}: ${u.reason}`),
  ];
  addBatchHistory(db, batch.id, {
    event: 'stock-taken',
    text: `Inventory: ${parts.join('. ')}.`,
    movements: use.movements.map(({ inventoryId, reagentKey, delta, unit }) => ({
      inventoryId,
      reagentKey,
      delta,
      unit,
    })),
  });
  return { kind: 'used', ...use };
}

/** Gives back what the newest "made" took; null when nothing is in force (never made, or already given back). */
function giveBackToInventory(db: SqliteDatabase, batch: StoredBatch): InventoryEffect | null {
  const used = inventoryUseInForce(db, batch.id);
  if (!used) return null;
  const names = new Map(listCatalog(db).map((reagent) => [reagent.key, reagent.name]));
  const inventory = new Map(listInventory(db).map((row) => [row.id, row]));
  const movements: InventoryMovement[] = [];
  const warnings: string[] = [];
  const stored: StoredMovement[] = [];
  for (const taken of used.movements) {
    const reagentName = names.get(taken.reagentKey) ?? taken.reagentKey;
    const row = inventory.get(taken.inventoryId);
    const change = row && row.unit === taken.unit ? adjustInventory(db, taken.inventoryId, -taken.delta) : null;
    if (!row || !change) {
      warnings.push(
        `${reagentName}: inventory entry #${taken.inventoryId} was removed or changed unit since; ` +
          `${shown(-taken.delta)} ${taken.unit} not given back — correct the inventory by hand`,
      );
      continue;
    }
    movements.push({
      inventoryId: row.id,
      reagentKey: taken.reagentKey,
      reagentName,
      delta: -taken.delta,
      unit: row.unit,
      before: change.before,
      after: change.after,
      location: row.location,
      lot: row.lot,
    });
    stored.push({ inventoryId: row.id, reagentKey: taken.reagentKey, delta: -taken.delta, unit: row.unit });
  }
  const text = movements.length > 0 ? `gave back ${movements.map(movementText).join('; ')}` : 'gave nothing back';
  const restoredId = addBatchHistory(db, batch.id, {
    event: 'stock-returned',
    text: `Inventory (undo of the "made" of ${used.at.slice(0, 10)}): ${[text, ...warnings].join('. ')}.`,
    movements: stored,
  });
  markRestored(db, used.id, restoredId);
  return { kind: 'restored', movements, unmatched: [], warnings };
}

export interface StatusMove {
  id: number;
  status: BatchStatus;
  /** Take from (made) or give back to (planned) the inventory; true unless the user turns it off. */
  inventory: boolean;
  measured?: { diameterNm?: number | null; particlesPerMl?: number | null } | undefined;
}

/** `batches.setStatus`: the status, the inventory and the history line, in one transaction. */
export function setBatchStatus(
  db: SqliteDatabase,
  move: StatusMove,
): { batch: StoredBatch; inventoryEffect: InventoryEffect | null } {
  return db.transaction(() => {
    const current = getBatch(db, move.id);
    if (current.importedHistory) {
      throw invalid(
        'status',
        `batch #${current.id} "${current.name}" is a row of imported history: it stays characterized ` +
          '(it was made elsewhere and took nothing from the inventory)',
      );
    }
    if (!statusMoveAllowed(current.status, move.status)) {
      throw invalid(
        'status',
        `a ${current.status} batch can move to ${allowedMoves(current.status)}, not to ${move.status}`,
      );
    }
    let inventoryEffect: InventoryEffect | null = null;
    if (move.inventory && current.status === 'planned' && move.status === 'made') {
      inventoryEffect = takeFromInventory(db, current);
    } else if (move.inventory && current.status !== 'planned' && move.status === 'planned') {
      inventoryEffect = giveBackToInventory(db, current);
    }
    if (current.status !== move.status) {
      const untouched =
        !move.inventory && (move.status === 'made' || move.status === 'planned') ? ' (inventory left as it was)' : '';
      addBatchHistory(db, current.id, {
        event: 'status',
        fromStatus: current.status,
        toStatus: move.status,
        text: `Status ${current.status} → ${move.status}, set by hand${untouched}.`,
      });
    }
    const batch = updateBatchStatus(db, move.id, move.status, move.measured);
    return { batch, inventoryEffect };
  })();
}

export interface OutcomeStatusChanges {
  batch: { from: BatchStatus; to: BatchStatus } | null;
  pair: { id: number; from: PairStatus; to: PairStatus } | null;
}

/**
 * Called inside the outcome transaction once a measurement is stored: the batch becomes characterized
 * (from planned too — its reagents are then not taken from the inventory, and its history says so) and
 * its campaign pair (the linked pair, else the campaign's pair of the same metals) becomes characterized.
 */
export function characterizedByOutcome(
  db: SqliteDatabase,
  batchId: number,
  parts: readonly string[],
): OutcomeStatusChanges {
  const batch = getBatch(db, batchId, 'batchId');
  let batchChange: OutcomeStatusChanges['batch'] = null;
  if (batch.status !== 'characterized') {
    const skipped =
      batch.status === 'planned' ? ' It was never marked made: no reagents were taken from the inventory.' : '';
    addBatchHistory(db, batch.id, {
      event: 'status',
      fromStatus: batch.status,
      toStatus: 'characterized',
      text: `Status ${batch.status} → characterized: outcome recorded (${parts.join(', ')}).${skipped}`,
    });
    updateBatchStatus(db, batch.id, 'characterized');
    batchChange = { from: batch.status, to: 'characterized' };
  }
  const pair =
    batch.pairId !== null
      ? getPair(db, batch.pairId)
      : batch.campaignId !== null
        ? findPair(db, batch.campaignId, batch.design.elementA, batch.design.elementB)
        : null;
  let pairChange: OutcomeStatusChanges['pair'] = null;
  if (pair && pair.status !== 'characterized' && pair.status !== 'dropped') {
    updatePair(db, pair.id, { status: 'characterized' });
    pairChange = { id: pair.id, from: pair.status, to: 'characterized' };
  }
  return { batch: batchChange, pair: pairChange };
}
