/**
 * Electron main process: one window, the app menu, and the IPC glue to the same services the browser
 * host uses. Thin on purpose: `wireDesktopApp` takes the Electron API as a parameter (see
 * electron-boundary.ts) so tests can drive it without the Electron binary.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { isOperationName, OPERATION_NAMES } from '../../shared-model/api/contract';
import { fail } from '../../shared-model/api/result';
import type { ServiceContext } from '../services/context';
import { dispatch } from '../services/dispatch';
import { shutdownServices } from '../services/lifecycle';
import {
  CALL_CHANNEL,
  OPERATIONS_CHANNEL,
  PRINT_CHANNEL,
  type BrowserWindowLike,
  type ElectronBoundary,
  type IpcMainInvokeEventLike,
  type MenuItemTemplate,
} from './electron-boundary';

export interface DesktopPaths {
  /** dist/renderer/index.html */
  rendererIndex: string;
  /** the bundled preload script */
  preload: string;
}

export interface DesktopApp {
  window: BrowserWindowLike;
}

/** Links we let the OS browser open: https only, to hosts we name in the app. */
export const VETTED_LINK_HOSTS = ['unece.org', 'echa.europa.eu', 'pubchem.ncbi.nlm.nih.gov'];

export function isVettedExternalLink(url: string): boolean {
  try {
    const parsed = new URL(url);
    return (
      parsed.protocol === 'https:' &&
      VETTED_LINK_HOSTS.some((host) => parsed.hostname === host || parsed.hostname.endsWith(`.${host}`))
    );
  } catch {
    return false;
  }
}

/** The sender must be our window's main frame showing our own index.html. */
export function isTrustedSender(
  event: IpcMainInvokeEventLike,
  window: BrowserWindowLike,
  rendererIndex: string,
): boolean {
  if (!event.senderFrame) return false;
  if (event.sender.id !== window.webContents.id) return false;
  const expected = pathToFileURL(rendererIndex);
  try {
    const actual = new URL(event.senderFrame.url);
    return actual.protocol === 'file:' && actual.pathname === expected.pathname;
  } catch {
    return false;
  }
}

export interface MenuActions {
  openDataFolder: () => void;
  backUp: () => void;
  about: () => void;
}

export function applicationMenu(electron: ElectronBoundary, actions: MenuActions): MenuItemTemplate[] {
  const file: MenuItemTemplate[] = [
    { label: 'Open data folder', click: actions.openDataFolder },
    { label: 'Back up the store…', click: actions.backUp },
    { type: 'separator' },
    { role: 'quit' },
  ];
  return [
    { label: 'File', submenu: file },
    {
      label: 'Edit',
      submenu: [
        { role: 'undo' },
        { role: 'redo' },
        { type: 'separator' },
        { role: 'cut' },
        { role: 'copy' },
        { role: 'paste' },
        { role: 'selectAll' },
      ],
    },
    {
      label: 'View',
      submenu: [
        { role: 'reload' },
        { role: 'toggleDevTools' },
        { type: 'separator' },
        { role: 'resetZoom' },
        { role: 'zoomIn' },
        { role: 'zoomOut' },
        { type: 'separator' },
        { role: 'togglefullscreen' },
      ],
    },
    { label: 'Window', submenu: [{ role: 'minimize' }, { role: 'close' }] },
    { label: 'Help', submenu: [{ label: `About Pairwright ${electron.app.getVersion()}`, click: actions.about }] },
  ];
}

/** File → Back up the store…: the user picks a new file; the service writes it with SQLite's online backup API. */
export async function backUpFromMenu<W extends BrowserWindowLike>(
  electron: ElectronBoundary<W>,
  window: W,
  context: ServiceContext,
): Promise<void> {
  const stamp = new Date().toISOString().slice(0, 10);
  const choice = await electron.dialog.showSaveDialog(window, {
    title: 'Back up the store',
    defaultPath: join(context.store.dataDir, 'backups', `pairwright-backup-${stamp}.sqlite`),
    filters: [{ name: 'Pairwright store', extensions: ['sqlite'] }],
  });
  if (choice.canceled || !choice.filePath) return;
  const result = await dispatch(context, 'backups.create', { to: choice.filePath });
  await electron.dialog.showMessageBox({
    type: 'info',
    title: 'Back up the store',
    message: result.ok ? 'Backup written' : 'Backup not written',
    detail: result.ok
      ? `${(result.value as { path: string }).path}\nRestore it with: pairwright restore <file> (with Pairwright closed).`
      : result.error.message,
  });
}

