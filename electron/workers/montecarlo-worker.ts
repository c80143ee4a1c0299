/**
 * Worker thread of one lattice Monte Carlo run: receives the run's inputs and a shared cancel flag,
 * posts progress reports and finally the result (or an error value). The computation itself is the
 * pure `runSimulation` of shared-model; this file only carries messages.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { DomainError } from '../../shared-model/api/result';
import { runSimulation, type SimulationSpec } from '../../shared-model/montecarlo/simulate';
import { createRandom } from '../../shared-model/random';
import type { WorkerInput, WorkerMessage } from './montecarlo-messages';

function post(message: WorkerMessage): void {
  parentPort?.postMessage(message);
}

const input = workerData as WorkerInput;
const cancelFlag = new Int32Array(input.cancelBuffer);
try {
  const spec: SimulationSpec = input.spec;
  const result = runSimulation(spec, createRandom(spec.seed), {
    onProgress: (progress) => post({ type: 'progress', progress }),
    shouldCancel: () => Atomics.load(cancelFlag, 0) === 1,
    now: () => performance.now(),
  });
  post({ type: 'result', result });
} catch (error) {
  if (error instanceof DomainError)
    post({ type: 'error', code: error.code, message: error.message, field: error.field ?? null });
  else
    post({
      type: 'error',
      code: 'internal',
      message: error instanceof Error ? (error.stack ?? error.message) : String(error),
      field: null,
    });
}
