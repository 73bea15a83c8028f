import 'fake-indexeddb/auto';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { eventsOfStudy } from '../../../src/store/events';
import { commitAnswer } from '../../../src/store/sessions';
import { createStudyFromDesign, enrolInStudy, openPeriod } from '../../../src/store/study-service';
import type { StoredSession, StoredStudy } from '../../../src/store/records';
import { tinyDesign, tinyImages, tinyManifest } from '../support/tiny-study';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-service-${process.pid}-${++n}`);

const setUp = async (db: HeedDb) => {
  const manifest = tinyManifest(6);
  const set = await saveCaseSet(db, { name: 'tiny', source: 'import', manifest, images: tinyImages(manifest) });
  const study = await createStudyFromDesign(db, 'Washout study', set.id, { ...tinyDesign(), washoutDays: 14 });
  return { study };
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

describe('opening periods behind the washout', () => {
  it('refuses a design that does not fit the case set, storing nothing', async () => {
    const db = fresh();
    const manifest = tinyManifest();
    const set = await saveCaseSet(db, { name: 't', source: 'import', manifest, images: tinyImages(manifest) });
    await expect(createStudyFromDesign(db, 'Bad', set.id, { ...tinyDesign(), findings: ['no-such-finding'] })).rejects.toThrow(/no-such-finding/);
    expect(await db.studies.count()).toBe(0);
  });

  it('refuses period 2 before period 1 is complete and before the washout, and logs an override with its reason', async () => {
    const db = fresh();
    const { study } = await setUp(db);
    const reader = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 4 });
    expect(await openPeriod(db, study, reader, 2, null)).toMatchObject({ open: false, message: expect.stringMatching(/Period 1 of R01 is not complete/) });
    const p1 = await openPeriod(db, study, reader, 1, null);
    if (!p1.open) throw new Error(p1.message);
    expect(p1.session.items.map((i) => i.practice).slice(0, 1)).toEqual([true]); // practice first
    await finish(db, study, p1.session);

    const soon = new Date(Date.now() + 3 * 24 * 3600 * 1000);
    const early = await openPeriod(db, study, reader, 2, null, soon);
    expect(early).toMatchObject({ open: false, message: expect.stringMatching(/14-day washout/) });
    // the message names the reader and the period, and when it opens
    expect(early).toMatchObject({ message: expect.stringMatching(/^Period 2 of R01 is not open yet\. It opens at \d{4}-\d\d-\d\d \d\d:\d\d UTC/) });
    const noReason = await openPeriod(db, study, reader, 2, { reason: ' ', by: 'coordinator', at: soon.toISOString() }, soon);
    expect(noReason.open).toBe(false);
    expect(await db.sessions.count()).toBe(1);

    const override = { reason: 'reader leaves the department next week', by: 'QO-1', at: soon.toISOString() };
    const opened = await openPeriod(db, study, reader, 2, override, soon);
    expect(opened.open).toBe(true);
    if (!opened.open) return;
    expect(opened.session.override).toEqual(override);
    const logged = (await eventsOfStudy(db, study.id)).filter((e) => e.type === 'washout-overridden');
    expect(logged).toHaveLength(1);
    expect(logged[0]?.detail).toMatchObject({ reason: override.reason, by: 'QO-1' });

    const after = new Date(Date.now() + 15 * 24 * 3600 * 1000);
    const reader2 = await enrolInStudy(db, study, { code: 'R02', role: 'resident', years: null });
    const q1 = await openPeriod(db, study, reader2, 1, null);
    if (!q1.open) throw new Error(q1.message);
    await finish(db, study, q1.session);
    const q2 = await openPeriod(db, study, reader2, 2, null, after);
    expect(q2.open).toBe(true);
    if (q2.open) expect(q2.session.override).toBeNull();
  });

  it('gives each reader the same schedule on any workstation (from the design seed and the reader code)', async () => {
    const a = fresh();
    const b = fresh();
    const orders: string[][] = [];
    for (const db of [a, b]) {
      const { study } = await setUp(db);
      const reader = await enrolInStudy(db, study, { code: 'R09', role: 'radiologist', years: null });
      const opened = await openPeriod(db, study, reader, 1, null);
      if (!opened.open) throw new Error(opened.message);
      orders.push(opened.session.items.map((i) => i.caseId));
    }
    expect(orders[0]).toEqual(orders[1]);
  });
});
