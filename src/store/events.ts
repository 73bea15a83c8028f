import type { HeedDb } from './db';
import type { StoredEvent } from './records';

/** Appends to the event log. Call it inside the transaction of the change it records. */
export const appendEvent = (db: HeedDb, studyId: string | null, type: string, detail: Record<string, unknown>): Promise<number | undefined> =>
  db.events.add({ at: new Date().toISOString(), studyId, type, detail } satisfies StoredEvent);

export const eventsOfStudy = (db: HeedDb, studyId: string): Promise<StoredEvent[]> =>
  db.events.where('studyId').equals(studyId).sortBy('seq');
