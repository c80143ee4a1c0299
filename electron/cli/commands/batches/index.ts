/**
 * `pairwright recipe`, `pairwright reagents`, `pairwright catalog`, `pairwright batches …`: batch design
 * from the command line, with the same services as the app.
 */
import type { CliCommand } from '../../command';
import { catalogCommand } from './catalog';
import { inventoryAddCommand } from './inventory-add';
import { inventoryCommand } from './inventory';
import { batchesListCommand } from './list';
import { reagentsCommand } from './reagents';
import { recipeCommand } from './recipe';
import { batchesStatusCommand } from './status';

export { recipeJson, recipeRequest, recipeText } from './recipe';

/** In the order help lists them. */
export const batchCommands: CliCommand[] = [
  recipeCommand,
  reagentsCommand,
  catalogCommand,
  batchesListCommand,
  batchesStatusCommand,
  inventoryCommand,
  inventoryAddCommand,
];
