/** A study's audit log: every event in time order, filtered by type and reader, exported as CSV or JSON Lines. */
import { useCallback, useEffect, useState } from 'react';
import { eventLogCsv, eventLogJsonl } from '../../io/event-log-export';
import { eventsOfStudy } from '../../store/events';
import { listReaders } from '../../store/readers';
import { getStudy } from '../../store/studies';
import { getHost } from '../../host';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';
import { auditLines, filterAudit, type AuditFilter } from './audit-log-lines';

const SHOWN_MAX = 2000;
/** The detail in plain "key: value" pairs; internal ids are left to the exported file. */
const readable = (detail: Record<string, unknown>): string =>
  Object.entries(detail).filter(([k]) => k !== 'readerId' && k !== 'sessionId')
    .map(([k, v]) => `${k}: ${typeof v === 'string' ? v : JSON.stringify(v)}`).join(' · ');
const safeName = (name: string): string => name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'study';

export const AuditLogScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const data = useAsync(useCallback(async () => {
    const study = await getStudy(db, studyId);
    const lines = auditLines(await eventsOfStudy(db, studyId), await listReaders(db, studyId));
    return { study, lines };
  }, [db, studyId]));
  const [filter, setFilter] = useState<AuditFilter>({ type: '', reader: '' });
  const [saved, setSaved] = useState<string | null>(null);
  useEffect(() => { if (data.value) signal('ready', { screen: 'audit' }); }, [data.value]);
  if (data.error) return <main className="page"><p role="alert">Cannot open the audit log: {data.error.message}</p></main>;
  if (!data.value) return <main className="page" aria-busy="true"><p>Opening the audit log…</p></main>;
  const { study, lines } = data.value;
  const shown = filterAudit(lines, filter);
  const types = [...new Set(lines.map((l) => l.type))].sort();
  const readers = [...new Set(lines.flatMap((l) => (l.reader === null ? [] : [l.reader])))].sort();
  const save = async (kind: 'csv' | 'jsonl') => {
    const base = safeName(`${study.name}-audit-log`);
    const result = kind === 'csv'
      ? await getHost().saveFile(`${base}.csv`, eventLogCsv(shown), 'text/csv')
      : await getHost().saveFile(`${base}.jsonl`, eventLogJsonl(shown), 'application/x-ndjson');
    setSaved(result.saved ? `Saved ${shown.length} events${result.where ? ` to ${result.where}` : ''}.` : result.handedTo ? `${shown.length} events handed to the downloads.` : 'Not saved.');
    signal('saved', { audit: kind });
  };
  return (
    <main className="page page-wide">
      <header className="page-head">
        <button type="button" className="link" onClick={() => actions.openStudy(study.id)}>← {study.name}</button>
        <h1>Audit log of {study.name}</h1>
        <p className="muted">Everything recorded for this study, oldest first: design changes, enrolments, sessions, answers, pauses, early openings, withdrawals.</p>
        <CautionLine />
      </header>
      <section className="panel" aria-label="Audit log filters">
        <div className="form-row inline-form">
          <label htmlFor="audit-type">Event type</label>
            <select id="audit-type" value={filter.type} onChange={(e) => setFilter({ ...filter, type: e.target.value })}>
              <option value="">all types</option>
              {types.map((t) => <option key={t} value={t}>{t}</option>)}
            </select>
          <label htmlFor="audit-reader">Reader</label>
            <select id="audit-reader" value={filter.reader} onChange={(e) => setFilter({ ...filter, reader: e.target.value })}>
              <option value="">all readers</option>
              {readers.map((r) => <option key={r} value={r}>{r}</option>)}
            </select>
          <button type="button" onClick={() => void save('csv')}>Save audit log (CSV)</button>
          <button type="button" onClick={() => void save('jsonl')}>Save audit log (JSON Lines)</button>
        </div>
        <p className="muted" aria-live="polite">{shown.length} of {lines.length} events{filter.type || filter.reader ? ' match the filters' : ''}; the saved file holds the events shown.</p>
        {saved && <p role="status">{saved}</p>}
      </section>
      <section className="panel scroll" aria-label="Events">
        <table className="grid">
          <thead><tr><th scope="col">#</th><th scope="col">Time (UTC)</th><th scope="col">Type</th><th scope="col">Reader</th><th scope="col">Detail</th></tr></thead>
          <tbody>
            {shown.slice(0, SHOWN_MAX).map((l) => (
              <tr key={l.seq}>
                <td>{l.seq}</td><td>{l.at.slice(0, 19).replace('T', ' ')}</td><td>{l.type}</td><td>{l.reader ?? '—'}</td>
                <td className="detail">{readable(l.detail)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {shown.length > SHOWN_MAX && <p className="muted">The first {SHOWN_MAX} are shown; the saved file holds all {shown.length}.</p>}
      </section>
    </main>
  );
};
