/**
 * Dry run of a draft design: simulated readers read the study many times over (the planner in
 * src/analysis/planner, in a Web Worker) and the panel says, in plain words first, how precise
 * the study's answers would be, with the assumptions beside the result and editable.
 */
import { useMemo, useRef, useState } from 'react';
import { PRESETS, isPresetName, type PlanAssumptions } from '../../analysis/planner/assumptions';
import type { PlanReport, Rate } from '../../analysis/planner/plan-report';
import { planSentences } from '../../analysis/planner/plan-text';
import type { PlanProgress } from '../../analysis/planner/run-plan';
import { powerCurvePlot } from '../../io/plots/power-curves';
import type { StoredCaseSet, StoredStudy } from '../../store/records';
import { dryRunDefaults, planCommand, studyFileBase } from '../planner/dry-run-defaults';
import { PlotView } from '../planner/PlotView';
import { startPlan, type PlanJob } from '../planner/run-plan-worker';
import { signal } from '../signals';

type NumberKey = 'readers' | 'cases' | 'prevalence' | 'modelAccuracy' | 'overreliance' | 'overrelianceSpread' | 'reference' | 'aucUnaided' | 'aucDifference' | 'noticeEffect' | 'sims' | 'seed';

const FIELDS: { key: NumberKey; label: string; step: string }[] = [
  { key: 'readers', label: 'Readers', step: '1' },
  { key: 'cases', label: 'Cases', step: '1' },
  { key: 'prevalence', label: 'Share of cases with the finding', step: '0.01' },
  { key: 'modelAccuracy', label: "Model's own accuracy", step: '0.01' },
  { key: 'overreliance', label: 'Assumed over-reliance', step: '0.01' },
  { key: 'overrelianceSpread', label: 'Spread between readers (sd)', step: '0.01' },
  { key: 'reference', label: 'Reference rate to beat', step: '0.01' },
  { key: 'aucUnaided', label: 'Accuracy (AUC) without suggestions', step: '0.01' },
  { key: 'aucDifference', label: 'AUC gain with suggestions', step: '0.01' },
  { key: 'noticeEffect', label: 'Cut in following wrong suggestions under the notice', step: '0.05' },
  { key: 'sims', label: 'Simulated studies', step: '10' },
  { key: 'seed', label: 'Seed', step: '1' },
];

const pct = (r: Rate | null): string => (r === null ? '—' : `${Math.round(100 * r.rate)}% ± ${(100 * r.mcse).toFixed(1)}`);
const num = (x: number | null, d = 3): string => (x === null ? '—' : x.toFixed(d));

const Figure = ({ name, label, value, text }: { name: string; label: string; value: number | null; text: string }) => (
  <tr><th scope="row">{label}</th><td className="num" data-figure={name} data-value={value ?? ''}>{text}</td></tr>
);

export const DryRunPanel = ({ study, caseSet }: { study: StoredStudy; caseSet: StoredCaseSet }) => {
  const start = useMemo(() => dryRunDefaults(study.design, caseSet.manifest, study.suggestions), [study, caseSet]);
  const [a, setA] = useState<PlanAssumptions>(start);
  const [progress, setProgress] = useState<PlanProgress | null>(null);
  const [report, setReport] = useState<PlanReport | null>(null);
  const [error, setError] = useState<string | null>(null);
  const job = useRef<PlanJob | null>(null);

  const run = async () => {
    setError(null);
    setReport(null);
    setProgress({ done: 0, total: 1 });
    const started = startPlan({ assumptions: a, base: study.design }, setProgress);
    job.current = started;
    try {
      const r = await started.result;
      if (r !== null) { setReport(r); signal('ready', { screen: 'dry-run' }); }
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      job.current = null;
      setProgress(null);
    }
  };
  const cancel = () => job.current?.cancel();
  const set = (key: NumberKey, value: string) => setA((old) => ({ ...old, [key]: Number(value) }));
  const command = planCommand(a, `${studyFileBase(study.name)}-study.json`);
  const running = progress !== null;

  return (
    <section className="panel" aria-labelledby="dry-run-head">
      <h2 id="dry-run-head">Dry run: how precise would this design be?</h2>
      <p className="muted">Simulated readers (invented, not people) read this design many times over. It is a planning aid for a research and training tool, not a medical device; the numbers are only as good as the assumptions beside them.</p>
      <div className="dry-run">
        <form className="form" aria-label="Dry-run assumptions" onSubmit={(e) => { e.preventDefault(); if (!running) void run(); }}>
          <fieldset disabled={running}>
            <legend>Assumptions</legend>
            {FIELDS.map((f) => (
              <label key={f.key}>{f.label}
                <input type="number" step={f.step} value={a[f.key]} onChange={(e) => set(f.key, e.target.value)} />
              </label>
            ))}
            <label>Planted wrong suggestions
              <input type="number" step="1" value={a.wrong.value} onChange={(e) => setA((old) => ({ ...old, wrong: { mode: 'count', value: Number(e.target.value) } }))} />
            </label>
            <label>Reader variability model
              <select value={a.preset} onChange={(e) => { const v = e.target.value; if (isPresetName(v)) setA((old) => ({ ...old, preset: v })); }}>
                {Object.entries(PRESETS).map(([k, p]) => <option key={k} value={k}>{p.label}</option>)}
              </select>
            </label>
          </fieldset>
          <p className="form-row">
            <button type="submit" disabled={running}>Run dry run</button>
            {running && <button type="button" onClick={cancel}>Cancel</button>}
          </p>
          {running && <p><progress aria-label="Dry run progress" max={progress.total} value={progress.done} /> {Math.floor((100 * progress.done) / progress.total)}%</p>}
          {error && <p role="alert">The dry run stopped: {error}</p>}
          <p className="muted">Same figures from the command line: <code data-testid="plan-command">{command}</code></p>
        </form>
        {report && <DryRunResult report={report} />}
      </div>
    </section>
  );
};

