import 'fake-indexeddb/auto';
import { readBundle } from '../../../src/io/bundle/read';
import { writeBundle } from '../../../src/io/bundle/write';
import { gatherStudySnapshot, MERGE_TRIES, mergeStudyBundle, openStudyBundle } from '../../../src/store/bundle';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { deleteCaseSet } from '../../../src/store/case-set-lifecycle';
import { enrolReader } from '../../../src/store/readers';
import { studyReadRows } from '../../../src/store/read-log-rows';
import { commitAnswer, startSession } from '../../../src/store/sessions';
import { getStudy } from '../../../src/store/studies';
import { freshDb, readTinyStudy } from '../support/bundle-study';
import { tinyImages, tinyItems } from '../support/tiny-study';

describe('merging a workstation bundle into a stored study', () => {
  it('adds the other workstation\'s reads, then changes nothing when merged again, and refuses another study', async () => {
    const a = freshDb();
    const { study, manifest } = await readTinyStudy(a);
    const b = freshDb();
    const opened = await openStudyBundle(b, 'a.zip', writeBundle(await gatherStudySnapshot(a, study.id, true)));
    expect(opened.ok).toBe(true);
    // workstation B enrols and reads a third reader
    const restored = await getStudy(b, study.id);
    const reader = await enrolReader(b, study.id, { code: 'R03', role: 'resident', years: 1 }, () => 0);
    const session = await startSession(b, { study: restored, readerId: reader.id, period: 1, items: tinyItems(manifest, 'concurrent'), orderSeed: 's', override: null });
    for (let i = 0; i < manifest.cases.length; i++) {
      await commitAnswer(b, { session, findings: ['target'], shownAt: `2026-12-02T09:0${i}:00.000Z`, suggestion: { call: 1, score: 0.7, planted: false }, cautionShown: false,
        step: { itemIndex: i, finding: 'target', phase: 'final' }, call: 1, confidence: 70, ms: 1000 + i });
    }
    const fromB = writeBundle(await gatherStudySnapshot(b, study.id));

    const merged = await mergeStudyBundle(a, study.id, 'b.zip', fromB);
    expect(merged).toEqual({ ok: true, added: 4 });
    // the merged study's completed sessions are packed in the merge's transaction (src/store/read-packs.ts)
    const completed = (await a.sessions.where('studyId').equals(study.id).toArray()).filter((s) => s.completedAt !== null).map((s) => s.id).sort();
    expect(completed.length).toBeGreaterThan(0);
    expect((await a.packs.where('studyId').equals(study.id).toArray()).map((p) => `${p.sessionId}:${p.count}`).sort())
      .toEqual(await Promise.all(completed.map(async (id) => `${id}:${await a.reads.where('sessionId').equals(id).count()}`)));
    expect(await studyReadRows(a, study.id)).toEqual(await studyReadRows(b, study.id));
    // the merged study is a sound chain: its bundle verifies
    expect(readBundle(writeBundle(await gatherStudySnapshot(a, study.id))).ok).toBe(true);
    const before = (await a.events.toArray()).map((e) => e.hash);
    expect(await mergeStudyBundle(a, study.id, 'b.zip', fromB)).toEqual({ ok: true, added: 0 });
    expect((await a.events.toArray()).map((e) => e.hash)).toEqual(before);

    const other = freshDb();
    const { study: second } = await readTinyStudy(other);
    const refused = await mergeStudyBundle(a, study.id, 'other.zip', writeBundle(await gatherStudySnapshot(other, second.id)));
    expect(refused).toEqual({ ok: false, message: 'other.zip was not merged: it holds another study ("Bundle study").' });
  });
});

