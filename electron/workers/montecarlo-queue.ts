/**
 * The queue of Monte Carlo runs of one store: runs are stored as 'queued', started in worker threads
 * (at most `concurrency` at a time, so the process that owns the window never computes), report
 * progress into the store, and end as 'done', 'failed' or 'cancelled'. Cancel sets a flag the worker
 * polls every sweep; a worker that does not stop within 10 s is terminated.
 *
 * Several processes may open the same store (the desktop app and a CLI command): each queue only runs
 * the runs it created, and keeps a heartbeat on them; a run whose owner fell silent is reported as
 * interrupted by whoever reads it next.
 */
import { randomBytes } from 'node:crypto';
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { Store } from '../../db/store';
import {
  expireSilentRuns,
  getRunSummary,
  insertRun,
  markEnded,
  markRunning,
  saveProgress,
  saveResult,
  touchHeartbeat,
  unfinishedRunOwners,
  markOwnerRunsInterrupted,
} from '../../db/repositories/simulation';
import type { SimulationRunSummary } from '../../shared-model/api/simulation';
import { DomainError } from '../../shared-model/api/result';
import {
  engineVersionFor,
  planSimulation,
  type SimulationProgress,
  type SimulationSpec,
} from '../../shared-model/montecarlo/simulate';
import type { WorkerInput, WorkerMessage } from './montecarlo-messages';
import { workerEntry } from './worker-entry';

const HEARTBEAT_MS = 5_000;
/** At most this many runs wait to start per process; more is refused with a message (a bound on memory). */
export const MAX_QUEUED = 200;
export const APP_CLOSED = 'cancelled (app closed)';

/** True when a process with this id exists (EPERM: it exists but belongs to another account). */
function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * At start: runs left queued or running by a process of this machine that no longer exists (killed, crashed) are
 * marked interrupted at once, instead of after SILENT_AFTER_MS without heartbeat. Returns how many were marked.
 */
export function interruptRunsOfDeadProcesses(store: Store): number {
  let marked = 0;
  for (const owner of unfinishedRunOwners(store.db)) {
    const pid = Number.parseInt(owner.split('-')[0] ?? '', 10);
    if (!Number.isInteger(pid) || pid <= 0 || pid === process.pid || processAlive(pid)) continue;
    const reason = `interrupted: the Pairwright process running it (pid ${pid}) ended before the run finished; start it again`;
    marked += markOwnerRunsInterrupted(store.db, owner, reason);
  }
  return marked;
}

/** A run whose owner has not refreshed its heartbeat for this long is reported as interrupted. */
export const SILENT_AFTER_MS = 60_000;
const CANCEL_GRACE_MS = 10_000;
const PROGRESS_WRITE_MS = 250;
const MAX_HISTORY = 5_000;

interface ActiveRun {
  id: number;
  worker: Worker;
  cancel: Int32Array;
  lastWrite: number;
  cancelTimer: NodeJS.Timeout | null;
  finished: boolean;
}

export class MonteCarloQueue {
  readonly owner = `${process.pid}-${randomBytes(6).toString('hex')}`;
  readonly concurrency: number;
  private readonly waiting: { id: number; spec: SimulationSpec }[] = [];
  private readonly active = new Map<number, ActiveRun>();
  private readonly histories = new Map<number, SimulationProgress[]>();
  private readonly idleWaiters: (() => void)[] = [];
  private heartbeat: NodeJS.Timeout | null = null;

  constructor(
    private readonly store: Store,
    options: { concurrency?: number } = {},
  ) {
    this.concurrency = options.concurrency ?? Math.min(4, Math.max(1, availableParallelism() - 1));
  }

  private get dbOpen(): boolean {
    return this.store.db.open;
  }

  /** Stores a new run as queued and starts it when a worker is free; refuses when MAX_QUEUED runs wait already. */
  enqueue(spec: SimulationSpec, label: string, pairId: number | null): SimulationRunSummary {
    if (this.waiting.length >= MAX_QUEUED) {
      throw new DomainError(
        'conflict',
        `the run queue is full: ${MAX_QUEUED} runs are waiting to start; cancel some or wait for them to finish`,
      );
    }
    const plan = planSimulation(spec);
    const summary = insertRun(this.store.db, {
      spec,
      label,
      pairId,
      engineVersion: engineVersionFor(spec),
      plannedAtoms: plan.atoms,
      totalSweeps: plan.totalSweeps,
      owner: this.owner,
    });
    this.waiting.push({ id: summary.id, spec });
    this.histories.set(summary.id, []);
    this.ensureHeartbeat();
    this.pump();
    return getRunSummary(this.store.db, summary.id);
  }

  /** Cancels a queued run at once, or asks a running one to stop (it ends as 'cancelled' within a sweep). */
  cancel(id: number): SimulationRunSummary {
    const current = this.summary(id);
    if (current.status !== 'queued' && current.status !== 'running') {
      throw new DomainError('conflict', `run ${id} has already ended (${current.status}); nothing to cancel`, 'id');
    }
    const waitingIndex = this.waiting.findIndex((entry) => entry.id === id);
    if (waitingIndex >= 0) {
      this.waiting.splice(waitingIndex, 1);
      markEnded(this.store.db, id, 'cancelled', 'cancelled before it started');
      this.notifyIfIdle();
      return this.summary(id);
    }
    const run = this.active.get(id);
    if (!run) {
      throw new DomainError(
        'conflict',
        `run ${id} is run by another Pairwright process (the app or a command); cancel it there`,
        'id',
      );
    }
    Atomics.store(run.cancel, 0, 1);
    run.cancelTimer ??= setTimeout(() => {
      if (!run.finished) {
        void run.worker.terminate();
        this.finish(run, () => markEnded(this.store.db, id, 'cancelled', 'cancelled (the worker was stopped)'));
      }
    }, CANCEL_GRACE_MS);
    return this.summary(id);
  }

