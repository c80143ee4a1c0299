/**
 * Outcome tables (migration 0005_outcomes.sql, every table named `outcome_*`): raw characterization data
 * beside derived results and the analysis version. Every import writes its parent row and all its raw rows
 * in one transaction. The batch a record belongs to is read through the batches repository; the
 * predictions made when it was planned through the predictions and simulation repositories.
 */
import type {
  CompositionRecord,
  LineScanPoint,
  LineScanRecord,
  ObservedArchitecture,
  ObservedDecision,
  OutcomeFile,
  OutcomeFileKind,
  SizeRecord,
} from '../../shared-model/api/outcomes';
import { DomainError } from '../../shared-model/api/result';
import type { CompositionComparison, CompositionMeasurement } from '../../shared-model/characterization/composition';
import type { LineScanAnalysis } from '../../shared-model/characterization/line-scan-fit';
import type { SizeAnalysis } from '../../shared-model/characterization/size-analysis';
import { nowIso, type SqliteDatabase } from '../store';

// ---------------------------------------------------------------- sizes

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

// ---------------------------------------------------------------- composition

interface CompositionRow {
  id: number;
  batch_id: number;
  nominal_xb: number | null;
  grid_metal: string | null;
  analysis_version: string;
  comparison_json: string;
  created_at: string;
}

function toComposition(db: SqliteDatabase, row: CompositionRow): CompositionRecord {
  const measurements = (
    db
      .prepare(
        `SELECT method, xb, uncertainty_xb, lines FROM outcome_composition_measurements
         WHERE composition_id = ? ORDER BY seq`,
      )
      .all(row.id) as {
      method: CompositionMeasurement['method'];
      xb: number;
      uncertainty_xb: number | null;
      lines: string | null;
    }[]
  ).map((m) => ({
    method: m.method,
    xB: m.xb,
    uncertaintyXB: m.uncertainty_xb,
    ...(m.lines !== null ? { lines: m.lines } : {}),
  }));
  return {
    id: row.id,
    batchId: row.batch_id,
    analysisVersion: row.analysis_version,
    nominalXB: row.nominal_xb,
    measurements,
    gridMetal: row.grid_metal,
    comparison: JSON.parse(row.comparison_json) as CompositionComparison,
    createdAt: row.created_at,
  };
}

export function insertComposition(
  db: SqliteDatabase,
  input: {
    batchId: number;
    nominalXB: number | null;
    gridMetal: string | null;
    measurements: readonly CompositionMeasurement[];
    comparison: CompositionComparison;
    analysisVersion: string;
  },
): CompositionRecord {
  const write = db.transaction(() => {
    const info = db
      .prepare(
        `INSERT INTO outcome_compositions
           (batch_id, nominal_xb, grid_metal, analysis_version, comparison_json, created_at) VALUES (?, ?, ?, ?, ?, ?)`,
      )
      .run(
        input.batchId,
        input.nominalXB,
        input.gridMetal,
        input.analysisVersion,
        JSON.stringify(input.comparison),
        nowIso(),
      );
    const id = Number(info.lastInsertRowid);
    const insert = db.prepare(
      `INSERT INTO outcome_composition_measurements (composition_id, seq, method, xb, uncertainty_xb, lines)
       VALUES (?, ?, ?, ?, ?, ?)`,
    );
    input.measurements.forEach((m, seq) => insert.run(id, seq, m.method, m.xB, m.uncertaintyXB, m.lines ?? null));
    return id;
  });
  const id = write();
  return toComposition(db, db.prepare('SELECT * FROM outcome_compositions WHERE id = ?').get(id) as CompositionRow);
}

export function listCompositions(db: SqliteDatabase, batchId: number): CompositionRecord[] {
  const rows = db
    .prepare('SELECT * FROM outcome_compositions WHERE batch_id = ? ORDER BY id')
    .all(batchId) as CompositionRow[];
  return rows.map((row) => toComposition(db, row));
}

// ---------------------------------------------------------------- line scans

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

// ---------------------------------------------------------------- observation, notes, files

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
