/**
 * The version 3 upgrade: links the events written before the hash chain existed, in commit (seq)
 * order per study, and gives each read the hash of the event that last committed it. Answer events
 * of those versions did not carry the read, so the upgrade adds it (the initial-call event gets
 * the read without its final call) before hashing, as a version 3 commit would have.
 */
import type { Transaction } from 'dexie';
import { genesisHash, linkHash } from '../core/chain';
import { chainKey } from './events';
import type { StoredEvent, StoredRead } from './records';

type LegacyEvent = Omit<StoredEvent, 'chain' | 'prev' | 'hash'> & Partial<Pick<StoredEvent, 'chain' | 'prev' | 'hash'>>;

const readIdOf = (detail: Record<string, unknown>): string | null => {
  const { sessionId, caseId, finding } = detail;
  return typeof sessionId === 'string' && typeof caseId === 'string' && typeof finding === 'string' ? `${sessionId}/${caseId}/${finding}` : null;
};

export const chainExistingRecords = async (tx: Transaction): Promise<void> => {
  const reads = new Map<string, StoredRead>();
  await tx.table<StoredRead>('reads').each((r) => { reads.set(r.id, r); });
  const events = await tx.table<LegacyEvent>('events').orderBy('seq').toArray();
  const heads = new Map<string, string>();
  const readHashes = new Map<string, string>();
  for (const event of events) {
    const chain = chainKey(event.studyId);
    const prev = heads.get(chain) ?? genesisHash(chain);
    let detail: Record<string, unknown> = event.detail ?? {}; // the oldest events may have none
    const id = (event.type === 'initial-committed' || event.type === 'final-committed') ? readIdOf(detail) : null;
    const read = id === null ? undefined : reads.get(id);
    if (id !== null && read && detail.read === undefined) {
      const { hash: _old, ...content } = read;
      detail = { ...detail, read: event.type === 'initial-committed' ? { ...content, final: null } : content };
    }
    const hash = linkHash(prev, { at: event.at, type: event.type, detail });
    heads.set(chain, hash);
    if (id !== null && read) readHashes.set(id, hash);
    Object.assign(event, { detail, chain, prev, hash });
  }
  await tx.table<LegacyEvent>('events').bulkPut(events);
  await tx.table<StoredRead>('reads').toCollection().modify((read) => {
    const hash = readHashes.get(read.id);
    if (hash !== undefined) read.hash = hash;
  });
};
