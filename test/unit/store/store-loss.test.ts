// A database the browser deleted and replaced with an empty one is noticed at the next start:
// the new database has a new identity while localStorage remembers the old one (docs/security.md).
import 'fake-indexeddb/auto';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { storeIdentity } from '../../../src/store/store-identity';
import { checkStoreLoss, dismissStoreLoss } from '../../../src/ui/services/store-loss';

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

describe('the database identity', () => {
  it('is made once and then kept', async () => {
    const db = fresh();
    const first = await storeIdentity(db, () => new Date('2026-03-01T08:00:00Z'));
    expect(first).toMatchObject({ createdAt: '2026-03-01T08:00:00.000Z', madeNow: true });
    const again = await storeIdentity(db);
    expect(again).toEqual({ ...first, madeNow: false });
  });
});

describe('noticing a lost database', () => {
  it('says nothing on a first start, nor on later starts of the same database', async () => {
    const db = fresh();
    const storage = memoryStorage();
    expect(checkStoreLoss(await storeIdentity(db), storage)).toBeNull();
    expect(checkStoreLoss(await storeIdentity(db), storage)).toBeNull();
  });

  it('reports a database made anew where another was remembered, until it is read', async () => {
    const storage = memoryStorage();
    const before = fresh();
    checkStoreLoss(await storeIdentity(before, () => new Date('2026-03-01T08:00:00Z')), storage, new Date('2026-03-02T09:30:00Z'));
    // the browser deleted it: the next start finds a new, empty database
    const after = fresh();
    const loss = checkStoreLoss(await storeIdentity(after), storage, new Date('2026-03-03T07:00:00Z'));
    expect(loss).toEqual({ lostCreatedAt: '2026-03-01T08:00:00.000Z', lostLastSeen: '2026-03-02T09:30:00.000Z', noticedAt: '2026-03-03T07:00:00.000Z' });
    // a reload does not hide it; reading it does
    expect(checkStoreLoss(await storeIdentity(after), storage)).toEqual(loss);
    dismissStoreLoss(storage);
    expect(checkStoreLoss(await storeIdentity(after), storage)).toBeNull();
  });

  it('is not fooled by an unreadable memory, and does not call an old database lost', async () => {
    const storage = memoryStorage();
    storage.setItem('heed.store-identity', '{not json');
    expect(checkStoreLoss(await storeIdentity(fresh()), storage)).toBeNull();
    // a database that already had its identity (not made now) is not a loss, whatever is remembered
    const db = fresh();
    const identity = await storeIdentity(db);
    storage.setItem('heed.store-identity', JSON.stringify({ id: 'another', createdAt: '2026-01-01T00:00:00Z', lastSeen: '2026-01-02T00:00:00Z' }));
    expect(checkStoreLoss({ ...identity, madeNow: false }, storage)).toBeNull();
  });
});
