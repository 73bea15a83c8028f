// Backups in a Chromium window: through the launcher's server (scripts/lib/backup-endpoint.mjs),
// which `npm start` gives a secret it also puts in the page address (?backup=...). A window
// opened any other way has no secret, hence no backup folder, and says so.
import type { BackupEntry, BackupHost, BackupListing } from './types';

const PATH = '/__heed/backups';
const HEADER = 'X-Heed-Backup';

export type FetchLike = (url: string, init?: { method?: string; headers?: Record<string, string>; body?: Uint8Array }) => Promise<{
  ok: boolean; status: number; text(): Promise<string>; json(): Promise<unknown>; arrayBuffer(): Promise<ArrayBuffer>;
}>;

export const NO_SECRET_REASON = 'this window was not opened by Heed’s launcher (npm start), so it has no backup folder. Save study bundles by hand from the study page.';

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null;
const isEntry = (v: unknown): v is BackupEntry => isRecord(v) && typeof v.id === 'string' && typeof v.studyId === 'string'
  && typeof v.fileName === 'string' && typeof v.bytes === 'number' && typeof v.savedAt === 'string';

/** The secret from a page address's query, or null. */
export const backupSecretOf = (search: string): string | null => {
  const secret = new URLSearchParams(search).get('backup');
  return secret !== null && /^[0-9a-f]{64}$/.test(secret) ? secret : null;
};

export const createLauncherBackups = (secret: string | null, fetchFn: FetchLike): BackupHost => {
  const ask = async (url: string, init: { method?: string; headers?: Record<string, string>; body?: Uint8Array } = {}) => {
    if (secret === null) throw new Error(NO_SECRET_REASON);
    const response = await fetchFn(url, { ...init, headers: { ...init.headers, [HEADER]: secret } });
    if (!response.ok) throw new Error(`the launcher refused the backup request (${response.status}): ${(await response.text()).trim()}`);
    return response;
  };
  return {
    saveBackup: async (studyId, fileName, bytes) => {
      const query = new URLSearchParams({ study: studyId, name: fileName });
      const entry: unknown = await (await ask(`${PATH}?${query.toString()}`, { method: 'POST', headers: { 'Content-Type': 'application/zip' }, body: bytes })).json();
      if (!isEntry(entry)) throw new Error('the launcher answered the backup with something that is not a backup entry');
      return entry;
    },
    listBackups: async (): Promise<BackupListing> => {
      if (secret === null) return { available: false, reason: NO_SECRET_REASON };
      try {
        const listing: unknown = await (await ask(PATH)).json();
        if (!isRecord(listing) || typeof listing.folder !== 'string' || typeof listing.keep !== 'number' || !Array.isArray(listing.backups)) {
          return { available: false, reason: 'the server of this window answered the backup listing with something unexpected.' };
        }
        return { available: true, folder: listing.folder, keep: listing.keep, backups: listing.backups.filter(isEntry) };
      } catch (error) {
        return { available: false, reason: `the server of this window takes no backups (${error instanceof Error ? error.message : String(error)}).` };
      }
    },
    readBackup: async (id) => new Uint8Array(await (await ask(`${PATH}/file?${new URLSearchParams({ id }).toString()}`)).arrayBuffer()),
  };
};
