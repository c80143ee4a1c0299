/** Every CLI command; an area adds its list with one line. */
import type { CliCommand } from '../command';
import { outcomeCommands } from './outcomes';
import { batchCommands } from './batches';
import { campaignCommands } from './campaigns';
import { pairCommands } from './pairs';
import { predictionCommands } from './prediction';
import { simulationCommands } from './simulation';

export const commands: CliCommand[] = [
  ...outcomeCommands,
  ...campaignCommands,
  ...pairCommands,
  ...batchCommands,
  ...predictionCommands,
  ...simulationCommands,
];
