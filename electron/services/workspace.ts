/**
 * Opening and closing a workspace (one store plus the services' background jobs) for every entry point:
 * the desktop app, the browser host and the CLI reach the store only through here and `dispatch`.
 */
import { openStore, type OpenStoreOptions } from '../../db/store';
import type { ServiceContext } from './context';
import { shutdownServices } from './lifecycle';

export type WorkspaceOptions = OpenStoreOptions;

/** Opens (creating or migrating as needed) the store in `options.dataDir` and returns the services' context. */
export function openWorkspace(options: WorkspaceOptions): ServiceContext {
  return { store: openStore(options) };
}

/** Stops background jobs (Monte Carlo runs are stored as cancelled), then closes the store. */
export async function closeWorkspace(context: ServiceContext): Promise<void> {
  await shutdownServices(context.store);
}
