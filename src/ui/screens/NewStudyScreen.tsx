/** Designing a study on a stored case set. The design is saved whole, seeds included. */
import { type FormEvent, useCallback, useEffect, useState } from 'react';
import { listCaseSets } from '../../store/case-sets';
import { InputError } from '../../store/input-error';
import { createStudyFromDesign } from '../../store/study-service';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';
import { designFromForm, initialFormValues, type DesignFormValues } from './design-form-state';
import { DesignFields, FieldProblems } from './DesignFields';
import { designFormProblems } from './design-form-problems';

export const NewStudyScreen = () => {
  const db = useDb();
  const sets = useAsync(useCallback(() => listCaseSets(db), [db]));
  const [edited, setValues] = useState<DesignFormValues | null>(null);
  const [attempted, setAttempted] = useState(false);
  const [saveProblem, setSaveProblem] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);

  const first = sets.value?.[0];
  const values = edited ?? (first ? initialFormValues(first.id, first.manifest.findings.slice(0, 1)) : null);

  useEffect(() => {
    if (sets.value) signal('ready', { screen: 'new-study' });
  }, [sets.value]);

  const caseSet = sets.value?.find((s) => s.id === values?.caseSetId);
  // after the first attempt, every problem shows beside its field and clears as soon as it is fixed
  const problems = attempted && values ? designFormProblems(values, caseSet?.manifest ?? null) : [];

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!values) return;
    setAttempted(true);
    setSaveProblem(null);
    const result = designFromForm(values);
    if ('problems' in result || designFormProblems(values, caseSet?.manifest ?? null).length > 0) return;
    setSaving(true);
    try {
      const study = await createStudyFromDesign(db, values.name, values.caseSetId, result.design);
      actions.openStudy(study.id, { kind: 'info', text: `Study “${study.name}” created. Enrol readers next.` });
    } catch (e) {
      setSaveProblem(e instanceof InputError ? e.message : `Not saved: ${e instanceof Error ? e.message : String(e)}`);
    } finally {
      setSaving(false);
    }
  };

  return (
    <main className="page">
      <header className="page-head">
        <button type="button" className="link" onClick={actions.goHome}>← Heed</button>
        <h1>New study</h1>
        <CautionLine />
      </header>
      {values && sets.value && caseSet && (
        <form className="panel form" onSubmit={(e) => void submit(e)} aria-label="Study design">
          {problems.length > 0 && (
            <p className="problems" role="alert">{problems.length === 1 ? 'One thing to fix' : `${problems.length} things to fix`} before the study can be created; each is marked under its field.</p>
          )}
          <label>Study name <input value={values.name} onChange={(e) => setValues({ ...values, name: e.target.value })} /></label>
          <FieldProblems problems={problems} field="name" />
          <label>Case set
            <select value={values.caseSetId} onChange={(e) => {
              const next = sets.value?.find((s) => s.id === e.target.value);
              if (next) setValues({ ...values, caseSetId: next.id, findings: next.manifest.findings.slice(0, 1), stratifyBy: '' });
            }}>
              {sets.value.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
            </select>
          </label>
          <DesignFields values={values} caseSet={caseSet} onChange={setValues} problems={problems} />
          <FieldProblems problems={problems} field="form" />
          {saveProblem && <p className="problems" role="alert">{saveProblem}</p>}
          {problems.length > 0 && <p className="problems">Fix the fields marked above, then create the study.</p>}
          <div className="form-actions">
            <button type="submit" className="primary" disabled={saving}>Create study</button>
            <button type="button" onClick={actions.goHome}>Cancel</button>
          </div>
        </form>
      )}
    </main>
  );
};
