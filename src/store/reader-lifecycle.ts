/**
 * Changes to an enrolled reader: correct the code or delete them before they start (the code seeds
 * their schedule, so it is fixed from the first session on), and withdraw them at any time with a
 * reason. A withdrawn reader's reads stay in the log, marked withdrawn; no new period opens for them.
 */
import type { HeedDb } from './db';
import { appendEvent } from './events';
import { InputError } from './input-error';
import { readerCodeProblem } from './readers';
import type { StoredReader } from './records';

const readerOf = async (db: HeedDb, readerId: string): Promise<StoredReader> => {
  const reader = await db.readers.get(readerId);
  if (!reader) throw new InputError('That reader is no longer enrolled.');
  return reader;
};

const refuseIfStarted = async (db: HeedDb, reader: StoredReader, what: string): Promise<void> => {
  const started = await db.sessions.where('readerId').equals(reader.id).count();
  if (started > 0) throw new InputError(`${reader.code} has started reading, so ${what}. Withdraw the reader instead if they stop.`);
};

export const correctReaderCode = (db: HeedDb, readerId: string, newCode: string): Promise<StoredReader> =>
  db.transaction('rw', db.readers, db.sessions, db.events, async () => {
    const problem = readerCodeProblem(newCode);
    if (problem) throw new InputError(problem);
    const reader = await readerOf(db, readerId);
    const code = newCode.trim();
    if (code === reader.code) return reader;
    await refuseIfStarted(db, reader, 'the code can no longer change (it seeds the reader’s case order)');
    const others = await db.readers.where('studyId').equals(reader.studyId).toArray();
    if (others.some((r) => r.id !== reader.id && r.code.toLowerCase() === code.toLowerCase())) {
      throw new InputError(`Reader code ${code} is already enrolled in this study.`);
    }
    const updated = { ...reader, code };
    await db.readers.put(updated);
    await appendEvent(db, reader.studyId, 'reader-code-corrected', { readerId, from: reader.code, to: code });
    return updated;
  });

export const deleteReader = (db: HeedDb, readerId: string): Promise<void> =>
  db.transaction('rw', db.readers, db.sessions, db.events, async () => {
    const reader = await readerOf(db, readerId);
    await refuseIfStarted(db, reader, 'they cannot be deleted');
    await db.readers.delete(readerId);
    await appendEvent(db, reader.studyId, 'reader-deleted', { readerId, code: reader.code, slot: reader.slot, sequenceIndex: reader.sequenceIndex });
  });

export const withdrawReader = (db: HeedDb, readerId: string, reason: string, by: string): Promise<StoredReader> =>
  db.transaction('rw', db.readers, db.events, async () => {
    const reader = await readerOf(db, readerId);
    if (reason.trim() === '') throw new InputError(`Withdrawing ${reader.code} needs a reason; none was given.`);
    if (by.trim() === '') throw new InputError(`Withdrawing ${reader.code} needs the name or code of who records it; none was given.`);
    if (reader.withdrawn) throw new InputError(`${reader.code} was already withdrawn on ${reader.withdrawn.at.slice(0, 10)}.`);
    const withdrawn = { at: new Date().toISOString(), reason: reason.trim(), by: by.trim() };
    const updated: StoredReader = { ...reader, withdrawn };
    await db.readers.put(updated);
    await appendEvent(db, reader.studyId, 'reader-withdrawn', { readerId, code: reader.code, reason: withdrawn.reason, by: withdrawn.by });
    return updated;
  });
