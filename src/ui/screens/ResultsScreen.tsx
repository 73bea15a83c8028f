/** Results of a study, computed by the same analysis engine as `heed analyze`, from the same log. */
import { useCallback, useEffect, useState } from 'react';
import { DEFAULT_BOOT, DEFAULT_SEED } from '../../analysis/engine';
import { studyReadRows } from '../../store/read-log-rows';
import { getStudy } from '../../store/studies';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { GroupResults } from '../results/GroupResults';
import { ReaderResults } from '../results/ReaderResults';
import { runAnalysis } from '../results/run-analysis';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';

export const ResultsScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const [seed, setSeed] = useState(DEFAULT_SEED);
  const [boot, setBoot] = useState(DEFAULT_BOOT);
  const results = useAsync(useCallback(async () => {
    const [study, rows] = await Promise.all([getStudy(db, studyId), studyReadRows(db, studyId)]);
    return { study, rows, report: rows.length > 0 ? await runAnalysis(rows, seed, boot) : null };
  }, [db, studyId, seed, boot]));
  useEffect(() => { if (results.value || results.error) signal('ready', { screen: 'results' }); }, [results.value, results.error]);
  const value = results.value;
  return (
    <main className="page page-wide">
      <header className="page-head">
        <button type="button" className="link" onClick={() => actions.openStudy(studyId)}>← Study</button>
        <h1>Results{value ? `: ${value.study.name}` : ''}</h1>
        <CautionLine />
      </header>
      <section className="panel form form-row" aria-label="Analysis options">
        <label>Bootstrap seed <input inputMode="numeric" defaultValue={seed} onBlur={(e) => { const n = Number(e.target.value); if (Number.isInteger(n)) setSeed(n); }} /></label>
        <label>Resamples <input inputMode="numeric" defaultValue={boot} onBlur={(e) => { const n = Number(e.target.value); if (Number.isInteger(n) && n >= 0) setBoot(n); }} /></label>
        <p className="muted">The same numbers as <code>heed analyze reads.csv --seed {seed} --boot {boot}</code> on this study’s exported read log. Practice reads are left out. Intervals: Wilson 95% for proportions, DeLong for AUC, percentile bootstrap over readers and cases for reader-averaged figures.</p>
      </section>
      {results.error && <p role="alert">Analysis failed: {results.error.message}</p>}
      {!value && !results.error && <p aria-busy="true">Computing…</p>}
      {value && !value.report && <p>No reads yet.</p>}
      {value?.report && (
        <>
          <p className="muted" data-reads={value.report.group.reads}>{value.report.group.reads} reads analysed; {value.report.group.practice_excluded} practice reads left out.</p>
          <GroupResults report={value.report} />
          <ReaderResults report={value.report} />
        </>
      )}
    </main>
  );
};
