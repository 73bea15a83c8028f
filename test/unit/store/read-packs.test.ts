// Read packs (src/store/read-packs.ts): one record per completed session, a derived copy of its
// reads. Checked here: a pack is written after a session's last answer and with a restored or
// merged study, used by studyReadRows, ignored when it disagrees with the reads, rebuilt when
// missing, deleted with its study, and a version-4 database opens with an empty packs table.
import 'fake-indexeddb/auto';
import { Dexie } from 'dexie';
import { defaultAnswerScale } from '../../../src/core/answer-scale';
import { joinReadRows } from '../../../src/core/read-rows';
import { gatherStudySnapshot, restoreStudy } from '../../../src/store/bundle';
import { saveCaseSet } from '../../../src/store/case-sets';
import { openHeedDb, SCHEMA_V4, type HeedDb } from '../../../src/store/db';
import { studyReadRows, studyReadRowsPacking } from '../../../src/store/read-log-rows';
import { loadStudyReads, packSession, readsOfPack, storePacks, type PackColumns } from '../../../src/store/read-packs';
import { withdrawReader } from '../../../src/store/reader-lifecycle';
import { listReaders } from '../../../src/store/readers';
import type { StoredReader, StoredSession, StoredStudy } from '../../../src/store/records';
import { commitAnswer } from '../../../src/store/sessions';
import { deleteStudy } from '../../../src/store/study-lifecycle';
import { createStudyFromDesign, enrolInStudy, openPeriod } from '../../../src/store/study-service';
import { tinyDesign, tinyImages, tinyManifest } from '../support/tiny-study';

let n = 0;
const dbName = (): string => `heed-packs-${process.pid}-${++n}`;

/** Answers the first `steps` steps of a session (every step when absent), five-point ratings, sequential cases with an initial call. */
const answer = async (db: HeedDb, session: StoredSession, steps = Infinity): Promise<void> => {
  let done = 0;
  for (let i = 0; i < session.items.length; i++) {
    const item = session.items[i]!;
    const phases = item.assistance === 'sequential' ? (['initial', 'final'] as const) : (['final'] as const);
    for (const phase of phases) {
      if (done++ >= steps) return;
      const rating = (i * 3 + (phase === 'initial' ? 1 : 2) + session.period) % 5 + 1;
      await commitAnswer(db, {
        session, findings: ['target'], step: { itemIndex: i, finding: 'target', phase }, call: rating >= 4 ? 1 : 0, confidence: null, rating,
        ms: 400 + 37 * i + (phase === 'final' ? 0.5 : 0), shownAt: `2026-12-0${session.period}T10:${String(i).padStart(2, '0')}:00.000Z`,
        suggestion: item.assistance === 'none' ? null : { call: (i % 2) as 0 | 1, score: i === 2 ? null : 0.125 * i, planted: i === 3 }, cautionShown: i === 1,
      });
    }
  }
};

const open = async (db: HeedDb, study: StoredStudy, reader: StoredReader, period: number): Promise<StoredSession> => {
  const opened = await openPeriod(db, study, reader, period, null);
  if (!opened.open) throw new Error(opened.message);
  return opened.session;
};

/** Waits (on the store, not a fixed time) until `check` holds, for work the app does not await. */
const until = async (check: () => Promise<boolean>): Promise<void> => {
  for (let i = 0; i < 200; i++) {
    if (await check()) return;
    await new Promise((resolve) => setTimeout(resolve, 5));
  }
  throw new Error('condition never held');
};

/**
 * Three readers, two periods, no washout: R1 finishes both periods, R2 finishes period 1 and is
 * half-way through period 2, R3 finishes period 1 and is withdrawn. Five-point ratings; the
 * default design's sequential periods give initial calls.
 */
