/**
 * The database's identity: a random id written once, when Heed first finds the database without
 * one. A browser that deletes a damaged database and starts an empty one (Chromium does, see
 * docs/security.md) gives Heed a database with no identity, so a new one is made; compared with
 * the id remembered outside the database (ui/services/store-loss.ts), that shows the loss.
 */
import type { HeedDb } from './db';

export type StoreIdentity = { id: string; createdAt: string; madeNow: boolean };

export const storeIdentity = (db: HeedDb, now: () => Date = () => new Date()): Promise<StoreIdentity> =>
  db.transaction('rw', db.settings, async () => {
    const found = await db.settings.get('store-identity');
    if (found?.key === 'store-identity') return { id: found.id, createdAt: found.createdAt, madeNow: false };
    const made = { key: 'store-identity' as const, id: crypto.randomUUID(), createdAt: now().toISOString() };
    await db.settings.put(made);
    return { id: made.id, createdAt: made.createdAt, madeNow: true };
  });
