/**
 * Retrain jobs of one store: each runs `reviewCampaign` in a worker thread (so the process that owns the
 * window never computes), reports progress, and ends as done (the review stored as a model by `onResult`),
 * failed or cancelled. Cancel sets a flag the computation polls between fits; a worker that does not stop
 * within 5 s is terminated. Jobs live in memory: a job id belongs to the process that started it.
 */
import { Worker } from 'node:worker_threads';
import type { Store } from '../../db/store';
import type { LearnJob } from '../../shared-model/api/learn';
import { DomainError } from '../../shared-model/api/result';
import type { ModelReview } from '../../shared-model/learn/review';
import type { LearnWorkerInput, LearnWorkerMessage } from './learn-messages';
import { workerEntry } from './worker-entry';

const CANCEL_GRACE_MS = 5_000;

interface ActiveJob {
  job: LearnJob;
  worker: Worker;
  cancel: Int32Array;
  done: Promise<void>;
  finish: () => void;
  cancelTimer: NodeJS.Timeout | null;
}

export class LearnJobs {
  private nextId = 1;
  private readonly jobs = new Map<number, ActiveJob>();

  start(
    campaignId: number,
    input: Omit<LearnWorkerInput, 'cancelBuffer'>,
    onResult: (review: ModelReview) => number,
  ): LearnJob {
    const running = [...this.jobs.values()].find((j) => j.job.campaignId === campaignId && j.job.status === 'running');
    if (running)
      throw new DomainError(
        'conflict',
        `a retrain of this campaign is already running (job ${running.job.id})`,
        'campaignId',
      );
    const cancelBuffer = new SharedArrayBuffer(4);
    const entry = workerEntry('learn-worker');
    const workerData: LearnWorkerInput = { ...input, cancelBuffer };
    const worker =
      'url' in entry ? new Worker(entry.url, { workerData }) : new Worker(entry.code, { eval: true, workerData });
    const job: LearnJob = {
      id: this.nextId++,
      campaignId,
      status: 'running',
      fraction: 0,
      stage: 'starting',
      error: null,
      modelId: null,
      startedAt: new Date().toISOString(),
      finishedAt: null,
    };
    let finish: () => void = () => undefined;
    const done = new Promise<void>((resolve) => (finish = resolve));
    const active: ActiveJob = { job, worker, cancel: new Int32Array(cancelBuffer), done, finish, cancelTimer: null };
    this.jobs.set(job.id, active);
    const end = (status: LearnJob['status'], error: string | null) => {
      if (job.status !== 'running') return;
      job.status = status;
      job.error = error;
      job.finishedAt = new Date().toISOString();
      if (active.cancelTimer) clearTimeout(active.cancelTimer);
      void worker.terminate();
      active.finish();
    };
    worker.on('message', (message: LearnWorkerMessage) => {
      if (job.status !== 'running') return;
      if (message.type === 'progress') {
        job.fraction = message.progress.fraction;
        job.stage = message.progress.stage;
      } else if (message.type === 'result') {
        try {
          job.modelId = onResult(message.review);
          job.fraction = 1;
          job.stage = 'done';
          end('done', null);
        } catch (error) {
          end('failed', `the model could not be stored: ${error instanceof Error ? error.message : String(error)}`);
        }
      } else end(message.code === 'cancelled' ? 'cancelled' : 'failed', message.message);
    });
    worker.on('error', (error) => end('failed', `the worker failed: ${error.message}`));
    worker.on('exit', (code) => end('failed', `the worker stopped (exit code ${code}) without a result`));
    return { ...job };
  }

  get(jobId: number): LearnJob {
    const active = this.jobs.get(jobId);
    if (!active) throw new DomainError('not_found', `no retrain job ${jobId} in this Pairwright process`, 'jobId');
    return { ...active.job };
  }

  cancel(jobId: number): LearnJob {
    const active = this.jobs.get(jobId);
    if (!active) throw new DomainError('not_found', `no retrain job ${jobId} in this Pairwright process`, 'jobId');
    if (active.job.status !== 'running')
      throw new DomainError('conflict', `job ${jobId} has already ended (${active.job.status})`, 'jobId');
    Atomics.store(active.cancel, 0, 1);
    active.cancelTimer ??= setTimeout(() => {
      if (active.job.status === 'running') {
        active.job.status = 'cancelled';
        active.job.error = 'cancelled (the worker was stopped)';
        active.job.finishedAt = new Date().toISOString();
        void active.worker.terminate();
        active.finish();
      }
    }, CANCEL_GRACE_MS);
    return { ...active.job };
  }

  /** Resolves when the job has ended. */
  whenDone(jobId: number): Promise<LearnJob> {
    const active = this.jobs.get(jobId);
    if (!active) return Promise.reject(new DomainError('not_found', `no retrain job ${jobId}`, 'jobId'));
    return active.done.then(() => ({ ...active.job }));
  }

  async close(): Promise<void> {
    const running = [...this.jobs.values()].filter((j) => j.job.status === 'running');
    for (const j of running) {
      j.job.status = 'cancelled';
      j.job.error = 'Pairwright closed during the retrain';
      j.job.finishedAt = new Date().toISOString();
      j.finish();
    }
    await Promise.all(running.map((j) => j.worker.terminate()));
  }
}

const registry = new WeakMap<Store, LearnJobs>();

export function learnJobsFor(store: Store): LearnJobs {
  let jobs = registry.get(store);
  if (!jobs) {
    jobs = new LearnJobs();
    registry.set(store, jobs);
  }
  return jobs;
}

export async function closeLearnJobsOf(store: Store): Promise<void> {
  const jobs = registry.get(store);
  if (!jobs) return;
  registry.delete(store);
  await jobs.close();
}
