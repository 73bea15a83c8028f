import { genesisHash, linkHash } from '../core/chain';
import type { HeedDb } from './db';
import type { StoredEvent } from './records';

/** The chain an event belongs to: its study, or '' for events of no study (e.g. a case set stored). */
export const chainKey = (studyId: string | null): string => studyId ?? '';

/** The hash the next event of a chain links to: the last event's hash, or the chain's genesis. */
export const chainHead = async (db: HeedDb, key: string): Promise<string> =>
  (await db.events.where('chain').equals(key).last())?.hash ?? genesisHash(key);

/**
 * Appends to the event log, linked to the head of its chain. Call it inside the transaction of the
 * change it records (the transaction must include db.events): the head is read and the new link
 * written in that one transaction, so two windows can never fork a chain.
 */
export const appendEvent = async (db: HeedDb, studyId: string | null, type: string, detail: Record<string, unknown>): Promise<StoredEvent> => {
  const event = linkEvent(await chainHead(db, chainKey(studyId)), studyId, type, detail);
  const seq = await db.events.add(event);
  event.seq = seq;
  rememberHead(db, event.chain, event.hash, seq);
  return event;
};

/** The last link this connection appended to a chain: its hash and its key (seq) in the event log. */
export type KnownHead = { hash: string; seq: number };

// The head each chain had after this connection's last append: a guess only (its transaction may
// still abort, another window may append), which a caller must check against the stored head
// inside its own transaction before relying on it.
const heads = new WeakMap<HeedDb, Map<string, KnownHead>>();

export const guessedHead = (db: HeedDb, chain: string): KnownHead | undefined => heads.get(db)?.get(chain);

/** Remembers a chain's new head; without its key (never expected) the chain's guess is dropped. */
export const rememberHead = (db: HeedDb, chain: string, hash: string, seq: number | undefined): void => {
  const known = heads.get(db) ?? new Map<string, KnownHead>();
  if (seq === undefined) known.delete(chain);
  else known.set(chain, { hash, seq });
  heads.set(db, known);
};

/**
 * The next link of a chain whose head `prev` was read in the current transaction, not yet stored:
 * a caller that must be quick (the answer commit) reads the head beside its other reads and adds
 * the event beside its other writes, all inside that one transaction.
 */
export const linkEvent = (prev: string, studyId: string | null, type: string, detail: Record<string, unknown>): StoredEvent => {
  const at = new Date().toISOString();
  return { at, studyId, type, detail, chain: chainKey(studyId), prev, hash: linkHash(prev, { at, type, detail }) };
};

export const eventsOfStudy = (db: HeedDb, studyId: string): Promise<StoredEvent[]> =>
  db.events.where('studyId').equals(studyId).sortBy('seq');
