/**
 * Joins a study's stored reads with its readers, sessions and case set into read-log rows
 * (docs/formats.md). The reads of completed sessions come from their read packs (read-packs.ts),
 * one record per session; a completed session without a current pack gets one on the way.
 */
import { joinReadRows } from '../core/read-rows';
import type { ReadRow } from '../core/read-log';
import { getCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { loadStudyReads, storePacks } from './read-packs';
import { listReaders } from './readers';
import { getStudy } from './studies';

export const studyReadRows = async (db: HeedDb, studyId: string): Promise<ReadRow[]> => {
  const study = await getStudy(db, studyId);
  const caseSet = await getCaseSet(db, study.caseSetId);
  const readers = await listReaders(db, studyId);
  const { sessions, reads, fresh } = await loadStudyReads(db, studyId);
  const rows = joinReadRows(study, caseSet.manifest, readers, sessions, reads).map((j) => j.row);
  await storePacks(db, fresh);
  return rows;
};
