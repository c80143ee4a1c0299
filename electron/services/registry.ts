/**
 * Every operation's service function, keyed by operation name. The type requires one handler per
 * operation in the contract, so a new operation does not compile until its service is registered here.
 */
import type { OperationName } from '../../shared-model/api/contract';
import { backupHandlers } from './backups';
import { batchHandlers } from './batches';
import { benchSheetHandlers } from './bench-sheet';
import { campaignHandlers } from './campaigns';
import type { HandlerMap } from './context';
import { learnHandlers } from './learn';
import { outcomeAnalysisHandlers, outcomeHandlers } from './outcomes';
import { elementHandlers } from './elements';
import { pairHandlers } from './pairs';
import { predictionHandlers } from './prediction';
import { screenHandlers } from './screen';
import { simulationHandlers } from './simulation';

export const handlers: HandlerMap<OperationName> = {
  ...learnHandlers,
  ...outcomeAnalysisHandlers,
  ...outcomeHandlers,
  ...campaignHandlers,
  ...pairHandlers,
  ...predictionHandlers,
  ...elementHandlers,
  ...batchHandlers,
  ...benchSheetHandlers,
  ...simulationHandlers,
  ...backupHandlers,
  ...screenHandlers,
};
