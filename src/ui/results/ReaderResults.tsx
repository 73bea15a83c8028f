/** Per reader and finding: unaided and aided performance, reliance, crossover pairs, time. */
import type { AnalysisReport } from '../../analysis/engine';
import { Estimate, Plain, Share } from './Figure';

export const ReaderResults = ({ report }: { report: AnalysisReport }) => (
  <section className="panel" aria-labelledby="per-reader-head">
    <h2 id="per-reader-head">Per reader</h2>
    <div className="scroll">
      <table className="grid results" aria-label="Per-reader results">
        <thead>
          <tr>
            <th scope="col">Reader</th><th scope="col">Finding</th>
            <th scope="col">Accuracy unaided</th><th scope="col">Accuracy aided</th>
            <th scope="col">AUC unaided</th><th scope="col">AUC aided</th>
            <th scope="col">Over-reliance</th><th scope="col">Under-reliance</th><th scope="col">Kappa vs model</th>
            <th scope="col">Pairs: aided − unaided</th><th scope="col">McNemar p</th>
            <th scope="col">Median ms unaided</th><th scope="col">Median ms aided</th>
          </tr>
        </thead>
        <tbody>
          {report.readers.map((r) => (
            <tr key={`${r.reader_id}/${r.finding}`} data-reader={r.reader_id} data-finding={r.finding}>
              <th scope="row">{r.reader_id}</th><td>{r.finding}</td>
              <Share name="unaided.accuracy" value={r.unaided?.accuracy} />
              <Share name="aided.accuracy" value={r.aided?.accuracy} />
              <Estimate name="unaided.auc" value={r.unaided?.auc} />
              <Estimate name="aided.auc" value={r.aided?.auc} />
              <Share name="aided.overreliance" value={r.aided?.overreliance} />
              <Share name="aided.underreliance" value={r.aided?.underreliance} />
              <Plain name="aided.kappa" value={r.aided?.kappa.estimate} />
              <Plain name="crossover.accuracy_difference" value={r.crossover?.accuracy_difference} />
              <Plain name="crossover.mcnemar.p" value={r.crossover?.mcnemar.p} digits={4} />
              <Plain name="unaided.median_ms" value={r.unaided?.median_ms} digits={0} />
              <Plain name="aided.median_ms" value={r.aided?.median_ms} digits={0} />
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  </section>
);
