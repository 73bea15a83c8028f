/**
 * Noticing that the browser lost Heed's database. The database's identity (store/store-identity.ts)
 * is remembered in the origin's localStorage, which the browser keeps in a separate file. When the
 * database comes up newly made while localStorage remembers another one, the earlier database is
 * gone: the loss is kept in localStorage until the coordinator says it was read, so a reload does
 * not hide it.
 */
import type { StoreIdentity } from '../../store/store-identity';

const REMEMBERED = 'heed.store-identity';
const LOSS = 'heed.store-loss';

export type StoreLoss = { lostCreatedAt: string; lostLastSeen: string; noticedAt: string };
type Remembered = { id: string; createdAt: string; lastSeen: string };

const read = <T>(storage: Storage, key: string, valid: (v: Record<string, unknown>) => boolean): T | null => {
  try {
    const value: unknown = JSON.parse(storage.getItem(key) ?? 'null');
    return value !== null && typeof value === 'object' && valid(value as Record<string, unknown>) ? (value as T) : null;
  } catch {
    return null;
  }
};
const isRemembered = (v: Record<string, unknown>) => typeof v.id === 'string' && typeof v.createdAt === 'string' && typeof v.lastSeen === 'string';
const isLoss = (v: Record<string, unknown>) => typeof v.lostCreatedAt === 'string' && typeof v.lostLastSeen === 'string' && typeof v.noticedAt === 'string';

/** Compares this launch's database with the one remembered, remembers this one, and returns an unread loss, if any. */
export const checkStoreLoss = (identity: StoreIdentity, storage: Storage, now: Date = new Date()): StoreLoss | null => {
  const remembered = read<Remembered>(storage, REMEMBERED, isRemembered);
  if (remembered !== null && remembered.id !== identity.id && identity.madeNow) {
    const loss: StoreLoss = { lostCreatedAt: remembered.createdAt, lostLastSeen: remembered.lastSeen, noticedAt: now.toISOString() };
    storage.setItem(LOSS, JSON.stringify(loss));
  }
  storage.setItem(REMEMBERED, JSON.stringify({ id: identity.id, createdAt: identity.createdAt, lastSeen: now.toISOString() } satisfies Remembered));
  return read<StoreLoss>(storage, LOSS, isLoss);
};

/** The coordinator has read the notice. */
export const dismissStoreLoss = (storage: Storage): void => storage.removeItem(LOSS);

/** localStorage, or null where the browser refuses it (the check is then skipped). */
export const originStorage = (): Storage | null => {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
};
