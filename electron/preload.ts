// The sandboxed preload: exposes window.heedHost with one narrow method per IPC channel. The page
// never gets ipcRenderer itself, nor any way to name a channel. Bundled to CommonJS
// (dist-electron/preload.cjs) because sandboxed preloads cannot load ES modules.
import { contextBridge, ipcRenderer } from 'electron';
import type { HeedBridge } from '../src/host/bridge';
import { CHANNELS } from './channels';

/** ipcRenderer.invoke's shape; the main process answers with the contract's BridgeResult. */
type Invoke = <T>(channel: string, payload: unknown) => Promise<T>;

export const makeBridge = (invoke: Invoke): HeedBridge => ({
  saveFile: (request) => invoke(CHANNELS.saveFile, request),
  printToPdf: (request) => invoke(CHANNELS.printToPdf, request),
  pickCaseSet: (request) => invoke(CHANNELS.pickCaseSet, request),
  readCaseFile: (request) => invoke(CHANNELS.readCaseFile, request),
  openFolder: (request) => invoke(CHANNELS.openFolder, request),
  saveBackup: (request) => invoke(CHANNELS.saveBackup, request),
  listBackups: (request) => invoke(CHANNELS.listBackups, request),
  readBackup: (request) => invoke(CHANNELS.readBackup, request),
});

contextBridge.exposeInMainWorld('heedHost', makeBridge((channel, payload) => ipcRenderer.invoke(channel, payload)));
