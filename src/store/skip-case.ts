/**
 * Letting a reader past a case that cannot be shown (an image the browser cannot decode). The
 * case is added to the session's `skipped` list and a `case-skipped` event with the reason is
 * appended, in one transaction that also checks the case is the current one. The case then has
 * no read: the read log leaves it out, and the event log says why.
 */
import { applySkip, currentPosition, type SessionPosition } from '../core/session';
import type { HeedDb } from './db';
import { appendEvent } from './events';
import { packSessionSoon } from './read-packs';
import type { StoredRead } from './records';

export type SkipReason = 'image-undecodable';

const toAnswer = (read: StoredRead) => ({ caseId: read.caseId, finding: read.finding, initial: read.initial, final: read.final });

/** Skips the current case of a session; resolves with the next position once stored. */
export const skipCase = async (db: HeedDb, sessionId: string, findings: string[], caseId: string, reason: SkipReason, detail: string): Promise<SessionPosition> => {
  const next = await skipInTransaction(db, sessionId, findings, caseId, reason, detail);
  if (next.done) packSessionSoon(db, sessionId); // the session is complete: its read pack, not awaited
  return next;
};

const skipInTransaction = (db: HeedDb, sessionId: string, findings: string[], caseId: string, reason: SkipReason, detail: string): Promise<SessionPosition> =>
  db.transaction('rw', db.reads, db.sessions, db.events, async () => {
    const session = await db.sessions.get(sessionId);
    if (!session) throw new Error(`no session ${sessionId}`);
    const reads = (await db.reads.where('sessionId').equals(sessionId).toArray()).map(toAnswer);
    const position = currentPosition({ items: session.items, findings, skipped: session.skipped }, reads);
    const skipped = applySkip(position, caseId, session.skipped);
    await db.sessions.update(sessionId, { skipped });
    await appendEvent(db, session.studyId, 'case-skipped', { sessionId, caseId, reason, detail });
    const next = currentPosition({ items: session.items, findings, skipped }, reads);
    if (next.done) {
      await db.sessions.update(sessionId, { completedAt: new Date().toISOString() });
      await appendEvent(db, session.studyId, 'session-completed', { sessionId });
    }
    return next;
  });
