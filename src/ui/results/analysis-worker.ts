/// <reference lib="webworker" />
// Runs the analysis engine (the same one `heed analyze` uses) off the main thread, and the ROC
// curves the results page draws from the same reads. Given a study (database name and study id)
// rather than rows, the worker reads the study's rows from IndexedDB itself: for a large study
// (200,000 reads) loading, joining and copying the rows to a worker would otherwise hold the
// page's main thread for seconds. A large study's report comes in two steps (analysis-steps.ts):
// the estimates first, then the bootstrap intervals.
import type { CovarianceMethod } from '../../analysis/engine';
import type { ReadRow } from '../../core/read-log';
import { openHeedDb } from '../../store/db';
import { studyReadRows } from '../../store/read-log-rows';
import { analyseInSteps } from './analysis-steps';

export type AnalysisRequest = { seed: number; boot: number; covariance?: CovarianceMethod } & ({ rows: ReadRow[] } | { dbName: string; studyId: string });

const rowsOf = async (request: AnalysisRequest): Promise<ReadRow[]> => {
  if ('rows' in request) return request.rows;
  const db = openHeedDb(request.dbName);
  try {
    return await studyReadRows(db, request.studyId);
  } finally {
    db.close();
  }
};

self.onmessage = async (event: MessageEvent<AnalysisRequest>) => {
  try {
    const { seed, boot, covariance } = event.data;
    const rows = await rowsOf(event.data);
    if (rows.length === 0) self.postMessage({ ok: true, empty: true });
    else analyseInSteps(rows, { seed, boot, covariance }, (step) => self.postMessage({ ok: true, ...step }));
  } catch (error) {
    self.postMessage({ ok: false, error: error instanceof Error ? error.message : String(error) });
  }
};
