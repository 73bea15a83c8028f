import 'fake-indexeddb/auto';
import { Dexie } from 'dexie';
import { openHeedDb, SCHEMA_V3, type HeedDb } from '../../../src/store/db';
import { engageLock, readLock, resetLock, setPassphrase, unlock } from '../../../src/store/coordinator-lock';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-lock-${process.pid}-${++n}`);
const types = async (db: HeedDb) => (await db.events.where('chain').equals('').sortBy('seq')).map((e) => e.type);

describe('the coordinator lock (store)', () => {
  it('is off on a fresh profile; once set it locks, refuses a wrong passphrase and opens with the right one', async () => {
    const db = fresh();
    expect(await readLock(db)).toEqual({ hasPassphrase: false, locked: false, idleMinutes: 15 });
    expect(await engageLock(db, 'reading')).toBe(false);
    await expect(setPassphrase(db, 'short', 'short')).rejects.toThrow(/at least 8/);
    await expect(setPassphrase(db, 'long enough phrase', 'long enough phrasE')).rejects.toThrow(/differ/);
    await setPassphrase(db, 'long enough phrase', 'long enough phrase', 10);
    const stored = JSON.stringify(await db.settings.toArray());
    expect(stored).not.toContain('long enough phrase'); // only the salted hash is kept
    expect(stored).toContain('"iterations":600000');
    await expect(setPassphrase(db, 'another phrase', 'another phrase')).rejects.toThrow(/already set/);
    expect(await engageLock(db, 'reading')).toBe(true);
    expect(await readLock(db)).toEqual({ hasPassphrase: true, locked: true, idleMinutes: 10 });
    expect(await unlock(db, 'long enough phras')).toBe(false);
    expect((await readLock(db)).locked).toBe(true);
    expect(await unlock(db, 'long enough phrase')).toBe(true);
    expect((await readLock(db)).locked).toBe(false);
    expect(await types(db)).toEqual(['lock-set', 'lock-refused', 'lock-unlocked']);
  }, 30_000);

  it('resets only with the typed phrase, logs it, and keeps every other record', async () => {
    const db = fresh();
    await setPassphrase(db, 'forgotten phrase', 'forgotten phrase');
    await engageLock(db, 'reading');
    await db.studies.add({ id: 'st1' } as never);
    await expect(resetLock(db, 'reset')).rejects.toThrow(/reset the lock/);
    expect((await readLock(db)).locked).toBe(true);
    await resetLock(db, 'Reset the lock');
    expect(await readLock(db)).toEqual({ hasPassphrase: false, locked: false, idleMinutes: 15 });
    expect(await db.studies.count()).toBe(1);
    expect(await types(db)).toEqual(['lock-set', 'lock-reset']);
  }, 30_000);

  it('opens a version-3 database at the latest version with nothing lost and an empty settings table', async () => {
    const name = `heed-v3-${process.pid}`;
    const v3 = new Dexie(name);
    v3.version(3).stores(SCHEMA_V3);
    await v3.table('studies').add({ id: 'st1', name: 'kept' });
    await v3.table('events').add({ at: 'a', type: 'old', studyId: null, chain: '', prev: 'p', hash: 'h', detail: {} });
    v3.close();
    const db = openHeedDb(name);
    await db.open();
    expect(db.verno).toBe(5);
    expect((await db.studies.get('st1'))?.name).toBe('kept');
    expect(await db.events.count()).toBe(1);
    expect(await db.settings.count()).toBe(0);
  });
});
