// A database the browser deleted and replaced with an empty one is noticed at the next start:
// the new database has a new identity while localStorage remembers the old one, and the loss is
// written into the new database so that a crash or a second tab cannot lose the notice
// (docs/security.md).
import 'fake-indexeddb/auto';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { markLossRead, storeIdentity } from '../../../src/store/store-identity';
import { rememberedStore, rememberStore } from '../../../src/ui/services/store-loss';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-identity-${process.pid}-${++n}`);

/** A Storage over a Map: the part of the Web Storage interface the check uses. */
const memoryStorage = (): Storage => {
  const items = new Map<string, string>();
  return {
    get length() { return items.size; },
    clear: () => items.clear(),
    getItem: (k) => items.get(k) ?? null,
    key: (i) => [...items.keys()][i] ?? null,
    removeItem: (k) => { items.delete(k); },
    setItem: (k, v) => { items.set(k, String(v)); },
  };
};

/** One start of the start screen: read what is remembered, look at the identity, remember it. */
const start = async (db: HeedDb, storage: Storage, at: string) => {
  const identity = await storeIdentity(db, rememberedStore(storage), () => new Date(at));
  rememberStore(storage, identity, new Date(at));
  return identity;
};

describe('the database identity', () => {
  it('is made once and then kept', async () => {
    const db = fresh();
    const first = await storeIdentity(db, null, () => new Date('2026-03-01T08:00:00Z'));
    expect(first).toMatchObject({ createdAt: '2026-03-01T08:00:00.000Z', unreadLoss: null });
    expect(await storeIdentity(db, null)).toEqual(first);
  });

  it('is only read, never written, at a start with nothing to record', async () => {
    // a read-write transaction waits for the start screen's other reads of its stores and holds them up;
    // Dexie binds the backend's transaction() when it opens, so the spy is set before that
    const opened = vi.spyOn(IDBDatabase.prototype, 'transaction');
    try {
      const db = fresh();
      const storage = memoryStorage();
      await start(db, storage, '2026-03-01T08:00:00Z');
      expect(opened.mock.calls.map((call) => call[1])).toContain('readwrite');
      const before = opened.mock.calls.length;
      expect((await start(db, storage, '2026-03-02T08:00:00Z')).unreadLoss).toBeNull();
      const modes = opened.mock.calls.slice(before).map((call) => call[1] ?? 'readonly');
      expect(modes.length).toBeGreaterThan(0);
      expect(modes).not.toContain('readwrite');
    } finally {
      opened.mockRestore();
    }
  });
});

describe('noticing a lost database', () => {
  it('says nothing on a first start, nor on later starts of the same database', async () => {
    const db = fresh();
    const storage = memoryStorage();
    expect((await start(db, storage, '2026-03-01T08:00:00Z')).unreadLoss).toBeNull();
    expect((await start(db, storage, '2026-03-02T08:00:00Z')).unreadLoss).toBeNull();
  });

  it('reports a database replaced by a new one, keeps the report in the new database, and drops it once read', async () => {
    const storage = memoryStorage();
    const before = fresh();
    await start(before, storage, '2026-03-01T08:00:00Z');
    await start(before, storage, '2026-03-02T09:30:00Z');
    // the browser deleted it: the next start finds a new, empty database
    const after = fresh();
    const first = await start(after, storage, '2026-03-03T07:00:00Z');
    expect(first.unreadLoss).toMatchObject({ createdAt: '2026-03-01T08:00:00.000Z', lastSeen: '2026-03-02T09:30:00.000Z', noticedAt: '2026-03-03T07:00:00.000Z', read: false });
    // localStorage now remembers the new database; the report lives on in the database itself
    expect(rememberedStore(storage)?.id).toBe(first.id);
    expect((await start(after, storage, '2026-03-03T08:00:00Z')).unreadLoss).toEqual(first.unreadLoss);
    await markLossRead(after);
    expect((await start(after, storage, '2026-03-03T09:00:00Z')).unreadLoss).toBeNull();
  });

  it('survives a localStorage write lost in a crash, without reporting twice', async () => {
    const storage = memoryStorage();
    const before = fresh();
    await start(before, storage, '2026-03-01T08:00:00Z');
    const after = fresh();
    const remembered = rememberedStore(storage);
    // the loss is noticed, but the browser is killed before localStorage reaches the disk
    const noticed = await storeIdentity(after, remembered, () => new Date('2026-03-03T07:00:00Z'));
    expect(noticed.unreadLoss?.id).toBe(remembered?.id);
    const again = await storeIdentity(after, remembered, () => new Date('2026-03-03T07:05:00Z'));
    expect(again.unreadLoss).toEqual(noticed.unreadLoss); // same report, first noticed time kept
    await markLossRead(after);
    expect((await storeIdentity(after, remembered)).unreadLoss).toBeNull(); // read stays read
  });

  it('is not fooled by an unreadable memory', async () => {
    const storage = memoryStorage();
    storage.setItem('heed.store-identity', '{not json');
    expect(rememberedStore(storage)).toBeNull();
    expect((await start(fresh(), storage, '2026-03-01T08:00:00Z')).unreadLoss).toBeNull();
  });
});
