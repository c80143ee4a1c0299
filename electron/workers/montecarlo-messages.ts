/** Messages between the Monte Carlo queue (main thread) and its worker threads. */
import type { ApiErrorCode } from '../../shared-model/api/result';
import type { SimulationProgress, SimulationResult, SimulationSpec } from '../../shared-model/montecarlo/simulate';

export interface WorkerInput {
  spec: SimulationSpec;
  /** Int32Array(1) over this buffer: 1 = cancel requested. */
  cancelBuffer: SharedArrayBuffer;
}

export type WorkerMessage =
  | { type: 'progress'; progress: SimulationProgress }
  | { type: 'result'; result: SimulationResult }
  | { type: 'error'; code: ApiErrorCode; message: string; field: string | null };
