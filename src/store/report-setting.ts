// The study setting "show readers their report at the end". It is a plain, non-indexed field of
// the study record, so it needs no schema version: older records simply lack it (meaning off).
import type { HeedDb } from './db';

/** Turns the setting on or off; throws when the study does not exist. */
export const setShowReportToReader = async (db: HeedDb, studyId: string, on: boolean): Promise<void> => {
  const changed = await db.studies.update(studyId, { showReportToReader: on });
  if (changed === 0 && !(await db.studies.get(studyId))) throw new Error(`no study with id ${studyId}`);
};
