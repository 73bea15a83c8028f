/**
 * A large study in the app's store (run: node scripts/bench.mjs large-study), by default the
 * issue's size: 50 readers x 2,000 cases x 2 periods (200,000 reads). HEED_BENCH_READERS and
 * HEED_BENCH_CASES change the size; HEED_BENCH_STORES=node or =chromium runs one side only.
 *
 * The study is made by a seeded script through the store's own functions: `heed demo` writes a
 * case set of CASES cases, `heed simulate` reads it with READERS simulated readers over 2 periods
 * (the shared simulated-reader model, seed 11), and `restoreStudy` stores the result. Then, each
 * timed on its own, what the app does:
 *  - the study page's data (`loadStudyProgress`: study, case set, readers, sessions, answered
 *    counts), target <= 1 s;
 *  - the reads.csv export (`studyReadRows` + `readLogCsv`, as the Export button), target <= 3 s;
 *  - the results page's computation (`analyzeReads` with the default bootstrap and seed, plus
 *    `rocCurves`: what the page's worker runs), target <= 3 s.
 * Two stores: fake-indexeddb in this Node process ("node"), much slower than a browser's
 * IndexedDB, and real Chromium ("chromium": the harness page bench/large-study/, built by vite,
 * simulates the same study in the page, stores it with restoreStudy in the profile's IndexedDB,
 * then a fresh page load times the three steps, the results through the app's analysis worker,
 * which reads the rows itself, with the main thread's long tasks meanwhile; then the reads alone and
 * the rows after deleting every read pack, which rebuilds them). restoreStudy writes the read packs
 * of the completed sessions, as the app does. Peak RSS is this Node process's.
 */
import 'fake-indexeddb/auto';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeReads, DEFAULT_BOOT, DEFAULT_SEED } from '../src/analysis/engine';
import { rocCurves } from '../src/analysis/roc-curves';
import { readBundle } from '../src/io/bundle/read';
import { readLogCsv } from '../src/io/read-log-export';
import { restoreStudy } from '../src/store/bundle';
import { openHeedDb } from '../src/store/db';
import { studyReadRows } from '../src/store/read-log-rows';
import { loadStudyProgress } from '../src/ui/screens/study-progress';
import { startStaticServer } from '../scripts/lib/static-server.mjs';
import { newProfileDir, removeProfileDir, startChromium } from '../test/e2e/support/chromium';
import type { Built, Measured } from './large-study/main';
import { atMost, machineNote, plain, printResult, type Figure } from './support/figures';

const READERS = Number(process.env.HEED_BENCH_READERS ?? 50);
const CASES = Number(process.env.HEED_BENCH_CASES ?? 2000);
const STORES = (process.env.HEED_BENCH_STORES ?? 'node,chromium').split(',');
const SEED = 11;
const ROOT = join(import.meta.dirname, '..');
const dir = mkdtempSync(join(tmpdir(), 'heed-bench-large-'));
const heed = (...args: string[]) => {
  const r = spawnSync(process.execPath, [join(ROOT, 'bin', 'heed.js'), ...args], { encoding: 'utf8', cwd: ROOT, maxBuffer: 1 << 28 });
  if (r.status !== 0) throw new Error(`heed ${args.join(' ')} failed: ${r.stderr}`);
};
const timed = async <T>(run: () => Promise<T> | T): Promise<{ value: T; ms: number }> => {
  const t0 = performance.now();
  const value = await run();
  return { value, ms: performance.now() - t0 };
};

const inNode = async (snapshot: Parameters<typeof restoreStudy>[1]): Promise<Figure[]> => {
  const db = openHeedDb('heed-bench-large');
  const stored = await timed(() => restoreStudy(db, snapshot));
  const studyId = stored.value.study.id;
  const page = await timed(() => loadStudyProgress(db, studyId));
  const answered = page.value.progress.reduce((n, r) => n + r.periods.reduce((m, p) => m + p.answered, 0), 0);
  const rows = await timed(() => studyReadRows(db, studyId));
  const csv = await timed(() => readLogCsv(rows.value, page.value.caseSet.manifest.attributeNames));
  const engine = await timed(() => analyzeReads(rows.value, { seed: DEFAULT_SEED, boot: DEFAULT_BOOT }));
  const roc = await timed(() => rocCurves(rows.value));
  return [
    plain('node: restoreStudy into fake-indexeddb', stored.ms, 'ms'),
    plain('node: answered cases on the study page', answered, 'cases'),
    atMost('node: study page data (loadStudyProgress)', page.ms, 'ms', 1000),
    atMost('node: reads.csv export (studyReadRows + readLogCsv)', rows.ms + csv.ms, 'ms', 3000),
    plain('node: export, of which studyReadRows (fake-indexeddb and the join)', rows.ms, 'ms'),
    plain('node: export, of which readLogCsv', csv.ms, 'ms'),
    plain('node: reads.csv size', csv.value.length / 1e6, 'MB'),
    atMost(`node: results computed (analyzeReads, ${DEFAULT_BOOT} resamples, + rocCurves)`, engine.ms + roc.ms, 'ms', 3000),
    plain('node: results, of which analyzeReads (the engine)', engine.ms, 'ms'),
    plain('node: results, of which rocCurves', roc.ms, 'ms'),
  ];
};

