/**
 * The Electron main process wired against a stand-in for the 'electron' module (the binary cannot be
 * downloaded on every machine). Checks the window's security settings, IPC sender validation,
 * navigation and window.open refusal, and the app menu — with a real store behind the services.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
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
import { isVettedExternalLink, wireDesktopApp } from '../../electron/desktop/main';
import { OPERATION_NAMES } from '../../shared-model/api/contract';
import { tempDataDir } from '../support/host-fixture';

type Listener = (...args: never[]) => unknown;

function standInElectron() {
  const handlers = new Map<string, (event: IpcMainInvokeEventLike, ...args: unknown[]) => Promise<unknown>>();
  const syncHandlers = new Map<string, (event: IpcMainEventLike) => void>();
  const webContentsListeners = new Map<string, Listener>();
  const opened: string[] = [];
  let windowOptions: BrowserWindowOptions | null = null;
  let loadedFile: string | null = null;
  let windowOpenHandler: ((details: { url: string }) => { action: string }) | null = null;
  let menu: MenuItemTemplate[] = [];
  const appListeners = new Map<string, Listener>();
  let quitCalls = 0;
  let savePath: string | null = null;
  const messages: string[] = [];
  class FakeWindow implements BrowserWindowLike {
    webContents = {
      id: 7,
      mainFrame: { url: '' },
      on: (event: string, listener: Listener) => void webContentsListeners.set(event, listener),
      setWindowOpenHandler: (handler: (details: { url: string }) => { action: 'deny' | 'allow' }) =>
        void (windowOpenHandler = handler),
      printToPDF: async () => new Uint8Array([37, 80, 68, 70]),
    };
    constructor(options: BrowserWindowOptions) {
      windowOptions = options;
    }
    loadFile = async (path: string) => void (loadedFile = path);
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
    },
    BrowserWindow: FakeWindow,
    ipcMain: {
      handle: (channel, listener) => void handlers.set(channel, listener),
      on: (channel, listener) => void syncHandlers.set(channel, listener),
    },
    Menu: { buildFromTemplate: (template) => ((menu = template), template), setApplicationMenu: () => undefined },
    shell: { openExternal: async (url) => void opened.push(url), openPath: async () => '' },
    dialog: {
      showSaveDialog: async () => (savePath === null ? { canceled: true } : { canceled: false, filePath: savePath }),
      showMessageBox: async (options) => void messages.push(`${options.message}: ${options.detail}`),
    },
  };
  return {
    electron,
    handlers,
    syncHandlers,
    webContentsListeners,
    opened,
    get windowOptions() {
      return windowOptions;
    },
    get loadedFile() {
      return loadedFile;
    },
    get windowOpenHandler() {
      return windowOpenHandler;
    },
    get menu() {
      return menu;
    },
    appListeners,
    messages,
    get quitCalls() {
      return quitCalls;
    },
    /** Where the stand-in save dialog answers (null = the user cancels). */
    chooseSavePath(path: string | null) {
      savePath = path;
    },
  };
}

const RENDERER_INDEX = '/opt/Pairwright/dist/renderer/index.html';
let store: Store | null = null;
afterEach(() => {
  store?.close();
  store = null;
});

async function wired() {
  const fake = standInElectron();
  store = openStore({ dataDir: tempDataDir() });
  await wireDesktopApp(
    fake.electron,
    { store },
    { rendererIndex: RENDERER_INDEX, preload: '/opt/Pairwright/dist-electron/preload.cjs' },
  );
  return fake;
}

const trustedEvent = (): IpcMainInvokeEventLike => ({
  sender: { id: 7 },
  senderFrame: { url: pathToFileURL(RENDERER_INDEX).href },
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
    expect(fake.loadedFile).toBe(RENDERER_INDEX);
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
      { sender: { id: 7 }, senderFrame: { url: 'https://example.org/' } },
      'campaigns.list',
      {},
    );
    expect(foreignPage).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const otherWindow = await call?.({ ...trustedEvent(), sender: { id: 99 } }, 'campaigns.list', {});
    expect(otherWindow).toMatchObject({ ok: false, error: { code: 'forbidden' } });
    const noFrame = await call?.({ sender: { id: 7 }, senderFrame: null }, 'campaigns.list', {});
    expect(noFrame).toMatchObject({ ok: false, error: { code: 'forbidden' } });
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
      senderFrame: { url: 'https://example.org/' },
      returnValue: undefined as unknown,
    };
    ask?.(foreign);
    expect(foreign.returnValue).toEqual([]);
  });

  it('refuses navigation and new windows; vetted https links go to the OS browser', async () => {
    const fake = await wired();
    let prevented = false;
    const navigate = fake.webContentsListeners.get('will-navigate') as (
      event: { preventDefault(): void },
      url: string,
    ) => void;
    navigate({ preventDefault: () => (prevented = true) }, 'https://example.org/');
    expect(prevented).toBe(true);
    expect(fake.windowOpenHandler?.({ url: 'https://example.org/' })).toEqual({ action: 'deny' });
    expect(fake.windowOpenHandler?.({ url: 'https://echa.europa.eu/information-on-chemicals' })).toEqual({
      action: 'deny',
    });
    expect(fake.opened).toEqual(['https://echa.europa.eu/information-on-chemicals']);
    expect(isVettedExternalLink('http://echa.europa.eu/')).toBe(false);
    expect(isVettedExternalLink('https://echa.europa.eu.evil.example/')).toBe(false);
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
    const foreign = await print?.({ sender: { id: 7 }, senderFrame: { url: 'https://example.org/' } }, 'x.pdf');
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
