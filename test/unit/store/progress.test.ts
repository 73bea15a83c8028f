// Answered-case counts for the study page and the start screen, loaded for many sessions at once:
// checked against the count made by hand from the answers committed in the test.
import 'fake-indexeddb/auto';
import { openHeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { enrolReader } from '../../../src/store/readers';
import { createStudy } from '../../../src/store/studies';
import { commitAnswer, startSession } from '../../../src/store/sessions';
import { answeredCases, answeredCasesOf, unfinishedSessions } from '../../../src/store/progress';
import { tinyDesign, tinyImages, tinyItems, tinyManifest, tinySuggestions } from '../support/tiny-study';

describe('answered cases', () => {
  it('counts cases with a final answer per session, open and complete, in one call', async () => {
    const db = openHeedDb(`heed-progress-${process.pid}`);
    const manifest = tinyManifest();
    const set = await saveCaseSet(db, { name: 'tiny', source: 'demo', manifest, images: tinyImages(manifest) });
    const study = await createStudy(db, { name: 'S', caseSetId: set.id, design: tinyDesign(), suggestions: tinySuggestions(manifest) });
    const a = await enrolReader(db, study.id, { code: 'RA', role: 'x', years: null }, () => 0);
    const b = await enrolReader(db, study.id, { code: 'RB', role: 'x', years: null }, () => 1);
    const seq = await startSession(db, { study, readerId: a.id, period: 1, items: tinyItems(manifest, 'sequential'), orderSeed: 's', override: null });
    const con = await startSession(db, { study, readerId: b.id, period: 1, items: tinyItems(manifest, 'concurrent'), orderSeed: 's', override: null });
    const base = { findings: ['target'], shownAt: '2026-12-01T10:00:00.000Z', suggestion: null, cautionShown: false, call: 1 as const, confidence: 50, ms: 500 };
    // sequential: case 1 initial + final, case 2 initial only -> 1 case answered
    await commitAnswer(db, { ...base, session: seq, step: { itemIndex: 0, finding: 'target', phase: 'initial' } });
    await commitAnswer(db, { ...base, session: seq, step: { itemIndex: 0, finding: 'target', phase: 'final' } });
    await commitAnswer(db, { ...base, session: seq, step: { itemIndex: 1, finding: 'target', phase: 'initial' } });
    // concurrent: all 4 cases -> complete
    for (let i = 0; i < manifest.cases.length; i++) await commitAnswer(db, { ...base, session: con, step: { itemIndex: i, finding: 'target', phase: 'final' } });
    const sessions = [(await db.sessions.get(seq.id))!, (await db.sessions.get(con.id))!];
    expect(sessions.map((s) => s.completedAt === null)).toEqual([true, false]);

    const counts = await answeredCasesOf(db, sessions, 1);
    expect(Object.fromEntries(counts)).toEqual({ [seq.id]: 1, [con.id]: 4 });
    expect(await answeredCases(db, sessions[0]!, 1)).toBe(1);
    // two findings asked: a case counts only once both have a final answer
    expect((await answeredCasesOf(db, [sessions[0]!], 2)).get(seq.id)).toBe(0);
    expect((await unfinishedSessions(db)).map((u) => [u.readerCode, u.answeredCases])).toEqual([['RA', 1]]);
  });
});
