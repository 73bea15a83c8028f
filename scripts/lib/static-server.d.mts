import type { BackupFolder } from './backup-folder.mjs';
export type StaticServer = { url: string; port: number; close(): Promise<void> };
export type BackupOptions = { folder: BackupFolder; secret: string; maxBytes?: number };
export declare const startStaticServer: (options: { root: string; port?: number; token?: string; backups?: BackupOptions }) => Promise<StaticServer>;
export declare const cacheControlFor: (pathname: string) => string;
