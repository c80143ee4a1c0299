/**
 * Orderly shutdown shared by the desktop app, the browser host and the CLI: stop background jobs
 * (Monte Carlo workers end their runs as cancelled, with a reason stored), then close the store.
 */
import type { Store } from '../../db/store';
import { closeLearnJobsOf } from '../workers/learn-jobs';
import { closeQueueOf } from '../workers/montecarlo-queue';

export async function shutdownServices(store: Store): Promise<void> {
  try {
    await closeQueueOf(store);
    await closeLearnJobsOf(store);
  } finally {
    store.close();
  }
}
