/**
 * Paths of a batch's original images and spectra (migration 0005: `outcome_files`); the files stay where they are.
 */
import type { OutcomeFile, OutcomeFileKind } from '../../shared-model/api/outcomes';
import { DomainError } from '../../shared-model/api/result';
import { nowIso, type SqliteDatabase } from '../store';

interface FileRow {
  id: number;
  batch_id: number;
  path: string;
  kind: OutcomeFileKind;
  note: string;
  added_at: string;
}

const toFile = (row: FileRow): OutcomeFile => ({
  id: row.id,
  batchId: row.batch_id,
  path: row.path,
  kind: row.kind,
  note: row.note,
  addedAt: row.added_at,
});

export function addOutcomeFile(
  db: SqliteDatabase,
  input: { batchId: number; path: string; kind: OutcomeFileKind; note: string },
): OutcomeFile {
  const info = db
    .prepare('INSERT INTO outcome_files (batch_id, path, kind, note, added_at) VALUES (?, ?, ?, ?, ?)')
    .run(input.batchId, input.path, input.kind, input.note, nowIso());
  return toFile(db.prepare('SELECT * FROM outcome_files WHERE id = ?').get(Number(info.lastInsertRowid)) as FileRow);
}

export function listOutcomeFiles(db: SqliteDatabase, batchId: number): OutcomeFile[] {
  return (db.prepare('SELECT * FROM outcome_files WHERE batch_id = ? ORDER BY id').all(batchId) as FileRow[]).map(
    toFile,
  );
}

export function removeOutcomeFile(db: SqliteDatabase, id: number): number {
  const changes = db.prepare('DELETE FROM outcome_files WHERE id = ?').run(id).changes;
  if (changes === 0) throw new DomainError('not_found', `no recorded file with id ${id}`, 'id');
  return changes;
}
