/** The group, per finding: reader-averaged figures with bootstrap intervals, MRMC, subgroups. */
import type { AnalysisReport } from '../../analysis/engine';
import { AVERAGED_FIGURES } from '../../analysis/reader-bootstrap';
import { Estimate, Plain, Share } from './Figure';

const LABEL: Record<(typeof AVERAGED_FIGURES)[number], string> = {
  unaided_accuracy: 'Accuracy, unaided', aided_accuracy: 'Accuracy, aided', accuracy_difference: 'Accuracy difference (aided − unaided)',
  unaided_sensitivity: 'Sensitivity, unaided', aided_sensitivity: 'Sensitivity, aided', unaided_specificity: 'Specificity, unaided',
  aided_specificity: 'Specificity, aided', unaided_auc: 'AUC, unaided', aided_auc: 'AUC, aided', auc_difference: 'AUC difference (aided − unaided)',
  agreement: 'Agreement with the suggestion', overreliance: 'Over-reliance (followed a wrong suggestion)', underreliance: 'Under-reliance (rejected a right suggestion)',
};

export const GroupResults = ({ report }: { report: AnalysisReport }) => (
  <>
    {report.group.findings.map((g) => (
      <section className="panel" key={g.finding} aria-label={`Group results for ${g.finding}`} data-finding={g.finding}>
        <h2>Group: {g.finding} <span className="muted">({g.readers} readers, {g.cases} cases)</span></h2>
        <table className="grid results">
          <thead><tr><th scope="col">Reader-averaged</th><th scope="col">Estimate [95% bootstrap]</th><th scope="col">Readers</th></tr></thead>
          <tbody>
            {AVERAGED_FIGURES.map((f) => (
              <tr key={f}><th scope="row">{LABEL[f]}</th><Estimate name={`reader_averaged.${f}`} value={g.reader_averaged[f]} /><td>{g.reader_averaged[f].readers}</td></tr>
            ))}
          </tbody>
        </table>
        <h3>Aided minus unaided AUC, Obuchowski-Rockette with Hillis degrees of freedom</h3>
        {g.mrmc ? (
          <table className="grid results">
            <thead><tr><th scope="col">Generalises to</th><th scope="col">Difference</th><th scope="col">SE</th><th scope="col">95% CI</th><th scope="col">F</th><th scope="col">ddf</th><th scope="col">p</th></tr></thead>
            <tbody>
              {([['random', 'readers and cases'], ['fixedReaders', 'cases (these readers)'], ['fixedCases', 'readers (these cases)']] as const).map(([k, label]) => {
                const t = g.mrmc?.[k];
                return t ? (
                  <tr key={k}><th scope="row">{label}</th><Plain name={`mrmc.${k}.difference`} value={t.difference} /><Plain name={`mrmc.${k}.se`} value={t.se} />
                    <td className="num">[{t.lower.toFixed(3)}, {t.upper.toFixed(3)}]</td><Plain name={`mrmc.${k}.f`} value={t.f} digits={2} />
                    <td className="num">{Number.isFinite(t.ddf) ? t.ddf.toFixed(1) : '∞'}</td><Plain name={`mrmc.${k}.p`} value={t.p} digits={4} /></tr>
                ) : null;
              })}
            </tbody>
          </table>
        ) : <p className="muted">{g.mrmc_note ?? 'Not available.'}</p>}
        <h3>Pooled reads</h3>
        <table className="grid results">
          <thead><tr><th scope="col"></th><th scope="col">Accuracy</th><th scope="col">AUC</th><th scope="col">Over-reliance</th><th scope="col">with notice</th><th scope="col">without notice</th></tr></thead>
          <tbody>
            <tr><th scope="row">unaided</th><Share name="pooled.unaided.accuracy" value={g.pooled.unaided?.accuracy} /><Estimate name="pooled.unaided.auc" value={g.pooled.unaided?.auc} /><td>—</td><td>—</td><td>—</td></tr>
            <tr><th scope="row">aided</th><Share name="pooled.aided.accuracy" value={g.pooled.aided?.accuracy} /><Estimate name="pooled.aided.auc" value={g.pooled.aided?.auc} />
              <Share name="pooled.aided.overreliance" value={g.pooled.aided?.overreliance} />
              <Share name="pooled.aided.caution.shown" value={g.pooled.aided?.caution.shown} /><Share name="pooled.aided.caution.not_shown" value={g.pooled.aided?.caution.not_shown} /></tr>
          </tbody>
        </table>
        {g.subgroups.length > 0 && (
          <>
            <h3>Subgroups: where the model is weaker, do readers follow it more?</h3>
            <table className="grid results">
              <thead><tr><th scope="col">Attribute</th><th scope="col">Value</th><th scope="col">Suggestion accuracy</th><th scope="col">Over-reliance</th><th scope="col">Accuracy aided</th></tr></thead>
              <tbody>
                {g.subgroups.map((s) => (
                  <tr key={`${s.attribute}/${s.value}`}><td>{s.attribute}</td><td>{s.value || '(empty)'}</td>
                    <Share name={`subgroup.${s.attribute}.${s.value}.ai_accuracy`} value={s.ai_accuracy} />
                    <Share name={`subgroup.${s.attribute}.${s.value}.overreliance`} value={s.overreliance} />
                    <Share name={`subgroup.${s.attribute}.${s.value}.aided.accuracy`} value={s.aided?.accuracy} /></tr>
                ))}
              </tbody>
            </table>
          </>
        )}
      </section>
    ))}
  </>
);
