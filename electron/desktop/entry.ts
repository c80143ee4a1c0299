/**
 * Entry of the bundled Electron main process (scripts/build-desktop.mjs bundles this file).
 * Loads the real 'electron' module, opens the store in the user-data folder with the Electron build of
 * better-sqlite3, and hands both to main.ts.
 */
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { openWorkspace } from '../services/workspace';
import type { ElectronBoundary } from './electron-boundary';
import { openStoreOrExplain, registerAppScheme, wireDesktopApp } from './main';

const here = dirname(fileURLToPath(import.meta.url));
const electronModuleName = 'electron';
const electronModule = (await import(electronModuleName)) as { default?: ElectronBoundary } & ElectronBoundary;
const electron: ElectronBoundary = electronModule.default ?? electronModule;

const nativeBinding = join(here, 'native', 'better_sqlite3.node');
registerAppScheme(electron);
await electron.app.whenReady();
const context = openStoreOrExplain(electron, () =>
  openWorkspace({
    dataDir: electron.app.getPath('userData'),
    migrationsDir: join(here, 'migrations'),
    ...(existsSync(nativeBinding) ? { nativeBinding } : {}),
  }),
);
if (context !== null) {
  await wireDesktopApp(electron, context, {
    rendererIndex: join(here, '..', 'dist', 'renderer', 'index.html'),
    preload: join(here, 'preload.cjs'),
  });
}
