/** Rename or delete one case set. A set in use by a study is refused with the study named. */
import { useState } from 'react';
import { deleteCaseSet, renameCaseSet } from '../../store/case-set-lifecycle';
import { InputError } from '../../store/input-error';
import type { StoredCaseSet } from '../../store/records';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';

type Mode = { kind: 'idle' } | { kind: 'rename'; name: string } | { kind: 'confirm-delete' };

export const CaseSetActions = ({ set, onChanged }: { set: StoredCaseSet; onChanged: () => void }) => {
  const db = useDb();
  const [mode, setMode] = useState<Mode>({ kind: 'idle' });
  const [problem, setProblem] = useState<string | null>(null);
  const attempt = async (change: () => Promise<void>, done: string) => {
    try {
      await change();
      setProblem(null);
      setMode({ kind: 'idle' });
      actions.notify({ kind: 'info', text: done });
      onChanged();
      signal('saved', { caseSet: set.id });
    } catch (e) {
      setProblem(e instanceof InputError ? e.message : `Not changed: ${String(e)}`);
      if (mode.kind === 'confirm-delete') setMode({ kind: 'idle' }); // refused: nothing left to confirm
      signal('saved', { refused: true });
    }
  };
  return (
    <div className="row-actions">
      {mode.kind === 'idle' && (
        <>
          <button type="button" onClick={() => { setProblem(null); setMode({ kind: 'rename', name: set.name }); }} aria-label={`Rename case set ${set.name}`}>Rename</button>
          <button type="button" onClick={() => { setProblem(null); setMode({ kind: 'confirm-delete' }); }} aria-label={`Delete case set ${set.name}`}>Delete</button>
        </>
      )}
      {mode.kind === 'rename' && (
        <form className="inline-form" onSubmit={(e) => { e.preventDefault(); void attempt(() => renameCaseSet(db, set.id, mode.name), `Case set renamed to “${mode.name.trim()}”.`); }}>
          <label>New name for {set.name} <input value={mode.name} onChange={(e) => setMode({ kind: 'rename', name: e.target.value })} /></label>
          <button type="submit">Save name</button>
          <button type="button" onClick={() => setMode({ kind: 'idle' })}>Cancel</button>
        </form>
      )}
      {mode.kind === 'confirm-delete' && (
        <div role="group" aria-label={`Confirm deleting ${set.name}`} className="inline-form">
          <span>Delete “{set.name}” and its {set.imageCount} images from this workstation?</span>
          <button type="button" className="danger" onClick={() => void attempt(() => deleteCaseSet(db, set.id), `Case set “${set.name}” deleted.`)}>Delete case set</button>
          <button type="button" onClick={() => setMode({ kind: 'idle' })}>Keep it</button>
        </div>
      )}
      {problem && <p role="alert" className="form-problem">{problem}</p>}
    </div>
  );
};
