// The main process's IPC handlers: every payload is parsed as unknown against the contract's
// schema, only pages of the app itself may ask, and every answer is { ok, value } | { ok, error }.
import { BrowserWindow, app, dialog, shell } from 'electron';
import type { IpcMain, IpcMainInvokeEvent, OpenDialogOptions, SaveDialogOptions } from 'electron';
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { z } from 'zod';
import type { BridgeResult, HeedBridge } from '../src/host/bridge';
import { createBackupFolder } from '../scripts/lib/backup-folder.mjs';
import type { BackupFolder } from '../scripts/lib/backup-folder.mjs';
import { isAppUrl } from './app-protocol';
import { createCaseSetFiles } from './case-set-files';
import type { CaseSetFiles } from './case-set-files';
import { CHANNELS, CHANNEL_KEYS, REQUESTS, describeIssues } from './ipc-contract';
import type { ChannelKey } from './ipc-contract';

type Handler<T> = (event: IpcMainInvokeEvent, raw: unknown) => Promise<BridgeResult<T>>;
type ValueOf<K extends ChannelKey> = Awaited<ReturnType<HeedBridge[K]>> extends BridgeResult<infer T> ? T : never;
/** One handler per channel, answering what the bridge method of the same name promises. */
export type Handlers = { [K in ChannelKey]: Handler<ValueOf<K>> };

const messageOf = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/** Wraps one handler: origin check, schema parse, errors turned into { ok: false }. */
const guarded = <S extends z.ZodType, T>(
  key: ChannelKey,
  schema: S,
  run: (request: z.infer<S>, event: IpcMainInvokeEvent) => Promise<T>,
): Handler<T> => async (event, raw) => {
  const from = event.senderFrame?.url ?? '';
  if (!isAppUrl(from)) return { ok: false, error: `${CHANNELS[key]}: refused, the request did not come from Heed's own page` };
  const parsed = schema.safeParse(raw);
  if (!parsed.success) return { ok: false, error: `${CHANNELS[key]}: ${describeIssues(parsed.error)}` };
  try {
    return { ok: true, value: await run(parsed.data, event) };
  } catch (error) {
    return { ok: false, error: `${CHANNELS[key]}: ${messageOf(error)}` };
  }
};

const filtersFor = (name: string): SaveDialogOptions['filters'] => {
  const ext = path.extname(name).slice(1).toLowerCase();
  return ext === '' ? [] : [{ name: ext.toUpperCase(), extensions: [ext] }, { name: 'All files', extensions: ['*'] }];
};

/** Backups live in the app's data folder (userData/backups), the last ten of each study kept. */
const appBackups = (): BackupFolder => createBackupFolder({ root: path.join(app.getPath('userData'), 'backups') });

export const createHandlers = (caseSets: CaseSetFiles = createCaseSetFiles(), backupFolder: () => BackupFolder = appBackups): Handlers => {
  // Paths written in this session: the only ones openFolder will reveal.
  const saved = new Set<string>();

  const askWhere = async (event: IpcMainInvokeEvent, suggestedName: string): Promise<string | null> => {
    const options: SaveDialogOptions = {
      defaultPath: path.join(app.getPath('documents'), suggestedName),
      filters: filtersFor(suggestedName),
      properties: ['createDirectory', 'showOverwriteConfirmation'],
    };
    const owner = BrowserWindow.fromWebContents(event.sender);
    const answer = owner ? await dialog.showSaveDialog(owner, options) : await dialog.showSaveDialog(options);
    return answer.canceled || !answer.filePath ? null : answer.filePath;
  };

  const write = async (where: string, data: Uint8Array | string) => {
    await writeFile(where, data);
    saved.add(where);
    return { saved: true, where };
  };

  return {
    saveFile: guarded('saveFile', REQUESTS.saveFile, async (request, event) => {
      const where = await askWhere(event, request.suggestedName);
      return where === null ? { saved: false } : write(where, request.data);
    }),
    printToPdf: guarded('printToPdf', REQUESTS.printToPdf, async (request, event) => {
      const where = await askWhere(event, request.suggestedName);
      if (where === null) return { saved: false };
      const pdf = await event.sender.printToPDF({ printBackground: true, pageSize: 'A4', preferCSSPageSize: true });
      return write(where, pdf);
    }),
    pickCaseSet: guarded('pickCaseSet', REQUESTS.pickCaseSet, async (request, event) => {
      const owner = BrowserWindow.fromWebContents(event.sender);
      const options: OpenDialogOptions = request.kind === 'folder'
        ? { title: 'Pick a case-set folder (it holds cases.csv)', properties: ['openDirectory'] }
        : { title: 'Pick a case-set .zip', properties: ['openFile'], filters: [{ name: 'Zip', extensions: ['zip'] }] };
      const answer = owner ? await dialog.showOpenDialog(owner, options) : await dialog.showOpenDialog(options);
      const picked = answer.filePaths[0];
      if (answer.canceled || picked === undefined) return null;
      return request.kind === 'folder' ? caseSets.addFolder(picked) : caseSets.addZip(picked);
    }),
    readCaseFile: guarded('readCaseFile', REQUESTS.readCaseFile, (request) =>
      caseSets.read(request.token, request.path, request.offset)),
    openFolder: guarded('openFolder', REQUESTS.openFolder, async (request) => {
      if (!saved.has(request.where)) throw new Error('Heed only shows files it saved in this session');
      shell.showItemInFolder(request.where);
      return true;
    }),
    saveBackup: guarded('saveBackup', REQUESTS.saveBackup, (request) => backupFolder().save(request.studyId, request.fileName, request.bytes)),
    listBackups: guarded('listBackups', REQUESTS.listBackups, async () => {
      const folder = backupFolder();
      return { available: true as const, folder: folder.root, keep: folder.keep, backups: await folder.list() };
    }),
    readBackup: guarded('readBackup', REQUESTS.readBackup, (request) => backupFolder().read(request.id)),
  };
};

/** Registers one ipcMain.handle per channel. */
export const registerIpc = (ipcMain: IpcMain, handlers: Handlers = createHandlers()): void => {
  for (const key of CHANNEL_KEYS) ipcMain.handle(CHANNELS[key], handlers[key]);
};
