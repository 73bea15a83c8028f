import 'fake-indexeddb/auto';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { eventsOfStudy } from '../../../src/store/events';
import { studyReadRows } from '../../../src/store/read-log-rows';
import { commitAnswer, getSession, sessionPosition } from '../../../src/store/sessions';
import { skipCase } from '../../../src/store/skip-case';
import { createStudyFromDesign, enrolInStudy, openPeriod } from '../../../src/store/study-service';
import { tinyDesign, tinyImages, tinyManifest } from '../support/tiny-study';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-skip-${process.pid}-${++n}`);

describe('skipping a case that cannot be shown (store)', () => {
  it('stores the skip with its reason, moves the position on, and a stale session copy still commits the next case', async () => {
    const db = fresh();
    const manifest = tinyManifest(6);
    const set = await saveCaseSet(db, { name: 'tiny', source: 'import', manifest, images: tinyImages(manifest) });
    const study = await createStudyFromDesign(db, 'Skip study', set.id, tinyDesign());
    const reader = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 4 });
    const opened = await openPeriod(db, study, reader, 1, null);
    if (!opened.open) throw new Error(opened.message);
    const stale = opened.session;
    const first = stale.items[0]!.caseId;
    await expect(skipCase(db, stale.id, study.design.findings, stale.items[1]!.caseId, 'image-undecodable', 'x')).rejects.toThrow(/only the case on screen/);
    const next = await skipCase(db, stale.id, study.design.findings, first, 'image-undecodable', 'The source image could not be decoded');
    if (next.done) throw new Error('not done');
    expect(next.item.caseId).toBe(stale.items[1]!.caseId);
    const stored = await getSession(db, stale.id);
    expect(stored?.skipped).toEqual([first]);
    expect(await sessionPosition(db, stored!, study.design.findings)).toEqual(next);
    const events = await eventsOfStudy(db, study.id);
    expect(events.find((e) => e.type === 'case-skipped')?.detail).toMatchObject({ caseId: first, reason: 'image-undecodable' });
    // the reading view's copy of the session predates the skip: its next commit is still accepted
    const steps = next.item.assistance === 'sequential' ? (['initial', 'final'] as const) : (['final'] as const);
    for (const phase of steps) {
      await commitAnswer(db, {
        session: stale, findings: study.design.findings, step: { itemIndex: 1, finding: 'target', phase }, call: 1, confidence: 50, ms: 10,
        shownAt: new Date().toISOString(), suggestion: null, cautionShown: false,
      });
    }
    const rows = await studyReadRows(db, study.id);
    expect(rows.map((r) => r.case_id)).not.toContain(first);
  });
});
