/** Every CLI command, in the order of the work (help lists them so); an area adds its list with one line. */
import type { CliCommand } from '../command';
import { batchCommands } from './batches';
import { benchSheetCommands } from './bench-sheet';
import { campaignCommands } from './campaigns';
import { helpCommands } from './help';
import { learnCommands } from './learn';
import { outcomeCommands } from './outcomes';
import { pairCommands } from './pairs';
import { predictionCommands } from './prediction';
import { screenCommands } from './screen';
import { simulationCommands } from './simulation';
import { storeCommands } from './store';

export const commands: CliCommand[] = [
  ...campaignCommands,
  ...pairCommands,
  ...predictionCommands,
  ...simulationCommands,
  ...screenCommands,
  ...batchCommands,
  ...benchSheetCommands,
  ...outcomeCommands,
  ...storeCommands,
  ...learnCommands,
  ...helpCommands,
];
