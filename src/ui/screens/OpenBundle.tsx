/** The start screen's "Open a study bundle": verify a bundle, then restore its study here. */
import { useBusyAction } from '../components/use-busy-action';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';

export const OpenBundle = () => {
  const db = useDb();
  const { busy, problem, setProblem, picked } = useBusyAction();
  const open = picked(async (name, bytes) => {
    try {
      // loaded on first use: the bundle reader (zip, hashes, schemas) is not part of the start screen's bundle
      const { openStudyBundle } = await import('../../store/bundle');
      const outcome = await openStudyBundle(db, name, bytes);
      if (!outcome.ok) {
        setProblem(outcome.message);
        signal('saved', { opened: name, ok: false });
        return;
      }
      const { study, caseSet, caseSetImported } = outcome.restored;
      actions.openStudy(study.id, { kind: 'info', text: `Opened “${study.name}” from ${name}: its hashes and chain check out.${caseSetImported ? ` The case set “${caseSet.name}” came with it.` : ` It uses the case set “${caseSet.name}” already here.`}` });
    } catch (e) {
      setProblem(`${name} was not opened: ${e instanceof Error ? e.message : String(e)}`);
    }
  });
  return (
    <section className="panel" aria-labelledby="open-bundle-head">
      <h2 id="open-bundle-head">Study from another workstation</h2>
      <p className="muted">A study bundle is checked (every file and the hash chain) before anything is stored; a bundle edited since it was saved is refused, naming where.</p>
      <label>
        Open a study bundle
        <input type="file" accept=".zip,application/zip" disabled={busy} onChange={open} />
      </label>
      {problem && <p role="alert">{problem}</p>}
    </section>
  );
};
