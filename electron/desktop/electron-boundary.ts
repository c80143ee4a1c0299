/**
 * The part of Electron's API that the main process uses, as our own types. main.ts is written against
 * this boundary so its wiring can be unit-tested with a stand-in (the Electron binary cannot be
 * downloaded on every machine); at run time the real 'electron' module is passed in.
 */
export interface IpcMainEventLike {
  senderFrame: { url: string } | null;
  sender: { id: number };
  returnValue: unknown;
}

export interface IpcMainInvokeEventLike {
  senderFrame: { url: string } | null;
  sender: { id: number };
}

export interface WebContentsLike {
  id: number;
  mainFrame: { url: string };
  on(event: 'will-navigate', listener: (event: { preventDefault(): void }, url: string) => void): void;
  on(event: 'will-attach-webview', listener: (event: { preventDefault(): void }) => void): void;
  setWindowOpenHandler(handler: (details: { url: string }) => { action: 'deny' | 'allow' }): void;
  printToPDF(options: { printBackground?: boolean; pageSize?: PaperSize }): Promise<Uint8Array>;
}

/** Paper names Electron's printToPDF accepts. */
export type PaperSize = 'A0' | 'A1' | 'A2' | 'A3' | 'A4' | 'A5' | 'A6' | 'Legal' | 'Letter' | 'Tabloid' | 'Ledger';

export interface BrowserWindowLike {
  webContents: WebContentsLike;
  loadFile(path: string): Promise<void>;
  once(event: 'ready-to-show', listener: () => void): void;
  show(): void;
}

export interface BrowserWindowOptions {
  width: number;
  height: number;
  minWidth: number;
  minHeight: number;
  title: string;
  show: boolean;
  backgroundColor: string;
  webPreferences: {
    preload: string;
    contextIsolation: boolean;
    sandbox: boolean;
    nodeIntegration: boolean;
    nodeIntegrationInWorker: boolean;
    webSecurity: boolean;
    allowRunningInsecureContent: boolean;
    webviewTag: boolean;
    spellcheck: boolean;
  };
}

/** The standard menu roles main.ts uses (a subset of Electron's MenuItemConstructorOptions role). */
export type MenuRole =
  | 'quit'
  | 'undo'
  | 'redo'
  | 'cut'
  | 'copy'
  | 'paste'
  | 'selectAll'
  | 'reload'
  | 'toggleDevTools'
  | 'resetZoom'
  | 'zoomIn'
  | 'zoomOut'
  | 'togglefullscreen'
  | 'minimize'
  | 'close';

export interface MenuItemTemplate {
  label?: string;
  role?: MenuRole;
  type?: 'separator' | 'normal';
  accelerator?: string;
  submenu?: MenuItemTemplate[];
  click?: () => void;
}

/**
 * `W` is the window class: our `BrowserWindowLike` for stand-ins, Electron's own `BrowserWindow` when the
 * real module is checked against this boundary (test/types/electron-boundary.check.ts).
 */
export interface ElectronBoundary<W extends BrowserWindowLike = BrowserWindowLike> {
  app: {
    whenReady(): Promise<void>;
    getPath(name: 'userData'): string;
    getVersion(): string;
    on(event: 'window-all-closed' | 'activate' | 'web-contents-created', listener: (...args: never[]) => void): void;
    quit(): void;
    setName?(name: string): void;
  };
  BrowserWindow: new (options: BrowserWindowOptions) => W;
  ipcMain: {
    handle(channel: string, listener: (event: IpcMainInvokeEventLike, ...args: unknown[]) => Promise<unknown>): void;
    on(channel: string, listener: (event: IpcMainEventLike) => void): void;
  };
  Menu: {
    buildFromTemplate(template: MenuItemTemplate[]): unknown;
    setApplicationMenu(menu: unknown): void;
  };
  shell: {
    openExternal(url: string): Promise<void>;
    openPath(path: string): Promise<string>;
  };
  dialog: {
    showSaveDialog(
      window: W,
      options: { title: string; defaultPath: string; filters: { name: string; extensions: string[] }[] },
    ): Promise<{ canceled: boolean; filePath?: string }>;
    showMessageBox(options: { type: 'info'; title: string; message: string; detail: string }): Promise<unknown>;
  };
}

/** The part of Electron's renderer-side API the preload uses. */
export interface PreloadElectron {
  contextBridge: { exposeInMainWorld(key: string, api: unknown): void };
  ipcRenderer: { invoke(channel: string, ...args: unknown[]): Promise<unknown>; sendSync(channel: string): unknown };
}

/** IPC channel names shared by main and preload. */
export const CALL_CHANNEL = 'pairwright:call';
export const PRINT_CHANNEL = 'pairwright:print-to-pdf';
/** Synchronous request from the preload for the allowlist of operation names. */
export const OPERATIONS_CHANNEL = 'pairwright:operations';
