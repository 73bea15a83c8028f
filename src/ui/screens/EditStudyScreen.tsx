/** Editing a draft study's design with the same fields as a new study; refused once the design is locked. */
import { type FormEvent, useCallback, useEffect, useState } from 'react';
import { getCaseSet } from '../../store/case-sets';
import { InputError } from '../../store/input-error';
import { getStudy } from '../../store/studies';
import { changeStudyDesign } from '../../store/study-service';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';
import { designFormProblems } from './design-form-problems';
import { designFromForm, formValuesFromDesign, type DesignFormValues } from './design-form-state';
import { DesignFields, FieldProblems } from './DesignFields';

export const EditStudyScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const loaded = useAsync(useCallback(async () => {
    const study = await getStudy(db, studyId);
    return { study, caseSet: await getCaseSet(db, study.caseSetId) };
  }, [db, studyId]));
  const [edited, setValues] = useState<DesignFormValues | null>(null);
  const [attempted, setAttempted] = useState(false);
  const [saveProblem, setSaveProblem] = useState<string | null>(null);
  useEffect(() => { if (loaded.value) signal('ready', { screen: 'edit-study' }); }, [loaded.value]);
  if (loaded.error) return <main className="page"><p role="alert">Cannot open this study: {loaded.error.message}</p></main>;
  if (!loaded.value) return <main className="page" aria-busy="true"><p>Opening the design…</p></main>;
  const { study, caseSet } = loaded.value;
  const values = edited ?? formValuesFromDesign(study.name, caseSet.id, study.design);
  const problems = attempted ? designFormProblems(values, caseSet.manifest) : [];

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setAttempted(true);
    setSaveProblem(null);
    const result = designFromForm(values);
    if (!('design' in result) || designFormProblems(values, caseSet.manifest).length > 0) return;
    try {
      await changeStudyDesign(db, study, result.design);
      actions.openStudy(study.id, { kind: 'info', text: 'Design saved. It stays editable until the first reader starts.' });
    } catch (e) {
      setSaveProblem(e instanceof InputError ? e.message : `Not saved: ${e instanceof Error ? e.message : String(e)}`);
      signal('saved', { refused: true });
    }
  };

  return (
    <main className="page">
      <header className="page-head">
        <button type="button" className="link" onClick={() => actions.openStudy(study.id)}>← {study.name}</button>
        <h1>Edit the design of {study.name}</h1>
        <p className="muted">on {caseSet.name}. Readers already enrolled keep their place and take the sequence of that place in the new design.</p>
        <CautionLine />
      </header>
      {study.lockedAt ? (
        <p role="alert" className="problems">The design of “{study.name}” is locked: reading started on {study.lockedAt.slice(0, 16).replace('T', ' ')} UTC, so it can no longer change.</p>
      ) : (
        <form className="panel form" onSubmit={(e) => void submit(e)} aria-label="Study design">
          {problems.length > 0 && (
            <p className="problems" role="alert">{problems.length === 1 ? 'One thing to fix' : `${problems.length} things to fix`} before the design can be saved; each is marked under its field.</p>
          )}
          <DesignFields values={values} caseSet={caseSet} onChange={setValues} problems={problems} />
          <FieldProblems problems={problems} field="form" />
          {saveProblem && <p className="problems" role="alert">{saveProblem}</p>}
          {problems.length > 0 && <p className="problems">Fix the fields marked above, then save.</p>}
          <div className="form-actions">
            <button type="submit" className="primary">Save design</button>
            <button type="button" onClick={() => actions.openStudy(study.id)}>Cancel</button>
          </div>
        </form>
      )}
    </main>
  );
};
