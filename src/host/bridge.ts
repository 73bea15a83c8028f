// The shape of `window.heedHost`, the narrow bridge the Electron preload exposes: one method per
// IPC channel, each answering { ok, value } or { ok, error }. Plain types only, so the renderer
// never depends on Electron; electron/ipc-contract.ts holds the matching runtime schemas.
import type { BackupEntry, BackupListing, CaseSetKind, SaveResult } from './types';

export type BridgeResult<T> = { ok: true; value: T } | { ok: false; error: string };

export type SaveFileRequest = { suggestedName: string; data: Uint8Array | string; mime: string };
export type PrintToPdfRequest = { suggestedName: string };
export type PickCaseSetRequest = { kind: CaseSetKind };
/** A picked set as listed by the main process; files are read later through `token`. */
export type CaseSetListing = { token: string; label: string; files: { path: string; size: number }[] };
/** Reads up to one chunk of a listed file from `offset`; `size` is the whole file's size. */
export type ReadCaseFileRequest = { token: string; path: string; offset: number };
export type FileChunk = { bytes: Uint8Array; size: number };
export type OpenFolderRequest = { where: string };
export type SaveBackupRequest = { studyId: string; fileName: string; bytes: Uint8Array };
/** Listing backups takes no arguments; the payload is always null. */
export type ListBackupsRequest = null;
export type ReadBackupRequest = { id: string };

export type HeedBridge = {
  saveFile(request: SaveFileRequest): Promise<BridgeResult<SaveResult>>;
  printToPdf(request: PrintToPdfRequest): Promise<BridgeResult<SaveResult>>;
  pickCaseSet(request: PickCaseSetRequest): Promise<BridgeResult<CaseSetListing | null>>;
  readCaseFile(request: ReadCaseFileRequest): Promise<BridgeResult<FileChunk>>;
  openFolder(request: OpenFolderRequest): Promise<BridgeResult<boolean>>;
  saveBackup(request: SaveBackupRequest): Promise<BridgeResult<BackupEntry>>;
  listBackups(request: ListBackupsRequest): Promise<BridgeResult<BackupListing>>;
  readBackup(request: ReadBackupRequest): Promise<BridgeResult<Uint8Array>>;
};

const METHODS = ['saveFile', 'printToPdf', 'pickCaseSet', 'readCaseFile', 'openFolder', 'saveBackup', 'listBackups', 'readBackup'] as const;

/** True when `value` has every bridge method; a page without the preload has no `heedHost`. */
export const isBridge = (value: unknown): value is HeedBridge =>
  typeof value === 'object' && value !== null &&
  METHODS.every((m) => typeof Reflect.get(value, m) === 'function');
