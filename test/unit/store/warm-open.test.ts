// The early open of the database (src/store/warm-open.ts), run by the page before the app's
// bundle: it must never create, change or hold on to the database the app then opens.
import 'fake-indexeddb/auto';
import { DB_NAME, openHeedDb, SCHEMA_VERSION } from '../../../src/store/db';
import type { StoredSetting } from '../../../src/store/records';
import { WARM_DB_NAME, warmOpen } from '../../../src/store/warm-open';

let n = 0;
const fresh = (): string => `heed-warm-${process.pid}-${++n}`;
const identity = (id: string): StoredSetting => ({ key: 'store-identity', id, createdAt: '2026-03-01T08:00:00.000Z' });
const listed = async (name: string) => (await indexedDB.databases()).find((d) => d.name === name);

/** The version and tables of a database the app makes with no early open beside it, to compare with. */
const usual = async (): Promise<{ verno: number; tables: string[] }> => {
  const db = openHeedDb(fresh());
  await db.open();
  const made = { verno: db.verno, tables: db.tables.map((t) => t.name).sort() };
  db.close();
  return made;
};

/** Deletes a database; fails when an open connection blocks the deletion. */
const deleteUnblocked = (name: string): Promise<void> => new Promise((resolve, reject) => {
  const request = indexedDB.deleteDatabase(name);
  request.onblocked = () => reject(new Error(`deleting ${name} was blocked by an open connection`));
  request.onsuccess = () => resolve();
  request.onerror = () => reject(request.error ?? new Error('delete failed'));
});

describe('the early open of the database', () => {
  it('opens the database the app opens', async () => {
    expect(WARM_DB_NAME).toBe(DB_NAME);
    expect((await usual()).verno).toBe(SCHEMA_VERSION); // the constant the browser tests compare with
  });

  it('creates nothing when there is no database yet, and the app then makes it as usual', async () => {
    const name = fresh();
    expect(await warmOpen(indexedDB, name)).toBe('missing');
    expect(await listed(name)).toBeUndefined();
    const db = openHeedDb(name);
    await db.settings.put(identity('x'));
    expect({ verno: db.verno, tables: db.tables.map((t) => t.name).sort() }).toEqual(await usual());
    db.close();
  });

  it("on a first launch, started together with the app's own open, leaves the app a whole database", async () => {
    const name = fresh();
    const early = warmOpen(indexedDB, name);
    const db = openHeedDb(name);
    expect(await db.caseSets.count()).toBe(0);
    expect(await early).toBe('missing');
    expect(db.tables.map((t) => t.name).sort()).toEqual((await usual()).tables);
    db.close();
  });

  it('lets go of an existing database: its data stays, and it blocks no version change or deletion', async () => {
    const name = fresh();
    const before = openHeedDb(name);
    await before.settings.put(identity('kept'));
    before.close();
    expect(await warmOpen(indexedDB, name)).toBe('opened');
    const after = openHeedDb(name);
    expect(await after.settings.get('store-identity')).toMatchObject({ id: 'kept' });
    after.close();
    await deleteUnblocked(name);
    expect(await listed(name)).toBeUndefined();
  });

  it("does not hold up the app's upgrade of an older database", async () => {
    const name = fresh();
    // a version-1 database (Dexie stores version n as n * 10)
    await new Promise<void>((resolve, reject) => {
      const request = indexedDB.open(name, 10);
      request.onupgradeneeded = () => { request.result.createObjectStore('settings', { keyPath: 'key' }); };
      request.onsuccess = () => { request.result.close(); resolve(); };
      request.onerror = () => reject(request.error ?? new Error('open failed'));
    });
    const early = warmOpen(indexedDB, name);
    const db = openHeedDb(name);
    await db.open();
    expect(await early).toBe('opened');
    expect(db.verno).toBe((await usual()).verno);
    db.close();
  });

  it('says so when there is no IndexedDB, without throwing', async () => {
    expect(await warmOpen(undefined)).toBe('refused');
  });
});
