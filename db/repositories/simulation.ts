/**
 * Stored Monte Carlo runs (migration 0003): inputs with the seed, engine version, job state, latest
 * progress, result and final occupations. The occupation string is kept in its own column and
 * re-attached to the result on reading.
 */
import type { SimulationRun, SimulationRunSummary, SimulationStatus } from '../../shared-model/api/simulation';
import { DomainError } from '../../shared-model/api/result';
import type { SimulationProgress, SimulationResult, SimulationSpec } from '../../shared-model/montecarlo/simulate';
import { nowIso, type SqliteDatabase } from '../store';
import { getPair } from './pairs';

interface RunRow {
  id: number;
  pair_id: number | null;
  element_a: string;
  element_b: string;
  label: string;
  inputs_json: string;
  seed: number;
  engine_version: string;
  status: SimulationStatus;
  planned_atoms: number;
  total_sweeps: number;
  progress_json: string | null;
  result_json: string | null;
  final_occupation: string | null;
  error: string | null;
  owner: string;
  heartbeat_at: string;
  created_at: string;
  started_at: string | null;
  finished_at: string | null;
}

const SUMMARY_COLUMNS =
  'id, pair_id, element_a, element_b, label, inputs_json, seed, engine_version, status, planned_atoms, total_sweeps, progress_json, NULL AS result_json, NULL AS final_occupation, error, owner, heartbeat_at, created_at, started_at, finished_at, ' +
  "json_extract(result_json, '$.architecture') AS architecture, json_extract(result_json, '$.surfaceXB') AS surface_xb";

function toSummary(row: RunRow & { architecture?: string | null; surface_xb?: number | null }): SimulationRunSummary {
  let architecture = row.architecture ?? null;
  let surfaceXB = row.surface_xb ?? null;
  if (row.result_json) {
    const result = JSON.parse(row.result_json) as SimulationResult;
    architecture = result.architecture;
    surfaceXB = result.surfaceXB;
  }
  return {
    id: row.id,
    status: row.status,
    spec: JSON.parse(row.inputs_json) as SimulationSpec,
    label: row.label,
    pairId: row.pair_id,
    engineVersion: row.engine_version,
    atoms: row.planned_atoms,
    totalSweeps: row.total_sweeps,
    progress: row.progress_json ? (JSON.parse(row.progress_json) as SimulationProgress) : null,
    architecture,
    surfaceXB,
    error: row.error,
    createdAt: row.created_at,
    startedAt: row.started_at,
    finishedAt: row.finished_at,
  };
}

export interface NewRun {
  spec: SimulationSpec;
  label: string;
  pairId: number | null;
  engineVersion: string;
  plannedAtoms: number;
  totalSweeps: number;
  /** Token of the process whose queue runs it. */
  owner: string;
}

export function insertRun(db: SqliteDatabase, run: NewRun): SimulationRunSummary {
  return db.transaction(() => {
    if (run.pairId !== null) {
      const pair = getPair(db, run.pairId);
      const same =
        (pair.elementA === run.spec.elementA && pair.elementB === run.spec.elementB) ||
        (pair.elementA === run.spec.elementB && pair.elementB === run.spec.elementA);
      if (!same)
        throw new DomainError(
          'invalid_input',
          `pair ${run.pairId} is ${pair.elementA}-${pair.elementB}, not ${run.spec.elementA}-${run.spec.elementB}`,
          'pairId',
        );
    }
    const info = db
      .prepare(
        `INSERT INTO simulation_runs (pair_id, element_a, element_b, label, inputs_json, seed, engine_version, status, planned_atoms, total_sweeps, owner, heartbeat_at, created_at)
         VALUES (?, ?, ?, ?, ?, ?, ?, 'queued', ?, ?, ?, ?, ?)`,
      )
      .run(
        run.pairId,
        run.spec.elementA,
        run.spec.elementB,
        run.label,
        JSON.stringify(run.spec),
        run.spec.seed,
        run.engineVersion,
        run.plannedAtoms,
        run.totalSweeps,
        run.owner,
        nowIso(),
        nowIso(),
      );
    return getRunSummary(db, Number(info.lastInsertRowid));
  })();
}

