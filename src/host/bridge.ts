// The shape of `window.heedHost`, the narrow bridge the Electron preload exposes: one method per
// IPC channel, each answering { ok, value } or { ok, error }. Plain types only, so the renderer
// never depends on Electron; electron/ipc-contract.ts holds the matching runtime schemas.
import type { CaseSetKind, SaveResult } from './types';

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

export type HeedBridge = {
  saveFile(request: SaveFileRequest): Promise<BridgeResult<SaveResult>>;
  printToPdf(request: PrintToPdfRequest): Promise<BridgeResult<SaveResult>>;
  pickCaseSet(request: PickCaseSetRequest): Promise<BridgeResult<CaseSetListing | null>>;
  readCaseFile(request: ReadCaseFileRequest): Promise<BridgeResult<FileChunk>>;
  openFolder(request: OpenFolderRequest): Promise<BridgeResult<boolean>>;
};

const METHODS = ['saveFile', 'printToPdf', 'pickCaseSet', 'readCaseFile', 'openFolder'] as const;

/** True when `value` has every bridge method; a page without the preload has no `heedHost`. */
export const isBridge = (value: unknown): value is HeedBridge =>
  typeof value === 'object' && value !== null &&
  METHODS.every((m) => typeof Reflect.get(value, m) === 'function');
