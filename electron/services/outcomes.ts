/**
 * Outcome services (issue "Outcomes"): previews that store nothing, and — once batches exist in the store —
 * imports that keep raw data beside derived results.
 */
import type { outcomeAnalysisOperations } from '../../shared-model/api/outcomes';
import type { HandlerMap } from './context';
import { analyseLineScanCsv, analyseSizeCsv } from './outcome-analysis';

export const outcomeAnalysisHandlers: HandlerMap<keyof typeof outcomeAnalysisOperations> = {
  'outcomes.previewSizes': (input) => analyseSizeCsv(input),
  'outcomes.previewLineScan': (input) => analyseLineScanCsv(input, input.pair.elementA, input.pair.elementB),
};