function getRow(db: SqliteDatabase, id: number): RunRow {
  const row = db.prepare('SELECT * FROM simulation_runs WHERE id = ?').get(id) as RunRow | undefined;
  if (!row) throw new DomainError('not_found', `no simulation run with id ${id}`, 'id');
  return row;
}

export function getRunSummary(db: SqliteDatabase, id: number): SimulationRunSummary {
  const row = db.prepare(`SELECT ${SUMMARY_COLUMNS} FROM simulation_runs WHERE id = ?`).get(id) as
    (RunRow & { architecture: string | null; surface_xb: number | null }) | undefined;
  if (!row) throw new DomainError('not_found', `no simulation run with id ${id}`, 'id');
  return toSummary(row);
}

/** A run with its result (the occupation re-attached); `progressHistory` is filled by the caller. */
export function getRun(db: SqliteDatabase, id: number): SimulationRun {
  const row = getRow(db, id);
  let result: SimulationResult | null = null;
  if (row.result_json) {
    result = JSON.parse(row.result_json) as SimulationResult;
    result.finalOccupation = row.final_occupation ?? '';
  }
  return { ...toSummary(row), result, progressHistory: [] };
}

export function listRuns(db: SqliteDatabase, limit: number): SimulationRunSummary[] {
  const rows = db
    .prepare(`SELECT ${SUMMARY_COLUMNS} FROM simulation_runs ORDER BY created_at DESC, id DESC LIMIT ?`)
    .all(limit) as (RunRow & {
    architecture: string | null;
    surface_xb: number | null;
  })[];
  return rows.map(toSummary);
}

export function markRunning(db: SqliteDatabase, id: number): void {
  db.prepare("UPDATE simulation_runs SET status = 'running', started_at = ? WHERE id = ? AND status = 'queued'").run(
    nowIso(),
    id,
  );
}

export function saveProgress(db: SqliteDatabase, id: number, progress: SimulationProgress): void {
  db.prepare("UPDATE simulation_runs SET progress_json = ? WHERE id = ? AND status IN ('queued', 'running')").run(
    JSON.stringify(progress),
    id,
  );
}

export function saveResult(db: SqliteDatabase, id: number, result: SimulationResult): void {
  const { finalOccupation, ...rest } = result;
  db.prepare(
    "UPDATE simulation_runs SET status = 'done', result_json = ?, final_occupation = ?, error = NULL, finished_at = ? WHERE id = ?",
  ).run(JSON.stringify(rest), finalOccupation, nowIso(), id);
}

export function markEnded(db: SqliteDatabase, id: number, status: 'failed' | 'cancelled', error: string): void {
  db.prepare('UPDATE simulation_runs SET status = ?, error = ?, finished_at = ? WHERE id = ? AND status IN (?, ?)').run(
    status,
    error,
    nowIso(),
    id,
    'queued',
    'running',
  );
}

/** The owning process is alive: refresh the heartbeat of its queued and running runs. */
export function touchHeartbeat(db: SqliteDatabase, owner: string): void {
  db.prepare("UPDATE simulation_runs SET heartbeat_at = ? WHERE owner = ? AND status IN ('queued', 'running')").run(
    nowIso(),
    owner,
  );
}

/**
 * Runs still queued or running whose owner has not refreshed its heartbeat since `staleBeforeIso` (the
 * app or command that started them ended mid-run) are marked failed, with the reason.
 */
export function expireSilentRuns(db: SqliteDatabase, staleBeforeIso: string): number {
  const info = db
    .prepare(
      "UPDATE simulation_runs SET status = 'failed', error = ?, finished_at = ? WHERE status IN ('queued', 'running') AND heartbeat_at < ?",
    )
    .run(
      'interrupted: the Pairwright process running it closed before the run finished; start it again',
      nowIso(),
      staleBeforeIso,
    );
  return info.changes;
}

