/**
 * One operation's fuzz run: generated inputs through `dispatch` (the path of every transport) on a copy of the
 * fixture store, each checked for: an answer (no throw), within the time budget, under the memory ceiling, never an
 * `internal` error, every rejection naming its field, row or line, and the store unchanged by every rejection:
 * SQLite's total_changes() (every row written by the connection, even when rolled back) and schema_version unmoved,
 * and all tables dumped before and after the call and compared for every 10th rejection and for every rejection
 * after which either moved (a transaction rolled back). Accepted long jobs are cancelled at once (every 25th is also
 * waited for to its end).
 * Why not a dump on every rejection: one dump of the fixture store (26 tables, 350 kB as text) takes about 4 ms on a
 * quiet 2-core machine, and a CI run has about 53,000 rejections, so ~210 s of dumps, more than the suite's whole
 * 3-minute aim. total_changes() moves for every row an INSERT, UPDATE or DELETE touches, rolled back or not
 * (SQLite C API, sqlite3_total_changes), so with schema_version it catches every write of the connection on every
 * rejection; the sampled dumps check that claim.
 */
import fc from 'fast-check';
import type { Store, SqliteDatabase } from '../../../db/store';
import type { ServiceContext } from '../../../electron/services/context';
import { dispatch } from '../../../electron/services/dispatch';
import { shutdownServices } from '../../../electron/services/lifecycle';
import { operations, type OperationName } from '../../../shared-model/api/contract';
import type { ApiError } from '../../../shared-model/api/result';
import { tableNames } from '../../support/table-dump';
import { openCopy, waitFor, type FixtureTemplate } from './fixture';
import { inputsFor } from './generate';
import { BOUNDED, SEEDS } from './seeds';

/** 1,000 inputs per operation in CI (CI=true); 100 otherwise, for a quick local run. FUZZ_RUNS overrides both. */
export const RUNS_PER_OPERATION = Number(process.env.FUZZ_RUNS ?? (process.env.CI === 'true' ? 1000 : 100));
/** Every call answers within 2 s (issue 14: a per-call time budget). */
export const CALL_BUDGET_MS = 2_000;
/** The process (main thread and workers) stays under 2 GiB resident while fuzzing. */
export const MEMORY_CEILING_BYTES = 2 * 1024 ** 3;
/** The base seed; each operation's seed is derived from it and the operation name (FUZZ_SEED overrides). */
export const BASE_SEED = Number(process.env.FUZZ_SEED ?? 20261202);

export function seedOf(name: string): number {
  let h = BASE_SEED >>> 0;
  for (let i = 0; i < name.length; i++) h = Math.imul(h ^ name.charCodeAt(i), 16777619) >>> 0;
  return h | 0;
}

/** All rows of all tables as one text, with the statements prepared once (the fuzz dumps thousands of times). */
export class TableDump {
  private readonly statements: { name: string; select: { all(): unknown[] } }[];
  private readonly changes: { get(): unknown };
  constructor(private readonly db: SqliteDatabase) {
    this.changes = db.prepare('SELECT total_changes() AS n');
    this.statements = tableNames(db).map((name) => {
      const columns = (db.prepare(`PRAGMA table_info("${name}")`).all() as { name: string }[]).map(
        (c) => `"${c.name}"`,
      );
      return { name, select: db.prepare(`SELECT * FROM "${name}" ORDER BY ${columns.join(', ')}`).raw(true) };
    });
  }
  text(): string {
    return JSON.stringify(
      this.statements.map(({ name, select }) => [name, select.all()]),
      (_k, v: unknown) => (typeof v === 'bigint' ? v.toString() : Buffer.isBuffer(v) ? v.toString('base64') : v),
    );
  }
  /** Rows written by this connection (rolled-back writes count too): any write moves it. */
  totalChanges(): number {
    return (this.changes.get() as { n: number }).n;
  }
  schemaVersion(): number {
    return this.db.pragma('schema_version', { simple: true }) as number;
  }
}

/**
 * A rejection names where: the field at fault, or a line/row/column of a file, or, for a rule about the whole input,
 * the input's own fields it asks for (e.g. "nothing to record: give sizes, composition, …"), or that the input as a
 * whole is not an object.
 */
export function namesWhere(error: ApiError, inputKeys: readonly string[]): boolean {
  if (error.field !== undefined && error.field.trim() !== '') return true;
  if (/\b(line|lines|row|rows|column)\s+\d/i.test(error.message)) return true;
  if (/^Invalid input: expected object/.test(error.message)) return true;
  return inputKeys.some((key) => new RegExp(`\\b${key}\\b`).test(error.message));
}

export interface OperationStats {
  name: string;
  inputs: number;
  accepted: number;
  rejected: Record<string, number>;
  slowestMs: number;
  totalMs: number;
  peakRssMb: number;
  /** Rejections after which every table was dumped and compared with the dump before the call. */
  fullDumps: number;
  /** Time spent dumping tables (before and after calls), apart from the calls themselves. */
  dumpMs: number;
  bounded: string | null;
}

function preview(input: unknown): string {
  let text: string;
  try {
    text = JSON.stringify(input) ?? String(input);
  } catch {
    text = String(input);
  }
  return text.length > 400 ? `${text.slice(0, 400)}… (${text.length} characters)` : text;
}

