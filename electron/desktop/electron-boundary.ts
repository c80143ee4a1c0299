/**
 * The part of Electron's API that the main process uses, as our own types. main.ts is written against
 * this boundary so its wiring can be unit-tested with a stand-in (the Electron binary cannot be
 * downloaded on every machine); at run time the real 'electron' module is passed in.
 */
/** The frame that sent an IPC message: `parent` is null for a window's main frame. */
export interface SenderFrameLike {
  url: string;
  parent: unknown;
}

export interface IpcMainEventLike {
  senderFrame: SenderFrameLike | null;
  sender: { id: number };
  returnValue: unknown;
}

export interface IpcMainInvokeEventLike {
  senderFrame: SenderFrameLike | null;
  sender: { id: number };
}

/** A navigation Electron asks about (will-navigate, will-redirect, will-frame-navigate): `url` is where it goes. */
export interface NavigationEventLike {
  url: string;
  preventDefault(): void;
}

/** What every webContents (the window's and any other) offers for hardening (see hardenWebContents). */
export interface GuardedContentsLike {
  on(
    event: 'will-navigate' | 'will-redirect' | 'will-frame-navigate',
    listener: (event: NavigationEventLike) => void,
  ): void;
  on(event: 'will-attach-webview', listener: (event: { preventDefault(): void }) => void): void;
  on(event: 'devtools-opened', listener: () => void): void;
  setWindowOpenHandler(handler: (details: { url: string }) => { action: 'deny' | 'allow' }): void;
  closeDevTools(): void;
}

export interface WebContentsLike extends GuardedContentsLike {
  id: number;
  mainFrame: { url: string };
  printToPDF(options: { printBackground?: boolean; pageSize?: PaperSize }): Promise<Uint8Array>;
}

/** Paper names Electron's printToPDF accepts. */
export type PaperSize = 'A0' | 'A1' | 'A2' | 'A3' | 'A4' | 'A5' | 'A6' | 'Legal' | 'Letter' | 'Tabloid' | 'Ledger';

export interface BrowserWindowLike {
  webContents: WebContentsLike;
  loadURL(url: string): Promise<void>;
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
    devTools: boolean;
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
    on(event: 'window-all-closed' | 'activate', listener: () => void): void;
    on(event: 'web-contents-created', listener: (event: unknown, contents: GuardedContentsLike) => void): void;
    quit(): void;
    /** True in an installed build (electron-builder); DevTools are off there. */
    isPackaged: boolean;
    setName?(name: string): void;
  };
  BrowserWindow: new (options: BrowserWindowOptions) => W;
  protocol: {
    registerSchemesAsPrivileged(
      schemes: { scheme: string; privileges: { standard: boolean; secure: boolean; supportFetchAPI: boolean } }[],
    ): void;
    handle(scheme: string, handler: (request: Request) => Promise<Response>): void;
  };
  session: {
    defaultSession: {
      setPermissionRequestHandler(
        handler: ((contents: unknown, permission: string, callback: (granted: boolean) => void) => void) | null,
      ): void;
      setPermissionCheckHandler(handler: ((contents: unknown, permission: string) => boolean) | null): void;
    };
  };
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
    showErrorBox(title: string, content: string): void;
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