const inChromium = async (caseSet: object): Promise<Figure[]> => {
  const outDir = join(dir, 'page');
  execFileSync(process.execPath, [join(ROOT, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', join(ROOT, 'bench', 'large-study'), '--config', join(ROOT, 'vite.config.ts'), '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: ROOT, stdio: ['ignore', 'ignore', 'inherit'] });
  writeFileSync(join(outDir, 'caseset.json'), JSON.stringify(caseSet));
  const server = await startStaticServer({ root: outDir });
  const profile = newProfileDir();
  const chrome = await startChromium(profile, 'about:blank');
  try {
    const { page } = chrome;
    const outcome = async <T>(name: 'heedBuilt' | 'heedMeasured'): Promise<T> => {
      await page.waitForFunction((n) => window[n] ?? window.heedFailed, name, { timeout: 3_600_000, polling: 500 });
      const failed = await page.evaluate(() => window.heedFailed);
      if (failed) throw new Error(`the harness page failed: ${failed}`);
      return await page.evaluate((n) => window[n], name) as T;
    };
    await page.goto(new URL(`index.html?phase=build&readers=${READERS}&seed=${SEED}`, server.url).href);
    const built = await outcome<Built>('heedBuilt');
    await page.goto(new URL(`index.html?phase=measure&study=${encodeURIComponent(built.studyId)}`, server.url).href);
    const m = await outcome<Measured>('heedMeasured');
    return [
      plain('chromium: reads stored', built.reads, 'reads'),
      plain('chromium: simulate in the page (untimed target)', built.simulateMs, 'ms'),
      plain('chromium: restoreStudy into IndexedDB', built.restoreMs, 'ms'),
      plain('chromium: answered cases on the study page', m.answered, 'cases'),
      atMost('chromium: study page data (loadStudyProgress)', m.studyPageMs, 'ms', 1000),
      atMost('chromium: reads.csv export (studyReadRows + readLogCsv)', m.exportRowsMs + m.exportCsvMs, 'ms', 3000),
      plain('chromium: export, of which studyReadRows (IndexedDB and the join)', m.exportRowsMs, 'ms'),
      plain('chromium: export, of which readLogCsv', m.exportCsvMs, 'ms'),
      atMost('chromium: results shown: estimates and every interval but the reader averages\' bootstrap (the worker\'s first step)', m.estimatesMs, 'ms', 3000),
      plain('chromium: results shown: the ROC curves (sent after the estimates)', m.curvesMs, 'ms'),
      atMost('chromium: results complete (the app\'s analysis worker: rows from IndexedDB, engine with the bootstrap, ROC curves)', m.resultsWorkerMs, 'ms', 3000),
      plain('chromium: main thread during the results: longest task', m.longestTaskMs, 'ms'),
      plain('chromium: main thread during the results: long tasks (count / total)', m.longTasks, `tasks, ${Math.round(m.longTaskMs)} ms`),
      plain('chromium: analyzeReads alone on the main thread (the engine)', m.engineMs, 'ms'),
      plain('chromium: rocCurves alone on the main thread', m.rocMs, 'ms'),
      plain('chromium: read packs stored (one per completed session)', m.packs, 'packs'),
      plain('chromium: the study\'s reads alone (loadStudyReads: packs, per-session counts, no join)', m.loadReadsMs, 'ms'),
      plain('chromium: reads alone, of which the completed sessions (index keys, no session record)', m.sessionsMs, 'ms'),
      plain('chromium: reads alone, of which the packs (getAll)', m.packsMs, 'ms'),
      plain('chromium: reads alone, of which the per-session read counts (index counts)', m.countsMs, 'ms'),
      plain('chromium: reads alone, of which unpacking (JSON.parse and read objects)', m.unpackMs, 'ms'),
      plain('chromium: rows with every pack deleted first (read from the records)', m.rebuildMs, 'ms'),
      plain('chromium: then the packs built on the way stored (not awaited by the rows)', m.packingMs, `ms, ${m.packedSessions} packs`),
      plain('chromium: rows again after that rebuild', m.afterRebuildMs, 'ms'),
    ];
  } finally {
    await chrome.stop();
    removeProfileDir(profile);
    await server.close();
  }
};

const notes = [machineNote('start')];
try {
  const cases = join(dir, 'cases');
  heed('demo', '--cases', String(CASES - 5), '--out', cases); // + 5 practice cases
  const file = join(dir, 'study.zip');
  const made = await timed(() => heed('simulate', '--readers', String(READERS), '--seed', String(SEED), '--cases', cases, '--out', file));
  const zip = new Uint8Array(readFileSync(file));
  const read = await timed(() => readBundle(zip));
  if (!read.value.ok) throw new Error(read.value.fault.message);
  const snapshot = read.value.snapshot;
  const figures: Figure[] = [
    plain('reads in the study', read.value.manifest.chain.reads, 'reads'),
    plain('heed simulate (new process, untimed target)', made.ms, 'ms'),
    plain('bundle verified in Node (readBundle, @noble/hashes)', read.ms, 'ms'),
  ];
  const { name, manifest } = snapshot.caseSet;
  const caseSet = { name, manifest, imageSha256: [...snapshot.caseSet.imageSha256] };
  if (STORES.includes('node')) { figures.push(...await inNode({ ...snapshot, images: [] })); notes.push(machineNote('after the node side')); }
  snapshot.events = [];
  if (STORES.includes('chromium')) figures.push(...await inChromium(caseSet));
  figures.push(plain('peak RSS of this Node process', process.resourceUsage().maxRSS / 1024, 'MB'));
  notes.push(
    `${READERS} readers x ${CASES} cases x 2 periods (the issue's size is 50 x 2,000 x 2; set HEED_BENCH_READERS and HEED_BENCH_CASES)`,
    'node: fake-indexeddb in Node (much slower than Chromium\'s IndexedDB); chromium: the app\'s store over real IndexedDB in Debian Chromium headless',
    machineNote('end'),
  );
  printResult({ bench: 'large-study', figures, notes });
} finally {
  rmSync(dir, { recursive: true, force: true });
}
