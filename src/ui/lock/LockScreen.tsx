/**
 * The coordinator lock: shown instead of any coordinator screen once a reading session was opened
 * (or the coordinator's side was idle), until the passphrase is entered. A forgotten passphrase
 * can be reset by typing a phrase; the reset is logged and keeps every study, reader and answer.
 */
import { useEffect, useState, type FormEvent } from 'react';
import { RESET_PHRASE, resetLock, unlock } from '../../store/coordinator-lock';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { signal } from '../signals';

type Props = { onOpen: () => void };

export const LockScreen = ({ onOpen }: Props) => {
  const db = useDb();
  const [phrase, setPhrase] = useState('');
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [resetting, setResetting] = useState(false);
  const [typed, setTyped] = useState('');
  useEffect(() => { signal('ready', { screen: 'lock' }); }, []);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setBusy(true);
    setProblem(null);
    try {
      if (await unlock(db, phrase)) onOpen();
      else { setProblem('That is not the coordinator passphrase.'); setPhrase(''); }
    } finally { setBusy(false); }
  };
  const reset = async (event: FormEvent) => {
    event.preventDefault();
    try { await resetLock(db, typed); onOpen(); } catch (e) { setProblem(e instanceof Error ? e.message : String(e)); }
  };

  return (
    <main className="page lock-screen">
      <h1>Coordinator lock</h1>
      <p>A reading session was opened on this workstation, so the coordinator's pages are locked.</p>
      <p>If you are a reader, please hand the workstation back to the study coordinator.</p>
      <form onSubmit={(e) => void submit(e)}>
        <label>Coordinator passphrase <input type="password" value={phrase} autoComplete="current-password" autoFocus onChange={(e) => setPhrase(e.target.value)} /></label>
        <button type="submit" disabled={busy || phrase === ''}>{busy ? 'Checking…' : 'Unlock'}</button>
      </form>
      {problem && <p role="alert">{problem}</p>}
      {!resetting && <button type="button" className="link" onClick={() => setResetting(true)}>Forgotten the passphrase?</button>}
      {resetting && (
        <form onSubmit={(e) => void reset(e)} aria-label="Reset the lock">
          <p>Resetting removes the passphrase and the lock; every study, reader and answer is kept. The reset is written to the workstation's event log, and the start page asks for a new passphrase.</p>
          <label>Type “{RESET_PHRASE}” to confirm <input value={typed} onChange={(e) => setTyped(e.target.value)} /></label>
          <button type="submit">Reset the lock (logged)</button>
        </form>
      )}
      <CautionLine />
    </main>
  );
};
