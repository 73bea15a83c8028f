// Everything a reader's report screen needs, loaded in one go: the study's log analysed by the
// same engine as `heed analyze` (in the worker), and whether all of the reader's periods are done.
import { DEFAULT_SEED } from '../../analysis/engine';
import { readerReport, type ReaderReport } from '../../analysis/reader-report/reader-report';
import type { HeedDb } from '../../store/db';
import { studyReadRows } from '../../store/read-log-rows';
import { listReaders } from '../../store/readers';
import type { StoredReader, StoredStudy } from '../../store/records';
import { sessionsOfStudy } from '../../store/sessions';
import { getStudy } from '../../store/studies';
import { runAnalysis } from '../results/run-analysis';

export type LoadedReport = { madeAt: string; study: StoredStudy; reader: StoredReader; report: ReaderReport; complete: boolean; periodsDone: number; periods: number };

/** Whether every period of the study has a completed session for this reader. */
export const readerPeriods = async (db: HeedDb, study: StoredStudy, readerId: string): Promise<{ done: number; periods: number }> => {
  const periods = study.design.sequences[0]?.periods.length ?? 0;
  const sessions = await sessionsOfStudy(db, study.id);
  const done = sessions.filter((s) => s.readerId === readerId && s.completedAt !== null).length;
  return { done, periods };
};

export const loadReaderReport = async (db: HeedDb, studyId: string, readerId: string): Promise<LoadedReport> => {
  const study = await getStudy(db, studyId);
  const reader = (await listReaders(db, studyId)).find((r) => r.id === readerId);
  if (!reader) throw new Error(`no reader ${readerId} in this study`);
  const { done, periods } = await readerPeriods(db, study, readerId);
  const rows = await studyReadRows(db, studyId);
  if (!rows.some((r) => r.reader_id === reader.code && r.practice === 0)) throw new Error(`reader ${reader.code} has no reads yet`);
  // The bootstrap changes only group figures, never a reader's: none is drawn here.
  const { report: analysis } = await runAnalysis(rows, DEFAULT_SEED, 0);
  const complete = periods > 0 && done >= periods;
  return { madeAt: new Date().toISOString(), study, reader, complete, periodsDone: done, periods, report: readerReport({ analysis, rows, readerId: reader.code, complete }) };
};
