/**
 * Electron main process: one window, the app menu, and the IPC glue to the same services the browser
 * host uses. Thin on purpose: `wireDesktopApp` takes the Electron API as a parameter (see
 * electron-boundary.ts) so tests can drive it without the Electron binary.
 */
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { isOperationName, OPERATION_NAMES } from '../../shared-model/api/contract';
import { fail } from '../../shared-model/api/result';
import type { ServiceContext } from '../services/context';
import { dispatch } from '../services/dispatch';
import { shutdownServices } from '../services/lifecycle';
import { APP_INDEX_URL, APP_SCHEME, APP_SCHEME_PRIVILEGES, appProtocolHandler, isAppUrl } from './app-protocol';
import {
  CALL_CHANNEL,
  OPERATIONS_CHANNEL,
  PRINT_CHANNEL,
  type BrowserWindowLike,
  type ElectronBoundary,
  type GuardedContentsLike,
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

/** The sender must be our window's main frame (not a subframe) showing our own app:// page. */
export function isTrustedSender(event: IpcMainInvokeEventLike, window: BrowserWindowLike): boolean {
  if (!event.senderFrame) return false;
  if (event.senderFrame.parent !== null) return false;
  if (event.sender.id !== window.webContents.id) return false;
  return isAppUrl(event.senderFrame.url);
}

/**
 * Permissions the page may have: none. The app uses no camera, microphone, geolocation, notifications,
 * clipboard reads, MIDI, HID, serial or USB; printing and file dialogs go through the main process.
 */
export function denyAllPermissions(electron: ElectronBoundary): void {
  electron.session.defaultSession.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  electron.session.defaultSession.setPermissionCheckHandler(() => false);
}

const hardened = new WeakSet<GuardedContentsLike>();

/**
 * The same rules for every webContents the app ever creates (applied from app 'web-contents-created'):
 * no navigation, redirect or frame navigation away from app://, no <webview>, no new windows (vetted https
 * links go to the OS browser), and no DevTools in an installed build.
 */
export function hardenWebContents(electron: ElectronBoundary, contents: GuardedContentsLike): void {
  if (hardened.has(contents)) return;
  hardened.add(contents);
  contents.on('will-navigate', (event) => event.preventDefault());
  contents.on('will-redirect', (event) => {
    if (!isAppUrl(event.url)) event.preventDefault();
  });
  contents.on('will-frame-navigate', (event) => {
    if (!isAppUrl(event.url)) event.preventDefault();
  });
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(({ url }) => {
    if (isVettedExternalLink(url)) {
      electron.shell
        .openExternal(url)
        .catch((error: unknown) => console.error('[pairwright] could not open link:', error));
    }
    return { action: 'deny' };
  });
  if (electron.app.isPackaged) contents.on('devtools-opened', () => contents.closeDevTools());
}

/** Before the app is ready: app:// is a standard, secure scheme (so CSP 'self' and fetch work on it). */
export function registerAppScheme(electron: ElectronBoundary): void {
  electron.protocol.registerSchemesAsPrivileged([{ scheme: APP_SCHEME, privileges: { ...APP_SCHEME_PRIVILEGES } }]);
}

/**
 * Opens the store, or tells the user in a dialog why it cannot be opened (newer version, damaged,
 * read-only, …) — the message names the backups folder and the restore command — and quits.
 */
export function openStoreOrExplain<T>(electron: ElectronBoundary, open: () => T): T | null {
  try {
    return open();
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    electron.dialog.showErrorBox('Pairwright cannot open its store', `${message}\n\nNothing in the store was changed.`);
    electron.app.quit();
    return null;
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
        ...(electron.app.isPackaged ? [] : [{ role: 'toggleDevTools' } as const]),
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
  const { app, BrowserWindow, ipcMain, Menu, shell, dialog, protocol } = electron;
  await app.whenReady();
  denyAllPermissions(electron);
  app.on('web-contents-created', (_event, contents) => hardenWebContents(electron, contents));
  protocol.handle(APP_SCHEME, appProtocolHandler(dirname(paths.rendererIndex)));
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
      devTools: !app.isPackaged,
    },
  });
  hardenWebContents(electron, window.webContents);

  ipcMain.on(OPERATIONS_CHANNEL, (event) => {
    event.returnValue = isTrustedSender(event, window) ? [...OPERATION_NAMES] : [];
  });

  ipcMain.handle(CALL_CHANNEL, async (event, name, input) => {
    if (!isTrustedSender(event, window)) return fail('forbidden', 'call from an untrusted frame refused');
    if (typeof name !== 'string' || !isOperationName(name))
      return fail('unknown_operation', `unknown operation "${String(name)}"`);
    return dispatch(context, name, input);
  });

  ipcMain.handle(PRINT_CHANNEL, async (event, suggestedName) => {
    if (!isTrustedSender(event, window)) return fail('forbidden', 'call from an untrusted frame refused');
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
  await window.loadURL(APP_INDEX_URL);
  return { window };
}
