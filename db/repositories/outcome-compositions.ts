/**
 * Composition records (migration 0005: `outcome_compositions`, `outcome_composition_measurements`): the
 * nominal value, the grid metal and each measurement kept apart, beside the comparison and its version.
 */
import type { CompositionRecord } from '../../shared-model/api/outcomes';
import type { CompositionComparison, CompositionMeasurement } from '../../shared-model/characterization/composition';
import { nowIso, type SqliteDatabase } from '../store';

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
