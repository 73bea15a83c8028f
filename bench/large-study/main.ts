/**
 * Benchmark harness for bench/large-study.ts in real Chromium: the app's own store functions over
 * this browser's IndexedDB (not fake-indexeddb). Two phases, one page load each, so the measuring
 * phase starts with a fresh heap as the app does when the coordinator opens the study:
 *  - ?phase=build&readers=N&seed=S: fetches caseset.json (the case set of the Node side's demo
 *    set), simulates the study (io/bundle/simulate-study.ts, as `heed simulate` does) and stores it
 *    with restoreStudy; publishes window.heedBuilt = { studyId, simulateMs, restoreMs, reads }.
 *  - ?phase=measure&study=ID: times what the app does, each on its own: the study page's data
 *    (loadStudyProgress), the reads.csv export (studyReadRows + readLogCsv, as the Export button),
 *    the results page's computation (runStudyAnalysis: the app's analysis worker reads the rows
 *    from IndexedDB and analyses them with the default seed and resamples, as ResultsScreen), with
 *    the main thread's long tasks meanwhile, and when the estimates arrived (a large study's report
 *    comes first without the reader averages' bootstrap intervals); then the engine and the ROC curves alone on this
 *    thread (the engine's share); then the reads alone (loadStudyReads: read packs, per-session
 *    counts), and the export's rows once more after deleting every pack (a study stored before
 *    packs: the first read rebuilds them) and again after. window.heedMeasured.
 */
import { analyzeReads, DEFAULT_BOOT, DEFAULT_SEED } from '../../src/analysis/engine';
import { rocCurves } from '../../src/analysis/roc-curves';
import type { CaseSetManifest } from '../../src/core/case-set';
import { simulateStudy } from '../../src/io/bundle/simulate-study';
import { readLogCsv } from '../../src/io/read-log-export';
import { restoreStudy } from '../../src/store/bundle';
import { openHeedDb } from '../../src/store/db';
import { studyReadRows, studyReadRowsPacking } from '../../src/store/read-log-rows';
import { loadStudyReads, readsOfPack } from '../../src/store/read-packs';
import { runStudyAnalysis } from '../../src/ui/results/run-analysis';
import { loadStudyProgress } from '../../src/ui/screens/study-progress';

export type Built = { studyId: string; simulateMs: number; restoreMs: number; reads: number };
export type Measured = {
  studyPageMs: number; sessions: number; answered: number;
  exportRowsMs: number; exportCsvMs: number; exportMB: number;
  resultsWorkerMs: number; estimatesMs: number; curvesMs: number; longestTaskMs: number; longTaskMs: number; longTasks: number;
  engineMs: number; rocMs: number; reads: number;
  /** the reads alone (packs, per-session counts, the others' records; no join) */
  loadReadsMs: number; sessionsMs: number; packsMs: number; countsMs: number; unpackMs: number;
  /** the rows with every pack deleted first (from the records), the packs built on the way stored after them, then the rows again */
  rebuildMs: number; packingMs: number; packedSessions: number; afterRebuildMs: number; packs: number;
};
declare global {
  // oxlint-disable-next-line typescript/consistent-type-definitions
  interface Window { heedBuilt?: Built; heedMeasured?: Measured; heedFailed?: string }
}

type CaseSetFile = { name: string; manifest: CaseSetManifest; imageSha256: [string, string][] };

const params = new URLSearchParams(location.search);
const db = openHeedDb('heed-bench-large');
const timed = async <T>(run: () => Promise<T> | T): Promise<{ value: T; ms: number }> => {
  const t0 = performance.now();
  const value = await run();
  return { value, ms: performance.now() - t0 };
};

const build = async (): Promise<void> => {
  const file = await (await fetch('caseset.json')).json() as CaseSetFile;
  const caseSet = { name: file.name, manifest: file.manifest, imageSha256: new Map(file.imageSha256), images: null };
  const made = await timed(() => simulateStudy(caseSet, { readers: Number(params.get('readers')), seed: Number(params.get('seed')), assistance: 'sequential' }));
  const stored = await timed(() => restoreStudy(db, { ...made.value, images: [] }));
  const reads = await db.reads.count();
  window.heedBuilt = { studyId: stored.value.study.id, simulateMs: made.ms, restoreMs: stored.ms, reads };
};

