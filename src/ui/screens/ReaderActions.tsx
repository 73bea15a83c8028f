/**
 * Changes to one reader: before they start, correct the code or delete them; at any time,
 * withdraw them with a reason (their reads stay in the log, marked withdrawn).
 */
import { useState } from 'react';
import { InputError } from '../../store/input-error';
import { correctReaderCode, deleteReader, withdrawReader } from '../../store/reader-lifecycle';
import type { StoredReader } from '../../store/records';
import { useDb } from '../db-context';
import { signal } from '../signals';

type Mode = { kind: 'idle' } | { kind: 'code'; code: string } | { kind: 'delete' } | { kind: 'withdraw'; reason: string; by: string };

export const ReaderActions = ({ reader, started, onChanged }: { reader: StoredReader; started: boolean; onChanged: () => void }) => {
  const db = useDb();
  const [mode, setMode] = useState<Mode>({ kind: 'idle' });
  const [problem, setProblem] = useState<string | null>(null);
  const attempt = async (change: () => Promise<unknown>) => {
    try {
      await change();
      setProblem(null);
      setMode({ kind: 'idle' });
      onChanged();
      signal('saved', { reader: reader.id });
    } catch (e) {
      setProblem(e instanceof InputError ? e.message : `Not changed: ${String(e)}`);
      signal('saved', { refused: true });
    }
  };
  if (reader.withdrawn) {
    return <span className="warning">withdrawn {reader.withdrawn.at.slice(0, 10)} by {reader.withdrawn.by}: {reader.withdrawn.reason}</span>;
  }
  const code = reader.code;
  return (
    <div className="row-actions">
      {mode.kind === 'idle' && (
        <>
          {!started && <button type="button" onClick={() => setMode({ kind: 'code', code })} aria-label={`Correct code ${code}`}>Correct code</button>}
          {!started && <button type="button" onClick={() => setMode({ kind: 'delete' })} aria-label={`Delete reader ${code}`}>Delete</button>}
          <button type="button" onClick={() => setMode({ kind: 'withdraw', reason: '', by: '' })} aria-label={`Withdraw ${code}`}>Withdraw</button>
        </>
      )}
      {mode.kind === 'code' && (
        <form className="inline-form" onSubmit={(e) => { e.preventDefault(); void attempt(() => correctReaderCode(db, reader.id, mode.code)); }}>
          <label>Corrected code for {code} <input value={mode.code} onChange={(e) => setMode({ kind: 'code', code: e.target.value })} /></label>
          <button type="submit">Save code</button>
          <button type="button" onClick={() => { setProblem(null); setMode({ kind: 'idle' }); }}>Cancel</button>
        </form>
      )}
      {mode.kind === 'delete' && (
        <div role="group" aria-label={`Confirm deleting reader ${code}`} className="inline-form">
          <span>Delete {code}? They have not started reading.</span>
          <button type="button" className="danger" onClick={() => void attempt(() => deleteReader(db, reader.id))}>Delete {code}</button>
          <button type="button" onClick={() => setMode({ kind: 'idle' })}>Keep</button>
        </div>
      )}
      {mode.kind === 'withdraw' && (
        <form className="inline-form" aria-label={`Withdraw ${code}`} onSubmit={(e) => { e.preventDefault(); void attempt(() => withdrawReader(db, reader.id, mode.reason, mode.by)); }}>
          <label>Reason for withdrawing {code} <input value={mode.reason} onChange={(e) => setMode({ ...mode, reason: e.target.value })} /></label>
          <label>Recorded by <input value={mode.by} onChange={(e) => setMode({ ...mode, by: e.target.value })} placeholder="coordinator’s name or code" /></label>
          <button type="submit" className="danger">Withdraw {code} (logged)</button>
          <button type="button" onClick={() => { setProblem(null); setMode({ kind: 'idle' }); }}>Cancel</button>
          <small className="muted">Their reads stay in the log, marked withdrawn; no new period opens for them.</small>
        </form>
      )}
      {problem && <p role="alert" className="form-problem">{problem}</p>}
    </div>
  );
};
