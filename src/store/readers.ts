/** Enrolling readers in a study: pseudonymous codes, unique per study, assigned to sequences. */
import type { HeedDb } from './db';
import { formulaProblem } from '../core/formula-text';
import { appendEvent } from './events';
import { InputError } from './input-error';
import type { StoredReader } from './records';

export type NewReader = { code: string; role: string; years: number | null };


const CODE_PATTERN = /^[A-Za-z0-9._-]{1,32}$/;

export const readerCodeProblem = (code: string): string | null => {
  const trimmed = code.trim();
  if (trimmed === '') return 'Reader code is empty: give a pseudonymous code such as R01.';
  const formula = formulaProblem(code) ?? formulaProblem(trimmed);
  if (formula) return `Reader code "${trimmed}" ${formula}.`;
  if (!CODE_PATTERN.test(trimmed)) return `Reader code "${trimmed}" must be 1-32 letters, digits, ".", "_" or "-" (no names: codes are pseudonymous).`;
  return null;
};

/** Which sequence the reader in enrolment slot `slot` gets; supplied by the study design. */
export type SequenceChooser = (slot: number) => number;

export const enrolReader = async (db: HeedDb, studyId: string, input: NewReader, chooseSequence: SequenceChooser): Promise<StoredReader> => {
  const problem = readerCodeProblem(input.code);
  if (problem) throw new InputError(problem);
  const code = input.code.trim();
  if (input.years !== null && !(Number.isFinite(input.years) && input.years >= 0 && input.years <= 70)) {
    throw new InputError(`Years of experience for ${code} must be a number from 0 to 70, or left empty.`);
  }
  return db.transaction('rw', db.readers, db.events, async () => {
    const existing = await db.readers.where('studyId').equals(studyId).toArray();
    if (existing.some((r) => r.code.toLowerCase() === code.toLowerCase())) {
      throw new InputError(`Reader code ${code} is already enrolled in this study.`);
    }
    // the lowest free slot: a reader deleted before starting leaves a gap the next one fills, keeping the blocks balanced
    const taken = new Set(existing.map((r) => r.slot));
    let slot = 0;
    while (taken.has(slot)) slot++;
    const reader: StoredReader = {
      id: crypto.randomUUID(),
      studyId,
      code,
      role: input.role.trim() || 'reader',
      years: input.years,
      sequenceIndex: chooseSequence(slot),
      slot,
      enrolledAt: new Date().toISOString(),
    };
    await db.readers.add(reader);
    await appendEvent(db, studyId, 'reader-enrolled', { readerId: reader.id, code, slot, sequenceIndex: reader.sequenceIndex });
    return reader;
  });
};

export const listReaders = (db: HeedDb, studyId: string): Promise<StoredReader[]> =>
  db.readers.where('studyId').equals(studyId).sortBy('slot');
