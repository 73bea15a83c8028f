import { readBundle } from '../../../src/io/bundle/read';
import { writeBundle } from '../../../src/io/bundle/write';
import { gatherStudySnapshot, mergeStudyBundle, openStudyBundle } from '../../../src/store/bundle';
import { enrolReader } from '../../../src/store/readers';
import { studyReadRows } from '../../../src/store/read-log-rows';
import { commitAnswer, startSession } from '../../../src/store/sessions';
import { getStudy } from '../../../src/store/studies';
import { freshDb, readTinyStudy } from '../support/bundle-study';
import { tinyItems } from '../support/tiny-study';

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
