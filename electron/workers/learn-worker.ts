/**
 * Worker thread of one retrain: receives the campaign's outcomes, elements and settings and a shared cancel
 * flag, posts progress and finally the review (or an error value). The computation is the pure
 * `reviewCampaign` of shared-model/learn; this file only carries messages.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { DomainError } from '../../shared-model/api/result';
import { reviewCampaign } from '../../shared-model/learn/review';
import type { LearnWorkerInput, LearnWorkerMessage } from './learn-messages';

function post(message: LearnWorkerMessage): void {
  parentPort?.postMessage(message);
}

const input = workerData as LearnWorkerInput;
const cancelFlag = new Int32Array(input.cancelBuffer);
try {
  const review = reviewCampaign(input.outcomes, input.elements, input.settings, {
    onProgress: (progress) => post({ type: 'progress', progress }),
    shouldCancel: () => Atomics.load(cancelFlag, 0) === 1,
  });
  post({ type: 'result', review });
} catch (error) {
  if (error instanceof DomainError)
    post({ type: 'error', code: error.code, message: error.message, field: error.field ?? null });
  else {
    const message = error instanceof Error ? (error.stack ?? error.message) : String(error);
    post({ type: 'error', code: 'internal', message, field: null });
  }
}
