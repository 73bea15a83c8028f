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
import { runStudyAnalysis, type EarlyOutput } from '../results/run-analysis';
import type { StoredStudy } from '../../store/records';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';

export const ResultsScreen = ({ studyId }: { studyId: string }) => {
  const db = useDb();
  const [seed, setSeed] = useState(DEFAULT_SEED);
  const [boot, setBoot] = useState(DEFAULT_BOOT);
  // a large study's estimates, shown while its bootstrap intervals are computed (results/analysis-steps.ts)
  const [early, setEarly] = useState<{ study: StoredStudy; seed: number; boot: number; output: EarlyOutput } | null>(null);
  const results = useAsync(useCallback(async (cancel: AbortSignal) => {
    // the worker reads the study's rows itself: the page's main thread stays free on a large study
    const studyLoaded = getStudy(db, studyId);
    const output = await runStudyAnalysis(db, studyId, seed, boot, 'jackknife', (first) => {
      void studyLoaded.then((study) => setEarly({ study, seed, boot, output: first }), () => undefined);
    }, cancel);
    return { study: await studyLoaded, seed, boot, output };
  }, [db, studyId, seed, boot]));
  const complete = results.value;
  useEffect(() => { if (complete || results.error) signal('ready', { screen: 'results', seed: complete?.seed, boot: complete?.boot }); }, [complete, results.error]);
  const current = (v: { seed: number; boot: number } | null | undefined) => v != null && v.seed === seed && v.boot === boot;
  // the estimates of the current seed and resamples, until their complete report arrives
  const estimates = !results.error && !current(complete) && current(early) && early?.study.id === studyId ? early : null;
  const value = estimates ?? complete;
  const busy = !results.error && !current(complete);
  return (
    <main className="page page-wide results-screen" data-seed={complete?.seed} data-boot={complete?.boot} data-intervals={estimates ? 'computing' : undefined}>
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
          {estimates && <p role="status" aria-busy="true"><strong>Still computing the 95% bootstrap intervals of the reader averages</strong> ({estimates.boot} resamples): they show as missing until then. Every estimate, and every other interval, is final.{estimates.output?.roc ? '' : ' The ROC curves are being drawn.'}</p>}
          <ResultsPage report={value.output.report} roc={value.output.roc} />
        </>
      )}
      <AnalysisOptions seed={seed} boot={boot} onSeed={setSeed} onBoot={setBoot} busy={busy} />
    </main>
  );
};
