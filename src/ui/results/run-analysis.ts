import type { AnalysisReport, CovarianceMethod } from '../../analysis/engine';
import type { FindingRoc } from '../../analysis/roc-curves';
import type { ReadRow } from '../../core/read-log';

export type AnalysisOutput = { report: AnalysisReport; roc: FindingRoc[] };

type Reply = ({ ok: true } & AnalysisOutput) | { ok: false; error: string };

/** The analysis engine in a worker; covariance picks the Obuchowski-Rockette covariance method. */
export const runAnalysis = (rows: ReadRow[], seed: number, boot: number, covariance: CovarianceMethod = 'jackknife'): Promise<AnalysisOutput> =>
  new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<Reply>) => {
      worker.terminate();
      if (event.data.ok) resolve({ report: event.data.report, roc: event.data.roc });
      else reject(new Error(event.data.error));
    };
    worker.onerror = (event) => { worker.terminate(); reject(new Error(event.message)); };
    worker.postMessage({ rows, seed, boot, covariance });
  });