const makeStudy = async (db: HeedDb) => {
  const manifest = tinyManifest(5);
  const set = await saveCaseSet(db, { name: 'tiny', source: 'import', manifest, images: tinyImages(manifest) });
  const study = await createStudyFromDesign(db, 'Packs', set.id, { ...tinyDesign(), washoutDays: 0, answerScale: defaultAnswerScale('five-point') });
  const [r1, r2, r3] = [
    await enrolInStudy(db, study, { code: 'R1', role: 'radiologist', years: 3 }),
    await enrolInStudy(db, study, { code: 'R2', role: 'resident', years: null }),
    await enrolInStudy(db, study, { code: 'R3', role: 'radiologist', years: 12 }),
  ];
  await answer(db, await open(db, study, r1!, 1));
  await answer(db, await open(db, study, r2!, 1));
  await answer(db, await open(db, study, r3!, 1));
  await answer(db, await open(db, study, r1!, 2));
  await answer(db, await open(db, study, r2!, 2), 3);
  await withdrawReader(db, r3!.id, 'left the hospital', 'QO-1');
  const completed = (await db.sessions.toArray()).filter((s) => s.completedAt !== null).map((s) => s.id).sort();
  await until(async () => (await db.packs.count()) === completed.length);
  return { study, manifest, completed };
};

/** The rows as they were built before packs: every `reads` record of the study, joined. */
const rowsFromReads = async (db: HeedDb, studyId: string) => {
  const study = await db.studies.get(studyId);
  const set = await db.caseSets.get(study!.caseSetId);
  return joinReadRows(study!, set!.manifest, await listReaders(db, studyId), await db.sessions.where('studyId').equals(studyId).toArray(),
    await db.reads.where('studyId').equals(studyId).toArray()).map((j) => j.row);
};

/** studyReadRows, then the storing of the packs it built on the way (which the rows do not wait for). */
const rowsThenPacks = async (db: HeedDb, studyId: string) => {
  const { rows, storeFresh } = await studyReadRowsPacking(db, studyId);
  await storeFresh();
  return rows;
};

const editPack = async (db: HeedDb, sessionId: string, edit: (c: PackColumns) => void): Promise<void> => {
  const pack = await db.packs.get(sessionId);
  const columns = JSON.parse(pack!.reads) as PackColumns;
  edit(columns);
  await db.packs.put({ ...pack!, reads: JSON.stringify(columns) });
};

