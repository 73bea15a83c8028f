/**
 * What a coordinator can do to a whole study: rename it, edit its draft design, read its audit
 * log, delete it. Deleting says plainly that no bundle was saved and needs an explicit choice.
 */
import { useState } from 'react';
import { InputError } from '../../store/input-error';
import type { StoredStudy } from '../../store/records';
import { deleteStudy, renameStudy } from '../../store/study-lifecycle';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';

type Mode = { kind: 'idle' } | { kind: 'rename'; name: string } | { kind: 'confirm-delete' };

export const StudyActions = ({ study, onChanged }: { study: StoredStudy; onChanged: () => void }) => {
  const db = useDb();
  const [mode, setMode] = useState<Mode>({ kind: 'idle' });
  const [problem, setProblem] = useState<string | null>(null);
  const fail = (e: unknown) => { setProblem(e instanceof InputError ? e.message : `Not changed: ${String(e)}`); signal('saved', { refused: true }); };
  const rename = async (name: string) => {
    try {
      await renameStudy(db, study.id, name);
      setProblem(null);
      setMode({ kind: 'idle' });
      onChanged();
      signal('saved', { study: study.id });
    } catch (e) { fail(e); }
  };
  const remove = async () => {
    try {
      const deleted = await deleteStudy(db, study.id, { withoutBundle: true });
      actions.goHome();
      actions.notify({ kind: 'info', text: `Study “${deleted.name}” deleted (${deleted.readers} readers, ${deleted.reads} reads); no bundle was saved.` });
      signal('saved', { deleted: study.id });
    } catch (e) { fail(e); }
  };
  return (
    <section className="panel" aria-label="Study actions">
      <div className="row-actions">
        <button type="button" onClick={() => { setProblem(null); setMode({ kind: 'rename', name: study.name }); }}>Rename study</button>
        <button type="button" onClick={() => actions.editStudy(study.id)} disabled={study.lockedAt !== null}
          title={study.lockedAt ? 'The design locked when the first reader started.' : undefined}>Edit design</button>
        <button type="button" onClick={() => actions.openAuditLog(study.id)}>Audit log</button>
        <button type="button" onClick={() => { setProblem(null); setMode({ kind: 'confirm-delete' }); }}>Delete study…</button>
      </div>
      {study.lockedAt && <p className="muted">The design is locked: reading started, so it can no longer be edited.</p>}
      {mode.kind === 'rename' && (
        <form className="inline-form panel-inner" onSubmit={(e) => { e.preventDefault(); void rename(mode.name); }}>
          <label>New study name <input value={mode.name} onChange={(e) => setMode({ kind: 'rename', name: e.target.value })} /></label>
          <button type="submit">Save name</button>
          <button type="button" onClick={() => setMode({ kind: 'idle' })}>Cancel</button>
        </form>
      )}
      {mode.kind === 'confirm-delete' && (
        <div role="group" aria-label="Confirm deleting the study" className="panel-inner">
          <p className="warning">No bundle of this study was saved. Deleting removes its design, readers, reads and audit log from this
            workstation for good; export the read log and study.json first if you need them.</p>
          <button type="button" className="danger" onClick={() => void remove()}>Delete without a bundle</button>
          <button type="button" onClick={() => setMode({ kind: 'idle' })}>Keep the study</button>
        </div>
      )}
      {problem && <p role="alert" className="form-problem">{problem}</p>}
    </section>
  );
};
