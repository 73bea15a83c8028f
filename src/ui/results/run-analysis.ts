import type { AnalysisReport, CovarianceMethod } from '../../analysis/engine';
import type { ReaderAveraged } from '../../analysis/reader-bootstrap';
import type { ReadColumns } from '../../analysis/read-columns';
import type { FindingRoc } from '../../analysis/roc-curves';
import type { ReadRow } from '../../core/read-log';
import type { HeedDb } from '../../store/db';
import { withReaderAveraged } from '../../analysis/engine';
import type { AnalysisStep } from './analysis-steps';
import type { BootstrapRequest } from './bootstrap-worker';
import type { AnalysisRequest } from './analysis-worker';

export type AnalysisOutput = { report: AnalysisReport; roc: FindingRoc[] };

/** A large study's report without its bootstrap intervals; `roc` is null until the curves are drawn. */
export type EarlyOutput = { report: AnalysisReport; roc: FindingRoc[] | null };

type Reply = ({ ok: true; empty?: false } & (AnalysisStep | { step: 'columns'; cols: ReadColumns })) | { ok: true; empty: true } | { ok: false; error: string };
type BootstrapReply = { ok: true; averaged: ReaderAveraged[] } | { ok: false; error: string };

/** The buffers of the columns' typed arrays, each once: moved to the second worker, not copied. */
const buffersOf = (cols: ReadColumns): ArrayBuffer[] => {
  const buffers = new Set<ArrayBuffer>();
  const add = (value: unknown) => { if (ArrayBuffer.isView(value) && value.buffer instanceof ArrayBuffer) buffers.add(value.buffer); };
  for (const value of Object.values(cols)) add(value);
  for (const a of cols.attributes.values()) add(a.code);
  for (const scratch of cols.caseScratch) add(scratch);
  return [...buffers];
};

/** Called with the report without its bootstrap intervals, when a large study's analysis sends it first (analysis-steps.ts), and again with the ROC curves. */
export type OnEstimates = (output: EarlyOutput) => void;

/** The two workers, made here (Vite bundles a worker from this literal form); tests give stand-ins. */
export type WorkerMakers = { analysis: () => Worker; bootstrap: () => Worker };
const workerMakers: WorkerMakers = {
  analysis: () => new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module' }),
  bootstrap: () => new Worker(new URL('./bootstrap-worker.ts', import.meta.url), { type: 'module' }),
};

/**
 * Runs one analysis request. `cancel` (the page moved on: other seed or resamples typed, screen
 * left) ends both workers at once, so superseded analyses of a large study do not keep the cores
 * busy, and rejects with an AbortError; the packs a cancelled worker had not stored yet are built
 * again next time (their transaction is all or nothing).
 */
export const inWorker = (request: AnalysisRequest, onEstimates?: OnEstimates, cancel?: AbortSignal, makers: WorkerMakers = workerMakers): Promise<AnalysisOutput | null> =>
  new Promise((resolve, reject) => {
    if (cancel?.aborted) { reject(new DOMException('analysis cancelled', 'AbortError')); return; }
    const worker = makers.analysis();
    let roc: FindingRoc[] = [];
    let early: AnalysisReport | null = null;
    // a large study's bootstrap in a second worker (analysis-steps.ts): done when the estimates, the curves and the reader averages are all in
    let second: Worker | null = null;
    let curves: FindingRoc[] | null = null;
    let averaged: ReaderAveraged[] | null = null;
    const finishWhenAllIn = () => {
      if (early && curves && averaged) resolve({ report: withReaderAveraged(early, averaged, request.boot), roc: curves });
    };
    const fail = (message: string) => {
      worker.terminate();
      second?.terminate();
      reject(new Error(message));
    };
    cancel?.addEventListener('abort', () => {
      worker.terminate();
      second?.terminate();
      reject(new DOMException('analysis cancelled', 'AbortError'));
    }, { once: true });
    worker.onmessage = (event: MessageEvent<Reply>) => {
      const reply = event.data;
      if (reply.ok && !reply.empty && reply.step === 'columns') {
        if (cancel?.aborted) return;
        const boot = makers.bootstrap();
        second = boot;
        boot.onmessage = (e: MessageEvent<BootstrapReply>) => {
          if (!e.data.ok) { fail(e.data.error); return; }
          averaged = e.data.averaged;
          finishWhenAllIn();
        };
        boot.onerror = (e) => fail(e.message);
        boot.onmessageerror = () => fail('the bootstrap worker’s answer could not be read (is the computer short of memory?)');
        const message: BootstrapRequest = { cols: reply.cols, seed: request.seed, boot: request.boot, covariance: request.covariance };
        boot.postMessage(message, buffersOf(reply.cols));
        return;
      }
      if (reply.ok && !reply.empty && reply.step === 'estimates') {
        early = reply.report;
        onEstimates?.({ report: early, roc: null });
        return;
      }
      if (reply.ok && !reply.empty && reply.step === 'roc') {
        roc = reply.roc;
        if (early) onEstimates?.({ report: early, roc });
        if (second) { curves = roc; finishWhenAllIn(); }
        return;
      }
      // the worker ends itself after the reply (it may still be storing read packs); a failed one is ended here
      if (!reply.ok) fail(reply.error);
      else resolve(reply.empty ? null : { report: reply.report, roc: reply.roc ?? roc });
    };
    worker.onerror = (event) => fail(event.message);
    worker.onmessageerror = () => fail('the analysis worker’s answer could not be read (is the computer short of memory?)');
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
export const runStudyAnalysis = (db: HeedDb, studyId: string, seed: number, boot: number, covariance: CovarianceMethod = 'jackknife', onEstimates?: OnEstimates, cancel?: AbortSignal): Promise<AnalysisOutput | null> =>
  inWorker({ dbName: db.name, studyId, seed, boot, covariance, bootstrapElsewhere: true }, onEstimates, cancel);
