/// <reference lib="webworker" />
// Runs the analysis engine (the same one `heed analyze` uses) off the main thread, and the ROC
// curves the results page draws from the same reads. Given a study (database name and study id)
// rather than rows, the worker reads the study's rows from IndexedDB itself: for a large study
// (200,000 reads) loading, joining and copying the rows to a worker would otherwise hold the
// page's main thread for seconds. A large study's report comes in two steps (analysis-steps.ts):
// the estimates first, then the bootstrap intervals. With `bootstrapElsewhere`, the columns are sent
// to the page (step `columns`) for a second worker to compute the bootstrap (bootstrap-worker.ts).
import type { CovarianceMethod } from '../../analysis/engine';
import type { ReadColumns } from '../../analysis/read-columns';
import type { ReadRow } from '../../core/read-log';
import { openHeedDb, type HeedDb } from '../../store/db';
import { studyReadRowsPacking } from '../../store/read-log-rows';
import { analyseInSteps } from './analysis-steps';

export type AnalysisRequest = { seed: number; boot: number; covariance?: CovarianceMethod; bootstrapElsewhere?: boolean } & ({ rows: ReadRow[] } | { dbName: string; studyId: string });

self.onmessage = async (event: MessageEvent<AnalysisRequest>) => {
  const request = event.data;
  const db = 'rows' in request ? null : openHeedDb(request.dbName);
  try {
    const { seed, boot, covariance } = request;
    // packs the study lacked are stored after the analysis (read-log-rows.ts: before it, their
    // transaction would hold up answers committed meanwhile)
    const { rows, storeFresh } = 'rows' in request ? { rows: request.rows, storeFresh: () => Promise.resolve(0) } : await studyReadRowsPacking(db as HeedDb, request.studyId);
    if (rows.length === 0) self.postMessage({ ok: true, empty: true });
    else {
      const elsewhere = request.bootstrapElsewhere === true ? (cols: ReadColumns) => self.postMessage({ ok: true, step: 'columns', cols }) : undefined;
      analyseInSteps(rows, { seed, boot, covariance }, (step) => self.postMessage({ ok: true, ...step }), undefined, elsewhere);
    }
    await storeFresh();
  } catch (error) {
    self.postMessage({ ok: false, error: error instanceof Error ? error.message : String(error) });
  } finally {
    db?.close();
    self.close(); // one request per worker; it ends itself once the packs are stored
  }
};
