/** Everything the study screen shows about its readers, loaded in one go. */
import { answeredCasesOf } from '../../store/progress';
import type { HeedDb } from '../../store/db';
import { listReaders } from '../../store/readers';
import type { StoredReader, StoredSession, StoredStudy } from '../../store/records';
import { sessionsOfStudy } from '../../store/sessions';
import { getStudy } from '../../store/studies';
import { getCaseSet } from '../../store/case-sets';
import { studyStatus } from '../../core/study-status';
import { periodOpensAt } from '../../core/washout';

/** `opensAt`: when the washout after the previous period ends (null when the previous period is not complete, or for period 1) */
export type PeriodProgress = { period: number; session: StoredSession | null; answered: number; total: number; opensAt: Date | null; inWashout: boolean };
export type ReaderProgress = { reader: StoredReader; sequenceLabel: string; periods: PeriodProgress[] };

export const loadStudyProgress = async (db: HeedDb, studyId: string, now: Date = new Date()) => {
  const study: StoredStudy = await getStudy(db, studyId);
  const caseSet = await getCaseSet(db, study.caseSetId);
  const readers = await listReaders(db, studyId);
  const sessions = await sessionsOfStudy(db, studyId);
  const periodCount = study.design.sequences[0]?.periods.length ?? 0;
  const caseCount = caseSet.manifest.cases.length;
  // one query per table, not per session: sessions by reader and period, answered counts at once
  const answered = await answeredCasesOf(db, sessions, study.design.findings.length);
  const sessionOf = new Map(sessions.map((s) => [`${s.readerId}\u0000${s.period}`, s]));
  const progress: ReaderProgress[] = [];
  for (const reader of readers) {
    const periods: PeriodProgress[] = [];
    for (let period = 1; period <= periodCount; period++) {
      const session = sessionOf.get(`${reader.id}\u0000${period}`) ?? null;
      const previousDone = periods[period - 2]?.session?.completedAt ?? null;
      periods.push({
        period, session, total: session?.items.length ?? caseCount,
        opensAt: previousDone === null ? null : periodOpensAt(new Date(previousDone), study.design.washoutDays),
        inWashout: session === null && previousDone !== null && periodOpensAt(new Date(previousDone), study.design.washoutDays).getTime() > now.getTime(),
        answered: session ? answered.get(session.id) ?? 0 : 0,
      });
    }
    progress.push({ reader, sequenceLabel: study.design.sequences[reader.sequenceIndex]?.label ?? '?', periods });
  }
  const status = studyStatus(study.lockedAt, periodCount, readers.map((r) => ({ id: r.id, withdrawn: Boolean(r.withdrawn) })), sessions);
  return { study, caseSet, progress, status };
};
