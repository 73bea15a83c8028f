/**
 * Heed's IndexedDB database through Dexie. Schema versions are append-only: a new version adds
 * its stores and an upgrade, and a test opens a database written by the version before it.
 */
import { Dexie, type EntityTable } from 'dexie';
import { chainExistingRecords } from './chain-upgrade';
import type {
  StoredCaseSet, StoredEvent, StoredImage, StoredPack, StoredRead, StoredReader, StoredSession, StoredSetting, StoredStudy,
} from './records';

export const DB_NAME = 'heed';

/** Version 1: the spine. Reads were keyed by session only. */
export const SCHEMA_V1 = {
  caseSets: 'id, createdAt',
  images: '[setId+path], setId',
  studies: 'id, caseSetId, createdAt',
  readers: 'id, studyId, &[studyId+code]',
  sessions: 'id, studyId, readerId',
  reads: 'id, sessionId',
  events: '++seq, at, type',
} as const;

/** Version 2: reads and events indexed by study, for export and for the per-study event trail. */
export const SCHEMA_V2 = {
  ...SCHEMA_V1,
  reads: 'id, sessionId, studyId, [studyId+readerId]',
  events: '++seq, at, type, studyId',
} as const;

/** Version 3: every event is a link of its study's hash chain (core/chain.ts), found by `chain`. */
export const SCHEMA_V3 = {
  ...SCHEMA_V2,
  events: '++seq, at, type, studyId, chain',
} as const;

/** Version 4: workstation settings by key (the coordinator lock); a new empty table, nothing to move. */
export const SCHEMA_V4 = {
  ...SCHEMA_V3,
  settings: 'key',
} as const;

/**
 * Version 5: read packs, one record per completed session holding that session's reads in one
 * JSON text (read-packs.ts), keyed by session and found by study. A derived copy of the `reads`
 * records, never the source of truth; a new empty table, filled as sessions complete or a study is
 * read (packs are rebuilt when missing), so the upgrade moves nothing. Sessions gain an index on
 * [studyId+completedAt]: it lists a study's completed sessions with their completion times
 * without reading the session records (an open session's null is not a key, so it is not listed).
 */
export const SCHEMA_V5 = {
  ...SCHEMA_V4,
  sessions: 'id, studyId, readerId, [studyId+completedAt]',
  packs: 'sessionId, studyId',
} as const;

/** The newest schema version (IndexedDB itself reports it times ten: Dexie's convention). */
export const SCHEMA_VERSION = 5; // raise with each db.version() added below (test/unit/store/warm-open.test.ts checks it)

export type HeedDb = Dexie & {
  caseSets: EntityTable<StoredCaseSet, 'id'>;
  images: Dexie.Table<StoredImage, [string, string]>;
  studies: EntityTable<StoredStudy, 'id'>;
  readers: EntityTable<StoredReader, 'id'>;
  sessions: EntityTable<StoredSession, 'id'>;
  reads: EntityTable<StoredRead, 'id'>;
  events: EntityTable<StoredEvent, 'seq'>;
  settings: EntityTable<StoredSetting, 'key'>;
  packs: EntityTable<StoredPack, 'sessionId'>;
};

/** Opens (and upgrades) the database. Strict durability: a committed answer is flushed to disk. */
export const openHeedDb = (name: string = DB_NAME): HeedDb => {
  const db = new Dexie(name, { chromeTransactionDurability: 'strict' }) as HeedDb;
  db.version(1).stores(SCHEMA_V1);
  db.version(2).stores(SCHEMA_V2).upgrade(async (tx) => {
    // v1 reads knew their session only; v2 also stores the study, taken from the session.
    const sessions = new Map<string, string>();
    await tx.table<StoredSession>('sessions').each((s) => { sessions.set(s.id, s.studyId); });
    await tx.table<StoredRead>('reads').toCollection().modify((read) => {
      const studyId = sessions.get(read.sessionId);
      if (studyId) read.studyId = studyId;
    });
    await tx.table<StoredEvent>('events').toCollection().modify((event) => {
      if (event.studyId === undefined) event.studyId = null;
    });
  });
  db.version(3).stores(SCHEMA_V3).upgrade((tx) => chainExistingRecords(tx));
  db.version(4).stores(SCHEMA_V4);
  db.version(5).stores(SCHEMA_V5);
  return db;
};
