/**
 * The analysis the results page's worker runs, in one step or two. On a large study the two-way
 * bootstrap of the reader-averaged figures takes most of the time (about three quarters at
 * 200,000 reads), so from ESTIMATES_FIRST_FROM reads on, the report is sent first without it
 * (boot = 0: every estimate, and every interval but the reader-averaged ones), then the ROC curves
 * (0.2-0.5 s at 200,000 reads, so the page does not wait for them to show the numbers), then the
 * report again complete once the bootstrap is done. The complete report is the one analyzeReads
 * gives with the same options, to the last bit (test/unit/analysis/golden). Below that size the
 * bootstrap takes a moment and the page gets one complete report, as before.
 */
import { analyzeColumns, readerAveragedOfColumns, withReaderAveraged, type AnalysisReport, type CovarianceMethod } from '../../analysis/engine';
import { logColumns } from '../../analysis/read-columns';
import { rocCurves, type FindingRoc } from '../../analysis/roc-curves';
import type { ReadRow } from '../../core/read-log';
import type { ReadColumns } from '../../analysis/read-columns';

/** Rule of thumb, no source: below this many reads the bootstrap is quick enough to wait for. */
export const ESTIMATES_FIRST_FROM = 20_000;

/**
 * `estimates`: the report with boot = 0, the ROC curves and a complete report follow; `roc`: the
 * curves; `complete`: the report with the bootstrap (its ROC curves are the `roc` step's when not given).
 */
export type AnalysisStep =
  | { step: 'estimates'; report: AnalysisReport }
  | { step: 'roc'; roc: FindingRoc[] }
  | { step: 'complete'; report: AnalysisReport; roc: FindingRoc[] | null };

export type StepOptions = { seed: number; boot: number; covariance?: CovarianceMethod };

/**
 * Hands the columns to a second worker that computes the reader averages' bootstrap
 * (`readerAveragedOfColumns`) on the other core while this one computes the estimates and the curves;
 * when given, no `complete` step is sent here: the page puts the two together (`withReaderAveraged`).
 */
export type BootstrapElsewhere = (cols: ReadColumns) => void;

/** Analyses `rows` (at least one), sending each step to `send` as soon as it is ready. Throws what analyzeReads throws. */
export const analyseInSteps = (
  rows: readonly ReadRow[], options: StepOptions, send: (step: AnalysisStep) => void, estimatesFirstFrom = ESTIMATES_FIRST_FROM, elsewhere?: BootstrapElsewhere,
): void => {
  const { seed, boot, covariance } = options;
  const cols = logColumns(rows);
  if (boot === 0 || rows.length < estimatesFirstFrom) {
    send({ step: 'complete', report: analyzeColumns(cols, { seed, boot, covariance }), roc: rocCurves(rows) });
    return;
  }
  elsewhere?.(cols);
  const first = analyzeColumns(cols, { seed, boot: 0, covariance });
  send({ step: 'estimates', report: first });
  send({ step: 'roc', roc: rocCurves(rows) });
  if (!elsewhere) send({ step: 'complete', report: withReaderAveraged(first, readerAveragedOfColumns(cols, options), boot), roc: null });
};
