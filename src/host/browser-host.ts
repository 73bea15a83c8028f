// The browser host, for Heed running in a Chromium app window: downloads through an
// <a download> blob URL, printing through the print dialog, case sets through a file input.
// The DOM pieces come in as small dependencies so the logic is tested without a browser.
import { checkFileName } from './file-name';
import { backupSecretOf, createLauncherBackups } from './launcher-backups';
import type { BackupHost, CaseSetKind, Host, PickedCaseSet } from './types';

export type AnchorLike = { href: string; download: string; rel: string; click(): void };
export type FileLike = { name: string; webkitRelativePath: string; arrayBuffer(): Promise<ArrayBuffer> };
export type FileInputLike = {
  type: string;
  accept: string;
  multiple: boolean;
  webkitdirectory: boolean;
  files: ArrayLike<FileLike> | null;
  addEventListener(type: 'change' | 'cancel', listener: () => void, options?: { once?: boolean }): void;
  click(): void;
};

export type BrowserDeps = {
  makeAnchor(): AnchorLike;
  makeFileInput(): FileInputLike;
  createObjectURL(blob: Blob): string;
  revokeObjectURL(url: string): void;
  print(): void;
  getTitle(): string;
  setTitle(title: string): void;
  later(run: () => void, ms: number): void;
};

/** The real DOM, for the running app. */
export const domDeps = (): BrowserDeps => ({
  makeAnchor: () => document.createElement('a'),
  makeFileInput: () => document.createElement('input'),
  createObjectURL: (blob) => URL.createObjectURL(blob),
  revokeObjectURL: (url) => URL.revokeObjectURL(url),
  print: () => window.print(),
  getTitle: () => document.title,
  setTitle: (title) => { document.title = title; },
  later: (run, ms) => { setTimeout(run, ms); },
});

// Long enough for the download to start reading the blob; revoking frees its memory.
const REVOKE_AFTER_MS = 60_000;

/** Folder picks name files "top/sub/x.png": paths are made relative to "top", the set's root. */
const folderSet = (files: FileLike[]): PickedCaseSet => {
  const label = files[0]?.webkitRelativePath.split('/')[0] ?? '';
  return {
    label,
    files: files.map((f) => {
      const rel = f.webkitRelativePath || f.name;
      const slash = rel.indexOf('/');
      return { path: slash >= 0 ? rel.slice(slash + 1) : rel, read: async () => new Uint8Array(await f.arrayBuffer()) };
    }),
  };
};

const zipSet = (file: FileLike): PickedCaseSet => {
  if (!/\.zip$/i.test(file.name)) throw new Error(`"${file.name}" is not a .zip file; pick a folder or a .zip of one`);
  return {
    label: file.name.replace(/\.zip$/i, ''),
    files: [{ path: file.name, read: async () => new Uint8Array(await file.arrayBuffer()) }],
  };
};

/** Backups through the launcher, with the secret from this page's address. */
export const pageBackups = (): BackupHost => {
  // made on first use, so a host built outside a page (tests) never touches window
  let made: BackupHost | null = null;
  const backups = (): BackupHost => (made ??= createLauncherBackups(backupSecretOf(window.location.search), (url, init) =>
    fetch(url, { method: init?.method ?? 'GET', headers: init?.headers ?? {}, body: init?.body ? new Blob([new Uint8Array(init.body)]) : null })));
  return {
    saveBackup: (studyId, fileName, bytes) => backups().saveBackup(studyId, fileName, bytes),
    listBackups: () => backups().listBackups(),
    readBackup: (id) => backups().readBackup(id),
  };
};

export const createBrowserHost = (deps: BrowserDeps = domDeps(), backups: BackupHost = pageBackups()): Host => ({
  ...backups,
  kind: 'browser',
  saveFile: async (suggestedName, data, mime) => {
    const name = checkFileName(suggestedName);
    // Copy bytes so the Blob owns a plain ArrayBuffer (a view on a shared buffer is not a BlobPart).
    const part = typeof data === 'string' ? data : new Uint8Array(data);
    const url = deps.createObjectURL(new Blob([part], { type: mime }));
    const a = deps.makeAnchor();
    a.href = url;
    a.download = name;
    a.rel = 'noopener';
    a.click();
    deps.later(() => deps.revokeObjectURL(url), REVOKE_AFTER_MS);
    return { saved: true, handedTo: 'downloads' };
  },
  printToPdf: async (suggestedName) => {
    // Chromium's "Save as PDF" suggests the document title as the file name.
    const title = deps.getTitle();
    deps.setTitle(checkFileName(suggestedName).replace(/\.pdf$/i, ''));
    try {
      deps.print();
    } finally {
      deps.setTitle(title);
    }
    return { saved: false, handedTo: 'print-dialog' };
  },
  pickCaseSet: (kind: CaseSetKind = 'folder') =>
    new Promise<PickedCaseSet | null>((resolve, reject) => {
      const input = deps.makeFileInput();
      input.type = 'file';
      if (kind === 'folder') {
        input.webkitdirectory = true;
        input.multiple = true;
      } else {
        input.accept = '.zip,application/zip';
        input.multiple = false;
      }
      input.addEventListener('cancel', () => resolve(null), { once: true });
      input.addEventListener('change', () => {
        const files = Array.from(input.files ?? []);
        const first = files[0];
        if (first === undefined) return resolve(null);
        try {
          resolve(kind === 'folder' ? folderSet(files) : zipSet(first));
        } catch (error) {
          reject(error);
        }
      }, { once: true });
      input.click();
    }),
});
