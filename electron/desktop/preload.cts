/**
 * Preload (sandboxed, context-isolated): exposes one function per allowlisted operation as
 * `window.pairwright["<operation>"](input)`, plus `window.pairwrightDesktop.printToPdf(name)`. Never raw
 * ipcRenderer. The allowlist comes from the main process (the contract's operation names), so this file
 * stays free of any module a sandboxed preload cannot load.
 */
import { CALL_CHANNEL, OPERATIONS_CHANNEL, PRINT_CHANNEL, type PreloadElectron } from './electron-boundary';

// eslint-disable-next-line @typescript-eslint/no-require-imports -- a sandboxed preload is CommonJS
const { contextBridge, ipcRenderer } = require('electron') as PreloadElectron;

const names = ipcRenderer.sendSync(OPERATIONS_CHANNEL);
const api: Record<string, (input: unknown) => Promise<unknown>> = {};
if (Array.isArray(names)) {
  for (const name of names) {
    if (typeof name === 'string') api[name] = (input: unknown) => ipcRenderer.invoke(CALL_CHANNEL, name, input);
  }
}
contextBridge.exposeInMainWorld('pairwright', Object.freeze(api));
contextBridge.exposeInMainWorld(
  'pairwrightDesktop',
  Object.freeze({ printToPdf: (name: string) => ipcRenderer.invoke(PRINT_CHANNEL, name) }),
);
