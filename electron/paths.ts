/**
 * Where things live on disk. The default data folder is the same one Electron's app.getPath('userData')
 * gives for the product name "Pairwright", so the desktop app, the browser host and the CLI share one store.
 */
import { homedir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const PRODUCT_NAME = 'Pairwright';

export function defaultDataDir(
  env: NodeJS.ProcessEnv = process.env,
  platform: NodeJS.Platform = process.platform,
): string {
  if (env.PAIRWRIGHT_DATA) return resolve(env.PAIRWRIGHT_DATA);
  if (platform === 'win32') return join(env.APPDATA ?? join(homedir(), 'AppData', 'Roaming'), PRODUCT_NAME);
  if (platform === 'darwin') return join(homedir(), 'Library', 'Application Support', PRODUCT_NAME);
  return join(env.XDG_CONFIG_HOME ?? join(homedir(), '.config'), PRODUCT_NAME);
}

/** The repository (or packaged app) root: the folder holding package.json. */
export function projectRoot(): string {
  return resolve(dirname(fileURLToPath(import.meta.url)), '..');
}

/** The built renderer (vite build output). */
export function rendererDistDir(): string {
  return join(projectRoot(), 'dist', 'renderer');
}
