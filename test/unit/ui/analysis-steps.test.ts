// The results page's analysis in two steps (src/ui/results/analysis-steps.ts): on a large log the
// estimates come first (boot = 0), then the complete report, which must be analyzeReads' own.
import { analyzeReads, readerAveragedOfColumns, withReaderAveraged } from '../../../src/analysis/engine';
import { rocCurves } from '../../../src/analysis/roc-curves';
import type { ReadColumns } from '../../../src/analysis/read-columns';
import { analyseInSteps, ESTIMATES_FIRST_FROM, type AnalysisStep } from '../../../src/ui/results/analysis-steps';
import { simulateReadRows } from '../../../bench/simulate-log';

const rows = simulateReadRows({ seed: 9, readers: 5, cases: 60, practiceCases: 2 });
const steps = (estimatesFirstFrom?: number, boot = 200): AnalysisStep[] => {
  const sent: AnalysisStep[] = [];
  analyseInSteps(rows, { seed: 4, boot }, (s) => sent.push(s), estimatesFirstFrom);
  return sent;
};

describe('the results page analysis in steps', () => {
  it('sends the estimates first on a large log, then the ROC curves, then the complete report analyzeReads gives', () => {
    const sent = steps(rows.length);
    expect(sent.map((s) => s.step)).toEqual(['estimates', 'roc', 'complete']);
    const [first, curves, complete] = sent as [Extract<AnalysisStep, { step: 'estimates' }>, Extract<AnalysisStep, { step: 'roc' }>, Extract<AnalysisStep, { step: 'complete' }>];
    expect(JSON.stringify(first.report)).toBe(JSON.stringify(analyzeReads(rows, { seed: 4, boot: 0 })));
    expect(first.report.group.findings[0]?.reader_averaged.auc_difference.lower).toBeNull();
    expect(JSON.stringify(complete.report)).toBe(JSON.stringify(analyzeReads(rows, { seed: 4, boot: 200 })));
    expect(complete.report.group.findings[0]?.reader_averaged.auc_difference.lower).not.toBeNull();
    expect('roc' in first).toBe(false);
    expect(curves.roc).toEqual(rocCurves(rows));
    expect(complete.roc).toBeNull();
  });

  it('sends one complete report below the size, or without resamples', () => {
    expect(rows.length).toBeLessThan(ESTIMATES_FIRST_FROM);
    for (const sent of [steps(), steps(rows.length, 0)]) {
      expect(sent.map((s) => s.step)).toEqual(['complete']);
      expect((sent[0] as Extract<AnalysisStep, { step: 'complete' }>).roc).toEqual(rocCurves(rows));
    }
    expect(JSON.stringify((steps()[0] as Extract<AnalysisStep, { step: 'complete' }>).report)).toBe(JSON.stringify(analyzeReads(rows, { seed: 4, boot: 200 })));
  });

  it('with the bootstrap in a second worker: the columns go out first, no complete step, and the report put together is analyzeReads\' own', () => {
    const sent: AnalysisStep[] = [];
    const order: string[] = [];
    let copy: ReadColumns | null = null;
    // structuredClone: what postMessage does to the columns on their way to the second worker
    analyseInSteps(rows, { seed: 4, boot: 200 }, (s) => { sent.push(s); order.push(s.step); }, rows.length, (cols) => { copy = structuredClone(cols); order.push('columns'); });
    expect(order).toEqual(['columns', 'estimates', 'roc']);
    const estimates = sent[0] as Extract<AnalysisStep, { step: 'estimates' }>;
    const averaged = readerAveragedOfColumns(copy as unknown as ReadColumns, { seed: 4, boot: 200 });
    expect(JSON.stringify(withReaderAveraged(estimates.report, averaged, 200))).toBe(JSON.stringify(analyzeReads(rows, { seed: 4, boot: 200 })));
  });
});

