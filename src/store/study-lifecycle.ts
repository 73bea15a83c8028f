/**
 * Renaming and deleting studies, and each study's status (draft, reading, finished). Deleting a
 * study removes its readers, sessions, reads and events in one transaction and leaves one
 * workstation-level event saying what was deleted. Until study bundles exist on this branch, a
 * study is deleted only with an explicit "delete without a bundle".
 */
import { studyStatus, type StudyStatus } from '../core/study-status';
import type { HeedDb } from './db';
import { appendEvent } from './events';
import { InputError } from './input-error';
import type { StoredStudy } from './records';

const NAME_MAX = 120;

export const renameStudy = (db: HeedDb, id: string, name: string): Promise<void> =>
  db.transaction('rw', db.studies, db.events, async () => {
    const to = name.trim();
    if (to === '') throw new InputError('A study needs a name: the new name is empty.');
    if (to.length > NAME_MAX) throw new InputError(`A study name can be at most ${NAME_MAX} characters (this one has ${to.length}).`);
    const study = await db.studies.get(id);
    if (!study) throw new InputError('That study is no longer stored.');
    if (to === study.name) return;
    await db.studies.update(id, { name: to });
    await appendEvent(db, id, 'study-renamed', { from: study.name, to });
  });

export type DeleteStudyChoice = {
  /** the coordinator chose "delete without a bundle": nothing of the study is kept anywhere */
  withoutBundle: boolean;
};

export type DeletedStudy = { name: string; readers: number; reads: number; events: number };

export const deleteStudy = (db: HeedDb, id: string, choice: DeleteStudyChoice): Promise<DeletedStudy> =>
  db.transaction('rw', [db.studies, db.readers, db.sessions, db.reads, db.packs, db.events], async () => {
    const study = await db.studies.get(id);
    if (!study) throw new InputError('That study is no longer stored.');
    if (!choice.withoutBundle) {
      throw new InputError(`No bundle of “${study.name}” was saved: to delete it anyway, choose “delete without a bundle”.`);
    }
    const readers = await db.readers.where('studyId').equals(id).delete();
    await db.sessions.where('studyId').equals(id).delete();
    const reads = await db.reads.where('studyId').equals(id).delete();
    await db.packs.where('studyId').equals(id).delete();
    const events = await db.events.where('studyId').equals(id).delete();
    await db.studies.delete(id);
    await appendEvent(db, null, 'study-deleted', { studyId: id, name: study.name, readers, reads, events, withoutBundle: true });
    return { name: study.name, readers, reads, events };
  });

/** The status of one study, from its readers and sessions. */
export const statusOfStudy = async (db: HeedDb, study: StoredStudy): Promise<StudyStatus> => {
  const readers = await db.readers.where('studyId').equals(study.id).toArray();
  const sessions = await db.sessions.where('studyId').equals(study.id).toArray();
  const periods = study.design.sequences[0]?.periods.length ?? 0;
  return studyStatus(study.lockedAt, periods, readers.map((r) => ({ id: r.id, withdrawn: Boolean(r.withdrawn) })), sessions);
};
