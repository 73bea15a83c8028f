/**
 * Where a window remembers the database it used (store/store-identity.ts): the origin's
 * localStorage, which Chromium keeps in a file of its own, apart from IndexedDB. The loss itself
 * is recorded in the new database, not here: localStorage is written to disk late, and a kill
 * soon after the notice would otherwise forget it.
 */
import type { RememberedStore, StoreIdentity } from '../../store/store-identity';

const REMEMBERED = 'heed.store-identity';

export const rememberedStore = (storage: Storage): RememberedStore | null => {
  try {
    const value: unknown = JSON.parse(storage.getItem(REMEMBERED) ?? 'null');
    if (value === null || typeof value !== 'object') return null;
    const v = value as Record<string, unknown>;
    return typeof v.id === 'string' && typeof v.createdAt === 'string' && typeof v.lastSeen === 'string'
      ? { id: v.id, createdAt: v.createdAt, lastSeen: v.lastSeen }
      : null;
  } catch {
    return null;
  }
};

export const rememberStore = (storage: Storage, identity: StoreIdentity, now: Date = new Date()): void => {
  storage.setItem(REMEMBERED, JSON.stringify({ id: identity.id, createdAt: identity.createdAt, lastSeen: now.toISOString() } satisfies RememberedStore));
};

/** localStorage, or null where the browser refuses it (the check is then skipped). */
export const originStorage = (): Storage | null => {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
};
