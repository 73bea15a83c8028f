/**
 * A large study in the app's store (run: node scripts/bench.mjs large-study).
 *
 * The study is made by a seeded script through the store's own functions: `heed demo` writes a
 * case set of CASES cases, `heed simulate` reads it with READERS simulated readers over 2 periods
 * (the shared simulated-reader model, seed 11), and `restoreStudy` stores the result in
 * fake-indexeddb (Node). Then, each timed on its own, what the app does:
 *  - the study page's data (`loadStudyProgress`: study, case set, readers, sessions, answered
 *    counts), target <= 1 s;
 *  - the reads.csv export (`studyReadRows` + `readLogCsv`, as the Export button), target <= 3 s;
 *  - the results page's computation (`analyzeReads` with the default bootstrap and seed, plus
 *    `rocCurves`: what the page's worker runs), target <= 3 s.
 * fake-indexeddb in Node is slower than Chromium's IndexedDB, so the store figures are an upper
 * bound for the app. The size is 50 readers x 2,000 cases x 2 periods (200,000 reads):
 * HEED_BENCH_READERS=50 HEED_BENCH_CASES=2000 (the simulation alone then takes minutes here).
 */
import 'fake-indexeddb/auto';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
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
import { machineNote } from './support/app-under-test';
import { atMost, plain, printResult } from './support/figures';

const READERS = Number(process.env.HEED_BENCH_READERS ?? 20);
const CASES = Number(process.env.HEED_BENCH_CASES ?? 500);
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

const notes = [machineNote('start')];
try {
  const cases = join(dir, 'cases');
  heed('demo', '--cases', String(CASES - 5), '--out', cases); // + 5 practice cases
  const file = join(dir, 'study.zip');
  const made = await timed(() => heed('simulate', '--readers', String(READERS), '--seed', '11', '--cases', cases, '--out', file));
  const read = readBundle(new Uint8Array(readFileSync(file)));
  if (!read.ok) throw new Error(read.fault.message);
  const db = openHeedDb('heed-bench-large');
  const stored = await timed(() => restoreStudy(db, { ...read.snapshot, images: [] }));
  const studyId = stored.value.study.id;

  const page = await timed(() => loadStudyProgress(db, studyId));
  // for comparison: the former way, every session's reads loaded by its own query to count answered cases
  const former = await timed(async () => {
    let n = 0;
    for (const r of page.value.progress) for (const p of r.periods) if (p.session) n += (await db.reads.where('sessionId').equals(p.session.id).toArray()).length;
    return n;
  });
  const answered = page.value.progress.reduce((n, r) => n + r.periods.reduce((m, p) => m + p.answered, 0), 0);
  const exported = await timed(async () => readLogCsv(await studyReadRows(db, studyId), page.value.caseSet.manifest.attributeNames));
  const rows = await studyReadRows(db, studyId);
  const results = await timed(() => ({ report: analyzeReads(rows, { seed: DEFAULT_SEED, boot: DEFAULT_BOOT }), roc: rocCurves(rows) }));

  notes.push(
    `${READERS} readers x ${CASES} cases x 2 periods (the issue's size is 50 x 2,000 x 2; set HEED_BENCH_READERS and HEED_BENCH_CASES)`,
    'store: fake-indexeddb in Node (slower than Chromium IndexedDB); results: the engine in this process, as the page\'s worker runs it',
    machineNote('end'),
  );
  printResult({
    bench: 'large-study',
    figures: [
      plain('reads in the study', rows.length, 'reads'),
      plain('answered cases on the study page', answered, 'cases'),
      plain('heed simulate (new process, untimed target)', made.ms, 'ms'),
      plain('restoreStudy into the store', stored.ms, 'ms'),
      atMost('study page data (loadStudyProgress)', page.ms, 'ms', 1000),
      plain('for comparison: one reads query per session, as the study page did before', former.ms, 'ms'),
      atMost('reads.csv export (studyReadRows + readLogCsv)', exported.ms, 'ms', 3000),
      plain('reads.csv size', exported.value.length / 1e6, 'MB'),
      atMost(`results computed (analyzeReads, ${DEFAULT_BOOT} resamples, + rocCurves)`, results.ms, 'ms', 3000),
    ],
    notes,
  });
} finally {
  rmSync(dir, { recursive: true, force: true });
}
