// The few platform services Heed needs from its host. The UI only ever sees this type, through
// getHost(); the Electron and browser implementations live beside it in src/host.

/** What happened to a file the user was offered. `where` is the saved path, when the host knows it. */
export type SaveResult = {
  saved: boolean;
  where?: string;
  /** Browser hosts cannot see the outcome: they hand the file to the downloads or print dialog. */
  handedTo?: 'downloads' | 'print-dialog';
};

/** One file of a picked case set; `path` is relative to the set's root, with '/' separators. */
export type PickedFile = { path: string; read(): Promise<Uint8Array> };

/** A picked case set: a folder's files, or a zip as a single entry whose path ends in .zip. */
export type PickedCaseSet = { label: string; files: PickedFile[] };

/** Which kind of case set to pick: a folder holding cases.csv, or a .zip of one. */
export type CaseSetKind = 'folder' | 'zip';

/** One backup on disk: `id` is `studyId/fileName`, `savedAt` an ISO time. */
export type BackupEntry = { id: string; studyId: string; fileName: string; bytes: number; savedAt: string };

/** Where backups go and which are there; or why this window has no backup folder. */
export type BackupListing =
  | { available: true; folder: string; keep: number; backups: BackupEntry[] }
  | { available: false; reason: string };

/** Automatic backups: written to a folder on disk by the launcher's server or Electron's main process. */
export type BackupHost = {
  /** Writes one study bundle; `fileName` is `<UTC time>-<name>.zip` (see backupFileName). */
  saveBackup(studyId: string, fileName: string, bytes: Uint8Array): Promise<BackupEntry>;
  listBackups(): Promise<BackupListing>;
  readBackup(id: string): Promise<Uint8Array>;
};

export type Host = BackupHost & {
  kind: 'electron' | 'browser';
  /** Offers `data` for saving under `suggestedName` (a plain file name, no folders). */
  saveFile(suggestedName: string, data: Uint8Array | string, mime: string): Promise<SaveResult>;
  /** Prints the current page to PDF (Electron) or opens the print dialog (browser). */
  printToPdf(suggestedName: string): Promise<SaveResult>;
  /** Lets the user pick a case set; null when they cancel. `kind` defaults to 'folder'. */
  pickCaseSet(kind?: CaseSetKind): Promise<PickedCaseSet | null>;
  /** Shows a file this host saved (a `where` from saveFile/printToPdf) in the system file manager. */
  openFolder?: (where: string) => Promise<boolean>;
};