const measure = async (): Promise<void> => {
  const studyId = params.get('study') ?? '';
  const page = await timed(() => loadStudyProgress(db, studyId));
  const exportRows = await timed(() => studyReadRows(db, studyId));
  const csv = await timed(() => readLogCsv(exportRows.value, page.value.caseSet.manifest.attributeNames));

  // the results page as ResultsScreen runs it: the worker reads the rows and analyses them
  const tasks: { start: number; duration: number }[] = [];
  const observer = new PerformanceObserver((list) => { for (const e of list.getEntries()) tasks.push({ start: e.startTime, duration: e.duration }); });
  observer.observe({ type: 'longtask' });
  const r0 = performance.now();
  let estimatesMs = Number.NaN;
  let curvesMs = Number.NaN;
  // called with the estimates, then again with the ROC curves (roc null the first time)
  const worker = await timed(() => runStudyAnalysis(db, studyId, DEFAULT_SEED, DEFAULT_BOOT, 'jackknife', (early) => {
    if (Number.isNaN(estimatesMs)) estimatesMs = performance.now() - r0;
    if (early.roc) curvesMs = performance.now() - r0;
  }));
  if (!worker.value) throw new Error('the worker found no reads');
  await new Promise((resolve) => setTimeout(resolve, 100)); // let the observer deliver the last entries
  observer.disconnect();
  const during = tasks.filter((t) => t.start >= r0);

  const engine = await timed(() => analyzeReads(exportRows.value, { seed: DEFAULT_SEED, boot: DEFAULT_BOOT }));
  const roc = await timed(() => rocCurves(exportRows.value));
  const loaded = await timed(() => loadStudyReads(db, studyId));
  if (loaded.value.fresh.length > 0) throw new Error('a completed session had no current pack after the export');
  // the parts of loadStudyReads, each alone
  const sessionsPart = await timed(() => db.sessions.where('[studyId+completedAt]').between([studyId, ''], [studyId, '\uffff'], true, true).primaryKeys());
  const packsPart = await timed(() => db.packs.where('studyId').equals(studyId).toArray());
  const countsPart = await timed(() => Promise.all(sessionsPart.value.map((id) => db.reads.where('sessionId').equals(id).count())));
  const unpackPart = await timed(() => packsPart.value.reduce((n, p) => n + readsOfPack(p).length, 0));
  const packs = packsPart.value.length;
  await db.packs.clear(); // a study stored before packs existed: the first read rebuilds them
  const rebuild = await timed(() => studyReadRowsPacking(db, studyId));
  const packing = await timed(() => rebuild.value.storeFresh());
  const afterRebuild = await timed(() => studyReadRows(db, studyId));
  if (rebuild.value.rows.length !== exportRows.value.length || afterRebuild.value.length !== exportRows.value.length) throw new Error('rows differ after a rebuild');
  window.heedMeasured = {
    studyPageMs: page.ms, sessions: page.value.progress.reduce((n, r) => n + r.periods.filter((p) => p.session).length, 0),
    answered: page.value.progress.reduce((n, r) => n + r.periods.reduce((m, p) => m + p.answered, 0), 0),
    exportRowsMs: exportRows.ms, exportCsvMs: csv.ms, exportMB: csv.value.length / 1e6,
    resultsWorkerMs: worker.ms, estimatesMs, curvesMs,
    longestTaskMs: during.reduce((m, t) => Math.max(m, t.duration), 0), longTaskMs: during.reduce((s, t) => s + t.duration, 0), longTasks: during.length,
    engineMs: engine.ms, rocMs: roc.ms, reads: exportRows.value.length,
    loadReadsMs: loaded.ms, sessionsMs: sessionsPart.ms, packsMs: packsPart.ms, countsMs: countsPart.ms, unpackMs: unpackPart.ms,
    rebuildMs: rebuild.ms, packingMs: packing.ms, packedSessions: packing.value, afterRebuildMs: afterRebuild.ms, packs,
  };
};

(params.get('phase') === 'build' ? build() : measure()).catch((error: unknown) => {
  window.heedFailed = error instanceof Error ? `${error.message}\n${error.stack ?? ''}` : String(error);
});
