import type { AnalysisReport, CovarianceMethod } from '../../analysis/engine';
import type { FindingRoc } from '../../analysis/roc-curves';
import type { ReadRow } from '../../core/read-log';
import type { HeedDb } from '../../store/db';
import type { AnalysisStep } from './analysis-steps';
import type { AnalysisRequest } from './analysis-worker';

export type AnalysisOutput = { report: AnalysisReport; roc: FindingRoc[] };

/** A large study's report without its bootstrap intervals; `roc` is null until the curves are drawn. */
export type EarlyOutput = { report: AnalysisReport; roc: FindingRoc[] | null };

type Reply = ({ ok: true; empty?: false } & AnalysisStep) | { ok: true; empty: true } | { ok: false; error: string };

/** Called with the report without its bootstrap intervals, when a large study's analysis sends it first (analysis-steps.ts), and again with the ROC curves. */
export type OnEstimates = (output: EarlyOutput) => void;

const inWorker = (request: AnalysisRequest, onEstimates?: OnEstimates): Promise<AnalysisOutput | null> =>
  new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module' });
    let roc: FindingRoc[] = [];
    let early: AnalysisReport | null = null;
    worker.onmessage = (event: MessageEvent<Reply>) => {
      const reply = event.data;
      if (reply.ok && !reply.empty && reply.step === 'estimates') {
        early = reply.report;
        onEstimates?.({ report: early, roc: null });
        return;
      }
      if (reply.ok && !reply.empty && reply.step === 'roc') {
        roc = reply.roc;
        if (early) onEstimates?.({ report: early, roc });
        return;
      }
      // the worker ends itself after the reply (it may still be storing read packs); a failed one is ended here
      if (!reply.ok) {
        worker.terminate();
        reject(new Error(reply.error));
      } else resolve(reply.empty ? null : { report: reply.report, roc: reply.roc ?? roc });
    };
    worker.onerror = (event) => { worker.terminate(); reject(new Error(event.message)); };
    worker.postMessage(request);
  });

/** The analysis engine in a worker, on rows the caller has; covariance picks the Obuchowski-Rockette covariance method. */
export const runAnalysis = async (rows: ReadRow[], seed: number, boot: number, covariance: CovarianceMethod = 'jackknife'): Promise<AnalysisOutput> => {
  const output = await inWorker({ rows, seed, boot, covariance });
  if (!output) throw new Error('no reads to analyse');
  return output;
};

/**
 * A stored study's analysis, its rows read from the database by the worker itself, so the page's
 * main thread neither loads nor copies them (a large study stays responsive). Null when the study
 * has no reads yet. Resolves with the complete report; a large study's estimates come first,
 * to `onEstimates`.
 */
export const runStudyAnalysis = (db: HeedDb, studyId: string, seed: number, boot: number, covariance: CovarianceMethod = 'jackknife', onEstimates?: OnEstimates): Promise<AnalysisOutput | null> =>
  inWorker({ dbName: db.name, studyId, seed, boot, covariance }, onEstimates);
