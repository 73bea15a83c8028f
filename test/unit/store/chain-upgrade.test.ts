import 'fake-indexeddb/auto';
import { Dexie } from 'dexie';
import { canonicalJson, genesisHash, linkHash, sha256Hex } from '../../../src/core/chain';
import { openHeedDb, SCHEMA_V1, SCHEMA_V2 } from '../../../src/store/db';
import { appendEvent, eventsOfStudy } from '../../../src/store/events';
import { freshDb, readTinyStudy } from '../support/bundle-study';

describe('hash chain in the store', () => {
  it('SHA-256 is the standard one (FIPS 180-2 example "abc")', () => {
    // FIPS 180-2, Appendix B.1: SHA-256("abc")
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    // and the same digest as WebCrypto
    return crypto.subtle.digest('SHA-256', new TextEncoder().encode('heed')).then((d) => {
      expect(sha256Hex('heed')).toBe([...new Uint8Array(d)].map((b) => b.toString(16).padStart(2, '0')).join(''));
    });
  });

  it('canonical JSON sorts keys at every depth and refuses numbers JSON cannot hold', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { z: 0, y: null }], c: 'x' }, u: undefined })).toBe('{"a":{"c":"x","d":[1,{"y":null,"z":0}]},"b":1}');
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(RangeError);
  });

  it('links every event of a study to the one before, in commit order, and gives each read its event hash', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const events = await eventsOfStudy(db, study.id);
    let prev = genesisHash(study.id);
    for (const e of events) {
      expect(e.prev).toBe(prev);
      expect(e.hash).toBe(linkHash(prev, e));
      prev = e.hash;
    }
    const finals = new Map(events.filter((e) => e.type === 'final-committed').map((e) => [(e.detail.read as { id: string }).id, e.hash]));
    const reads = await db.reads.where('studyId').equals(study.id).toArray();
    expect(reads).toHaveLength(8);
    for (const r of reads) expect(r.hash).toBe(finals.get(r.id));
    // events of no study form the workstation's own chain
    const setEvent = (await db.events.toArray()).find((e) => e.type === 'case-set-stored');
    expect(setEvent?.prev).toBe(genesisHash(''));
  });

  it('appends in one transaction: a failing change leaves no link behind', async () => {
    const db = freshDb();
    await expect(db.transaction('rw', db.events, async () => {
      await appendEvent(db, 's', 'x', {});
      throw new Error('boom');
    })).rejects.toThrow('boom');
    expect(await db.events.count()).toBe(0);
  });

  it('upgrades a version-2 database: existing events and reads are chained', async () => {
    const name = `heed-chain-upgrade-${process.pid}`;
    const v2 = new Dexie(name);
    v2.version(1).stores(SCHEMA_V1);
    v2.version(2).stores(SCHEMA_V2);
    const read = { id: 'rd/1/c1/target', sessionId: 'rd/1', studyId: 'st1', readerId: 'rd', period: 1, caseId: 'c1', finding: 'target',
      initial: { call: 0, confidence: 20, ms: 500 }, final: { call: 1, confidence: 90, ms: 1200 }, shownAt: 't0', aiCall: 1, aiScore: 0.8, aiPlanted: false, cautionShown: false };
    await v2.table('reads').add(read);
    const detail = { sessionId: 'rd/1', caseId: 'c1', finding: 'target' };
    await v2.table('events').bulkAdd([
      { at: 't1', studyId: 'st1', type: 'study-created', detail: { name: 'S' } },
      { at: 't2', studyId: null, type: 'case-set-stored', detail: {} },
      { at: 't3', studyId: 'st1', type: 'initial-committed', detail: { ...detail, call: 0 } },
      { at: 't4', studyId: 'st1', type: 'final-committed', detail: { ...detail, call: 1 } },
    ]);
    v2.close();

    const db = openHeedDb(name);
    await db.open();
    expect(db.verno).toBe(5);
    const events = await eventsOfStudy(db, 'st1');
    expect(events.map((e) => e.type)).toEqual(['study-created', 'initial-committed', 'final-committed']);
    let prev = genesisHash('st1');
    for (const e of events) {
      expect(e.chain).toBe('st1');
      expect(e.hash).toBe(linkHash(prev, e));
      prev = e.hash;
    }
    expect(events[1]?.detail.read).toMatchObject({ final: null });
    expect(events[2]?.detail.read).toEqual(read);
    expect((await db.reads.get(read.id))?.hash).toBe(events[2]?.hash);
    // the next commit continues the chain from the upgraded head
    const next = await db.transaction('rw', db.events, () => appendEvent(db, 'st1', 'paused', {}));
    expect(next.prev).toBe(events[2]?.hash);
  });
});
