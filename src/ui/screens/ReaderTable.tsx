/** Readers with their sequence and progress per period; opening a period, or resuming it. */
import { useEffect, useState } from 'react';
import type { StoredStudy } from '../../store/records';
import { openPeriod } from '../../store/study-service';
import { InputError } from '../../store/input-error';
import { useDb } from '../db-context';
import { actions } from '../state/app-state';
import { when } from '../../core/washout';
import { periodWords } from '../../core/design-summary';
import { preloadReading } from '../reading/load-reading';
import { ReaderActions } from './ReaderActions';
import type { PeriodProgress, ReaderProgress } from './study-progress';

type Props = { study: StoredStudy; progress: ReaderProgress[]; onChanged: () => void };

type EarlyRequest = { readerId: string; period: number; message: string };

/** The reader's private report opens once a period is done; it says itself when it is interim. */
const reportCell = (studyId: string, row: ReaderProgress) => {
  const done = row.periods.filter((p) => p.session?.completedAt).length;
  if (done === 0) return <span className="muted">after a period</span>;
  return (
    <button type="button" onClick={() => actions.openReaderReport(studyId, row.reader.id)} aria-label={`Report for ${row.reader.code}`}>
      {done === row.periods.length ? 'Report' : 'Interim report'}
    </button>
  );
};

export const ReaderTable = ({ study, progress, onChanged }: Props) => {
  const db = useDb();
  const [early, setEarly] = useState<EarlyRequest | null>(null);
  // reading starts from this table: fetch the reading view while the coordinator looks at it
  useEffect(preloadReading, []);
  const [reason, setReason] = useState('');
  const [by, setBy] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const periodCount = study.design.sequences[0]?.periods.length ?? 0;

  const open = async (row: ReaderProgress, period: number, withOverride: boolean) => {
    setProblem(null);
    try {
      const override = withOverride ? { reason, by, at: new Date().toISOString() } : null;
      const result = await openPeriod(db, study, row.reader, period, override);
      if (result.open) { setEarly(null); actions.startReading(study.id, result.session.id); return; }
      if (withOverride) setProblem(result.message);
      else setEarly({ readerId: row.reader.id, period, message: result.message });
      onChanged();
    } catch (e) {
      setProblem(e instanceof InputError ? e.message : String(e));
    }
  };

  const cell = (row: ReaderProgress, p: PeriodProgress) => {
    const sequence = study.design.sequences[row.reader.sequenceIndex];
    const assistance = sequence ? periodWords(sequence, p.period - 1, study.design.blocks, true) : '?';
    const label = `${row.reader.code} period ${p.period}`;
    const openedEarly = p.session?.override ? <span className="warning"> opened early by {p.session.override.by}: {p.session.override.reason}</span> : null;
    if (p.session?.completedAt) return <span>{p.answered}/{p.total} done{openedEarly}</span>;
    const what = <span className="muted">{assistance} · {p.session ? `${p.answered}/${p.total}` : 'not started'}</span>;
    if (row.reader.withdrawn) return <span className="cell-actions">{what}</span>;
    const previousDone = p.period === 1 || Boolean(row.periods[p.period - 2]?.session?.completedAt);
    const inWashout = p.inWashout;
    const why = !previousDone ? `opens after period ${p.period - 1} is complete` : inWashout && p.opensAt ? `opens ${when(p.opensAt)} (washout)` : null;
    const whyId = `why-${row.reader.id}-${p.period}`;
    return (
      <span className="cell-actions">
        {what}{openedEarly}
        {why && <span id={whyId} className="muted"> · {why}</span>}
        <button type="button" disabled={why !== null} aria-describedby={why ? whyId : undefined}
          onClick={() => void open(row, p.period, false)} aria-label={`${p.session ? 'Resume' : 'Start'} ${label}`}>
          {p.session ? 'Resume' : 'Start'}
        </button>
        {inWashout && p.opensAt && (
          <button type="button" aria-label={`Open ${label} early`}
            onClick={() => { setProblem(null); setEarly({ readerId: row.reader.id, period: p.period, message: `Period ${p.period} of ${row.reader.code} is not open yet. It opens at ${when(p.opensAt ?? new Date())}, after the ${study.design.washoutDays}-day washout.` }); }}>
            Open early…
          </button>
        )}
      </span>
    );
  };

  return (
    <section className="panel" aria-labelledby="readers-head">
      <h2 id="readers-head">Readers</h2>
      {progress.length === 0 ? <p className="muted">No reader enrolled yet.</p> : (
        <table className="grid">
          <thead>
            <tr><th scope="col">Code</th><th scope="col">Role</th><th scope="col">Years</th><th scope="col">Sequence</th>
              {Array.from({ length: periodCount }, (_, i) => <th scope="col" key={i}>Period {i + 1}</th>)}<th scope="col">Report</th><th scope="col">Changes</th></tr>
          </thead>
          <tbody>
            {progress.map((row) => (
              <tr key={row.reader.id}>
                <td>{row.reader.code}</td><td>{row.reader.role}</td><td>{row.reader.years ?? '—'}</td><td>{row.sequenceLabel}</td>
                {row.periods.map((p) => <td key={p.period}>{cell(row, p)}</td>)}
                <td>{reportCell(study.id, row)}</td>
                <td><ReaderActions reader={row.reader} started={row.periods.some((p) => p.session !== null)} onChanged={onChanged} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {early && (
        <div className="panel-inner" role="group" aria-label="Washout not over">
          <p>{early.message}</p>
          <label>Reason for opening early <input value={reason} onChange={(e) => setReason(e.target.value)} /></label>
          <label>Allowed by <input value={by} onChange={(e) => setBy(e.target.value)} placeholder="coordinator’s name or code" /></label>
          <button type="button" onClick={() => {
            const row = progress.find((r) => r.reader.id === early.readerId);
            if (row) void open(row, early.period, true);
          }}>Open early (logged)</button>
          <button type="button" onClick={() => setEarly(null)}>Wait</button>
        </div>
      )}
      {problem && <p role="alert" className="form-problem">{problem}</p>}
    </section>
  );
};
