/**
 * The API contract: every operation Pairwright offers, listed once. The operation names are the
 * allowlist of both transports (Electron IPC and the browser host), and the renderer's client type
 * is derived from this record. A new capability adds its own `*Operations` record here.
 */
import type { z } from 'zod';
import { backupOperations } from './backups';
import { batchOperations } from './batches';
import { benchSheetOperations } from './bench-sheet';
import { campaignOperations } from './campaigns';
import { elementOperations } from './elements';
import { learnOperations } from './learn';
import type { OperationSpec } from './operation';
import { outcomeAnalysisOperations, outcomeOperations } from './outcomes';
import { pairOperations } from './pairs';
import { predictionOperations } from './prediction';
import { screenOperations } from './screen';
import { simulationOperations } from './simulation';

export const operations = {
  ...learnOperations,
  ...outcomeAnalysisOperations,
  ...outcomeOperations,
  ...campaignOperations,
  ...pairOperations,
  ...predictionOperations,
  ...elementOperations,
  ...batchOperations,
  ...benchSheetOperations,
  ...simulationOperations,
  ...backupOperations,
  ...screenOperations,
} satisfies Record<string, OperationSpec<z.ZodType, unknown>>;

export type Operations = typeof operations;
export type OperationName = keyof Operations;
/** What a caller passes (before defaults are applied). */
export type OperationInput<Name extends OperationName> = z.input<Operations[Name]['input']>;
/** What a service receives (after validation and defaults). */
export type ValidatedInput<Name extends OperationName> = z.output<Operations[Name]['input']>;
export type OperationOutput<Name extends OperationName> = NonNullable<Operations[Name]['output']>;

export const OPERATION_NAMES = Object.keys(operations) as OperationName[];

export function isOperationName(name: string): name is OperationName {
  return Object.prototype.hasOwnProperty.call(operations, name);
}
