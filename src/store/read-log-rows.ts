/**
 * Joins a study's stored reads with its readers, sessions and case set into read-log rows
 * (docs/formats.md). The reads of completed sessions come from their read packs (read-packs.ts),
 * one record per session; a completed session without a current pack gets one on the way, stored
 * after the rows are returned.
 */
import { joinReadRows } from '../core/read-rows';
import type { ReadRow } from '../core/read-log';
import { getCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { loadStudyReads, storePacks } from './read-packs';
import { listReaders } from './readers';
import { getStudy } from './studies';

/**
 * The rows, and `packing`: the storing of packs built on the way for completed sessions that had
 * none (read-packs.ts, storePacks), which the rows do not wait for; it resolves with how many were
 * stored and never rejects (a pack not stored is built again next time).
 */
export const studyReadRowsPacking = async (db: HeedDb, studyId: string): Promise<{ rows: ReadRow[]; packing: Promise<number> }> => {
  const study = await getStudy(db, studyId);
  const caseSet = await getCaseSet(db, study.caseSetId);
  const readers = await listReaders(db, studyId);
  const { sessions, reads, fresh } = await loadStudyReads(db, studyId);
  const packing = storePacks(db, fresh).catch(() => 0);
  return { rows: joinReadRows(study, caseSet.manifest, readers, sessions, reads).map((j) => j.row), packing };
};

export const studyReadRows = async (db: HeedDb, studyId: string): Promise<ReadRow[]> =>
  (await studyReadRowsPacking(db, studyId)).rows;
