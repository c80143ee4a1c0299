/**
 * The Electron main process wired against a stand-in for the 'electron' module (the binary cannot be
 * downloaded on every machine). Checks the window's security settings, IPC sender validation,
 * navigation and window.open refusal, and the app menu — with a real store behind the services.
 */
import Database from 'better-sqlite3';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { openStore, STORE_FILE_NAME, type Store } from '../../db/store';
import {
  CALL_CHANNEL,
  OPERATIONS_CHANNEL,
  PRINT_CHANNEL,
  type BrowserWindowLike,
  type IpcMainEventLike,
  type BrowserWindowOptions,
  type ElectronBoundary,
  type IpcMainInvokeEventLike,
  type MenuItemTemplate,
} from '../../electron/desktop/electron-boundary';
import {
  isVettedExternalLink,
  openStoreOrExplain,
  registerAppScheme,
  wireDesktopApp,
} from '../../electron/desktop/main';
import { OPERATION_NAMES } from '../../shared-model/api/contract';
import { tempDataDir } from '../support/host-fixture';

type Listener = (...args: never[]) => unknown;

/** A webContents stand-in that keeps every listener, so a test can fire the events Electron would. */
class FakeContents {
  listeners = new Map<string, Listener[]>();
  windowOpenHandler: ((details: { url: string }) => { action: 'deny' | 'allow' }) | null = null;
  devToolsClosed = 0;
  constructor(readonly id: number) {}
  mainFrame = { url: '' };
  on = (event: string, listener: Listener) =>
    void this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
  setWindowOpenHandler = (handler: (details: { url: string }) => { action: 'deny' | 'allow' }) =>
    void (this.windowOpenHandler = handler);
  closeDevTools = () => void (this.devToolsClosed += 1);
  printToPDF = async () => new Uint8Array([37, 80, 68, 70]);
  /** Fires a navigation-like event; true when a listener prevented it. */
  navigate(event: string, url: string): boolean {
    let prevented = false;
    for (const listener of this.listeners.get(event) ?? [])
      (listener as (event: { url: string; preventDefault(): void }) => void)({
        url,
        preventDefault: () => (prevented = true),
      });
    return prevented;
  }
  fire(event: string): void {
    for (const listener of this.listeners.get(event) ?? []) (listener as () => void)();
  }
}

function standInElectron(options: { isPackaged?: boolean } = {}) {
  const handlers = new Map<string, (event: IpcMainInvokeEventLike, ...args: unknown[]) => Promise<unknown>>();
  const syncHandlers = new Map<string, (event: IpcMainEventLike) => void>();
  const opened: string[] = [];
  let windowOptions: BrowserWindowOptions | null = null;
  let loadedUrl: string | null = null;
  let menu: MenuItemTemplate[] = [];
  const appListeners = new Map<string, Listener>();
  let quitCalls = 0;
  let savePath: string | null = null;
  const messages: string[] = [];
  const errorBoxes: { title: string; content: string }[] = [];
  const privilegedSchemes: { scheme: string; privileges: Record<string, boolean> }[] = [];
  const protocolHandlers = new Map<string, (request: Request) => Promise<Response>>();
  let permissionRequest:
    ((contents: unknown, permission: string, callback: (granted: boolean) => void) => void) | null = null;
  let permissionCheck: ((contents: unknown, permission: string) => boolean) | null = null;
  const windowContents = new FakeContents(7);
  class FakeWindow implements BrowserWindowLike {
    webContents = windowContents;
    constructor(options: BrowserWindowOptions) {
      windowOptions = options;
    }
    loadURL = async (url: string) => void (loadedUrl = url);
    once = () => undefined;
    show = () => undefined;
  }
  const electron: ElectronBoundary = {
    app: {
      whenReady: async () => undefined,
      getPath: () => '/tmp/pairwright-user-data',
      getVersion: () => '0.1.0',
      on: (event: string, listener: Listener) => void appListeners.set(event, listener),
      quit: () => void (quitCalls += 1),
      isPackaged: options.isPackaged ?? false,
    },
    BrowserWindow: FakeWindow,
    protocol: {
      registerSchemesAsPrivileged: (schemes) => void privilegedSchemes.push(...schemes),
      handle: (scheme, handler) => void protocolHandlers.set(scheme, handler),
    },
    session: {
      defaultSession: {
        setPermissionRequestHandler: (handler) => void (permissionRequest = handler),
        setPermissionCheckHandler: (handler) => void (permissionCheck = handler),
      },
    },
    ipcMain: {
      handle: (channel, listener) => void handlers.set(channel, listener),
      on: (channel, listener) => void syncHandlers.set(channel, listener),
    },
    Menu: { buildFromTemplate: (template) => ((menu = template), template), setApplicationMenu: () => undefined },
    shell: { openExternal: async (url) => void opened.push(url), openPath: async () => '' },
    dialog: {
      showSaveDialog: async () => (savePath === null ? { canceled: true } : { canceled: false, filePath: savePath }),
      showMessageBox: async (options) => void messages.push(`${options.message}: ${options.detail}`),
      showErrorBox: (title, content) => void errorBoxes.push({ title, content }),
    },
  };
  return {
    electron,
    handlers,
    syncHandlers,
    windowContents,
    opened,
    get windowOptions() {
      return windowOptions;
    },
    get loadedUrl() {
      return loadedUrl;
    },
    get menu() {
      return menu;
    },
    appListeners,
    messages,
    errorBoxes,
    privilegedSchemes,
    protocolHandlers,
    get permissionRequest() {
      return permissionRequest;
    },
    get permissionCheck() {
      return permissionCheck;
    },
    get quitCalls() {
      return quitCalls;
    },
    /** Where the stand-in save dialog answers (null = the user cancels). */
    chooseSavePath(path: string | null) {
      savePath = path;
    },
  };
}

