/**
 * Starts the browser host in-process on a temporary store (a real SQLite file) for end-to-end tests.
 * `host.url` is the host's first one-time login address: a browser page that opens it is logged in (the
 * session cookie stays with that browser context; opening the address again there just redirects).
 */
import { openStore, type Store } from '../../db/store';
import { startHost, type RunningHost } from '../../electron/host/server';
import { shutdownServices } from '../../electron/services/lifecycle';
import { rendererDistDir } from '../../electron/paths';
import { tempDir } from './temp-dirs';

export interface HostFixture {
  host: RunningHost;
  store: Store;
  dataDir: string;
  stop(): Promise<void>;
}

/** A temporary data folder, removed after the test (or file) that made it: see temp-dirs.ts. */
export function tempDataDir(prefix = 'pairwright-test-'): string {
  return tempDir(prefix);
}

export async function startTestHost(dataDir: string = tempDataDir(), port = 0): Promise<HostFixture> {
  const store = openStore({ dataDir });
  const host = await startHost({ context: { store }, rendererDir: rendererDistDir(), port });
  return {
    host,
    store,
    dataDir,
    // background jobs end first (as the real host does), then the store closes
    stop: async () => {
      await host.close();
      await shutdownServices(store);
    },
  };
}
