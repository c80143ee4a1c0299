/** Messages between the retrain job manager (main thread) and its worker thread. */
import type { ApiErrorCode } from '../../shared-model/api/result';
import type { LearningOutcome } from '../../shared-model/learn/outcome-model';
import type { ModelReview, ReviewProgress, ReviewSettings } from '../../shared-model/learn/review';

export interface LearnWorkerInput {
  outcomes: LearningOutcome[];
  elements: string[];
  settings: ReviewSettings;
  /** Int32Array(1) over this buffer: 1 = cancel requested. */
  cancelBuffer: SharedArrayBuffer;
}

export type LearnWorkerMessage =
  | { type: 'progress'; progress: ReviewProgress }
  | { type: 'result'; review: ModelReview }
  | { type: 'error'; code: ApiErrorCode; message: string; field: string | null };
