/** Importing a case set from a folder or a zip: validated whole, refused with row and column named. */
import { useState } from 'react';
import type { CaseSetSummary } from '../../io/case-set/types';
import { getHost } from '../../host';
import { useDb } from '../db-context';
import { signal } from '../signals';

type State =
  | { kind: 'idle' }
  | { kind: 'working'; label: string }
  | { kind: 'refused'; label: string; lines: string[]; total: number }
  | { kind: 'imported'; summary: CaseSetSummary };

const pct = (x: number | null): string => (x === null ? '—' : `${Math.round(100 * x)}%`);

export const ImportCaseSet = ({ onImported }: { onImported: () => void }) => {
  const db = useDb();
  const [state, setState] = useState<State>({ kind: 'idle' });
  const run = async (kind: 'folder' | 'zip') => {
    try {
      const picked = await getHost().pickCaseSet(kind);
      if (!picked) return;
      setState({ kind: 'working', label: picked.label });
      // loaded on first use: the case-set reader (zip, CSV, validation) is not part of the start screen's bundle
      const [{ pickedSource }, { importCaseSet, problemLine }] = await Promise.all([import('../../io/picked-source'), import('../../store/import-case-set')]);
      const outcome = await importCaseSet(db, await pickedSource(picked));
      if (outcome.ok) { setState({ kind: 'imported', summary: outcome.summary }); onImported(); signal('saved', { caseSet: outcome.caseSet.id }); }
      else { setState({ kind: 'refused', label: picked.label, lines: outcome.problems.map((p) => problemLine(picked.label, p)), total: outcome.total }); signal('saved', { refused: true }); }
    } catch (e) {
      setState({ kind: 'refused', label: 'you picked', lines: [e instanceof Error ? e.message : String(e)], total: 1 });
      signal('saved', { refused: true });
    }
  };
  return (
    <div className="import">
      <div className="form-actions">
        <button type="button" onClick={() => void run('folder')}>Import a folder…</button>
        <button type="button" onClick={() => void run('zip')}>Import a zip…</button>
      </div>
      <p className="muted">A folder (or a zip of one) with cases.csv and its PNG or JPEG images. Nothing is stored unless the whole set is valid. Use de-identified images only, as your data-protection rules require.</p>
      {state.kind === 'working' && <p aria-busy="true">Checking {state.label}…</p>}
      {state.kind === 'refused' && (
        <div role="alert" className="problems">
          <p>The case set {state.label} was not imported ({state.total} problem{state.total === 1 ? '' : 's'}); nothing was stored.</p>
          <ul>{state.lines.map((l) => <li key={l}>{l}</li>)}</ul>
        </div>
      )}
      {state.kind === 'imported' && (
        <div role="status" className="import-summary">
          <p>Imported “{state.summary.name}”: {state.summary.cases} cases, {state.summary.practiceCases} practice, {state.summary.images} images.</p>
          <ul>
            {state.summary.findings.map((f) => (
              <li key={f.finding}>{f.finding}: prevalence {pct(f.prevalence)}, suggestion accuracy {pct(f.suggestionAccuracy.estimate)} ({f.suggestionAccuracy.k}/{f.suggestionAccuracy.n})</li>
            ))}
            {state.summary.subgroups.map((s) => (
              <li key={s.attribute}>{s.attribute}: {s.values.map((v) => `${v.value} (${v.cases} cases, suggestion accuracy ${pct(v.suggestionAccuracy.estimate)})`).join(', ')}</li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
};
