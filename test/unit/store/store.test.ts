import 'fake-indexeddb/auto';
import { Dexie } from 'dexie';
import { openHeedDb, SCHEMA_V1, type HeedDb } from '../../../src/store/db';
import { saveCaseSet, listCaseSets } from '../../../src/store/case-sets';
import { enrolReader, listReaders } from '../../../src/store/readers';
import { createStudy, updateStudyDesign, getStudy } from '../../../src/store/studies';
import { commitAnswer, logSessionMoment, sessionPosition, startSession } from '../../../src/store/sessions';
import { studyReadRows } from '../../../src/store/read-log-rows';
import { eventsOfStudy } from '../../../src/store/events';
import { canonicalJson } from '../../../src/core/chain';
import { tinyDesign, tinyImages, tinyItems, tinyManifest, tinySuggestions } from '../support/tiny-study';

let counter = 0;
const freshDb = (): HeedDb => openHeedDb(`heed-test-${process.pid}-${++counter}`);

const setUpStudy = async (db: HeedDb) => {
  const manifest = tinyManifest();
  const set = await saveCaseSet(db, { name: 'tiny', source: 'demo', manifest, images: tinyImages(manifest) });
  const study = await createStudy(db, { name: 'S', caseSetId: set.id, design: tinyDesign(), suggestions: tinySuggestions(manifest) });
  return { manifest, set, study };
};

