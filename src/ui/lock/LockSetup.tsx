/**
 * On the start page while no coordinator passphrase is set: asks the coordinator to set one (it
 * can be put off). Without a passphrase there is no lock; with one, the coordinator's side locks
 * as soon as a reading session opens, and after the chosen idle minutes.
 */
import { useState, type FormEvent } from 'react';
import { DEFAULT_IDLE_MINUTES, setPassphrase } from '../../store/coordinator-lock';
import { useDb } from '../db-context';

type Props = { onSet: () => void; onDismiss: () => void };

export const LockSetup = ({ onSet, onDismiss }: Props) => {
  const db = useDb();
  const [phrase, setPhrase] = useState('');
  const [repeat, setRepeat] = useState('');
  const [idle, setIdle] = useState(String(DEFAULT_IDLE_MINUTES));
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setBusy(true);
    setProblem(null);
    try { await setPassphrase(db, phrase, repeat, Number(idle)); onSet(); } catch (e) { setProblem(e instanceof Error ? e.message : String(e)); } finally { setBusy(false); }
  };
  return (
    <section className="lock-setup panel" aria-label="Coordinator lock">
      <h2>Protect the coordinator's pages</h2>
      <p>Set a passphrase so that a reader cannot leave a reading session for the study pages, the answers or the results. Only a salted hash of it is stored.</p>
      <form onSubmit={(e) => void submit(e)}>
        <label>New passphrase <input type="password" autoComplete="new-password" value={phrase} onChange={(e) => setPhrase(e.target.value)} /></label>
        <label>Repeat the passphrase <input type="password" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} /></label>
        <label>Lock after idle minutes <input type="number" min={1} max={240} value={idle} onChange={(e) => setIdle(e.target.value)} /></label>
        <button type="submit" disabled={busy}>{busy ? 'Setting…' : 'Set the passphrase'}</button>
        <button type="button" className="link" onClick={onDismiss}>Not now</button>
      </form>
      {problem && <p role="alert">{problem}</p>}
    </section>
  );
};
