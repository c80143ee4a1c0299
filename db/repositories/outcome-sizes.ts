/**
 * TEM size imports (migration 0005: `outcome_size_imports`, `outcome_diameters`): every particle diameter
 * beside the analysis (statistics, log-normal fit, histogram) and its version, written in one transaction.
 */
import type { SizeRecord } from '../../shared-model/api/outcomes';
import { DomainError } from '../../shared-model/api/result';
import type { SizeAnalysis } from '../../shared-model/characterization/size-analysis';
import { nowIso, type SqliteDatabase } from '../store';

interface SizeImportRow {
  id: number;
  batch_id: number;
  source_file: string | null;
  column_number: number;
  column_name: string | null;
  import_notes_json: string;
  analysis_json: string;
  created_at: string;
}

export interface NewSizeImport {
  batchId: number;
  sourceFile: string | null;
  column: { number: number; name: string | null };
  importNotes: string[];
  targetDiameterNm: number | null;
  precisionPercent: number;
  diametersNm: readonly number[];
  analysis: SizeAnalysis;
}

function diametersOf(db: SqliteDatabase, importId: number): number[] {
  return (
    db.prepare('SELECT diameter_nm FROM outcome_diameters WHERE import_id = ? ORDER BY seq').all(importId) as {
      diameter_nm: number;
    }[]
  ).map((r) => r.diameter_nm);
}

function toSizeRecord(db: SqliteDatabase, row: SizeImportRow): SizeRecord {
  const analysis = JSON.parse(row.analysis_json) as SizeAnalysis;
  return {
    ...analysis,
    id: row.id,
    batchId: row.batch_id,
    diametersNm: diametersOf(db, row.id),
    sourceFile: row.source_file,
    column: { number: row.column_number, name: row.column_name },
    importNotes: JSON.parse(row.import_notes_json) as string[],
    createdAt: row.created_at,
  };
}

export function insertSizeImport(db: SqliteDatabase, input: NewSizeImport): SizeRecord {
  const write = db.transaction(() => {
    const info = db
      .prepare(
        `INSERT INTO outcome_size_imports (batch_id, source_file, column_number, column_name, import_notes_json,
           target_diameter_nm, precision_percent, analysis_version, analysis_json, created_at)
         VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
      )
      .run(
        input.batchId,
        input.sourceFile,
        input.column.number,
        input.column.name,
        JSON.stringify(input.importNotes),
        input.targetDiameterNm,
        input.precisionPercent,
        input.analysis.analysisVersion,
        JSON.stringify(input.analysis),
        nowIso(),
      );
    const id = Number(info.lastInsertRowid);
    const insert = db.prepare('INSERT INTO outcome_diameters (import_id, seq, diameter_nm) VALUES (?, ?, ?)');
    input.diametersNm.forEach((d, seq) => insert.run(id, seq, d));
    return id;
  });
  return getSizeImport(db, write());
}

export function getSizeImport(db: SqliteDatabase, id: number): SizeRecord {
  const row = db.prepare('SELECT * FROM outcome_size_imports WHERE id = ?').get(id) as SizeImportRow | undefined;
  if (!row) throw new DomainError('not_found', `no size import with id ${id}`, 'id');
  return toSizeRecord(db, row);
}

export function listSizeImports(db: SqliteDatabase, batchId: number): SizeRecord[] {
  const rows = db
    .prepare('SELECT * FROM outcome_size_imports WHERE batch_id = ? ORDER BY id')
    .all(batchId) as SizeImportRow[];
  return rows.map((row) => toSizeRecord(db, row));
}

export function removeSizeImport(db: SqliteDatabase, id: number): number {
  getSizeImport(db, id);
  return db.prepare('DELETE FROM outcome_size_imports WHERE id = ?').run(id).changes;
}
