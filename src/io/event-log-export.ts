/**
 * A study's audit log (its events in time order) as CSV or JSON Lines, for export. One line per
 * event: sequence number, ISO time, type, the reader's code when the event concerns one, and the
 * event's detail as JSON. Throws nothing.
 */
import Papa from 'papaparse';

export type EventLine = { seq: number; at: string; type: string; reader: string | null; detail: Record<string, unknown> };

export const EVENT_LOG_COLUMNS = ['seq', 'at', 'type', 'reader', 'detail'] as const;

export const eventLogCsv = (lines: readonly EventLine[]): string =>
  Papa.unparse({
    fields: [...EVENT_LOG_COLUMNS],
    data: lines.map((l) => [l.seq, l.at, l.type, l.reader ?? '', JSON.stringify(l.detail)]),
  }, { newline: '\n' }) + '\n';

export const eventLogJsonl = (lines: readonly EventLine[]): string =>
  lines.map((l) => JSON.stringify({ seq: l.seq, at: l.at, type: l.type, reader: l.reader, detail: l.detail })).join('\n') + (lines.length > 0 ? '\n' : '');
