/** Enrolling a reader: a pseudonymous code, a role, years of experience. */
import { useState, type FormEvent } from 'react';
import { InputError } from '../../store/input-error';
import type { StoredStudy } from '../../store/records';
import { enrolInStudy } from '../../store/study-service';
import { useDb } from '../db-context';
import { signal } from '../signals';

export const EnrolForm = ({ study, onEnrolled }: { study: StoredStudy; onEnrolled: () => void }) => {
  const db = useDb();
  const [code, setCode] = useState('');
  const [role, setRole] = useState('radiologist');
  const [years, setYears] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const parsedYears = years.trim() === '' ? null : Number(years);
    if (parsedYears !== null && !Number.isFinite(parsedYears)) { setProblem(`Years of experience: "${years}" is not a number.`); return; }
    try {
      const reader = await enrolInStudy(db, study, { code, role, years: parsedYears });
      setProblem(null);
      setCode('');
      setYears('');
      onEnrolled();
      signal('saved', { reader: reader.code });
    } catch (e) {
      setProblem(e instanceof InputError ? e.message : `Not enrolled: ${String(e)}`);
    }
  };
  return (
    <form className="panel form form-row" aria-label="Enrol a reader" onSubmit={(e) => void submit(e)}>
      <h2>Enrol a reader</h2>
      <label>Reader code <input value={code} onChange={(e) => setCode(e.target.value)} placeholder="e.g. R01" /></label>
      <label>Role
        <select value={role} onChange={(e) => setRole(e.target.value)}>
          <option>radiologist</option><option>resident</option><option>radiographer</option><option>surgeon</option><option>other clinician</option>
        </select>
      </label>
      <label>Years of experience <input inputMode="numeric" value={years} onChange={(e) => setYears(e.target.value)} placeholder="optional" /></label>
      <button type="submit" className="primary">Enrol</button>
      <p className="form-problem" role={problem ? 'alert' : undefined}>{problem ?? ''}</p>
      <p className="muted">Use codes, never names: the key from codes to people stays outside Heed, under your data-protection rules.</p>
    </form>
  );
};
