/** Reading progress: sessions started and not complete, and per-session answered counts. */
import type { HeedDb } from './db';
import type { StoredSession } from './records';

export type Unfinished = { session: StoredSession; studyName: string; readerCode: string; answeredCases: number };

/** Cases whose every finding has a final answer in the session. */
export const answeredCases = async (db: HeedDb, session: StoredSession, findingCount: number): Promise<number> => {
  const reads = await db.reads.where('sessionId').equals(session.id).toArray();
  const perCase = new Map<string, number>();
  for (const read of reads) if (read.final) perCase.set(read.caseId, (perCase.get(read.caseId) ?? 0) + 1);
  return [...perCase.values()].filter((n) => n >= findingCount).length;
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