describe('read packs', () => {
  it('packs each completed session after its last answer, and the rows from packs equal the rows from reads', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    expect(completed).toHaveLength(4);
    expect((await db.packs.toArray()).map((p) => p.sessionId).sort()).toEqual(completed);
    for (const id of completed) {
      const stored = await db.reads.where('sessionId').equals(id).toArray();
      expect(readsOfPack((await db.packs.get(id))!)).toEqual(stored.map(({ hash: _hash, studyId: _study, ...read }) => read));
    }
    const expected = await rowsFromReads(db, study.id);
    expect(expected.some((r) => r.withdrawn === 1 && r.reader_id === 'R3')).toBe(true);
    expect(expected.some((r) => r.initial_rating !== null && r.initial_call !== null)).toBe(true);
    expect(expected.some((r) => r.reader_id === 'R2' && r.period === 2)).toBe(true); // the unfinished session's reads
    expect(expected.some((r) => r.ai_score === null && r.assistance !== 'none')).toBe(true);
    expect(await studyReadRows(db, study.id)).toEqual(expected);
  });

  it('uses a current pack instead of the reads (a pack changed on purpose shows in the rows)', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    const target = completed[0]!;
    await editPack(db, target, (c) => { c.final[0]![2] = 123456; });
    const rows = await studyReadRows(db, study.id);
    expect(rows.filter((r) => r.total_ms === 123456)).toHaveLength(1);
  });

  it('ignores a pack whose read count or completion time disagrees with the session, and rebuilds it', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    const [first, second] = completed as [string, string];
    await editPack(db, first, (c) => { c.final[0]![2] = 123456; });
    await editPack(db, second, (c) => { c.final[0]![2] = 123456; });
    // a read of the first session gone from the store (count differs), the second completed at another time
    const gone = (await db.reads.where('sessionId').equals(first).primaryKeys())[1]!;
    await db.reads.delete(gone);
    await db.sessions.update(second, { completedAt: '2026-12-24T00:00:00.000Z' });
    const expected = await rowsFromReads(db, study.id);
    const rows = await rowsThenPacks(db, study.id);
    expect(rows).toEqual(expected);
    expect(rows.some((r) => r.total_ms === 123456)).toBe(false);
    // rebuilt on the way, so the next load uses them
    expect((await db.packs.get(first))?.count).toBe(await db.reads.where('sessionId').equals(first).count());
    expect((await db.packs.get(second))?.completedAt).toBe('2026-12-24T00:00:00.000Z');
    expect(await studyReadRows(db, study.id)).toEqual(expected);
  });

  it('stores packs built on the way only when the caller is done with the rows (their transaction would hold up answers)', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    await db.packs.clear();
    const { rows, storeFresh } = await studyReadRowsPacking(db, study.id);
    expect(rows).toEqual(await rowsFromReads(db, study.id));
    await new Promise((resolve) => { setTimeout(resolve, 30); });
    expect(await db.packs.count()).toBe(0); // no write started while the caller works
    expect(await storeFresh()).toBe(completed.length);
    expect(await db.packs.count()).toBe(completed.length);
    // the plain entry (export, reader's report) stores them in a later task of its own
    await db.packs.clear();
    await studyReadRows(db, study.id);
    expect(await db.packs.count()).toBe(0);
    await vi.waitFor(async () => { expect(await db.packs.count()).toBe(completed.length); }, { timeout: 10_000, interval: 20 });
  });

  it('rebuilds missing packs when the study is read, for completed sessions only', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    const expected = await rowsFromReads(db, study.id);
    await db.packs.clear();
    expect(await rowsThenPacks(db, study.id)).toEqual(expected);
    expect((await db.packs.toArray()).map((p) => p.sessionId).sort()).toEqual(completed);
    expect(await studyReadRows(db, study.id)).toEqual(expected);
    // a session packed by hand when not complete: nothing is stored
    const unfinished = (await db.sessions.toArray()).find((s) => s.completedAt === null)!;
    expect(await packSession(db, unfinished.id)).toBe(false);
    expect(await db.packs.get(unfinished.id)).toBeUndefined();
  });

  it('does not store a pack built on the way when its session changed before the write', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    await db.packs.clear();
    const { fresh } = await loadStudyReads(db, study.id);
    expect(fresh.map((p) => p.sessionId).sort()).toEqual(completed);
    const [first, second] = completed as [string, string];
    await db.reads.delete((await db.reads.where('sessionId').equals(first).primaryKeys())[0]!);
    await db.sessions.update(second, { completedAt: '2026-12-24T00:00:00.000Z' });
    expect(await storePacks(db, fresh)).toBe(completed.length - 2);
    expect(await db.packs.get(first)).toBeUndefined();
    expect(await db.packs.get(second)).toBeUndefined();
  });

  it('writes packs with a restored study, and deletes them with the study', async () => {
    const db = openHeedDb(dbName());
    const { study, completed } = await makeStudy(db);
    const other = openHeedDb(dbName());
    await restoreStudy(other, await gatherStudySnapshot(db, study.id, true));
    expect((await other.packs.toArray()).map((p) => p.sessionId).sort()).toEqual(completed);
    expect(await studyReadRows(other, study.id)).toEqual(await rowsFromReads(db, study.id));
    await deleteStudy(other, study.id, { withoutBundle: true });
    expect(await other.packs.count()).toBe(0);
  });

  it('opens a version-4 database: an empty packs table, the same rows, packs made when the study is read', async () => {
    const db = openHeedDb(dbName());
    const { study } = await makeStudy(db);
    const expected = await studyReadRows(db, study.id);
    const name = dbName();
    const v4 = new Dexie(name);
    v4.version(4).stores(SCHEMA_V4);
    for (const table of Object.keys(SCHEMA_V4)) await v4.table(table).bulkAdd(await db.table(table).toArray());
    v4.close();

    const upgraded = openHeedDb(name);
    await upgraded.open();
    expect(upgraded.verno).toBe(5);
    expect(await upgraded.packs.count()).toBe(0);
    expect(await upgraded.reads.count()).toBe(await db.reads.count());
    expect(await rowsThenPacks(upgraded, study.id)).toEqual(expected);
    expect(await upgraded.packs.count()).toBe(4);
    // and they are used: the completion index was built over the sessions already stored
    await editPack(upgraded, (await upgraded.packs.toCollection().primaryKeys())[0]!, (c) => { c.final[0]![2] = 123456; });
    expect((await studyReadRows(upgraded, study.id)).filter((r) => r.total_ms === 123456)).toHaveLength(1);
  });
});