let store: Store | null = null;
afterEach(() => {
  store?.close();
  store = null;
});

/** An installed app's layout: the built renderer, and a file beside it that app:// must never serve. */
function installedRenderer(): string {
  const root = tempDataDir('pairwright-install-');
  mkdirSync(join(root, 'dist', 'renderer', 'assets'), { recursive: true });
  writeFileSync(join(root, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Pairwright</title>');
  writeFileSync(join(root, 'dist', 'renderer', 'assets', 'app.js'), 'console.log(1)');
  writeFileSync(join(root, 'dist', 'secret.txt'), 'not for the page');
  return join(root, 'dist', 'renderer', 'index.html');
}

async function wired(options: { isPackaged?: boolean } = {}) {
  const fake = standInElectron(options);
  store = openStore({ dataDir: tempDataDir() });
  await wireDesktopApp(
    fake.electron,
    { store },
    { rendererIndex: installedRenderer(), preload: '/opt/Pairwright/dist-electron/preload.cjs' },
  );
  return fake;
}

const trustedEvent = (): IpcMainInvokeEventLike => ({
  sender: { id: 7 },
  senderFrame: { url: 'app://pairwright/index.html', parent: null },
});

describe('Electron main process wiring', () => {
  it('opens one window with isolation, sandbox and no Node in the page', async () => {
    const fake = await wired();
    const prefs = fake.windowOptions?.webPreferences;
    expect(prefs).toMatchObject({
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      webSecurity: true,
      webviewTag: false,
    });
    expect(fake.loadedUrl).toBe('app://pairwright/index.html');
    expect(prefs?.devTools).toBe(true);
  });

  it('answers API calls from our own frame through the shared services', async () => {
    const fake = await wired();
    const call = fake.handlers.get(CALL_CHANNEL);
    expect(call).toBeDefined();
    const created = await call?.(trustedEvent(), 'campaigns.create', { name: 'From the window' });
    expect(created).toMatchObject({ ok: true, value: { name: 'From the window' } });
    const bad = await call?.(trustedEvent(), 'campaigns.create', { name: '' });
    expect(bad).toMatchObject({ ok: false, error: { field: 'name' } });
  });

  it('refuses calls from other frames, other pages and unknown operations', async () => {
    const fake = await wired();
    const call = fake.handlers.get(CALL_CHANNEL);
    const foreignPage = await call?.(
      { sender: { id: 7 }, senderFrame: { url: 'https://example.org/', parent: null } },
      'campaigns.list',
      {},
    );
    expect(foreignPage).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const otherWindow = await call?.({ ...trustedEvent(), sender: { id: 99 } }, 'campaigns.list', {});
    expect(otherWindow).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const noFrame = await call?.({ sender: { id: 7 }, senderFrame: null }, 'campaigns.list', {});
    expect(noFrame).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const subframe = await call?.(
      { sender: { id: 7 }, senderFrame: { url: 'app://pairwright/index.html', parent: {} } },
      'campaigns.list',
      {},
    );
    expect(subframe).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const fileUrl = await call?.(
      { sender: { id: 7 }, senderFrame: { url: 'file:///opt/Pairwright/dist/renderer/index.html', parent: null } },
      'campaigns.list',
      {},
    );
    expect(fileUrl).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const unknown = await call?.(trustedEvent(), 'shell.exec', {});
    expect(unknown).toMatchObject({ ok: false, error: { code: 'unknown_operation' } });
  });

  it('gives the preload the allowlist only when our own frame asks', async () => {
    const fake = await wired();
    const ask = fake.syncHandlers.get(OPERATIONS_CHANNEL);
    const trusted = { ...trustedEvent(), returnValue: undefined as unknown };
    ask?.(trusted);
    expect(trusted.returnValue).toEqual(OPERATION_NAMES);
    const foreign = {
      sender: { id: 7 },
      senderFrame: { url: 'https://example.org/', parent: null },
      returnValue: undefined as unknown,
    };
    ask?.(foreign);
    expect(foreign.returnValue).toEqual([]);
  });

  it('refuses navigation and new windows; vetted https links go to the OS browser', async () => {
    const fake = await wired();
    const contents = fake.windowContents;
    expect(contents.navigate('will-navigate', 'https://example.org/')).toBe(true);
    expect(contents.navigate('will-redirect', 'https://example.org/')).toBe(true);
    expect(contents.navigate('will-redirect', 'app://pairwright/index.html')).toBe(false);
    expect(contents.navigate('will-frame-navigate', 'file:///etc/passwd')).toBe(true);
    expect(contents.navigate('will-frame-navigate', 'app://pairwright/index.html')).toBe(false);
    expect(contents.navigate('will-attach-webview', 'about:blank')).toBe(true);
    expect(contents.windowOpenHandler?.({ url: 'https://example.org/' })).toEqual({ action: 'deny' });
    expect(contents.windowOpenHandler?.({ url: 'https://echa.europa.eu/information-on-chemicals' })).toEqual({
      action: 'deny',
    });
    expect(fake.opened).toEqual(['https://echa.europa.eu/information-on-chemicals']);
    expect(isVettedExternalLink('http://echa.europa.eu/')).toBe(false);
    expect(isVettedExternalLink('https://echa.europa.eu.evil.example/')).toBe(false);
  });

  it('applies the same rules to every webContents the app creates, once each', async () => {
    const fake = await wired();
    const created = fake.appListeners.get('web-contents-created') as (event: unknown, contents: FakeContents) => void;
    const other = new FakeContents(8);
    created({}, other);
    created({}, other);
    expect(other.listeners.get('will-navigate')).toHaveLength(1);
    expect(other.navigate('will-navigate', 'https://example.org/')).toBe(true);
    expect(other.navigate('will-frame-navigate', 'https://example.org/')).toBe(true);
    expect(other.windowOpenHandler?.({ url: 'https://example.org/' })).toEqual({ action: 'deny' });
  });

  it('denies every permission request and check (the app uses none)', async () => {
    const fake = await wired();
    for (const permission of ['media', 'geolocation', 'notifications', 'clipboard-read', 'hid', 'serial', 'usb']) {
      let granted: boolean | null = null;
      fake.permissionRequest?.({}, permission, (answer) => (granted = answer));
      expect(granted, permission).toBe(false);
      expect(fake.permissionCheck?.({}, permission), permission).toBe(false);
    }
  });

  it('serves the page from app:// inside the renderer folder only', async () => {
    const fake = await wired();
    const serve = fake.protocolHandlers.get('app');
    expect(serve).toBeTypeOf('function');
    const index = await serve?.(new Request('app://pairwright/index.html'));
    expect(index?.status).toBe(200);
    expect(index?.headers.get('content-type')).toMatch(/^text\/html/);
    expect(await index?.text()).toContain('<title>Pairwright</title>');
    const script = await serve?.(new Request('app://pairwright/assets/app.js'));
    expect(script?.headers.get('content-type')).toMatch(/^text\/javascript/);
    for (const escape of [
      'app://pairwright/../secret.txt',
      'app://pairwright/%2e%2e/secret.txt',
      'app://pairwright/assets/%2e%2e%2f%2e%2e%2fsecret.txt',
      'app://pairwright/..%5csecret.txt',
      'app://pairwright/index.html%00.js',
      'app://elsewhere/index.html',
      'app://pairwright/missing.js',
    ]) {
      const response = await serve?.(new Request(escape));
      expect(response?.status, escape).toBe(404);
      expect(await response?.text(), escape).not.toContain('not for the page');
    }
  });

  it('an installed build has no DevTools: not in the window, not in the menu, closed if opened', async () => {
    const fake = await wired({ isPackaged: true });
    expect(fake.windowOptions?.webPreferences.devTools).toBe(false);
    const roles = fake.menu.flatMap((item) => item.submenu ?? []).map((item) => item.role);
    expect(roles).not.toContain('toggleDevTools');
    fake.windowContents.fire('devtools-opened');
    expect(fake.windowContents.devToolsClosed).toBe(1);
    const development = await wired();
    expect(development.menu.flatMap((item) => item.submenu ?? []).map((item) => item.role)).toContain('toggleDevTools');
  });

  it('registers app:// as a standard, secure scheme before the app is ready', () => {
    const fake = standInElectron();
    registerAppScheme(fake.electron);
    expect(fake.privilegedSchemes).toEqual([
      { scheme: 'app', privileges: { standard: true, secure: true, supportFetchAPI: true } },
    ]);
  });

  it('a store that cannot be opened gets a dialog naming the problem and the restore command, then quits', () => {
    const fake = standInElectron();
    const dataDir = tempDataDir();
    openStore({ dataDir }).close();
    const raw = new Database(join(dataDir, STORE_FILE_NAME));
    raw.pragma('user_version = 999');
    raw.close();
    const opened = openStoreOrExplain(fake.electron, () => openStore({ dataDir }));
    expect(opened).toBeNull();
    expect(fake.quitCalls).toBe(1);
    expect(fake.errorBoxes).toHaveLength(1);
    expect(fake.errorBoxes[0]?.title).toBe('Pairwright cannot open its store');
    expect(fake.errorBoxes[0]?.content).toMatch(/schema version 999, newer than this Pairwright/);
    expect(fake.errorBoxes[0]?.content).toContain('pairwright restore');
    const sound = standInElectron();
    const healthy = openStoreOrExplain(sound.electron, () => openStore({ dataDir: tempDataDir() }));
    expect(healthy).not.toBeNull();
    healthy?.close();
    expect(sound.errorBoxes).toEqual([]);
  });

  it('closing the last window stops background jobs, closes the store and quits', async () => {
    const fake = await wired();
    const openStoreHandle = store;
    const closeAll = fake.appListeners.get('window-all-closed') as () => void;
    closeAll();
    await expect.poll(() => fake.quitCalls).toBe(1);
    expect(openStoreHandle?.db.open).toBe(false);
    store = null;
  });

  it('saves the page as PDF where the user chose, and does nothing when the dialog is cancelled', async () => {
    const fake = await wired();
    const print = fake.handlers.get(PRINT_CHANNEL);
    expect(await print?.(trustedEvent(), 'reagents.pdf')).toEqual({ ok: true, value: { saved: null } });
    const target = join(tempDataDir('pairwright-pdf-'), 'reagents.pdf');
    fake.chooseSavePath(target);
    expect(await print?.(trustedEvent(), 'reagents.pdf')).toEqual({ ok: true, value: { saved: target } });
    expect(readFileSync(target).subarray(0, 4).toString('latin1')).toBe('%PDF');
    const foreign = await print?.(
      { sender: { id: 7 }, senderFrame: { url: 'https://example.org/', parent: null } },
      'x.pdf',
    );
    expect(foreign).toMatchObject({ ok: false, error: { code: 'forbidden' } });
  });

  it('builds the usual application menu', async () => {
    const fake = await wired();
    expect(fake.menu.map((item) => item.label)).toEqual(['File', 'Edit', 'View', 'Window', 'Help']);
    const roles = fake.menu
      .flatMap((item) => item.submenu ?? [])
      .map((item) => item.role)
      .filter(Boolean);
    expect(roles).toEqual(
      expect.arrayContaining(['quit', 'undo', 'redo', 'cut', 'copy', 'paste', 'selectAll', 'reload', 'minimize']),
    );
  });

  it('backs the store up from File → Back up the store… to the file the user chose', async () => {
    const fake = await wired();
    const item = fake.menu[0]?.submenu?.find((entry) => entry.label === 'Back up the store…');
    expect(item?.click).toBeTypeOf('function');
    const target = join(tempDataDir(), 'menu-backup.sqlite');
    fake.chooseSavePath(target);
    item?.click?.();
    await expect.poll(() => fake.messages.length).toBe(1);
    expect(fake.messages[0]).toMatch(/^Backup written: .*menu-backup\.sqlite/);
    expect(readFileSync(target).subarray(0, 15).toString('latin1')).toBe('SQLite format 3');
    fake.chooseSavePath(null);
    item?.click?.();
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(fake.messages.length).toBe(1);
  });
});
