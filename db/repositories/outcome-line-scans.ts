/**
 * EDX line scans (migration 0005: `outcome_line_scans`, `outcome_line_scan_points`): every point beside the
 * four-model fit and its version; a refit replaces the fit and keeps the points.
 */
import type { LineScanPoint, LineScanRecord } from '../../shared-model/api/outcomes';
import { DomainError } from '../../shared-model/api/result';
import type { LineScanAnalysis } from '../../shared-model/characterization/line-scan-fit';
import { nowIso, type SqliteDatabase } from '../store';

interface LineScanRow {
  id: number;
  batch_id: number;
  name: string;
  source_file: string | null;
  element_a: string;
  element_b: string;
  unit: 'counts' | 'atPercent';
  probe_sigma_nm: number | null;
  import_notes_json: string;
  chosen_model: string;
  analysis_version: string;
  analysis_json: string;
  created_at: string;
  fitted_at: string;
}

export interface NewLineScan {
  batchId: number;
  name: string;
  sourceFile: string | null;
  elementA: string;
  elementB: string;
  unit: 'counts' | 'atPercent';
  probeSigmaNm: number | null;
  importNotes: string[];
  points: readonly LineScanPoint[];
  analysis: LineScanAnalysis;
}

export function lineScanPoints(db: SqliteDatabase, scanId: number): LineScanPoint[] {
  return (
    db
      .prepare('SELECT position_nm, signal_a, signal_b FROM outcome_line_scan_points WHERE scan_id = ? ORDER BY seq')
      .all(scanId) as {
      position_nm: number;
      signal_a: number;
      signal_b: number;
    }[]
  ).map((p) => ({ positionNm: p.position_nm, a: p.signal_a, b: p.signal_b }));
}

function toLineScan(db: SqliteDatabase, row: LineScanRow): LineScanRecord {
  return {
    id: row.id,
    batchId: row.batch_id,
    name: row.name,
    sourceFile: row.source_file,
    unit: row.unit,
    probeSigmaNm: row.probe_sigma_nm,
    points: lineScanPoints(db, row.id),
    importNotes: JSON.parse(row.import_notes_json) as string[],
    analysis: JSON.parse(row.analysis_json) as LineScanAnalysis,
    createdAt: row.created_at,
  };
}

export function insertLineScan(db: SqliteDatabase, input: NewLineScan): LineScanRecord {
  const write = db.transaction(() => {
    const now = nowIso();
    const info = db
      .prepare(
        `INSERT INTO outcome_line_scans (batch_id, name, source_file, element_a, element_b, unit, probe_sigma_nm,
           import_notes_json, chosen_model, analysis_version, analysis_json, created_at, fitted_at)
         VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
      )
      .run(
        input.batchId,
        input.name,
        input.sourceFile,
        input.elementA,
        input.elementB,
        input.unit,
        input.probeSigmaNm,
        JSON.stringify(input.importNotes),
        input.analysis.chosenModel,
        input.analysis.analysisVersion,
        JSON.stringify(input.analysis),
        now,
        now,
      );
    const id = Number(info.lastInsertRowid);
    const insert = db.prepare(
      'INSERT INTO outcome_line_scan_points (scan_id, seq, position_nm, signal_a, signal_b) VALUES (?, ?, ?, ?, ?)',
    );
    input.points.forEach((p, seq) => insert.run(id, seq, p.positionNm, p.a, p.b));
    return id;
  });
  return getLineScan(db, write());
}

export function getLineScan(db: SqliteDatabase, id: number): LineScanRecord {
  const row = db.prepare('SELECT * FROM outcome_line_scans WHERE id = ?').get(id) as LineScanRow | undefined;
  if (!row) throw new DomainError('not_found', `no line scan with id ${id}`, 'id');
  return toLineScan(db, row);
}

export function lineScanElements(db: SqliteDatabase, id: number): { elementA: string; elementB: string } {
  const row = db.prepare('SELECT element_a, element_b FROM outcome_line_scans WHERE id = ?').get(id) as
    { element_a: string; element_b: string } | undefined;
  if (!row) throw new DomainError('not_found', `no line scan with id ${id}`, 'id');
  return { elementA: row.element_a, elementB: row.element_b };
}

export function updateLineScanFit(
  db: SqliteDatabase,
  id: number,
  probeSigmaNm: number | null,
  analysis: LineScanAnalysis,
): LineScanRecord {
  db.prepare(
    `UPDATE outcome_line_scans SET probe_sigma_nm = ?, chosen_model = ?, analysis_version = ?, analysis_json = ?,
       fitted_at = ? WHERE id = ?`,
  ).run(probeSigmaNm, analysis.chosenModel, analysis.analysisVersion, JSON.stringify(analysis), nowIso(), id);
  return getLineScan(db, id);
}

export function listLineScans(db: SqliteDatabase, batchId: number): LineScanRecord[] {
  const rows = db
    .prepare('SELECT * FROM outcome_line_scans WHERE batch_id = ? ORDER BY id')
    .all(batchId) as LineScanRow[];
  return rows.map((row) => toLineScan(db, row));
}

export function removeLineScan(db: SqliteDatabase, id: number): number {
  getLineScan(db, id);
  return db.prepare('DELETE FROM outcome_line_scans WHERE id = ?').run(id).changes;
}
