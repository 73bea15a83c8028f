/** Studies: a design over a case set, with the suggestions it shows. Locked once reading starts. */
import { withDesignDefaults, type StudyDesign } from '../core/design';
import { formulaProblem } from '../core/formula-text';
import type { HeedDb } from './db';
import { appendEvent } from './events';
import { InputError } from './input-error';
import type { StoredStudy } from './records';
import type { SuggestionRow } from '../core/suggestions';

export type NewStudy = { name: string; caseSetId: string; design: StudyDesign; suggestions: SuggestionRow[] };

export const createStudy = async (db: HeedDb, input: NewStudy): Promise<StoredStudy> => {
  const name = input.name.trim();
  if (name === '') throw new InputError('Study name is empty.');
  const formula = formulaProblem(input.name) ?? formulaProblem(name);
  if (formula) throw new InputError(`Study name "${name}" ${formula}.`);
  const study: StoredStudy = {
    id: crypto.randomUUID(),
    name,
    caseSetId: input.caseSetId,
    design: input.design,
    suggestions: input.suggestions,
    createdAt: new Date().toISOString(),
    lockedAt: null,
  };
  await db.transaction('rw', db.studies, db.events, async () => {
    await db.studies.add(study);
    await appendEvent(db, study.id, 'study-created', { name, caseSetId: input.caseSetId, seed: input.design.seed });
  });
  return study;
};

/** Replaces the design (and the suggestions derived from it); refused once the study is locked. */
export const updateStudyDesign = async (
  db: HeedDb, studyId: string, design: StudyDesign, suggestions: SuggestionRow[], chooseSequence?: (slot: number) => number,
): Promise<StoredStudy> =>
  db.transaction('rw', db.studies, db.readers, db.events, async () => {
    const study = await getStudy(db, studyId);
    if (study.lockedAt) throw new InputError(`The design of “${study.name}” is locked: reading started on ${study.lockedAt.slice(0, 16).replace('T', ' ')} UTC.`);
    const updated = { ...study, design, suggestions };
    await db.studies.put(updated);
    if (chooseSequence) {
      await db.readers.where('studyId').equals(studyId).modify((reader) => { reader.sequenceIndex = chooseSequence(reader.slot); });
    }
    await appendEvent(db, studyId, 'design-changed', { seed: design.seed });
    return updated;
  });

export const getStudy = async (db: HeedDb, id: string): Promise<StoredStudy> => {
  const found = await db.studies.get(id);
  if (!found) throw new Error(`no study with id ${id}`);
  return withStudyDefaults(found);
};

export const listStudies = async (db: HeedDb): Promise<StoredStudy[]> => (await db.studies.orderBy('createdAt').toArray()).map(withStudyDefaults);

// Studies stored before a design field existed read with its default (no schema version needed:
// the field is not indexed).
const withStudyDefaults = (study: StoredStudy): StoredStudy => {
  const design = withDesignDefaults(study.design);
  return design === study.design ? study : { ...study, design };
};
