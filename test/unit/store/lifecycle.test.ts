import 'fake-indexeddb/auto';
import { saveCaseSet } from '../../../src/store/case-sets';
import { deleteCaseSet, renameCaseSet } from '../../../src/store/case-set-lifecycle';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { eventsOfStudy } from '../../../src/store/events';
import { unfinishedSessions } from '../../../src/store/progress';
import { studyReadRows } from '../../../src/store/read-log-rows';
import { correctReaderCode, deleteReader, withdrawReader } from '../../../src/store/reader-lifecycle';
import { listReaders } from '../../../src/store/readers';
import type { StoredSession, StoredStudy } from '../../../src/store/records';
import { commitAnswer } from '../../../src/store/sessions';
import { deleteStudy, renameStudy, statusOfStudy } from '../../../src/store/study-lifecycle';
import { changeStudyDesign, createStudyFromDesign, enrolInStudy, openPeriod } from '../../../src/store/study-service';
import { getStudy } from '../../../src/store/studies';
import { tinyDesign, tinyImages, tinyManifest } from '../support/tiny-study';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-lifecycle-${process.pid}-${++n}`);

/** Everything stored, to check that a refusal changed nothing. */
const snapshot = async (db: HeedDb) => JSON.stringify({
  sets: await db.caseSets.toArray(), images: await db.images.count(), studies: await db.studies.toArray(),
  readers: await db.readers.toArray(), sessions: await db.sessions.toArray(), reads: await db.reads.count(), events: await db.events.toArray(),
});

const setUp = async (db: HeedDb) => {
  const manifest = tinyManifest(6);
  const set = await saveCaseSet(db, { name: 'Halden March', source: 'import', manifest, images: tinyImages(manifest) });
  const study = await createStudyFromDesign(db, 'Pilot', set.id, { ...tinyDesign(), washoutDays: 0 });
  return { set, study };
};

const finish = async (db: HeedDb, study: StoredStudy, session: StoredSession) => {
  for (let i = 0; i < session.items.length; i++) {
    const item = session.items[i]!;
    const steps = item.assistance === 'sequential' ? (['initial', 'final'] as const) : (['final'] as const);
    for (const phase of steps) {
      await commitAnswer(db, {
        session, findings: study.design.findings, step: { itemIndex: i, finding: 'target', phase }, call: 1, confidence: 50, ms: 10,
        shownAt: new Date().toISOString(), suggestion: null, cautionShown: false,
      });
    }
  }
};

const opened = async (db: HeedDb, study: StoredStudy, readerId: string, period: number) => {
  const reader = (await db.readers.get(readerId))!;
  const result = await openPeriod(db, study, reader, period, null);
  if (!result.open) throw new Error(result.message);
  return result.session;
};

describe('case sets: rename and delete', () => {
  it('renames a set with an event, and refuses an empty or taken name changing nothing', async () => {
    const db = fresh();
    const { set } = await setUp(db);
    await renameCaseSet(db, set.id, '  Halden April ');
    expect((await db.caseSets.get(set.id))?.name).toBe('Halden April');
    expect((await db.events.where('type').equals('case-set-renamed').toArray())[0]?.detail).toMatchObject({ from: 'Halden March', to: 'Halden April' });
    const manifest = tinyManifest(3);
    await saveCaseSet(db, { name: 'Korvik', source: 'import', manifest, images: tinyImages(manifest) });
    const before = await snapshot(db);
    await expect(renameCaseSet(db, set.id, '   ')).rejects.toThrow(/name is empty/);
    await expect(renameCaseSet(db, set.id, 'korvik')).rejects.toThrow(/already named “Korvik”/);
    expect(await snapshot(db)).toBe(before);
  });

  it('refuses to delete a set in use, naming the study; deletes it with its images once free', async () => {
    const db = fresh();
    const { set, study } = await setUp(db);
    const before = await snapshot(db);
    await expect(deleteCaseSet(db, set.id)).rejects.toThrow(/used by the study “Pilot”/);
    expect(await snapshot(db)).toBe(before);
    await deleteStudy(db, study.id, { withoutBundle: true });
    await deleteCaseSet(db, set.id);
    expect(await db.caseSets.count()).toBe(0);
    expect(await db.images.count()).toBe(0);
    expect(await db.events.where('type').equals('case-set-deleted').count()).toBe(1);
  });

  it('does not delete the generated demo set', async () => {
    const db = fresh();
    const manifest = tinyManifest(3);
    const demo = await saveCaseSet(db, { name: 'Demo', source: 'demo', manifest, images: tinyImages(manifest) });
    await expect(deleteCaseSet(db, demo.id)).rejects.toThrow(/demo set/);
    expect(await db.caseSets.count()).toBe(1);
  });
});

describe('studies: edit a draft, rename, delete, status', () => {
  it('edits a draft design (reassigning enrolled readers) and refuses once the first reader starts', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const r1 = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 3 });
    const three = { ...study.design, sequences: [
      { label: 'A', periods: ['none', 'sequential'] as const }, { label: 'B', periods: ['sequential', 'none'] as const },
      { label: 'C', periods: ['concurrent', 'none'] as const },
    ].map((s) => ({ label: s.label, periods: [...s.periods] })) };
    const edited = await changeStudyDesign(db, study, three);
    expect(edited.design.sequences.map((s) => s.label)).toEqual(['A', 'B', 'C']);
    expect((await db.readers.get(r1.id))?.sequenceIndex).toBeLessThan(3);
    await opened(db, edited, r1.id, 1);
    expect((await getStudy(db, study.id)).lockedAt).not.toBeNull();
    const before = await snapshot(db);
    await expect(changeStudyDesign(db, edited, { ...edited.design, washoutDays: 7 })).rejects.toThrow(/is locked/);
    expect(await snapshot(db)).toBe(before);
  });

  it('renames a study and refuses an empty name', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    await renameStudy(db, study.id, 'Pilot, Halden only');
    expect((await getStudy(db, study.id)).name).toBe('Pilot, Halden only');
    const before = await snapshot(db);
    await expect(renameStudy(db, study.id, '')).rejects.toThrow(/name is empty/);
    expect(await snapshot(db)).toBe(before);
    expect((await eventsOfStudy(db, study.id)).map((e) => e.type)).toContain('study-renamed');
  });

  it('deletes a study only with "delete without a bundle", removing its readers, sessions, reads and events', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const r1 = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 3 });
    await finish(db, study, await opened(db, study, r1.id, 1));
    const before = await snapshot(db);
    await expect(deleteStudy(db, study.id, { withoutBundle: false })).rejects.toThrow(/No bundle of “Pilot” was saved/);
    expect(await snapshot(db)).toBe(before);
    const deleted = await deleteStudy(db, study.id, { withoutBundle: true });
    expect(deleted.reads).toBeGreaterThan(0);
    expect([await db.studies.count(), await db.readers.count(), await db.sessions.count(), await db.reads.count()]).toEqual([0, 0, 0, 0]);
    expect(await db.events.where('studyId').equals(study.id).count()).toBe(0);
    expect((await db.events.where('type').equals('study-deleted').toArray())[0]?.detail).toMatchObject({ name: 'Pilot', withoutBundle: true });
  });

  it('is a draft, then reading, then finished when every period of every active reader is complete', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const r1 = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 3 });
    const r2 = await enrolInStudy(db, study, { code: 'R02', role: 'resident', years: 1 });
    expect(await statusOfStudy(db, await getStudy(db, study.id))).toBe('draft');
    for (const period of [1, 2]) await finish(db, study, await opened(db, study, r1.id, period));
    expect(await statusOfStudy(db, await getStudy(db, study.id))).toBe('reading');
    await finish(db, study, await opened(db, study, r2.id, 1));
    expect(await statusOfStudy(db, await getStudy(db, study.id))).toBe('reading');
    await withdrawReader(db, r2.id, 'moved to another hospital', 'QO-1');
    expect(await statusOfStudy(db, await getStudy(db, study.id))).toBe('finished');
  });
});

describe('readers: correct, delete, withdraw', () => {
  it('corrects a code before the reader starts, with the enrolment rules, and refuses after', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const r1 = await enrolInStudy(db, study, { code: 'R0l', role: 'radiologist', years: 3 });
    await enrolInStudy(db, study, { code: 'R02', role: 'radiologist', years: 3 });
    const before = await snapshot(db);
    await expect(correctReaderCode(db, r1.id, ' ')).rejects.toThrow(/code is empty/);
    await expect(correctReaderCode(db, r1.id, 'r02')).rejects.toThrow(/R02|r02.*already enrolled/);
    await expect(correctReaderCode(db, r1.id, 'Dr Smith')).rejects.toThrow(/letters, digits/);
    expect(await snapshot(db)).toBe(before);
    await correctReaderCode(db, r1.id, 'R01');
    expect((await listReaders(db, study.id)).map((r) => r.code)).toEqual(['R01', 'R02']);
    await opened(db, study, r1.id, 1);
    const started = await snapshot(db);
    await expect(correctReaderCode(db, r1.id, 'R03')).rejects.toThrow(/R01 has started reading/);
    expect(await snapshot(db)).toBe(started);
  });

  it('deletes a reader not yet started; the next enrolment fills the slot; a started reader is refused', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const r1 = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 3 });
    const r2 = await enrolInStudy(db, study, { code: 'R02', role: 'radiologist', years: 3 });
    await deleteReader(db, r2.id);
    const r3 = await enrolInStudy(db, study, { code: 'R03', role: 'radiologist', years: 3 });
    expect([r3.slot, r3.sequenceIndex]).toEqual([r2.slot, r2.sequenceIndex]);
    await opened(db, study, r1.id, 1);
    const before = await snapshot(db);
    await expect(deleteReader(db, r1.id)).rejects.toThrow(/cannot be deleted/);
    expect(await snapshot(db)).toBe(before);
    expect((await eventsOfStudy(db, study.id)).map((e) => e.type)).toContain('reader-deleted');
  });

  it('withdraws a reader with a logged reason; their reads stay, marked withdrawn, and no period opens for them', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const r1 = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 3 });
    const r2 = await enrolInStudy(db, study, { code: 'R02', role: 'radiologist', years: 3 });
    await finish(db, study, await opened(db, study, r1.id, 1));
    await finish(db, study, await opened(db, study, r2.id, 1));
    await opened(db, study, r1.id, 2);
    const before = await snapshot(db);
    await expect(withdrawReader(db, r1.id, '  ', 'QO-1')).rejects.toThrow(/needs a reason/);
    await expect(withdrawReader(db, r1.id, 'ill', '')).rejects.toThrow(/who records it/);
    expect(await snapshot(db)).toBe(before);
    await withdrawReader(db, r1.id, 'left the department', 'QO-1');
    await expect(withdrawReader(db, r1.id, 'again', 'QO-1')).rejects.toThrow(/already withdrawn/);
    const rows = await studyReadRows(db, study.id);
    expect(new Set(rows.filter((r) => r.reader_id === 'R01').map((r) => r.withdrawn))).toEqual(new Set([1]));
    expect(new Set(rows.filter((r) => r.reader_id === 'R02').map((r) => r.withdrawn))).toEqual(new Set([0]));
    expect(rows.filter((r) => r.reader_id === 'R01').length).toBe(6);
    const event = (await eventsOfStudy(db, study.id)).find((e) => e.type === 'reader-withdrawn');
    expect(event?.detail).toMatchObject({ code: 'R01', reason: 'left the department', by: 'QO-1' });
    const gate = await openPeriod(db, study, (await db.readers.get(r1.id))!, 2, null);
    expect(gate).toMatchObject({ open: false, message: expect.stringMatching(/withdrawn/) });
    expect((await unfinishedSessions(db)).map((u) => u.readerCode)).not.toContain('R01');
  });
});
