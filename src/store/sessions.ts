/**
 * Reading sessions and the durable commit of answers. The commit checks, inside the same
 * transaction as the write, that the answer is for the session's current step, so no answer can
 * be committed twice or out of order, even from two windows.
 */
import type { Bit } from '../core/read-log';
import { applyCommit, currentPosition, positionAt, stepIndexOf, type CommittedAnswer, type Phase, type SessionItem, type SessionPosition } from '../core/session';
import type { HeedDb } from './db';
import { appendEvent, chainHead, chainKey, guessedHead, linkEvent, rememberHead, type KnownHead } from './events';
import type { StoredEvent, StoredRead, StoredSession, StoredStudy, WashoutOverride } from './records';
import { packSessionSoon } from './read-packs';

export const sessionId = (readerId: string, period: number): string => `${readerId}/${period}`;
const readId = (session: string, caseId: string, finding: string): string => `${session}/${caseId}/${finding}`;

export type NewSession = {
  study: StoredStudy;
  readerId: string;
  period: number;
  items: SessionItem[];
  orderSeed: string;
  override: WashoutOverride | null;
};

/** Starts a session, or returns the one already started. Starting the first one locks the design. */
export const startSession = (db: HeedDb, input: NewSession): Promise<StoredSession> =>
  db.transaction('rw', db.sessions, db.studies, db.events, async () => {
    const id = sessionId(input.readerId, input.period);
    const existing = await db.sessions.get(id);
    if (existing) return existing;
    const now = new Date().toISOString();
    const session: StoredSession = {
      id, studyId: input.study.id, readerId: input.readerId, period: input.period, items: input.items,
      orderSeed: input.orderSeed, startedAt: now, completedAt: null, override: input.override,
    };
    await db.sessions.add(session);
    const study = await db.studies.get(input.study.id);
    if (study && !study.lockedAt) {
      await db.studies.put({ ...study, lockedAt: now });
      await appendEvent(db, study.id, 'design-locked', { by: 'first session start', sessionId: id });
    }
    if (input.override) await appendEvent(db, input.study.id, 'washout-overridden', { sessionId: id, ...input.override });
    await appendEvent(db, input.study.id, 'session-started', { sessionId: id, readerId: input.readerId, period: input.period, orderSeed: input.orderSeed });
    return session;
  });

export const getSession = async (db: HeedDb, id: string): Promise<StoredSession | undefined> => db.sessions.get(id);

export const sessionsOfStudy = (db: HeedDb, studyId: string): Promise<StoredSession[]> =>
  db.sessions.where('studyId').equals(studyId).toArray();

const toAnswer = (read: StoredRead): CommittedAnswer => ({ caseId: read.caseId, finding: read.finding, initial: read.initial, final: read.final });

export const readsOfSession = (db: HeedDb, id: string): Promise<StoredRead[]> => db.reads.where('sessionId').equals(id).toArray();

/** The session's position, from the answers committed so far. */
export const sessionPosition = async (db: HeedDb, session: StoredSession, findings: string[]): Promise<SessionPosition> =>
  currentPosition({ items: session.items, findings, skipped: session.skipped }, (await readsOfSession(db, session.id)).map(toAnswer));

export type AnswerCommit = {
  session: StoredSession;
  findings: string[];
  step: { itemIndex: number; finding: string; phase: Phase };
  call: Bit;
  confidence: number | null;
  /** the rating on a five-point or percent scale (the call came from it); null or absent on call-confidence */
  rating?: number | null;
  ms: number;
  shownAt: string;
  suggestion: { call: Bit; score: number | null; planted: boolean } | null;
  cautionShown: boolean;
};

export type Committed = { position: SessionPosition; read: StoredRead };

const answered = (read: StoredRead | undefined, phase: Phase): boolean =>
  read !== undefined && (phase === 'initial' ? read.initial != null : read.final != null);

/**
 * Commits one answer durably; resolves once the transaction is complete, with the stored read and
 * the next position. The step check costs two reads by key, not a read of the whole session:
 * answers are only ever committed at the current step, so the committed steps are a prefix of the
 * plan, and a step is the current one exactly when it is unanswered and the step before it is
 * answered. Both are read inside the transaction, so a stale or repeated commit (a second window,
 * a double Enter) is refused there, with nothing written.
 *
 * Speed (the next case waits for this): every read the check needs (the stored session for its
 * skips, this step's read, the step before's, the head of the study's hash chain) is issued at
 * once, and the writes (read, event, a completed session) likewise, so the transaction costs two
 * round trips to the database and one flush; none of the reads depends on another's result.
 */