describe('merging while another window of the workstation records answers', () => {
  // Workstation A holds the study; B adds reader R03's reads; on A, reader R04 is reading in another
  // window (a second connection to A's database) while the coordinator merges B's bundle.
  const setUp = async () => {
    const a = freshDb();
    const { study, manifest } = await readTinyStudy(a);
    const b = freshDb();
    await openStudyBundle(b, 'a.zip', writeBundle(await gatherStudySnapshot(a, study.id, true)));
    const onB = await getStudy(b, study.id);
    const r03 = await enrolReader(b, study.id, { code: 'R03', role: 'resident', years: 1 }, () => 0);
    const sessionB = await startSession(b, { study: onB, readerId: r03.id, period: 1, items: tinyItems(manifest, 'concurrent'), orderSeed: 's', override: null });
    for (let i = 0; i < manifest.cases.length; i++) {
      await commitAnswer(b, { session: sessionB, findings: ['target'], shownAt: `2026-12-02T09:0${i}:00.000Z`, suggestion: { call: 1, score: 0.7, planted: false }, cautionShown: false,
        step: { itemIndex: i, finding: 'target', phase: 'final' }, call: 1, confidence: 70, ms: 1000 + i });
    }
    const fromB = writeBundle(await gatherStudySnapshot(b, study.id));
    const onA = await getStudy(a, study.id);
    const r04 = await enrolReader(a, study.id, { code: 'R04', role: 'resident', years: 2 }, () => 1);
    const sessionA = await startSession(a, { study: onA, readerId: r04.id, period: 1, items: tinyItems(manifest, 'concurrent'), orderSeed: 's', override: null });
    const otherWindow = openHeedDb(a.name);
    let answered = 0;
    /** R04 answers the next case in the other window (its own connection), committed before this resolves. */
    const answerInOtherWindow = async () => {
      const i = answered++;
      await commitAnswer(otherWindow, { session: sessionA, findings: ['target'], shownAt: `2026-12-03T09:0${i}:00.000Z`, suggestion: { call: 1, score: 0.7, planted: false }, cautionShown: false,
        step: { itemIndex: i, finding: 'target', phase: 'final' }, call: 0, confidence: 55, ms: 2000 + i });
    };
    /** Runs `before` each time the merge opens a read-write transaction on A, before the transaction starts. */
    const beforeEachWrite = (before: (n: number) => Promise<void>) => {
      const original = a.transaction.bind(a) as unknown as (...args: unknown[]) => Promise<unknown>;
      let n = 0;
      vi.spyOn(a, 'transaction').mockImplementation((async (...args: unknown[]) => {
        if (args[0] === 'rw') await before(n++);
        return original(...args);
      }) as never);
    };
    const sessionCases = (n: number) => sessionA.items.slice(0, n).map((item) => item.caseId);
    return { a, study, fromB, r04, otherWindow, answerInOtherWindow, beforeEachWrite, sessionCases };
  };

  it('keeps an answer committed between gathering the study and storing the merge', async () => {
    const { a, study, fromB, r04, otherWindow, answerInOtherWindow, beforeEachWrite, sessionCases } = await setUp();
    await answerInOtherWindow();
    beforeEachWrite(async (n) => { if (n === 0) await answerInOtherWindow(); });

    expect(await mergeStudyBundle(a, study.id, 'b.zip', fromB)).toEqual({ ok: true, added: 4 });
    vi.restoreAllMocks();
    // both of R04's answers survive, as reads and in the chain, and the merged study still verifies
    const r04Reads = await a.reads.where('[studyId+readerId]').equals([study.id, r04.id]).toArray();
    expect(r04Reads.map((r) => `${r.caseId}:${r.final?.call}`).sort()).toEqual(sessionCases(2).map((c) => `${c}:0`).sort());
    expect(readBundle(writeBundle(await gatherStudySnapshot(a, study.id))).ok).toBe(true);
    // and the other window goes on answering after the merge, on the merged chain
    await answerInOtherWindow();
    expect(await a.reads.where('[studyId+readerId]').equals([study.id, r04.id]).count()).toBe(3);
    expect(readBundle(writeBundle(await gatherStudySnapshot(otherWindow, study.id))).ok).toBe(true);
  });

  it('gives up with one message after a bounded number of tries, merging nothing and losing nothing', async () => {
    const { a, study, fromB, r04, answerInOtherWindow, beforeEachWrite } = await setUp();
    beforeEachWrite(() => answerInOtherWindow());
    const refused = await mergeStudyBundle(a, study.id, 'b.zip', fromB);
    vi.restoreAllMocks();
    expect(refused.ok).toBe(false);
    expect(refused.ok ? '' : refused.message).toMatch(/^b\.zip was not merged: the study kept changing in another window .*\(3 tries\)/);
    expect(await a.reads.where('[studyId+readerId]').equals([study.id, r04.id]).count()).toBe(MERGE_TRIES);
    expect((await a.readers.where('studyId').equals(study.id).toArray()).map((r) => r.code).sort()).toEqual(['R01', 'R02', 'R04']);
    expect(readBundle(writeBundle(await gatherStudySnapshot(a, study.id))).ok).toBe(true);
  });
});

describe('restoring while another window changes the workstation', () => {
  const spyBeforeWrite = (db: HeedDb, before: () => Promise<void>) => {
    const original = db.transaction.bind(db) as unknown as (...args: unknown[]) => Promise<unknown>;
    vi.spyOn(db, 'transaction').mockImplementation((async (...args: unknown[]) => {
      if (args[0] === 'rw') await before();
      return original(...args);
    }) as never);
  };

  it('refuses, storing nothing, when the matching case set is deleted between the match and the transaction', async () => {
    const a = freshDb();
    const { study, manifest } = await readTinyStudy(a);
    const read = readBundle(writeBundle(await gatherStudySnapshot(a, study.id)));
    if (!read.ok) throw new Error(read.fault.message);
    const b = freshDb();
    const set = await saveCaseSet(b, { name: 'tiny here', source: 'import', manifest, images: tinyImages(manifest) });
    const otherWindow = openHeedDb(b.name);
    spyBeforeWrite(b, () => deleteCaseSet(otherWindow, set.id));
    const opened = await openStudyBundle(b, 'a.zip', writeBundle(read.snapshot));
    vi.restoreAllMocks();
    expect(opened).toEqual({ ok: false, message: 'a.zip was not opened: The case set "tiny here" was deleted meanwhile (another window): open the bundle again.' });
    expect(await b.studies.count()).toBe(0);
    expect(await b.reads.count()).toBe(0);
  });

  it('refuses with the usual message when another window restored the same study meanwhile', async () => {
    const a = freshDb();
    const { study } = await readTinyStudy(a);
    const zip = writeBundle(await gatherStudySnapshot(a, study.id, true));
    const b = freshDb();
    const otherWindow = openHeedDb(b.name);
    spyBeforeWrite(b, async () => { await openStudyBundle(otherWindow, 'a.zip', zip); });
    const opened = await openStudyBundle(b, 'a.zip', zip);
    vi.restoreAllMocks();
    expect(opened).toEqual({ ok: false, message: 'a.zip was not opened: Study "Bundle study" was stored on this workstation meanwhile (another window): open it and merge the bundle into it instead.' });
    expect(await b.studies.count()).toBe(1);
    expect(await b.caseSets.count()).toBe(1);
  });
});