  /** Summary with silent runs of dead processes expired first. */
  summary(id: number): SimulationRunSummary {
    this.expireSilent();
    return getRunSummary(this.store.db, id);
  }

  expireSilent(): void {
    if (!this.dbOpen) return;
    expireSilentRuns(this.store.db, new Date(Date.now() - SILENT_AFTER_MS).toISOString());
  }

  /** Progress reports of a run started by this process (empty for others). */
  history(id: number): SimulationProgress[] {
    return [...(this.histories.get(id) ?? [])];
  }

  /** Resolves when nothing is queued or running in this process. */
  whenIdle(): Promise<void> {
    if (this.waiting.length === 0 && this.active.size === 0) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  /**
   * Stops every worker (closing the store or the app); their runs end as 'cancelled (app closed)'. Each run is
   * stored as ended before its worker is stopped, so the worker's exit is not mistaken for a failure.
   */
  async close(): Promise<void> {
    for (const entry of this.waiting.splice(0)) {
      if (this.dbOpen)
        markEnded(this.store.db, entry.id, 'cancelled', `${APP_CLOSED}: Pairwright closed before the run started`);
    }
    const runs = [...this.active.values()];
    for (const run of runs)
      this.finish(run, () =>
        markEnded(this.store.db, run.id, 'cancelled', `${APP_CLOSED}: Pairwright closed during the run`),
      );
    await Promise.all(runs.map((run) => run.worker.terminate()));
    if (this.heartbeat) clearInterval(this.heartbeat);
    this.heartbeat = null;
  }

  private ensureHeartbeat(): void {
    if (this.heartbeat) return;
    this.heartbeat = setInterval(() => {
      if (this.dbOpen) touchHeartbeat(this.store.db, this.owner);
    }, HEARTBEAT_MS);
    this.heartbeat.unref();
  }

  private pump(): void {
    while (this.active.size < this.concurrency && this.waiting.length > 0) {
      const next = this.waiting.shift()!;
      this.start(next.id, next.spec);
    }
  }

  private start(id: number, spec: SimulationSpec): void {
    const cancelBuffer = new SharedArrayBuffer(4);
    const entry = workerEntry('montecarlo-worker');
    const input: WorkerInput = { spec, cancelBuffer };
    const worker =
      'url' in entry
        ? new Worker(entry.url, { workerData: input })
        : new Worker(entry.code, { eval: true, workerData: input });
    const run: ActiveRun = {
      id,
      worker,
      cancel: new Int32Array(cancelBuffer),
      lastWrite: 0,
      cancelTimer: null,
      finished: false,
    };
    this.active.set(id, run);
    markRunning(this.store.db, id);
    worker.on('message', (message: WorkerMessage) => this.onMessage(run, message));
    worker.on('error', (error) => {
      console.error(`[pairwright] Monte Carlo run ${id} worker failed:`, error);
      this.finish(run, () => markEnded(this.store.db, id, 'failed', `the worker failed: ${error.message}`));
    });
    worker.on('exit', (code) => {
      if (!run.finished)
        this.finish(run, () =>
          markEnded(this.store.db, id, 'failed', `the worker stopped (exit code ${code}) without a result`),
        );
    });
  }

  private onMessage(run: ActiveRun, message: WorkerMessage): void {
    if (run.finished) return;
    if (message.type === 'progress') {
      const history = this.histories.get(run.id);
      if (history) {
        history.push(message.progress);
        if (history.length > MAX_HISTORY) history.splice(0, history.length - MAX_HISTORY);
      }
      const now = Date.now();
      if (
        this.dbOpen &&
        (now - run.lastWrite >= PROGRESS_WRITE_MS || message.progress.sweep === message.progress.totalSweeps)
      ) {
        saveProgress(this.store.db, run.id, message.progress);
        run.lastWrite = now;
      }
      return;
    }
    if (message.type === 'result') {
      this.finish(run, () => saveResult(this.store.db, run.id, message.result));
      return;
    }
    if (message.code === 'cancelled')
      this.finish(run, () => markEnded(this.store.db, run.id, 'cancelled', message.message));
    else this.finish(run, () => markEnded(this.store.db, run.id, 'failed', message.message));
  }

  private finish(run: ActiveRun, write: () => void): void {
    if (run.finished) return;
    run.finished = true;
    if (run.cancelTimer) clearTimeout(run.cancelTimer);
    if (this.dbOpen) write();
    this.active.delete(run.id);
    this.pump();
    this.notifyIfIdle();
  }

  private notifyIfIdle(): void {
    if (this.waiting.length > 0 || this.active.size > 0) return;
    if (this.heartbeat) {
      clearInterval(this.heartbeat);
      this.heartbeat = null;
    }
    for (const resolve of this.idleWaiters.splice(0)) resolve();
  }
}

const queues = new WeakMap<Store, MonteCarloQueue>();

/** The queue of a store (one per store object, created on first use). */
export function queueFor(store: Store): MonteCarloQueue {
  let queue = queues.get(store);
  if (!queue) {
    queue = new MonteCarloQueue(store);
    queues.set(store, queue);
  }
  return queue;
}

/** Stops the queue of a store if one was started (runs end as cancelled); a no-op otherwise. */
export async function closeQueueOf(store: Store): Promise<void> {
  const queue = queues.get(store);
  if (!queue) return;
  queues.delete(store);
  await queue.close();
}
