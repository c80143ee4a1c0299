/** Stored predictions (migration 0002): inputs, settings, model version and result, linked to a campaign pair. */
import type { SavedPrediction } from '../../shared-model/api/prediction';
import { DomainError } from '../../shared-model/api/result';
import type { Prediction } from '../../shared-model/prediction/predict';
import { nowIso, type SqliteDatabase } from '../store';
import { getPair } from './pairs';

interface PredictionRow {
  id: number;
  pair_id: number | null;
  element_a: string;
  element_b: string;
  inputs_json: string;
  settings_json: string;
  model_version: string;
  result_json: string;
  created_at: string;
}

function toSaved(row: PredictionRow): SavedPrediction {
  return {
    id: row.id,
    pairId: row.pair_id,
    pair: `${row.element_a}-${row.element_b}`,
    modelVersion: row.model_version,
    inputs: JSON.parse(row.inputs_json) as SavedPrediction['inputs'],
    result: JSON.parse(row.result_json) as Prediction,
    createdAt: row.created_at,
  };
}

export function getPrediction(db: SqliteDatabase, id: number): SavedPrediction {
  const row = db.prepare('SELECT * FROM predictions WHERE id = ?').get(id) as PredictionRow | undefined;
  if (!row) throw new DomainError('not_found', `no stored prediction with id ${id}`, 'id');
  return toSaved(row);
}

/**
 * Stores one prediction. When `pairId` is given the pair must exist and hold the same two elements
 * (in either order).
 */
export function insertPrediction(
  db: SqliteDatabase,
  input: { pairId: number | null; inputs: SavedPrediction['inputs']; result: Prediction },
): SavedPrediction {
  return db.transaction(() => {
    const { elementA, elementB } = input.inputs;
    if (input.pairId !== null) {
      const pair = getPair(db, input.pairId);
      const same =
        (pair.elementA === elementA && pair.elementB === elementB) ||
        (pair.elementA === elementB && pair.elementB === elementA);
      if (!same) {
        throw new DomainError(
          'invalid_input',
          `pair ${input.pairId} is ${pair.elementA}-${pair.elementB}, not ${elementA}-${elementB}`,
          'pairId',
        );
      }
    }
    const { thresholds, facet, strainRule } = input.inputs.conditions;
    const info = db
      .prepare(
        'INSERT INTO predictions (pair_id, element_a, element_b, inputs_json, settings_json, model_version, result_json, created_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
      )
      .run(
        input.pairId,
        elementA,
        elementB,
        JSON.stringify(input.inputs),
        JSON.stringify({ thresholds, facet, strainRule, classifierVersion: input.result.classifierVersion }),
        input.result.modelVersion,
        JSON.stringify(input.result),
        nowIso(),
      );
    return getPrediction(db, Number(info.lastInsertRowid));
  })();
}

export function listPredictionsForPair(db: SqliteDatabase, pairId: number): SavedPrediction[] {
  getPair(db, pairId);
  const rows = db
    .prepare('SELECT * FROM predictions WHERE pair_id = ? ORDER BY created_at DESC, id DESC')
    .all(pairId) as PredictionRow[];
  return rows.map(toSaved);
}

/** The architecture label of a stored prediction, with the model version and when it was made. */
export interface PredictedLabel {
  label: string;
  modelVersion: string;
  createdAt: string;
}

interface LabelRow {
  label: unknown;
  model_version: string;
  created_at: string;
}

const LABEL_SELECT = `SELECT json_extract(result_json, '$.architecture') AS label, model_version, created_at
  FROM predictions`;

const toLabel = (row: LabelRow | undefined): PredictedLabel | null =>
  row && typeof row.label === 'string'
    ? { label: row.label, modelVersion: row.model_version, createdAt: row.created_at }
    : null;

/**
 * The newest prediction stored for a pair at or before `madeBy` (an ISO time); without a pair link (or
 * when the pair has none), the newest one of the same two elements in either order.
 */
export function latestPredictionBefore(
  db: SqliteDatabase,
  query: { pairId: number | null; elementA: string; elementB: string; madeBy: string },
): PredictedLabel | null {
  const byPair =
    query.pairId !== null
      ? (db
          .prepare(`${LABEL_SELECT} WHERE pair_id = ? AND created_at <= ? ORDER BY created_at DESC, id DESC LIMIT 1`)
          .get(query.pairId, query.madeBy) as LabelRow | undefined)
      : undefined;
  if (byPair) return toLabel(byPair);
  const bySymbols = db
    .prepare(
      `${LABEL_SELECT} WHERE ((element_a = ? AND element_b = ?) OR (element_a = ? AND element_b = ?))
       AND created_at <= ? ORDER BY created_at DESC, id DESC LIMIT 1`,
    )
    .get(query.elementA, query.elementB, query.elementB, query.elementA, query.madeBy) as LabelRow | undefined;
  return toLabel(bySymbols);
}
