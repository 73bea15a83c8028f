import 'fake-indexeddb/auto';
import { clockBackwardsProblem, periodEnd } from '../../../src/core/washout';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { eventsOfStudy } from '../../../src/store/events';
import { commitAnswer } from '../../../src/store/sessions';
import { createStudyFromDesign, enrolInStudy, openPeriod } from '../../../src/store/study-service';
import type { StoredSession, StoredStudy } from '../../../src/store/records';
import { tinyDesign, tinyImages, tinyManifest } from '../support/tiny-study';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-clock-${process.pid}-${++n}`);
const DAY = 24 * 3600 * 1000;

const finish = async (db: HeedDb, study: StoredStudy, session: StoredSession) => {
  for (let i = 0; i < session.items.length; i++) {
    const steps = session.items[i]!.assistance === 'sequential' ? (['initial', 'final'] as const) : (['final'] as const);
    for (const phase of steps) {
      await commitAnswer(db, {
        session, findings: study.design.findings, step: { itemIndex: i, finding: 'target', phase }, call: 1, confidence: 50, ms: 10,
        shownAt: new Date().toISOString(), suggestion: null, cautionShown: false,
      });
    }
  }
};

const setUp = async (washoutDays: number) => {
  const db = fresh();
  const manifest = tinyManifest(6);
  const set = await saveCaseSet(db, { name: 'tiny', source: 'import', manifest, images: tinyImages(manifest) });
  const study = await createStudyFromDesign(db, 'Clock study', set.id, { ...tinyDesign(), washoutDays });
  const reader = await enrolInStudy(db, study, { code: 'R01', role: 'radiologist', years: 4 });
  const p1 = await openPeriod(db, study, reader, 1, null);
  if (!p1.open) throw new Error(p1.message);
  await finish(db, study, p1.session);
  return { db, study, reader, session: p1.session };
};

describe('the washout and a clock that moved backwards', () => {
  it('names both times when the clock reads earlier than the latest stored time (beyond a minute of slack)', () => {
    const stored = new Date('2026-03-01T10:00:00Z');
    expect(clockBackwardsProblem(new Date('2026-02-01T10:00:00Z'), stored)).toMatch(/2026-02-01 10:00 UTC.*2026-03-01 10:00 UTC/);
    expect(clockBackwardsProblem(new Date('2026-03-01T09:59:30Z'), stored)).toBeNull();
    expect(clockBackwardsProblem(new Date('2026-02-01T10:00:00Z'), null)).toBeNull();
    expect(periodEnd(new Date('2026-01-01T00:00:00Z'), [stored])).toEqual({ end: stored, backwards: true });
    expect(periodEnd(stored, [new Date('2026-01-01T00:00:00Z')])).toEqual({ end: stored, backwards: false });
  });

  it('refuses to open a period while the clock reads earlier than stored events, and logs clock-backwards', async () => {
    const { db, study, reader } = await setUp(0);
    const setBack = new Date(Date.now() - 2 * DAY);
    const refused = await openPeriod(db, study, reader, 2, null, setBack);
    expect(refused).toMatchObject({ open: false, message: expect.stringMatching(/^Period 2 of R01 was not opened\. The computer's clock reads .* set back/) });
    expect(await db.sessions.count()).toBe(1);
    const logged = (await eventsOfStudy(db, study.id)).filter((e) => e.type === 'clock-backwards');
    expect(logged).toHaveLength(1);
    expect(logged[0]?.detail).toMatchObject({ readerId: reader.id, period: 2, clock: setBack.toISOString() });
    // with the clock right again, it opens
    expect((await openPeriod(db, study, reader, 2, null)).open).toBe(true);
  });

  it('measures the washout from the latest time stored for the period, not a completion stamped by a clock set back', async () => {
    const { db, study, reader, session } = await setUp(14);
    // the clock was set back 30 days when the period was completed
    await db.sessions.update(session.id, { completedAt: new Date(Date.now() - 30 * DAY).toISOString() });
    const refused = await openPeriod(db, study, reader, 2, null);
    expect(refused).toMatchObject({ open: false, message: expect.stringMatching(/14-day washout/) });
    const logged = (await eventsOfStudy(db, study.id)).filter((e) => e.type === 'clock-backwards');
    expect(logged[0]?.detail).toMatchObject({ readerId: reader.id, period: 1 });
    expect((await openPeriod(db, study, reader, 2, null, new Date(Date.now() + 15 * DAY))).open).toBe(true);
  });
});
