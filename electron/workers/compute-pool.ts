/**
 * The compute pool: a few worker threads that run the services' heavy computations (line-scan fits, energies,
 * relaxations; electron/services/compute-tasks.ts), so the process that owns the window and the host keeps
 * answering — and hears SIGTERM — while one runs. Tasks wait in order when every worker is busy. Each task has its
 * own wall-time budget inside the worker; a worker still busy 10 s past it is terminated and its task answered
 * with a message. Idle workers do not keep the process alive. `closeComputePool` (shutdownServices) ends the
 * workers and answers waiting and running tasks as cancelled.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { DomainError } from '../../shared-model/api/result';
import {
  COMPUTE_WALL_BUDGET_MS,
  type ComputeArgs,
  type ComputeKind,
  type ComputeResult,
} from '../services/compute-tasks';
import type { ComputeFailure, ComputeReply, ComputeRequest } from './compute-messages';
import { workerEntry } from './worker-entry';

/** How long past its own budget a task may run before its worker is stopped (the budget is checked in steps). */
const HARD_STOP_GRACE_MS = 10_000;

const TASK_NAMES: Record<ComputeKind, string> = {
  previewLineScan: 'the line-scan fit',
  fitLineScan: 'the line-scan fit',
  energy: 'the energy',
  relax: 'the relaxation',
};

interface Task {
  request: ComputeRequest;
  resolve: (value: unknown) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  task: Task | null;
  timer: NodeJS.Timeout | null;
}

function errorOf(failure: ComputeFailure): Error {
  if (failure.kind === 'domain') return new DomainError(failure.code, failure.message, failure.field ?? undefined);
  const error = failure.kind === 'range' ? new RangeError(failure.message) : new Error(failure.message);
  if (failure.stack) error.stack = `${failure.stack}\n    (in a compute worker)`;
  return error;
}

export class ComputePool {
  private nextId = 1;
  private readonly slots: Slot[] = [];
  private readonly waiting: Task[] = [];
  private closed = false;

  constructor(readonly size: number) {}

  run<Kind extends ComputeKind>(kind: Kind, args: ComputeArgs<Kind>): Promise<ComputeResult<Kind>> {
    if (this.closed) return Promise.reject(new DomainError('cancelled', 'Pairwright is closing; nothing was computed'));
    return new Promise<ComputeResult<Kind>>((resolve, reject) => {
      const request: ComputeRequest = { id: this.nextId++, kind, args };
      this.waiting.push({ request, resolve: resolve as (value: unknown) => void, reject });
      this.pump();
    });
  }

  /** Tasks running and waiting (for tests and status). */
  get load(): { running: number; waiting: number; workers: number } {
    return {
      running: this.slots.filter((slot) => slot.task).length,
      waiting: this.waiting.length,
      workers: this.slots.length,
    };
  }

  async close(): Promise<void> {
    this.closed = true;
    const stopped = new DomainError('cancelled', 'stopped: Pairwright is closing');
    for (const task of this.waiting.splice(0)) task.reject(stopped);
    const slots = this.slots.splice(0);
    for (const slot of slots) {
      if (slot.timer) clearTimeout(slot.timer);
      slot.task?.reject(stopped);
      slot.task = null;
    }
    await Promise.all(slots.map((slot) => slot.worker.terminate()));
  }

  private pump(): void {
    while (this.waiting.length > 0) {
      let slot = this.slots.find((s) => s.task === null);
      if (!slot) {
        if (this.slots.length >= this.size) return;
        slot = this.startWorker();
      }
      const task = this.waiting.shift() as Task;
      this.assign(slot, task);
    }
  }

  private assign(slot: Slot, task: Task): void {
    slot.task = task;
    slot.worker.ref();
    const kind = task.request.kind;
    const limitMs = COMPUTE_WALL_BUDGET_MS[kind] + HARD_STOP_GRACE_MS;
    slot.timer = setTimeout(() => {
      this.retire(
        slot,
        new DomainError(
          'unsupported',
          `${TASK_NAMES[kind]} did not stop within ${Math.round(limitMs / 1000)} s and was stopped; ` +
            'use a smaller input',
        ),
      );
    }, limitMs);
    slot.timer.unref();
    slot.worker.postMessage(task.request);
  }

  private startWorker(): Slot {
    const entry = workerEntry('compute-worker');
    const worker = 'url' in entry ? new Worker(entry.url) : new Worker(entry.code, { eval: true });
    const slot: Slot = { worker, task: null, timer: null };
    worker.on('message', (reply: ComputeReply) => {
      const task = slot.task;
      if (!task || task.request.id !== reply.id) return;
      this.release(slot);
      if (reply.ok) task.resolve(reply.value);
      else task.reject(errorOf(reply.failure));
      this.pump();
    });
    worker.on('error', (error) => this.retire(slot, error));
    worker.on('exit', (code) => {
      if (this.slots.includes(slot))
        this.retire(slot, new Error(`a compute worker stopped unexpectedly (exit code ${code})`));
    });
    worker.unref();
    this.slots.push(slot);
    return slot;
  }

  private release(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.task = null;
    slot.worker.unref();
  }

  /** Ends a worker (stuck, crashed or exited) and answers its task with `error`; a new worker starts on demand. */
  private retire(slot: Slot, error: Error): void {
    const index = this.slots.indexOf(slot);
    if (index < 0) return;
    this.slots.splice(index, 1);
    const task = slot.task;
    this.release(slot);
    void slot.worker.terminate().catch((reason: unknown) => console.error('[pairwright] compute worker:', reason));
    task?.reject(error);
    this.pump();
  }
}

let pool: ComputePool | null = null;

/** The process's compute pool: two workers (one on a single-core machine), started on first use. */
export function computePool(): ComputePool {
  pool ??= new ComputePool(Math.max(1, Math.min(2, availableParallelism() - 1)));
  return pool;
}

/** Ends the pool's workers; the next use starts a new pool. */
export async function closeComputePool(): Promise<void> {
  const current = pool;
  pool = null;
  if (current) await current.close();
}