/**
 * Cancels what an accepted call started (Monte Carlo runs, a retrain job); `wait` also waits for it to end. A job
 * that ends later writes between calls, never during one (the dump before a call is taken after such writes).
 */
async function settle(context: ServiceContext, name: OperationName, value: unknown, wait: boolean): Promise<void> {
  const call = async (op: string, input: unknown): Promise<unknown> => {
    const result = await dispatch(context, op, input);
    if (!result.ok) throw new Error(`${op} after ${name}: ${result.error.message}`);
    return result.value;
  };
  const runIds: number[] = [];
  if (name === 'simulation.start') runIds.push((value as { id: number }).id);
  if (name === 'screen.start') runIds.push(...(value as { runs: { runId: number }[] }).runs.map((r) => r.runId));
  if (runIds.length > 0) {
    await dispatch(context, 'screen.cancel', { runIds }); // runs that already ended are left as they are
    if (!wait) return;
    for (const id of runIds)
      await waitFor(
        () => call('simulation.status', { id }) as Promise<{ status: string }>,
        (r) => r.status !== 'queued' && r.status !== 'running',
        `run ${id}`,
      );
  }
  if (name === 'learn.retrain') {
    const jobId = (value as { id: number }).id;
    await dispatch(context, 'learn.cancel', { jobId }); // a job that already ended answers a conflict
    if (!wait) return;
    await waitFor(
      () => call('learn.job', { jobId }) as Promise<{ status: string }>,
      (j) => j.status !== 'running',
      `retrain job ${jobId}`,
    );
  }
}

export async function fuzzOperation(template: FixtureTemplate, name: OperationName): Promise<OperationStats> {
  const { store, ids } = openCopy(template);
  const context: ServiceContext = { store };
  const stats: OperationStats = {
    name,
    inputs: 0,
    accepted: 0,
    rejected: {},
    slowestMs: 0,
    totalMs: 0,
    peakRssMb: 0,
    fullDumps: 0,
    dumpMs: 0,
    bounded: BOUNDED[name]?.why ?? null,
  };
  try {
    const seeds = SEEDS[name](ids);
    for (const seed of seeds) {
      const parsed = operations[name].input.safeParse(seed);
      if (!parsed.success) throw new Error(`${name}: seed ${preview(seed)} is not valid: ${parsed.error.message}`);
    }
    const inputKeys = [
      ...new Set(seeds.flatMap((seed) => (typeof seed === 'object' && seed !== null ? Object.keys(seed) : []))),
    ];
    const dump = new TableDump(store.db);
    const timedText = (): string => {
      const started = performance.now();
      const text = dump.text();
      stats.dumpMs += performance.now() - started;
      return text;
    };
    let clean = timedText();
    let cleanAt = dump.totalChanges();
    const schemaAt = dump.schemaVersion();
    let rejections = 0;
    await fc.assert(
      fc.asyncProperty(inputsFor(seeds), async (generated) => {
        const input = BOUNDED[name]?.bound(generated, ids) ?? generated;
        if (dump.totalChanges() !== cleanAt) {
          clean = timedText();
          cleanAt = dump.totalChanges();
        }
        const started = performance.now();
        const result = await dispatch(context, name, input);
        const ms = performance.now() - started;
        stats.inputs++;
        stats.totalMs += ms;
        stats.slowestMs = Math.max(stats.slowestMs, ms);
        const rss = process.memoryUsage.rss();
        stats.peakRssMb = Math.max(stats.peakRssMb, rss / 1024 ** 2);
        if (ms > CALL_BUDGET_MS)
          throw new Error(`${name} took ${ms.toFixed(0)} ms (budget ${CALL_BUDGET_MS} ms) on ${preview(input)}`);
        if (rss > MEMORY_CEILING_BYTES)
          throw new Error(`${name}: resident memory ${(rss / 1024 ** 2).toFixed(0)} MB after ${preview(input)}`);
        if (result.ok) {
          stats.accepted++;
          // every 25th accepted job is waited for to its end, so cancelled jobs do not pile up
          await settle(context, name, result.value, stats.accepted % 25 === 0);
          return;
        }
        const { error } = result;
        stats.rejected[error.code] = (stats.rejected[error.code] ?? 0) + 1;
        if (error.code === 'internal')
          throw new Error(`${name} answered an internal error "${error.message}" on ${preview(input)}`);
        if (!namesWhere(error, inputKeys))
          throw new Error(`${name}: the rejection "${error.message}" names no field, row or line (${preview(input)})`);
        // Every rejection: no row written (even rolled back) and no schema change, else all tables are compared;
        // every 10th rejection: all tables compared regardless.
        rejections++;
        const moved = dump.totalChanges() !== cleanAt || dump.schemaVersion() !== schemaAt;
        if (!moved && rejections % 10 !== 1) return;
        stats.fullDumps++;
        const after = timedText();
        if (after !== clean)
          throw new Error(`${name}: a rejection ("${error.message}") changed the store: ${preview(input)}`);
      }),
      { seed: seedOf(name), numRuns: RUNS_PER_OPERATION, endOnFailure: true },
    );
    return stats;
  } finally {
    await shutdownServices(store as Store);
  }
}
