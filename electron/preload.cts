/**
 * Preload (sandboxed, context-isolated): exposes one function per allowlisted operation as
 * `window.pairwright["<operation>"](input)`, plus `window.pairwrightDesktop.printToPdf(name)`. Never raw ipcRenderer.
 */
import { OPERATION_NAMES } from '../shared-model/api/contract';
import { CALL_CHANNEL, PRINT_CHANNEL } from './electron-boundary';

interface PreloadElectron {
  contextBridge: { exposeInMainWorld(key: string, api: unknown): void };
  ipcRenderer: { invoke(channel: string, ...args: unknown[]): Promise<unknown> };
}

// eslint-disable-next-line @typescript-eslint/no-require-imports -- a sandboxed preload is CommonJS
const { contextBridge, ipcRenderer } = require('electron') as PreloadElectron;

const api: Record<string, (input: unknown) => Promise<unknown>> = {};
for (const name of OPERATION_NAMES) {
  api[name] = (input: unknown) => ipcRenderer.invoke(CALL_CHANNEL, name, input);
}
contextBridge.exposeInMainWorld('pairwright', Object.freeze(api));
contextBridge.exposeInMainWorld('pairwrightDesktop', Object.freeze({ printToPdf: (name: string) => ipcRenderer.invoke(PRINT_CHANNEL, name) }));