export async function wireDesktopApp<W extends BrowserWindowLike>(
  electron: ElectronBoundary<W>,
  context: ServiceContext,
  paths: DesktopPaths,
): Promise<DesktopApp> {
  const { app, BrowserWindow, ipcMain, Menu, shell, dialog } = electron;
  await app.whenReady();
  const window = new BrowserWindow({
    width: 1400,
    height: 900,
    minWidth: 960,
    minHeight: 640,
    title: 'Pairwright',
    show: false,
    backgroundColor: '#f4f1ea',
    webPreferences: {
      preload: paths.preload,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      spellcheck: true,
    },
  });

  window.webContents.on('will-navigate', (event) => event.preventDefault());
  window.webContents.on('will-attach-webview', (event) => event.preventDefault());
  window.webContents.setWindowOpenHandler(({ url }) => {
    if (isVettedExternalLink(url)) {
      shell.openExternal(url).catch((error: unknown) => console.error('[pairwright] could not open link:', error));
    }
    return { action: 'deny' };
  });

  ipcMain.on(OPERATIONS_CHANNEL, (event) => {
    event.returnValue = isTrustedSender(event, window, paths.rendererIndex) ? [...OPERATION_NAMES] : [];
  });

  ipcMain.handle(CALL_CHANNEL, async (event, name, input) => {
    if (!isTrustedSender(event, window, paths.rendererIndex))
      return fail('forbidden', 'call from an untrusted frame refused');
    if (typeof name !== 'string' || !isOperationName(name))
      return fail('unknown_operation', `unknown operation "${String(name)}"`);
    return dispatch(context, name, input);
  });

  ipcMain.handle(PRINT_CHANNEL, async (event, suggestedName) => {
    if (!isTrustedSender(event, window, paths.rendererIndex))
      return fail('forbidden', 'call from an untrusted frame refused');
    const defaultName =
      typeof suggestedName === 'string' && /^[\w .-]{1,80}$/.test(suggestedName) ? suggestedName : 'pairwright.pdf';
    const choice = await dialog.showSaveDialog(window, {
      title: 'Save as PDF',
      defaultPath: join(app.getPath('userData'), defaultName),
      filters: [{ name: 'PDF', extensions: ['pdf'] }],
    });
    if (choice.canceled || !choice.filePath) return { ok: true, value: { saved: null } };
    const pdf = await window.webContents.printToPDF({ printBackground: true, pageSize: 'A4' });
    writeFileSync(choice.filePath, pdf);
    return { ok: true, value: { saved: choice.filePath } };
  });

  Menu.setApplicationMenu(
    Menu.buildFromTemplate(
      applicationMenu(electron, {
        openDataFolder: () => {
          shell
            .openPath(context.store.dataDir)
            .catch((error: unknown) => console.error('[pairwright] could not open data folder:', error));
        },
        backUp: () => {
          backUpFromMenu(electron, window, context).catch((error: unknown) =>
            console.error('[pairwright] backup failed:', error),
          );
        },
        about: () => {
          dialog
            .showMessageBox({
              type: 'info',
              title: 'About Pairwright',
              message: `Pairwright ${app.getVersion()}`,
              detail: `Data: ${context.store.path}\nRecipes and hazard notes assist you; they never replace the supplier's SDS, institutional safety rules or local regulations.`,
            })
            .catch((error: unknown) => console.error('[pairwright] about dialog failed:', error));
        },
      }),
    ),
  );

  app.on('window-all-closed', () => {
    shutdownServices(context.store)
      .catch((error: unknown) => console.error('[pairwright] error while closing:', error))
      .finally(() => app.quit());
  });
  window.once('ready-to-show', () => window.show());
  await window.loadFile(paths.rendererIndex);
  return { window };
}