export const commitAnswerAndRead = async (db: HeedDb, input: AnswerCommit): Promise<Committed> => {
  const item = input.session.items[input.step.itemIndex];
  const head = guessedHead(db, chainKey(input.session.studyId));
  // the first answer of a case (no earlier answer to carry over) with the chain's head known
  if (item && head !== undefined && (input.step.phase === 'initial' || item.assistance !== 'sequential')) {
    try {
      return await commitInOneTrip(db, input, head);
    } catch {
      // the guess missed (or the commit is refused): nothing was written; the checked commit
      // below decides, and gives the refusal its message
    }
  }
  const committed = await commitChecked(db, input);
  // the session's last answer (only the checked commit writes it): its read pack, in a transaction of its own, not awaited
  if (committed.position.done) packSessionSoon(db, input.session.id);
  return committed;
};

class GuessMissed extends Error {}

/**
 * The commit in one round trip to the database: the writes are issued together with the step
 * check's reads, on the assumption that this is the current step, that the case has no answer yet
 * and that the chain's head is the one this connection last wrote. The reads are issued first, so
 * they see the database as it was before the writes; when any assumption proves wrong the
 * transaction is aborted (nothing of it is stored) and the caller falls back to commitChecked.
 * The head is checked on the event log's primary key, not the `chain` index: the log from the key
 * of the link this connection last wrote holds exactly that link only when no event of any chain
 * was appended since, and then that link is still its chain's head (a range read of one record,
 * cheaper than a cursor on the index; another window's event, on any chain, sends the commit to
 * commitChecked).
 * It runs on IndexedDB itself, not through Dexie: the reader waits for this, and a trace showed
 * Dexie's promise zone costing several milliseconds of main-thread time per commit. The records
 * are the ones Dexie would store (plain objects; events keyed by their auto-incremented seq), in
 * one transaction with the same strict durability. The last answer of a session (which also
 * updates the session record) always takes the checked commit.
 */
const commitInOneTrip = async (db: HeedDb, input: AnswerCommit, guessed: KnownHead): Promise<Committed> => {
  const { session } = input;
  const plan = { items: session.items, findings: input.findings, skipped: session.skipped };
  const stepIndex = stepIndexOf(plan, input.step);
  const item = session.items[input.step.itemIndex];
  if (!item || stepIndex < 0) throw new GuessMissed();
  const id = readId(session.id, item.caseId, input.step.finding);
  const before = stepIndex > 0 ? positionAt(plan, stepIndex - 1) : null;
  const beforeId = before && !before.done ? readId(session.id, before.item.caseId, before.step.finding) : null;
  if (beforeId === id) throw new GuessMissed();
  const { read, events, next } = answerRecords(input, item, id, positionAt(plan, stepIndex), undefined, guessed.hash, stepIndex);
  if (next.done) throw new GuessMissed();
  const chain = chainKey(session.studyId);
  if (!db.isOpen()) await db.open();
  const tx = db.backendDB().transaction(['reads', 'sessions', 'events'], 'readwrite', { durability: 'strict' });
  const done = new Promise<void>((resolve, reject) => {
    tx.oncomplete = () => resolve();
    tx.onabort = () => reject(tx.error ?? new GuessMissed());
    tx.onerror = () => reject(tx.error ?? new GuessMissed());
  });
  done.catch(() => undefined); // an abort is answered by the fallback below
  const request = <T>(r: IDBRequest<T>): Promise<T> => new Promise((resolve, reject) => {
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error ?? new GuessMissed());
  });
  const reads = tx.objectStore('reads');
  const eventStore = tx.objectStore('events');
  const checks = Promise.all([
    request<StoredSession | undefined>(tx.objectStore('sessions').get(session.id)),
    request<StoredRead | undefined>(reads.get(id)),
    beforeId === null ? Promise.resolve(undefined) : request<StoredRead | undefined>(reads.get(beforeId)),
    // the event log from this connection's last link on: that link alone, still on this chain
    request<StoredEvent[]>(eventStore.getAll(IDBKeyRange.lowerBound(guessed.seq), 2)).then((from) =>
      from.length === 1 && from[0]?.seq === guessed.seq && from[0].chain === chain ? from[0].hash : null),
  ]);
  const added = events.map((e) => eventStore.add(e));
  reads.put(read);
  try {
    const [stored, previous, beforeRead, head] = await checks;
    const current = stored !== undefined && head === guessed.hash && previous === undefined
      && !(stored.skipped ?? []).includes(item.caseId)
      && (before === null || before.done || answered(beforeRead, before.step.phase));
    if (!current) throw new GuessMissed();
  } catch (e) {
    try { tx.abort(); } catch { /* already finished */ }
    throw e;
  }
  await done;
  const last = events.length - 1;
  rememberHead(db, chain, events[last]?.hash ?? guessed.hash, Number(added[last]?.result ?? guessed.seq));
  return { position: next, read };
};

/**
 * The read and its chain links (the answer event, and the session-completed event after the last
 * answer), linked after `head`. Throws what applyCommit throws for an answer the step refuses.
 */
