/** The start screen's "Open a study bundle": verify a bundle, then restore its study here. */
import { useState, type ChangeEvent } from 'react';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';

export const OpenBundle = () => {
  const db = useDb();
  const [problem, setProblem] = useState('');
  const [busy, setBusy] = useState(false);
  const open = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    setBusy(true);
    setProblem('');
    try {
      // loaded on first use: the bundle reader (zip, hashes, schemas) is not part of the start screen's bundle
      const { openStudyBundle } = await import('../../store/bundle');
      const outcome = await openStudyBundle(db, file.name, new Uint8Array(await file.arrayBuffer()));
      if (!outcome.ok) {
        setProblem(outcome.message);
        signal('saved', { opened: file.name, ok: false });
        return;
      }
      const { study, caseSet, caseSetImported } = outcome.restored;
      actions.openStudy(study.id, { kind: 'info', text: `Opened “${study.name}” from ${file.name}: its hashes and chain check out.${caseSetImported ? ` The case set “${caseSet.name}” came with it.` : ` It uses the case set “${caseSet.name}” already here.`}` });
    } catch (e) {
      setProblem(`${file.name} was not opened: ${e instanceof Error ? e.message : String(e)}`);
    } finally {
      setBusy(false);
    }
  };
  return (
    <section className="panel" aria-labelledby="open-bundle-head">
      <h2 id="open-bundle-head">Study from another workstation</h2>
      <p className="muted">A study bundle is checked (every file and the hash chain) before anything is stored; a bundle edited since it was saved is refused, naming where.</p>
      <label>
        Open a study bundle
        <input type="file" accept=".zip,application/zip" disabled={busy} onChange={(e) => void open(e)} />
      </label>
      {problem && <p role="alert">{problem}</p>}
    </section>
  );
};
