/**
 * Read packs: one record per completed session holding the session's reads as JSON columns, so a
 * study's reads load as one record per session instead of one per answer (a browser's IndexedDB
 * spends about 45 microseconds deserialising each record, whatever its size; a 200,000-read study
 * is 100 packs). A pack is a derived copy: the `reads` records and the hash chain stay the source
 * of truth, and a pack is used only while it provably matches them (`packIsCurrent`: the session's
 * completedAt and the number of its stored reads, which an index count gives without reading a
 * record). Packs are written after a session's last answer (its own transaction, not awaited by the
 * reading view), with a restored or merged study's records, and whenever a study's reads are read
 * and a completed session has no current pack. Everything that deletes or replaces a study's reads
 * deletes its packs in the same transaction.
 */
import type { Assistance } from '../core/design';
import type { Bit } from '../core/read-log';
import type { RowItem, RowRead, RowSession } from '../core/read-rows';
import type { AnswerPart } from '../core/session';
import type { HeedDb } from './db';
import type { StoredPack, StoredRead, StoredSession } from './records';

/** An answer part as an array: [call, confidence, ms] or, when the part has a rating key, [call, confidence, ms, rating]. */
type PackedPart = [Bit, number | null, number] | [Bit, number | null, number, number | null];

/** The JSON text of a pack: one array per field, one entry per read, in the order of the reads' keys. */
export type PackColumns = {
  caseId: string[];
  finding: string[];
  shownAt: string[];
  initial: (PackedPart | null)[];
  final: (PackedPart | null)[];
  aiCall: (Bit | null)[];
  aiScore: (number | null)[];
  aiPlanted: Bit[];
  cautionShown: Bit[];
  /** the read's case as the session planned it (so the session record need not be read): assistance, practice (0/1), order */
  assistance: Assistance[];
  practice: Bit[];
  order: number[];
};

const packPart = (part: AnswerPart | null): PackedPart | null =>
  part === null ? null : 'rating' in part ? [part.call, part.confidence, part.ms, part.rating ?? null] : [part.call, part.confidence, part.ms];

const unpackPart = (packed: PackedPart | null): AnswerPart | null =>
  packed === null ? null : packed.length === 4
    ? { call: packed[0], confidence: packed[1], ms: packed[2], rating: packed[3] }
    : { call: packed[0], confidence: packed[1], ms: packed[2] };

/** The pack of a completed session from its stored reads (all of them: `count` is checked against the index). */
export const packOf = (session: StoredSession & { completedAt: string }, reads: readonly StoredRead[]): StoredPack | null => {
  const columns: PackColumns = {
    caseId: [], finding: [], shownAt: [], initial: [], final: [], aiCall: [], aiScore: [], aiPlanted: [], cautionShown: [],
    assistance: [], practice: [], order: [],
  };
  const items = new Map(session.items.map((i) => [i.caseId, i]));
  for (const r of reads) {
    const item = items.get(r.caseId);
    // a read of a case its session does not plan cannot be joined: such a session is not packed (its reads are used)
    if (!item) return null;
    columns.assistance.push(item.assistance);
    columns.practice.push(item.practice ? 1 : 0);
    columns.order.push(item.order);
    columns.caseId.push(r.caseId);
    columns.finding.push(r.finding);
    columns.shownAt.push(r.shownAt);
    columns.initial.push(packPart(r.initial));
    columns.final.push(packPart(r.final));
    columns.aiCall.push(r.aiCall);
    columns.aiScore.push(r.aiScore);
    columns.aiPlanted.push(r.aiPlanted ? 1 : 0);
    columns.cautionShown.push(r.cautionShown ? 1 : 0);
  }
  return {
    sessionId: session.id, studyId: session.studyId, readerId: session.readerId, period: session.period,
    completedAt: session.completedAt, count: reads.length, reads: JSON.stringify(columns),
  };
};

/** The reads a pack holds, as the read-log join takes them, and its session's plan of the cases read. */
export const unpack = (pack: StoredPack): { reads: RowRead[]; session: RowSession } => {
  const c = JSON.parse(pack.reads) as PackColumns;
  const out: RowRead[] = new Array<RowRead>(c.caseId.length);
  const items: RowItem[] = [];
  for (let i = 0; i < c.caseId.length; i += 1) {
    const caseId = c.caseId[i] as string;
    const finding = c.finding[i] as string;
    items.push({ caseId, assistance: c.assistance[i] as Assistance, practice: c.practice[i] === 1, order: c.order[i] as number });
    out[i] = {
      id: `${pack.sessionId}/${caseId}/${finding}`, sessionId: pack.sessionId, readerId: pack.readerId, period: pack.period,
      caseId, finding, initial: unpackPart(c.initial[i] ?? null), final: unpackPart(c.final[i] ?? null), shownAt: c.shownAt[i] as string,
      aiCall: c.aiCall[i] ?? null, aiScore: c.aiScore[i] ?? null, aiPlanted: c.aiPlanted[i] === 1, cautionShown: c.cautionShown[i] === 1,
    };
  }
  return { reads: out, session: { id: pack.sessionId, items } };
};

/** The reads a pack holds, as the read-log join takes them. */
export const readsOfPack = (pack: StoredPack): RowRead[] => unpack(pack).reads;

/** True when the pack may stand for the session's reads: the session completed at the pack's time, with as many reads as the index counts. */
export const packIsCurrent = (pack: StoredPack | undefined, completedAt: string | null | undefined, readCount: number): pack is StoredPack =>
  pack !== undefined && completedAt != null && pack.completedAt === completedAt && pack.count === readCount;

const isCompleted = (s: StoredSession): s is StoredSession & { completedAt: string } => s.completedAt !== null;

