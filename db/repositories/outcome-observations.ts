/**
 * The observed architecture of a batch (confirmed or overridden) and its free-text notes (migration 0005:
 * `outcome_observations`, one row per batch).
 */
import type { ObservedArchitecture, ObservedDecision } from '../../shared-model/api/outcomes';
import { nowIso, type SqliteDatabase } from '../store';

interface ObservationRow {
  observed_label: string | null;
  decision: ObservedDecision | null;
  suggested_label: string | null;
  reason: string;
  notes: string;
  updated_at: string;
}

export function getObservation(
  db: SqliteDatabase,
  batchId: number,
): { observed: ObservedArchitecture | null; notes: string } {
  const row = db.prepare('SELECT * FROM outcome_observations WHERE batch_id = ?').get(batchId) as
    ObservationRow | undefined;
  if (!row) return { observed: null, notes: '' };
  const observed =
    row.observed_label !== null && row.decision !== null
      ? {
          label: row.observed_label,
          decision: row.decision,
          suggestedLabel: row.suggested_label,
          reason: row.reason,
          updatedAt: row.updated_at,
        }
      : null;
  return { observed, notes: row.notes };
}

export function setObservation(
  db: SqliteDatabase,
  batchId: number,
  observed: { label: string; decision: ObservedDecision; suggestedLabel: string | null; reason: string },
): void {
  db.prepare(
    `INSERT INTO outcome_observations (batch_id, observed_label, decision, suggested_label, reason, updated_at)
     VALUES (?, ?, ?, ?, ?, ?)
     ON CONFLICT (batch_id) DO UPDATE SET observed_label = excluded.observed_label, decision = excluded.decision,
       suggested_label = excluded.suggested_label, reason = excluded.reason, updated_at = excluded.updated_at`,
  ).run(batchId, observed.label, observed.decision, observed.suggestedLabel, observed.reason, nowIso());
}

export function setOutcomeNotes(db: SqliteDatabase, batchId: number, notes: string): void {
  db.prepare(
    `INSERT INTO outcome_observations (batch_id, notes, updated_at) VALUES (?, ?, ?)
     ON CONFLICT (batch_id) DO UPDATE SET notes = excluded.notes, updated_at = excluded.updated_at`,
  ).run(batchId, notes, nowIso());
}
