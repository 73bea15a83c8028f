import Papa from 'papaparse';
import { eventLogCsv, eventLogJsonl } from '../../../src/io/event-log-export';
import type { StoredEvent, StoredReader } from '../../../src/store/records';
import { auditLines, filterAudit } from '../../../src/ui/screens/audit-log-lines';

const reader = (id: string, code: string) => ({ id, code } as Pick<StoredReader, 'id' | 'code'>) satisfies Pick<StoredReader, 'id' | 'code'>;
// chain, prev and hash do not matter to the lines; placeholders
const link = { chain: 's', prev: '', hash: '' };
const events: StoredEvent[] = [
  { ...link, seq: 3, at: '2026-01-02T10:00:00.000Z', studyId: 's', type: 'session-started', detail: { sessionId: 'r1/1', readerId: 'r1', period: 1 } },
  { ...link, seq: 1, at: '2026-01-01T09:00:00.000Z', studyId: 's', type: 'study-created', detail: { name: 'Pilot' } },
  { ...link, seq: 2, at: '2026-01-01T09:05:00.000Z', studyId: 's', type: 'reader-deleted', detail: { readerId: 'gone', code: 'R9' } },
  { ...link, seq: 4, at: '2026-01-02T10:01:00.000Z', studyId: 's', type: 'paused', detail: { sessionId: 'r1/1', note: 'a "quoted", comma' } },
];

describe('audit log', () => {
  const lines = auditLines(events, [reader('r1', 'R01') as StoredReader]);

  it('lists events in time order with the reader each concerns (also a deleted reader, by the code in its event)', () => {
    expect(lines.map((l) => [l.seq, l.type, l.reader])).toEqual([
      [1, 'study-created', null], [2, 'reader-deleted', 'R9'], [3, 'session-started', 'R01'], [4, 'paused', 'R01'],
    ]);
  });

  it('filters by type and by reader', () => {
    expect(filterAudit(lines, { type: 'paused', reader: '' }).map((l) => l.seq)).toEqual([4]);
    expect(filterAudit(lines, { type: '', reader: 'R01' }).map((l) => l.seq)).toEqual([3, 4]);
    expect(filterAudit(lines, { type: 'study-created', reader: 'R01' })).toEqual([]);
  });

  it('exports CSV that parses back (papaparse 5.7.1) and one JSON object per line', () => {
    const parsed = Papa.parse<Record<string, string>>(eventLogCsv(lines), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data.map((r) => r.type)).toEqual(['study-created', 'reader-deleted', 'session-started', 'paused']);
    expect(JSON.parse(parsed.data[3]?.detail ?? '{}')).toEqual(events[3]?.detail);
    const jsonl = eventLogJsonl(lines).trimEnd().split('\n').map((l) => JSON.parse(l) as { seq: number; reader: string | null });
    expect(jsonl.map((o) => [o.seq, o.reader])).toEqual([[1, null], [2, 'R9'], [3, 'R01'], [4, 'R01']]);
  });
});