/** The packs of every completed session among `sessions`, built from `reads` (records already in memory: restore, merge). */
export const packsOf = (sessions: readonly StoredSession[], reads: readonly StoredRead[]): StoredPack[] => {
  const bySession = new Map<string, StoredRead[]>();
  for (const r of reads) {
    let list = bySession.get(r.sessionId);
    if (!list) bySession.set(r.sessionId, (list = []));
    list.push(r);
  }
  // in key order, as the store would give them
  return sessions.filter(isCompleted).flatMap((s) => packOf(s, (bySession.get(s.id) ?? []).sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))) ?? []);
};

/**
 * Builds and stores the pack of one session, in one transaction with the reads it is made from;
 * false (nothing stored) when the session is not complete. Called after a session's last answer,
 * not awaited by the reading view.
 */
export const packSession = (db: HeedDb, sessionId: string): Promise<boolean> =>
  db.transaction('rw', db.sessions, db.reads, db.packs, async () => {
    const session = await db.sessions.get(sessionId);
    if (!session || !isCompleted(session)) return false;
    const pack = packOf(session, await db.reads.where('sessionId').equals(sessionId).toArray());
    if (pack) await db.packs.put(pack);
    return pack !== null;
  });

/** Starts packing a just-completed session without waiting for it (a failure leaves it to be packed when next read). */
export const packSessionSoon = (db: HeedDb, sessionId: string): void => {
  packSession(db, sessionId).catch(() => undefined);
};

/** What loading a study's reads found: each session's plan, the reads, and the packs built on the way for sessions that had none. */
export type StudyReads = { sessions: RowSession[]; reads: RowRead[]; fresh: StoredPack[] };

/**
 * The stored reads of a study's sessions: from the current pack of each completed session, from
 * the `reads` records for the others, all in one read transaction (so packs and counts agree with
 * the reads read beside them). Which sessions are complete, and when, comes from an index (no
 * session record is read); the records are read only for sessions without a current pack. For a
 * completed session without a current pack, its pack is built from the reads just read and
 * returned in `fresh`, for `storePacks`.
 */
/**
 * When each completed session of a study completed, by session id, from the `[studyId+completedAt]`
 * index alone (no session record, with its list of cases, is read). Call inside a transaction over `sessions`.
 */
const completionTimes = async (db: HeedDb, studyId: string): Promise<Map<string, string>> => {
  const completedIndex = db.sessions.where('[studyId+completedAt]').between([studyId, ''], [studyId, '\uffff'], true, true); // completion times are ISO texts
  const [keys, ids] = await Promise.all([completedIndex.keys(), completedIndex.primaryKeys()]);
  return new Map(ids.map((id, i) => [id, (keys[i] as unknown as [string, string])[1]]));
};

export const loadStudyReads = (db: HeedDb, studyId: string): Promise<StudyReads> =>
  db.transaction('r', db.sessions, db.reads, db.packs, async () => {
    const [ids, completedAt, packs] = await Promise.all([
      db.sessions.where('studyId').equals(studyId).primaryKeys(),
      completionTimes(db, studyId),
      db.packs.where('studyId').equals(studyId).toArray(),
    ]);
    const known = new Set(ids);
    const candidates = packs.filter((p) => known.has(p.sessionId) && completedAt.get(p.sessionId) === p.completedAt);
    const counts = await Promise.all(candidates.map((p) => db.reads.where('sessionId').equals(p.sessionId).count()));
    const current = candidates.filter((p, i) => packIsCurrent(p, completedAt.get(p.sessionId), counts[i] ?? -1));
    const packed = new Set(current.map((p) => p.sessionId));
    const restIds = ids.filter((id) => !packed.has(id));
    const rest = (await db.sessions.bulkGet(restIds)).filter((s): s is StoredSession => s !== undefined);
    let stored: StoredRead[] = [];
    if (current.length === 0) stored = await db.reads.where('studyId').equals(studyId).toArray();
    else if (rest.length > 0) stored = (await Promise.all(rest.map((s) => db.reads.where('sessionId').equals(s.id).toArray()))).flat();
    const sessions: RowSession[] = [...rest];
    const reads: RowRead[] = [...stored];
    for (const pack of current) {
      const { reads: packReads, session } = unpack(pack);
      sessions.push(session);
      for (const r of packReads) reads.push(r);
    }
    return { sessions, reads, fresh: packsOf(rest, stored) };
  });

/** Packs stored per transaction by storePacks: a reader's answer commit waits for one batch at most, not for all. */
const PACKS_PER_TRANSACTION = 10;

/**
 * Stores packs built by `loadStudyReads`, each only if its session is still completed at the same
 * time with as many reads as the pack holds (checked in the writing transaction), a few per
 * transaction; resolves with how many were stored.
 */
export const storePacks = async (db: HeedDb, packs: readonly StoredPack[]): Promise<number> => {
  let stored = 0;
  for (let at = 0; at < packs.length; at += PACKS_PER_TRANSACTION) {
    const batch = packs.slice(at, at + PACKS_PER_TRANSACTION);
    stored += await db.transaction('rw', db.sessions, db.reads, db.packs, async () => {
      // completion times from the index of each study in the batch, not from the session records
      const studies = [...new Set(batch.map((p) => p.studyId))];
      const times = new Map((await Promise.all(studies.map((id) => completionTimes(db, id)))).flatMap((m) => [...m]));
      const counts = await Promise.all(batch.map((p) => db.reads.where('sessionId').equals(p.sessionId).count()));
      const checks = batch.map((p, i) => packIsCurrent(p, times.get(p.sessionId), counts[i] ?? -1));
      const fit = batch.filter((_, i) => checks[i]);
      await db.packs.bulkPut(fit);
      return fit.length;
    });
  }
  return stored;
};
