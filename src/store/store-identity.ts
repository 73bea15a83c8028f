/**
 * The database's identity: a random id written once, when Heed first finds the database without
 * one. A browser that deletes a damaged database and starts an empty one (Chromium does, see
 * docs/security.md) gives Heed a database with a new identity. The identity this window used
 * last is remembered outside the database (ui/services/store-loss.ts); when the two differ, the
 * earlier database is gone, and that is written into this one, in the same strict transaction
 * that reads the identity, so neither a crash nor a second tab can lose the notice.
 */
import type { HeedDb } from './db';
import type { LostStore, StoredSetting } from './records';

type IdentityRecord = Extract<StoredSetting, { key: 'store-identity' }>;

/** The identity a window last saw, kept outside the database. */
export type RememberedStore = { id: string; createdAt: string; lastSeen: string };

/** This database's identity, and the earlier database it replaced if its notice is not read yet. */
export type StoreIdentity = { id: string; createdAt: string; unreadLoss: LostStore | null };

/** The earlier database `remembered` names is gone, and `record` does not say so yet. */
const lossToRecord = (record: IdentityRecord, remembered: RememberedStore | null): remembered is RememberedStore =>
  remembered !== null && remembered.id !== record.id && record.lost?.id !== remembered.id;

const answer = (record: IdentityRecord): StoreIdentity =>
  ({ id: record.id, createdAt: record.createdAt, unreadLoss: record.lost !== undefined && !record.lost.read ? record.lost : null });

/**
 * Usually (every start but the first, and no loss to record) one read-only look, which does not
 * wait for or hold up the start screen's other reads; otherwise the read-write transaction reads
 * the record again and decides, so a second window doing the same at once cannot record twice.
 */
export const storeIdentity = async (db: HeedDb, remembered: RememberedStore | null, now: () => Date = () => new Date()): Promise<StoreIdentity> => {
  const seen = await db.settings.get('store-identity');
  if (seen?.key === 'store-identity' && !lossToRecord(seen, remembered)) return answer(seen);
  return db.transaction('rw', db.settings, async () => {
    const found = await db.settings.get('store-identity');
    const record: IdentityRecord = found?.key === 'store-identity' ? found : { key: 'store-identity', id: crypto.randomUUID(), createdAt: now().toISOString() };
    const gone = lossToRecord(record, remembered);
    const lost: LostStore | undefined = gone
      ? { id: remembered.id, createdAt: remembered.createdAt, lastSeen: remembered.lastSeen, noticedAt: now().toISOString(), read: false }
      : record.lost;
    const next: IdentityRecord = lost === undefined ? record : { ...record, lost };
    if (found === undefined || gone) await db.settings.put(next);
    return answer(next);
  });
};

/** The coordinator has read the notice of a lost database. */
export const markLossRead = (db: HeedDb): Promise<void> =>
  db.transaction('rw', db.settings, async () => {
    const found = await db.settings.get('store-identity');
    if (found?.key !== 'store-identity' || found.lost === undefined) return;
    const next: IdentityRecord = { ...found, lost: { ...found.lost, read: true } };
    await db.settings.put(next);
  });
