/** Reading progress: sessions started and not complete, and per-session answered counts. */
import type { HeedDb } from './db';
import type { StoredSession } from './records';

export type Unfinished = { session: StoredSession; studyName: string; readerCode: string; answeredCases: number };

/** Cases whose every finding has a final answer in the session. */
export const answeredCases = async (db: HeedDb, session: StoredSession, findingCount: number): Promise<number> =>
  (await answeredCasesOf(db, [session], findingCount)).get(session.id) ?? 0;

/**
 * Answered cases of many sessions, keyed by session id, in one query: a complete session has
 * answered all of its cases (it is marked complete by the commit of its last step), so only the
 * reads of the sessions still open are loaded, all at once.
 */
export const answeredCasesOf = async (db: HeedDb, sessions: readonly StoredSession[], findingCount: number): Promise<Map<string, number>> => {
  const counts = new Map<string, number>();
  const open: string[] = [];
  for (const session of sessions) {
    if (session.completedAt === null) open.push(session.id);
    else counts.set(session.id, session.items.length);
  }
  if (open.length === 0) return counts;
  const perCase = new Map<string, Map<string, number>>();
  for (const id of open) { perCase.set(id, new Map()); counts.set(id, 0); }
  await db.reads.where('sessionId').anyOf(open).each((read) => {
    const cases = perCase.get(read.sessionId);
    if (!cases || !read.final) return;
    const n = (cases.get(read.caseId) ?? 0) + 1;
    cases.set(read.caseId, n);
    if (n === findingCount) counts.set(read.sessionId, (counts.get(read.sessionId) ?? 0) + 1);
  });
  return counts;
};

export const unfinishedSessions = async (db: HeedDb): Promise<Unfinished[]> => {
  const open = (await db.sessions.toArray()).filter((s) => s.completedAt === null);
  const result: Unfinished[] = [];
  for (const session of open) {
    const study = await db.studies.get(session.studyId);
    const reader = await db.readers.get(session.readerId);
    if (!study || !reader || reader.withdrawn) continue;
    result.push({ session, studyName: study.name, readerCode: reader.code, answeredCases: await answeredCases(db, session, study.design.findings.length) });
  }
  return result.sort((a, b) => a.session.startedAt.localeCompare(b.session.startedAt));
};
