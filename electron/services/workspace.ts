/**
 * Opening and closing a workspace (one store plus the services' background jobs) for every entry point:
 * the desktop app, the browser host and the CLI reach the store only through here and `dispatch`.
 * Also the store-level maintenance that runs with the store closed: restore and the full integrity check.
 */
import { StoreOpenError } from '../../db/integrity';
import { restoreStore, RestoreError } from '../../db/restore';
import { openStore, type OpenStoreOptions } from '../../db/store';
import { interruptRunsOfDeadProcesses } from '../workers/montecarlo-queue';
import type { ServiceContext } from './context';
import { shutdownServices } from './lifecycle';

export type WorkspaceOptions = OpenStoreOptions;

/** Opens (creating or migrating as needed) the store in `options.dataDir` and returns the services' context. */
export function openWorkspace(options: WorkspaceOptions): ServiceContext {
  const store = openStore(options);
  interruptRunsOfDeadProcesses(store);
  return { store };
}

/** Stops background jobs (Monte Carlo runs are stored as cancelled), then closes the store. */
export async function closeWorkspace(context: ServiceContext): Promise<void> {
  await shutdownServices(context.store);
}

/**
 * True for a refusal meant for the user as it stands (a damaged, empty, newer or foreign store; a refused restore):
 * entry points print its message alone, without a stack trace.
 */
export function isStoreRefusal(error: unknown): error is Error {
  return error instanceof StoreOpenError || error instanceof RestoreError;
}

export interface RestoreSummary {
  restoredFrom: string;
  previousStoreKeptAt: string | null;
  fromSchemaVersion: number;
  schemaVersion: number;
}

/** Restores a backup file into the workspace (the store must be closed everywhere); see db/restore.ts. */
export async function restoreWorkspace(dataDir: string, file: string): Promise<RestoreSummary> {
  const report = await restoreStore(dataDir, file);
  report.store.close();
  return {
    restoredFrom: report.restoredFrom,
    previousStoreKeptAt: report.previousStoreKeptAt,
    fromSchemaVersion: report.fromSchemaVersion,
    schemaVersion: report.store.migration.toVersion,
  };
}

/** Opens the store with the full `PRAGMA integrity_check` (throws a StoreOpenError when damaged) and closes it. */
export function checkWorkspace(dataDir: string): { path: string; schemaVersion: number } {
  const store = openStore({ dataDir, check: 'full', dailyBackup: false });
  try {
    return { path: store.path, schemaVersion: store.migration.toVersion };
  } finally {
    store.close();
  }
}
