/** Results of a study, computed by the same analysis engine as `heed analyze`, from the same log. */
import { useCallback, useEffect, useState } from 'react';
import { DEFAULT_BOOT, DEFAULT_SEED } from '../../analysis/engine';
import { getHost } from '../../host';
import { getStudy } from '../../store/studies';
import { CautionLine } from '../components/CautionLine';
import { useDb } from '../db-context';
import { AnalysisOptions } from '../results/AnalysisOptions';
import { drawAllPlotsThen } from '../results/PlotFigure';
import { ResultsPage } from '../results/ResultsPage';
import { runStudyAnalysis } from '../results/run-analysis';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';

export const ResultsScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const [seed, setSeed] = useState(DEFAULT_SEED);
  const [boot, setBoot] = useState(DEFAULT_BOOT);
  const results = useAsync(useCallback(async () => {
    // the worker reads the study's rows itself: the page's main thread stays free on a large study
    const [study, output] = await Promise.all([getStudy(db, studyId), runStudyAnalysis(db, studyId, seed, boot)]);
    return { study, seed, boot, output };
  }, [db, studyId, seed, boot]));
  const value = results.value;
  useEffect(() => { if (value || results.error) signal('ready', { screen: 'results', seed: value?.seed, boot: value?.boot }); }, [value, results.error]);
  const busy = !results.error && (value === undefined || value.seed !== seed || value.boot !== boot);
  return (
    <main className="page page-wide results-screen" data-seed={value?.seed} data-boot={value?.boot}>
      <header className="page-head">
        <button type="button" className="link" onClick={() => actions.openStudy(studyId)}>← Study</button>
        <div className="head-row">
          <h1>Results{value ? `: ${value.study.name}` : ''}</h1>
          <button type="button" onClick={() => drawAllPlotsThen(() => void getHost().printToPdf(`${value?.study.name ?? 'results'}-results.pdf`))}>Print or save as PDF</button>
        </div>
        <CautionLine />
        <p className="muted">Figures describe this study’s readers and cases, for research and training; they are not an appraisal of any reader.</p>
      </header>
      {results.error && <p role="alert">Analysis failed: {results.error.message}</p>}
      {!value && !results.error && <p aria-busy="true">Computing…</p>}
      {value && !value.output && <p>No reads yet.</p>}
      {value?.output && (
        <>
          <p className="muted" data-reads={value.output.report.group.reads}>{value.output.report.group.reads} reads analysed; {value.output.report.group.practice_excluded} practice reads left out.</p>
          <ResultsPage report={value.output.report} roc={value.output.roc} />
        </>
      )}
      <AnalysisOptions seed={seed} boot={boot} onSeed={setSeed} onBoot={setBoot} busy={busy} />
    </main>
  );
};
