/**
 * Joins a study's stored reads with its readers, sessions and case set into read-log rows
 * (docs/formats.md). The reads of completed sessions come from their read packs (read-packs.ts),
 * one record per session; a completed session without a current pack gets one on the way, stored
 * once the caller's own work on the rows is done.
 */
import { joinReadRows } from '../core/read-rows';
import type { ReadRow } from '../core/read-log';
import { getCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { loadStudyReads, storePacks } from './read-packs';
import { listReaders } from './readers';
import { getStudy } from './studies';

/**
 * The rows, and `storeFresh`: stores the packs built on the way for completed sessions that had
 * none (read-packs.ts, storePacks); it resolves with how many were stored and never rejects (a pack
 * not stored is built again next time). Call it when the work on the rows is done, not before: its
 * read-write transaction holds the `reads` store until this thread takes the results of its
 * requests, so started before a long computation it would hold up every answer committed
 * meanwhile, in any window.
 */
export const studyReadRowsPacking = async (db: HeedDb, studyId: string): Promise<{ rows: ReadRow[]; storeFresh: () => Promise<number> }> => {
  const study = await getStudy(db, studyId);
  const caseSet = await getCaseSet(db, study.caseSetId);
  const readers = await listReaders(db, studyId);
  const { sessions, reads, fresh } = await loadStudyReads(db, studyId);
  return { rows: joinReadRows(study, caseSet.manifest, readers, sessions, reads).map((j) => j.row), storeFresh: () => storePacks(db, fresh).catch(() => 0) };
};

/** The rows; packs built on the way are stored in a later task, after the caller's synchronous work on the rows (an export's CSV). */
export const studyReadRows = async (db: HeedDb, studyId: string): Promise<ReadRow[]> => {
  const { rows, storeFresh } = await studyReadRowsPacking(db, studyId);
  setTimeout(() => { void storeFresh(); }, 0);
  return rows;
};
