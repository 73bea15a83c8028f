/** Joins a study's stored reads with its readers, sessions and case set into read-log rows (docs/formats.md). */
import { joinReadRows } from '../core/read-rows';
import type { ReadRow } from '../core/read-log';
import { getCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { listReaders } from './readers';
import { getStudy } from './studies';

export const studyReadRows = async (db: HeedDb, studyId: string): Promise<ReadRow[]> => {
  const study = await getStudy(db, studyId);
  const caseSet = await getCaseSet(db, study.caseSetId);
  const readers = await listReaders(db, studyId);
  const sessions = await db.sessions.where('studyId').equals(studyId).toArray();
  const reads = await db.reads.where('studyId').equals(studyId).toArray();
  return joinReadRows(study, caseSet.manifest, readers, sessions, reads).map((j) => j.row);
};
