export type BackupEntry = { id: string; studyId: string; fileName: string; bytes: number; savedAt: string };
export type BackupFolder = {
  root: string;
  keep: number;
  save(studyId: string, fileName: string, bytes: Uint8Array): Promise<BackupEntry>;
  list(): Promise<BackupEntry[]>;
  read(id: string): Promise<Uint8Array>;
};
export declare const DEFAULT_KEEP: number;
export declare const defaultBackupRoot: (env: Record<string, string | undefined>, home: string) => string;
export declare const backupSecretFor: (token: string) => string;
export declare const backupProblem: (studyId: unknown, fileName: unknown) => string | null;
export declare const backupsToRemove: (names: string[], keep: number) => string[];
export declare const parseBackupId: (id: unknown) => { studyId: string; fileName: string } | null;
export declare const createBackupFolder: (options: { root: string; keep?: number }) => BackupFolder;