const answerRecords = (input: AnswerCommit, item: SessionItem, id: string, position: SessionPosition, previous: StoredRead | undefined, head: string, stepIndex: number) => {
  const { session } = input;
  const answer = applyCommit(position, input.step, previous ? toAnswer(previous) : null, {
    call: input.call, confidence: input.confidence, ms: input.ms, ...(input.rating == null ? {} : { rating: input.rating }),
  });
  // Keys in canonical (sorted) order here and in the event's detail: canonicalJson (core/chain.ts)
  // then takes its fast path when this answer is hashed and each time a bundle or backup is written.
  const read: StoredRead = {
    aiCall: input.suggestion?.call ?? null, aiPlanted: input.suggestion?.planted ?? false, aiScore: input.suggestion?.score ?? null,
    caseId: item.caseId, cautionShown: input.cautionShown, final: answer.final, finding: input.step.finding, id,
    initial: answer.initial, period: session.period, readerId: session.readerId, sessionId: session.id,
    shownAt: previous?.shownAt ?? input.shownAt, studyId: session.studyId,
  };
  // The event carries the read as stored, so the chain covers the answer; the read keeps the link's hash.
  const event = linkEvent(head, session.studyId, input.step.phase === 'initial' ? 'initial-committed' : 'final-committed', {
    call: input.call, caseId: item.caseId, confidence: input.confidence, finding: input.step.finding, ms: input.ms,
    ...(input.rating == null ? {} : { rating: input.rating }),
    read: { ...read }, sessionId: session.id,
  });
  read.hash = event.hash;
  const next = positionAt({ items: session.items, findings: input.findings }, stepIndex + 1);
  const events = next.done ? [event, linkEvent(event.hash, session.studyId, 'session-completed', { sessionId: session.id })] : [event];
  return { read, events, next };
};

const commitChecked = (db: HeedDb, input: AnswerCommit): Promise<Committed> =>
  db.transaction('rw', db.reads, db.sessions, db.events, async () => {
    const { session } = input;
    // the step and the one before it do not depend on skips (positionAt walks every item)
    const stepIndex = stepIndexOf({ items: session.items, findings: input.findings }, input.step);
    const item = session.items[input.step.itemIndex];
    if (!item || stepIndex < 0) throw new Error(`session ${session.id} has no step ${input.step.itemIndex}/${input.step.finding}/${input.step.phase}`);
    const id = readId(session.id, item.caseId, input.step.finding);
    const before = stepIndex > 0 ? positionAt({ items: session.items, findings: input.findings }, stepIndex - 1) : null;
    const beforeId = before && !before.done ? readId(session.id, before.item.caseId, before.step.finding) : null;
    // skipped cases are read from the stored session: the caller's copy may predate a skip
    const [stored, previous, beforeOther, head] = await Promise.all([
      db.sessions.get(session.id),
      db.reads.get(id),
      beforeId === null || beforeId === id ? Promise.resolve(undefined) : db.reads.get(beforeId),
      chainHead(db, chainKey(session.studyId)),
    ]);
    const beforeRead = beforeId === id ? previous : beforeOther;
    const skipped = stored?.skipped;
    const plan = { items: session.items, findings: input.findings, skipped };
    // the quick check: this step unanswered and the one before it answered; a skipped case, or a
    // step after one, takes the full walk (which knows the skips)
    const current = !(skipped ?? []).includes(item.caseId) && !answered(previous, input.step.phase)
      && (before === null || before.done || answered(beforeRead, before.step.phase));
    // otherwise the position comes from all the session's answers (and its skips): applyCommit then
    // refuses any step but that one, naming the step that is current
    const position = current ? positionAt(plan, stepIndex) : await sessionPosition(db, stored ?? session, input.findings);
    const { read, events, next } = answerRecords(input, item, id, position, previous, head, stepIndex);
    const added = Promise.all(events.map((e) => db.events.add(e)));
    const writes: Promise<unknown>[] = [added, db.reads.put(read)];
    if (next.done) writes.push(db.sessions.update(session.id, { completedAt: new Date().toISOString() }));
    await Promise.all(writes);
    const seqs = await added;
    rememberHead(db, chainKey(session.studyId), events[events.length - 1]?.hash ?? head, seqs[seqs.length - 1]);
    return { position: next, read };
  });

/** Commits one answer durably; resolves once the transaction is complete. Returns the next position. */
export const commitAnswer = async (db: HeedDb, input: AnswerCommit): Promise<SessionPosition> =>
  (await commitAnswerAndRead(db, input)).position;

/** Records a moment of a session that is not an answer (pause, resume, break, practice over, truth shown, reopened after a stop). */
export const logSessionMoment = (db: HeedDb, session: StoredSession, type: 'paused' | 'resumed' | 'break-taken' | 'practice-over-shown' | 'truth-shown' | 'session-reopened', detail: Record<string, unknown>): Promise<unknown> =>
  db.transaction('rw', db.events, () => appendEvent(db, session.studyId, type, { sessionId: session.id, ...detail }));