const DryRunResult = ({ report: r }: { report: PlanReport }) => {
  const plots = useMemo(() => (['readers', 'cases', 'wrong'] as const).map((vary) => ({
    vary,
    options: powerCurvePlot(r.curves.points, vary, vary === 'readers' ? r.design.readers : vary === 'cases' ? r.design.cases : r.overreliance.wrong_reads_per_reader),
  })), [r]);
  return (
    <div className="dry-run-result" aria-label="Dry-run result">
      {planSentences(r).map((s) => <p key={s}>{s}</p>)}
      <table className="grid">
        <caption>{r.sims} simulated studies, seed {r.seed}; ± is the Monte Carlo standard error</caption>
        <tbody>
          <Figure name="overreliance.wrong_reads_per_reader" label="Wrong suggestions per reader" value={r.overreliance.wrong_reads_per_reader} text={num(r.overreliance.wrong_reads_per_reader, 1)} />
          <Figure name="overreliance.expected_halfwidth" label={`±95% for one reader at ${r.overreliance.assumed_rate}`} value={r.overreliance.expected_halfwidth} text={num(r.overreliance.expected_halfwidth)} />
          <Figure name="overreliance.median_halfwidth" label="±95% in the simulated studies (median)" value={r.overreliance.median_halfwidth} text={num(r.overreliance.median_halfwidth)} />
          <Figure name="overreliance.coverage" label="Reader intervals that contain the true rate" value={r.overreliance.coverage.rate} text={pct(r.overreliance.coverage)} />
          <Figure name="overreliance.power" label={`Chance to show over-reliance above ${r.overreliance.reference}`} value={r.overreliance.power.rate} text={pct(r.overreliance.power)} />
          <Figure name="notice.power" label="Chance to detect the caution notice's effect" value={r.notice.power?.rate ?? null} text={r.notice.power === null ? `— (${r.notice.reason ?? ''})` : pct(r.notice.power)} />
          <Figure name="auc.power" label={`Chance to show the AUC gain of ${r.auc.difference}`} value={r.auc.power?.rate ?? null} text={pct(r.auc.power)} />
          <Figure name="auc.type_i_error" label="False alarms when there is no gain" value={r.auc.type_i_error?.rate ?? null} text={pct(r.auc.type_i_error)} />
          <Figure name="auc.median_halfwidth" label="±95% of the AUC difference (median)" value={r.auc.median_halfwidth} text={num(r.auc.median_halfwidth)} />
        </tbody>
      </table>
      <div className="plot-row">
        {plots.map((p) => <PlotView key={p.vary} options={p.options} label={`Power as ${p.vary === 'wrong' ? 'wrong suggestions per reader' : p.vary} grow`} />)}
      </div>
      <p className="muted">Tests: {r.overreliance.test}; {r.auc.test}. Model: {r.assumptions.preset_source}.</p>
    </div>
  );
};
