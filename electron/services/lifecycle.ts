/**
 * Orderly shutdown shared by the desktop app, the browser host and the CLI: stop background jobs
 * (Monte Carlo workers end their runs as cancelled, with a reason stored; fits and energies of the compute pool
 * are answered as cancelled), then close the store.
 */
import type { Store } from '../../db/store';
import { closeComputePool } from '../workers/compute-pool';
import { closeLearnJobsOf } from '../workers/learn-jobs';
import { closeQueueOf } from '../workers/montecarlo-queue';

export async function shutdownServices(store: Store): Promise<void> {
  try {
    await closeQueueOf(store);
    await closeLearnJobsOf(store);
    await closeComputePool();
  } finally {
    store.close();
  }
}