describe('store', () => {
  it('stores a case set with its images in one piece', async () => {
    const db = freshDb();
    const { set } = await setUpStudy(db);
    expect((await listCaseSets(db)).map((s) => s.id)).toEqual([set.id]);
    expect(await db.images.where('setId').equals(set.id).count()).toBe(4);
  });

  it('stores nothing of a case set whose images fail to store', async () => {
    const db = freshDb();
    const manifest = tinyManifest();
    const images = tinyImages(manifest);
    images.push({ ...images[0]! }); // same [setId+path] twice: the bulk add fails inside the transaction
    await expect(saveCaseSet(db, { name: 'dup', source: 'import', manifest, images })).rejects.toThrow();
    expect(await db.caseSets.count()).toBe(0);
    expect(await db.images.count()).toBe(0);
    expect(await db.events.count()).toBe(0);
  });

  it('refuses empty and duplicate reader codes with a clear message and assigns sequences', async () => {
    const db = freshDb();
    const { study } = await setUpStudy(db);
    const alternate = (slot: number) => slot % 2;
    await enrolReader(db, study.id, { code: 'R01', role: 'radiologist', years: 7 }, alternate);
    await expect(enrolReader(db, study.id, { code: '  ', role: 'x', years: null }, alternate)).rejects.toThrow(/empty/);
    await expect(enrolReader(db, study.id, { code: 'r01', role: 'x', years: null }, alternate)).rejects.toThrow(/already enrolled/);
    await expect(enrolReader(db, study.id, { code: 'R 2', role: 'x', years: null }, alternate)).rejects.toThrow(/letters, digits/);
    await enrolReader(db, study.id, { code: 'R02', role: 'resident', years: null }, alternate);
    expect((await listReaders(db, study.id)).map((r) => [r.code, r.sequenceIndex])).toEqual([['R01', 0], ['R02', 1]]);
  });

  it('commits answers in order, resumes from a new connection, locks the design and has no way back', async () => {
    const name = `heed-test-${process.pid}-${++counter}`;
    let db = openHeedDb(name);
    const { manifest, study } = await setUpStudy(db);
    const reader = await enrolReader(db, study.id, { code: 'R01', role: 'radiologist', years: 3 }, () => 0);
    const session = await startSession(db, { study, readerId: reader.id, period: 1, items: tinyItems(manifest, 'sequential'), orderSeed: 's1', override: null });
    expect((await getStudy(db, study.id)).lockedAt).not.toBeNull();
    await expect(updateStudyDesign(db, study.id, tinyDesign(), [])).rejects.toThrow(/locked/);

    const base = { session, findings: ['target'], shownAt: '2026-12-01T10:00:00.000Z', suggestion: { call: 1 as const, score: 0.7, planted: false }, cautionShown: false };
    await commitAnswer(db, { ...base, step: { itemIndex: 0, finding: 'target', phase: 'initial' }, call: 0, confidence: 40, ms: 900 });
    await commitAnswer(db, { ...base, step: { itemIndex: 0, finding: 'target', phase: 'final' }, call: 1, confidence: 60, ms: 1500 });
    await commitAnswer(db, { ...base, step: { itemIndex: 1, finding: 'target', phase: 'initial' }, call: 1, confidence: 80, ms: 700 });
    db.close();

    db = openHeedDb(name); // a new connection, as after a crash and relaunch
    const position = await sessionPosition(db, session, ['target']);
    expect(position.done).toBe(false);
    if (position.done) return;
    expect([position.item.caseId, position.step.phase]).toEqual(['k2', 'final']);
    await expect(commitAnswer(db, { ...base, step: { itemIndex: 0, finding: 'target', phase: 'final' }, call: 0, confidence: 10, ms: 1 }))
      .rejects.toThrow(/not the current one/);
    const read = await db.reads.get(`${session.id}/k1/target`);
    expect(read?.final).toEqual({ call: 1, confidence: 60, ms: 1500 });
    const types = (await eventsOfStudy(db, study.id)).map((e) => e.type);
    expect(types).toEqual(['study-created', 'reader-enrolled', 'design-locked', 'session-started', 'initial-committed', 'final-committed', 'initial-committed']);
  });

  it('stores answer events whose detail is already in canonical key order (the hash and every bundle take the fast path)', async () => {
    const db = freshDb();
    const { manifest, study } = await setUpStudy(db);
    const reader = await enrolReader(db, study.id, { code: 'R01', role: 'radiologist', years: 3 }, () => 0);
    const session = await startSession(db, { study, readerId: reader.id, period: 1, items: tinyItems(manifest, 'sequential'), orderSeed: 's1', override: null });
    const base = { session, findings: ['target'], shownAt: '2026-12-01T10:00:00.000Z', suggestion: { call: 1 as const, score: 0.7, planted: true }, cautionShown: true };
    await commitAnswer(db, { ...base, step: { itemIndex: 0, finding: 'target', phase: 'initial' }, call: 0, confidence: 40, ms: 900, rating: 2 });
    await commitAnswer(db, { ...base, step: { itemIndex: 0, finding: 'target', phase: 'final' }, call: 1, confidence: 60, ms: 1500 });
    const answers = (await eventsOfStudy(db, study.id)).filter((e) => e.type.endsWith('-committed'));
    expect(answers).toHaveLength(2);
    // JSON.stringify keeps insertion order; canonicalJson sorts: equal only when the keys were stored sorted
    for (const e of answers) expect(JSON.stringify(e.detail)).toBe(canonicalJson(e.detail));
    const { hash: _hash, ...read } = (await db.reads.get(`${session.id}/k1/target`))!;
    expect(JSON.stringify(read)).toBe(canonicalJson(read));
  });

  it('refuses, inside the transaction and with nothing written, a commit for a step already answered, ahead of the current one, or from a stale window', async () => {
    const db = openHeedDb(`heed-test-${process.pid}-${++counter}`);
    const { manifest, study } = await setUpStudy(db);
    const reader = await enrolReader(db, study.id, { code: 'R01', role: 'radiologist', years: 3 }, () => 0);
    const session = await startSession(db, { study, readerId: reader.id, period: 1, items: tinyItems(manifest, 'sequential'), orderSeed: 's1', override: null });
    const base = { session, findings: ['target'], shownAt: '2026-12-01T10:00:00.000Z', suggestion: null, cautionShown: false, call: 1 as const, confidence: 50, ms: 800 };
    const step = (itemIndex: number, phase: 'initial' | 'final') => ({ itemIndex, finding: 'target', phase });
    const snapshot = async () => ({ reads: await db.reads.toArray(), events: (await eventsOfStudy(db, study.id)).length });

    await commitAnswer(db, { ...base, step: step(0, 'initial') });
    const after = await snapshot();
    // the same step twice (a double Enter, or a second window that still shows it)
    await expect(commitAnswer(db, { ...base, step: step(0, 'initial'), call: 0 })).rejects.toThrow(/not the current one/);
    // a step ahead of the current one (its initial call done, the final not yet)
    await expect(commitAnswer(db, { ...base, step: step(1, 'initial') })).rejects.toThrow(/not the current one/);
    // two windows racing for the same step: exactly one commit is stored
    const race = await Promise.allSettled([commitAnswer(db, { ...base, step: step(0, 'final') }), commitAnswer(db, { ...base, step: step(0, 'final'), call: 0 })]);
    expect(race.map((r) => r.status).sort()).toEqual(['fulfilled', 'rejected']);
    expect(await snapshot()).toEqual({ reads: expect.any(Array), events: after.events + 1 });
    expect((await db.reads.get(`${session.id}/k1/target`))?.final?.call).toBe(1);
    // a step the plan does not have
    await expect(commitAnswer(db, { ...base, step: step(9, 'final') })).rejects.toThrow(/has no step/);
    expect((await eventsOfStudy(db, study.id)).length).toBe(after.events + 1);
    const next = await commitAnswer(db, { ...base, step: step(1, 'initial') });
    expect(next.done ? null : [next.stepIndex, next.step.phase]).toEqual([3, 'final']);
  });

  it('links every answer to the stored head of the chain, also when another connection appended in between', async () => {
    const name = `heed-test-${process.pid}-${++counter}`;
    const db = openHeedDb(name);
    const { manifest, study } = await setUpStudy(db);
    const reader = await enrolReader(db, study.id, { code: 'R01', role: 'radiologist', years: 3 }, () => 0);
    const session = await startSession(db, { study, readerId: reader.id, period: 1, items: tinyItems(manifest, 'concurrent'), orderSeed: 's1', override: null });
    const base = { session, findings: ['target'], shownAt: '2026-12-01T10:00:00.000Z', suggestion: null, cautionShown: false, call: 1 as const, confidence: 50, ms: 800 };
    const step = (itemIndex: number) => ({ itemIndex, finding: 'target', phase: 'final' as const });
    await commitAnswer(db, { ...base, step: step(0) });
    await commitAnswer(db, { ...base, step: step(1) });
    // a second window (its own connection) logs a moment: this connection's last known head is now stale
    const other = openHeedDb(name);
    await logSessionMoment(other, session, 'paused', { caseId: 'k3', by: 'reader' });
    other.close();
    await commitAnswer(db, { ...base, step: step(2) });
    // and the same step again, after the commit: refused, nothing written
    await expect(commitAnswer(db, { ...base, step: step(2) })).rejects.toThrow(/not the current one/);
    const events = await eventsOfStudy(db, study.id);
    expect(events.map((e) => e.type).slice(-4)).toEqual(['final-committed', 'final-committed', 'paused', 'final-committed']);
    // each link's prev is the hash of the event stored before it on the chain
    for (let i = 1; i < events.length; i++) expect(events[i]?.prev).toBe(events[i - 1]?.hash);
    expect((await db.reads.get(`${session.id}/k3/target`))?.hash).toBe(events[events.length - 1]?.hash);
  });

  it('links an answer to its own chain when another study appended to the event log in between', async () => {
    const name = `heed-test-${process.pid}-${++counter}`;
    const db = openHeedDb(name);
    const { manifest, set, study } = await setUpStudy(db);
    const reader = await enrolReader(db, study.id, { code: 'R01', role: 'radiologist', years: 3 }, () => 0);
    const session = await startSession(db, { study, readerId: reader.id, period: 1, items: tinyItems(manifest, 'concurrent'), orderSeed: 's1', override: null });
    const base = { session, findings: ['target'], shownAt: '2026-12-01T10:00:00.000Z', suggestion: null, cautionShown: false, call: 1 as const, confidence: 50, ms: 800 };
    const step = (itemIndex: number) => ({ itemIndex, finding: 'target', phase: 'final' as const });
    await commitAnswer(db, { ...base, step: step(0) });
    // a second window creates another study: the newest event of the log is on that study's chain
    const other = openHeedDb(name);
    const second = await createStudy(other, { name: 'T', caseSetId: set.id, design: tinyDesign(), suggestions: tinySuggestions(manifest) });
    other.close();
    await commitAnswer(db, { ...base, step: step(1) });
    await commitAnswer(db, { ...base, step: step(2) });
    const events = await eventsOfStudy(db, study.id);
    expect(events.map((e) => e.type).slice(-3)).toEqual(['final-committed', 'final-committed', 'final-committed']);
    for (let i = 1; i < events.length; i++) expect(events[i]?.prev).toBe(events[i - 1]?.hash);
    expect((await eventsOfStudy(db, second.id)).map((e) => e.type)).toEqual(['study-created']);
  });

  it('marks the session complete on its last answer and exports read-log rows', async () => {
    const db = freshDb();
    const { manifest, study } = await setUpStudy(db);
    const reader = await enrolReader(db, study.id, { code: 'R07', role: 'resident', years: null }, () => 1);
    const session = await startSession(db, { study, readerId: reader.id, period: 2, items: tinyItems(manifest, 'concurrent'), orderSeed: 's', override: null });
    let done = false;
    for (let i = 0; i < manifest.cases.length; i++) {
      const s = study.suggestions[i]!;
      const next = await commitAnswer(db, {
        session, findings: ['target'], step: { itemIndex: i, finding: 'target', phase: 'final' }, call: (1 - s.call) as 0 | 1,
        confidence: 50 + i, ms: 1000 * (i + 1), shownAt: `2026-12-01T10:0${i}:00.000Z`, suggestion: s, cautionShown: i === 3,
      });
      done = next.done;
    }
    expect(done).toBe(true);
    expect((await db.sessions.get(session.id))?.completedAt).not.toBeNull();
    const rows = await studyReadRows(db, study.id);
    expect(rows).toHaveLength(4);
    expect(rows[0]).toMatchObject({ reader_id: 'R07', sequence: 'AU', period: 2, assistance: 'concurrent', case_id: 'k1', practice: 1, order: 1, truth: 0, ai_call: 1, final_call: 0, initial_call: null, total_ms: 1000 });
    expect(rows[2]).toMatchObject({ case_id: 'k3', ai_planted: 1, case_attributes: { scanner: 'Halden' } });
    expect(rows[3]).toMatchObject({ caution_shown: 1, final_confidence: 53 });
  });

  it('upgrades a version-1 database: reads gain their study, nothing is lost', async () => {
    const name = `heed-upgrade-${process.pid}`;
    const v1 = new Dexie(name);
    v1.version(1).stores(SCHEMA_V1);
    await v1.table('sessions').add({ id: 'rd/1', studyId: 'st1', readerId: 'rd', period: 1, items: [], orderSeed: 'x', startedAt: 'a', completedAt: null, override: null });
    await v1.table('reads').add({ id: 'rd/1/c1/target', sessionId: 'rd/1', readerId: 'rd', period: 1, caseId: 'c1', finding: 'target', initial: null, final: { call: 1, confidence: 90, ms: 1200 } });
    await v1.table('events').add({ at: 'a', type: 'old' });
    v1.close();

    const db = openHeedDb(name);
    await db.open();
    expect(db.verno).toBe(5);
    const reads = await db.reads.where('studyId').equals('st1').toArray();
    expect(reads.map((r) => [r.id, r.final?.ms])).toEqual([['rd/1/c1/target', 1200]]);
    expect((await db.events.toArray())[0]?.studyId).toBeNull();
  });
});
