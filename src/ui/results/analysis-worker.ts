/// <reference lib="webworker" />
// Runs the analysis engine (the same one `heed analyze` uses) off the main thread, and the ROC
// curves the results page draws from the same reads.
import { analyzeReads, type CovarianceMethod } from '../../analysis/engine';
import { rocCurves } from '../../analysis/roc-curves';
import type { ReadRow } from '../../core/read-log';

self.onmessage = (event: MessageEvent<{ rows: ReadRow[]; seed: number; boot: number; covariance?: CovarianceMethod }>) => {
  try {
    const { rows, seed, boot, covariance } = event.data;
    self.postMessage({ ok: true, report: analyzeReads(rows, { seed, boot, covariance }), roc: rocCurves(rows) });
  } catch (error) {
    self.postMessage({ ok: false, error: error instanceof Error ? error.message : String(error) });
  }
};
