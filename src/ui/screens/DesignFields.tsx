/** The fields of a study design: conditions, crossover, suggestion display, planted errors, notice. */
import { defaultAnswerScale } from '../../core/answer-scale';
import type { StoredCaseSet } from '../../store/records';
import type { DesignFormValues } from './design-form-state';
import { problemsOf, type FieldProblem, type FormField } from './design-form-problems';

type Props = { values: DesignFormValues; caseSet: StoredCaseSet; onChange: (v: DesignFormValues) => void; problems?: readonly FieldProblem[] };

/** The problems of one field, shown right under it (empty when it is fine). */
export const FieldProblems = ({ problems, field }: { problems: readonly FieldProblem[]; field: FormField }) => {
  const messages = problemsOf(problems, field);
  return messages.length === 0 ? null : <span className="field-problem" data-field={field}>{messages.join(' ')}</span>;
};

export const DesignFields = ({ values: v, caseSet, onChange, problems = [] }: Props) => {
  const set = <K extends keyof DesignFormValues>(key: K, value: DesignFormValues[K]) => onChange({ ...v, [key]: value });
  const show = (field: FormField) => <FieldProblems problems={problems} field={field} />;
  return (
    <>
      <fieldset>
        <legend>Findings asked</legend>
        {caseSet.manifest.findings.map((f) => (
          <label key={f} className="inline">
            <input type="checkbox" checked={v.findings.includes(f)}
              onChange={(e) => set('findings', e.target.checked ? caseSet.manifest.findings.filter((x) => x === f || v.findings.includes(x)) : v.findings.filter((x) => x !== f))} />
            {f}
          </label>
        ))}
        {show('findings')}
      </fieldset>
      <fieldset>
        <legend>Conditions and crossover</legend>
        <label>Aided condition
          <select value={v.aidedMode} onChange={(e) => set('aidedMode', e.target.value === 'concurrent' ? 'concurrent' : 'sequential')}>
            <option value="sequential">sequential: first call, then the suggestion, then the final call</option>
            <option value="concurrent">concurrent: suggestion shown from the start</option>
          </select>
        </label>
        <p className="muted">Two sequences: unaided then aided (UA), and aided then unaided (AU); readers are assigned to them balanced.</p>
        <label>Custom sequences (optional, replaces the two above)
          <textarea rows={3} value={v.customSequences} placeholder={'one per line, e.g.\nUSC: none, sequential, concurrent\nCUS: concurrent, none, sequential'} onChange={(e) => set('customSequences', e.target.value)} />
          <small>two or more sequences with the same number of periods; each period is none, concurrent or sequential</small>
        </label>
        {show('customSequences')}
        <label>Washout days <input inputMode="numeric" value={v.washoutDays} onChange={(e) => set('washoutDays', e.target.value)} /></label>
        {show('washoutDays')}
        <label>Blocks <input inputMode="numeric" value={v.blocks} onChange={(e) => set('blocks', e.target.value)} />
          <small>1: every case in every period; 2: cases split in two blocks, each read once per condition</small></label>
        {show('blocks')}
        <label>Break every N cases <input inputMode="numeric" value={v.breakEvery} placeholder="no breaks" onChange={(e) => set('breakEvery', e.target.value)} /></label>
        {show('breakEvery')}
        <label>Seed <input inputMode="numeric" value={v.seed} onChange={(e) => set('seed', e.target.value)} />
          <small>every random choice of the study (order, assignment, planted errors, notices) follows from it</small></label>
        {show('seed')}
      </fieldset>
      <fieldset>
        <legend>Suggestion</legend>
        <label>Threshold for a “present” call <input inputMode="decimal" value={v.threshold} onChange={(e) => set('threshold', e.target.value)} /></label>
        {show('threshold')}
        <label className="inline"><input type="checkbox" checked={v.showScore} onChange={(e) => set('showScore', e.target.checked)} /> Show the score beside the call</label>
        {v.scaleKind === 'call-confidence' && <label className="inline"><input type="checkbox" checked={v.askConfidence} onChange={(e) => set('askConfidence', e.target.checked)} /> Ask readers for their confidence</label>}
      </fieldset>
      <fieldset>
        <legend>Answers and feedback</legend>
        <label>Answer scale <select value={v.scaleKind} onChange={(e) => set('scaleKind', e.target.value === 'five-point' ? 'five-point' : e.target.value === 'percent' ? 'percent' : 'call-confidence')}>
          <option value="call-confidence">present or absent, with a confidence</option>
          <option value="five-point">five-point rating (1 definitely absent … 5 definitely present)</option>
          <option value="percent">likelihood present, 0 to 100%</option>
        </select></label>
        {v.scaleKind === 'five-point' && v.scaleLabels.map((label, i) => (
          <label key={i}>Label of rating {i + 1} <input value={label} onChange={(e) => set('scaleLabels', v.scaleLabels.map((l, j) => (j === i ? e.target.value : l)))} /></label>
        ))}
        {v.scaleKind !== 'call-confidence' && (
          <label>Rating counted as present from <input inputMode="decimal" value={v.presentFrom} placeholder={String(defaultAnswerScale(v.scaleKind).presentFrom)} onChange={(e) => set('presentFrom', e.target.value)} />
            <small>the call is “present” when the rating is at or above this value ({v.scaleKind === 'five-point' ? '2 to 5; default 4' : '1 to 100; default 50'})</small></label>
        )}
        <label className="inline"><input type="checkbox" checked={v.training} onChange={(e) => set('training', e.target.checked)} /> Training: show the truth after each case</label>
        <small>A training study shows each reader the truth, whether the suggestion was right and whether they followed it; its reads are marked and kept out of measurement statistics. Practice cases always show the truth.</small>
      </fieldset>
      <fieldset>
        <legend>Planted errors</legend>
        <label>Planted as <select value={v.plantMode} onChange={(e) => set('plantMode', e.target.value === 'rate' ? 'rate' : 'count')}>
          <option value="count">a count of case-findings</option><option value="rate">a rate of eligible case-findings</option></select></label>
        <label>False-positive suggestions <input inputMode="decimal" value={v.plantedFalsePositive} onChange={(e) => set('plantedFalsePositive', e.target.value)} /></label>
        {show('plantedFalsePositive')}
        <label>False-negative suggestions <input inputMode="decimal" value={v.plantedFalseNegative} onChange={(e) => set('plantedFalseNegative', e.target.value)} /></label>
        {show('plantedFalseNegative')}
        <label>Spread across <select value={v.stratifyBy} onChange={(e) => set('stratifyBy', e.target.value)}>
          <option value="">the whole set</option>
          {caseSet.manifest.attributeNames.map((a) => <option key={a} value={a}>each {a}</option>)}
        </select></label>
        {show('stratifyBy')}
      </fieldset>
      <fieldset>
        <legend>Caution notice</legend>
        <label>Show the notice <select value={v.cautionMode} onChange={(e) => set('cautionMode', e.target.value === 'all' ? 'all' : e.target.value === 'random-half' ? 'random-half' : 'off')}>
          <option value="off">never</option><option value="all">with every aided read</option><option value="random-half">with a random half of aided reads</option></select></label>
        <label>Notice text <textarea rows={2} value={v.cautionText} onChange={(e) => set('cautionText', e.target.value)} /></label>
        {show('cautionText')}
      </fieldset>
    </>
  );
};