/** The architecture a finished run found, with the engine version and when the run was queued. */
export interface SimulatedLabel {
  label: string;
  engineVersion: string;
  createdAt: string;
}

/**
 * The newest finished run of a pair, whenever it ran; without a pair link (or when the pair has none),
 * the newest finished run of the same two elements in either order.
 */
export function latestFinishedRun(
  db: SqliteDatabase,
  query: { pairId: number | null; elementA: string; elementB: string },
): SimulatedLabel | null {
  type LabelRow = { label: unknown; engine_version: string; created_at: string };
  const select = `SELECT json_extract(result_json, '$.architecture') AS label, engine_version, created_at
    FROM simulation_runs`;
  const newest = "AND status = 'done' ORDER BY created_at DESC, id DESC LIMIT 1";
  const byPair =
    query.pairId !== null
      ? (db.prepare(`${select} WHERE pair_id = ? ${newest}`).get(query.pairId) as LabelRow | undefined)
      : undefined;
  const row =
    byPair ??
    (db
      .prepare(`${select} WHERE ((element_a = ? AND element_b = ?) OR (element_a = ? AND element_b = ?)) ${newest}`)
      .get(query.elementA, query.elementB, query.elementB, query.elementA) as LabelRow | undefined);
  return row && typeof row.label === 'string'
    ? { label: row.label, engineVersion: row.engine_version, createdAt: row.created_at }
    : null;
}

/** Owners (process tags) of runs still queued or running. */
export function unfinishedRunOwners(db: SqliteDatabase): string[] {
  const rows = db.prepare("SELECT DISTINCT owner FROM simulation_runs WHERE status IN ('queued', 'running')").all() as {
    owner: string;
  }[];
  return rows.map((row) => row.owner);
}

/** Ends the queued and running runs of one owner as failed with the reason (its process is gone). */
export function markOwnerRunsInterrupted(db: SqliteDatabase, owner: string, reason: string): number {
  return db
    .prepare(
      "UPDATE simulation_runs SET status = 'failed', error = ?, finished_at = ? WHERE owner = ? AND status IN ('queued', 'running')",
    )
    .run(reason, nowIso(), owner).changes;
}

/** A finished run's inputs and classified architecture (for the learning prior). */
export interface FinishedRunLabel {
  id: number;
  pairId: number | null;
  label: string;
  spec: SimulationSpec;
  architecture: string;
  createdAt: string;
}

/**
 * Finished runs linked to one of `pairIds` or whose label starts with `labelPrefix` (exact, case-sensitive),
 * oldest first; runs without a stored architecture are left out.
 */
export function listFinishedRunLabels(
  db: SqliteDatabase,
  query: { pairIds: readonly number[]; labelPrefix: string },
): FinishedRunLabel[] {
  const byPair = query.pairIds.length > 0 ? `pair_id IN (${query.pairIds.map(() => '?').join(', ')}) OR ` : '';
  const rows = db
    .prepare(
      `SELECT id, pair_id, label, inputs_json, json_extract(result_json, '$.architecture') AS architecture, created_at
       FROM simulation_runs WHERE status = 'done' AND (${byPair}substr(label, 1, ?) = ?)
       ORDER BY created_at, id`,
    )
    .all(...query.pairIds, query.labelPrefix.length, query.labelPrefix) as {
    id: number;
    pair_id: number | null;
    label: string;
    inputs_json: string;
    architecture: unknown;
    created_at: string;
  }[];
  return rows
    .filter((r) => typeof r.architecture === 'string')
    .map((r) => ({
      id: r.id,
      pairId: r.pair_id,
      label: r.label,
      spec: JSON.parse(r.inputs_json) as SimulationSpec,
      architecture: r.architecture as string,
      createdAt: r.created_at,
    }));
}
