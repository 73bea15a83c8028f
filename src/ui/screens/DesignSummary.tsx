/** The saved design as readable lines, with the design check (how precise over-reliance will be). */
import { designCheck } from '../../core/design-check';
import { designSummary } from '../../core/design-summary';
import type { StoredCaseSet, StoredStudy } from '../../store/records';
import { PlantedList } from './PlantedList';

export const DesignSummary = ({ study, caseSet }: { study: StoredStudy; caseSet: StoredCaseSet }) => {
  const lines = designSummary(study.design, { manifest: caseSet.manifest, table: study.suggestions });
  const check = designCheck(study.design, study.suggestions);
  return (
    <section className="panel" aria-labelledby="design-head">
      <h2 id="design-head">Design</h2>
      <dl className="summary">
        {lines.map((l) => <div key={l.label}><dt>{l.label}</dt><dd>{l.value}</dd></div>)}
      </dl>
      <h3>Design check: reads with a wrong suggestion, per reader</h3>
      <table className="grid">
        <thead><tr><th scope="col">Sequence</th><th scope="col">Finding</th><th scope="col">Aided reads</th><th scope="col">Model errors</th><th scope="col">Planted</th><th scope="col">±95% at 0.30</th></tr></thead>
        <tbody>
          {check.rows.map((r) => (
            <tr key={`${r.sequence}/${r.finding}`}>
              <td>{r.sequence}</td><td>{r.finding}</td><td>{r.aidedReads}</td><td>{r.naturalErrorReads}</td><td>{r.plantedReads}</td>
              <td>{r.halfWidth === null ? '—' : `±${r.halfWidth.toFixed(3)}`}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {check.rows.filter((r) => r.warning).map((r) => <p key={`${r.sequence}/${r.finding}`} className="warning" role="note">{r.warning}</p>)}
      <p className="muted formula">{check.formula}</p>
      <PlantedList study={study} />
    </section>
  );
};
