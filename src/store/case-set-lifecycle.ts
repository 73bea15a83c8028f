/**
 * Renaming and deleting case sets. A set in use by a study is never deleted (the study's reads
 * refer to its cases); the refusal names the study. Each change is one transaction with its event;
 * a refusal throws InputError before anything is written.
 */
import type { HeedDb } from './db';
import { appendEvent } from './events';
import { InputError } from './input-error';

const NAME_MAX = 120;

export const caseSetNameProblem = (name: string): string | null => {
  const trimmed = name.trim();
  if (trimmed === '') return 'A case set needs a name: the new name is empty.';
  if (trimmed.length > NAME_MAX) return `A case set name can be at most ${NAME_MAX} characters (this one has ${trimmed.length}).`;
  return null;
};

export const renameCaseSet = (db: HeedDb, id: string, name: string): Promise<void> =>
  db.transaction('rw', db.caseSets, db.events, async () => {
    const problem = caseSetNameProblem(name);
    if (problem) throw new InputError(problem);
    const set = await db.caseSets.get(id);
    if (!set) throw new InputError('That case set is no longer stored.');
    const to = name.trim();
    if (to === set.name) return;
    const clash = (await db.caseSets.toArray()).find((s) => s.id !== id && s.name.toLowerCase() === to.toLowerCase());
    if (clash) throw new InputError(`Another case set is already named “${clash.name}”; choose another name.`);
    await db.caseSets.update(id, { name: to });
    await appendEvent(db, null, 'case-set-renamed', { caseSetId: id, from: set.name, to });
  });

/** Deletes a set and its images; refused while a study uses it, and for the generated demo set. */
export const deleteCaseSet = (db: HeedDb, id: string): Promise<void> =>
  db.transaction('rw', db.caseSets, db.images, db.studies, db.events, async () => {
    const set = await db.caseSets.get(id);
    if (!set) throw new InputError('That case set is no longer stored.');
    if (set.source === 'demo') throw new InputError(`“${set.name}” is the demo set Heed generates; it comes back at every launch, so it is not deleted.`);
    const users = await db.studies.where('caseSetId').equals(id).toArray();
    if (users.length > 0) {
      const names = users.map((s) => `“${s.name}”`).join(', ');
      throw new InputError(`Case set “${set.name}” is used by the study ${names}; it cannot be deleted while a study uses it. Delete the study first.`);
    }
    const images = await db.images.where('setId').equals(id).delete();
    await db.caseSets.delete(id);
    await appendEvent(db, null, 'case-set-deleted', { caseSetId: id, name: set.name, images });
  });
