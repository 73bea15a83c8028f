/** The audit log's lines: a study's events in time order, each with the code of the reader it concerns. */
import type { EventLine } from '../../io/event-log-export';
import type { StoredEvent, StoredReader } from '../../store/records';

/** The reader an event concerns: its readerId, or the reader part of its session id (`reader/period`). */
const readerIdOf = (detail: Record<string, unknown>): string | null => {
  if (typeof detail.readerId === 'string') return detail.readerId;
  if (typeof detail.sessionId === 'string') return detail.sessionId.split('/')[0] ?? null;
  return null;
};

export const auditLines = (events: readonly StoredEvent[], readers: readonly StoredReader[]): EventLine[] => {
  const codes = new Map(readers.map((r) => [r.id, r.code]));
  // a reader deleted before starting is no longer stored: their code is in the event itself
  for (const e of events) {
    const id = readerIdOf(e.detail);
    if (id !== null && !codes.has(id) && typeof e.detail.code === 'string') codes.set(id, e.detail.code);
  }
  return [...events]
    .sort((a, b) => a.at.localeCompare(b.at) || (a.seq ?? 0) - (b.seq ?? 0))
    .map((e) => {
      const id = readerIdOf(e.detail);
      return { seq: e.seq ?? 0, at: e.at, type: e.type, reader: id === null ? null : codes.get(id) ?? id, detail: e.detail };
    });
};

export type AuditFilter = { type: string; reader: string };

export const filterAudit = (lines: readonly EventLine[], filter: AuditFilter): EventLine[] =>
  lines.filter((l) => (filter.type === '' || l.type === filter.type) && (filter.reader === '' || l.reader === filter.reader));
