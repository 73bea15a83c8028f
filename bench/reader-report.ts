// Speed of the reader's private report (issue 7): the report of one reader with 500 cases (each
// read unaided and aided, 1,000 reads; 10 readers in the study) built from the analysis and
// rendered to self-contained HTML with its plots in Node (linkedom), target <= 1 s; the same
// with the analysis included; and the whole command `node bin/heed.js report FILE --reader R1
// --out F` on the simulated 100,000-read log (50 readers x 1000 cases x 2 periods), wall clock
// as a user runs it, target <= 2 s. Targets are reported, not asserted.
// Run: npx tsx bench/reader-report.ts
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeReads } from '../src/analysis/engine';
import { readerReport } from '../src/analysis/reader-report/reader-report';
import { plotDocument } from '../src/cli/plot-document';
import { reportPage } from '../src/io/report/render-report';
import { atMost, machineNote, plain, printResult, spread, timeOnce, type Figure } from './support/figures';
import { simulateReadLog, simulateReadRows } from './simulate-log';


const figures: Figure[] = [];
const notes: string[] = [machineNote('start')];

const rows = simulateReadRows({ seed: 4, readers: 10, cases: 500 });
const analysis = analyzeReads(rows, { boot: 0 });
const render = () => reportPage(readerReport({ analysis, rows, readerId: 'R1', complete: true }), { document: plotDocument() });
const firstRender = timeOnce(render);
const renders = spread(Array.from({ length: 5 }, () => timeOnce(render)));
figures.push(plain('report of a reader with 500 cases to HTML, first run', firstRender, 'ms'));
figures.push(atMost('report of a reader with 500 cases to HTML, median of 5', renders.p50, 'ms', 1000));
const withAnalysis = spread(Array.from({ length: 3 }, () => timeOnce(() => {
  const a = analyzeReads(rows, { boot: 0, readersOnly: true });
  return reportPage(readerReport({ analysis: a, rows, readerId: 'R1', complete: true }), { document: plotDocument() });
})));
figures.push(plain('  the same with the per-reader analysis of the study (10,000 reads), median of 3', withAnalysis.p50, 'ms'));
notes.push(`HTML size ${Math.round(render().length / 1024)} KB without case images`);

const dir = mkdtempSync(join(tmpdir(), 'heed-bench-report-'));
try {
  const file = join(dir, 'reads.csv');
  writeFileSync(file, simulateReadLog({ seed: 1, readers: 50, cases: 1000 }));
  const out = join(dir, 'report.html');
  const args = ['bin/heed.js', 'report', file, '--reader', 'R1', '--out', out];
  spawnSync(process.execPath, args, { stdio: 'ignore' }); // builds or refreshes dist-cli/heed.mjs
  const walls: number[] = [];
  for (let i = 0; i < 3; i++) {
    const t = performance.now();
    const r = spawnSync(process.execPath, args, { encoding: 'utf8' });
    walls.push(performance.now() - t);
    if (r.status !== 0) throw new Error(`heed report failed: ${r.stderr}`);
  }
  figures.push(atMost('heed report on 100,000 reads, wall, median of 3', spread(walls).p50, 'ms', 2000));
  notes.push(`report written: ${Math.round(statSync(out).size / 1024)} KB`);
} finally {
  rmSync(dir, { recursive: true, force: true });
}

printResult({ bench: 'reader-report', figures, notes });
