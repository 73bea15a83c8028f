// Speed of the analysis engine: analyzeReads on a simulated 100,000-read log (50 readers x 1000
// cases x 2 periods) without bootstrap, the 2,000-resample bootstrap on 24,000 reads (12 x 1000
// x 2), DeLong on 1,000,000 scores, parsing the 100,000-read CSV, and the whole command
// `node bin/heed.js analyze FILE --json --boot 0` on it as a user runs it (wall clock and peak RSS
// from /usr/bin/time -v when present; target 1 s and 300 MB, issue 3). Prints figures; targets
// are reported, not asserted. Run: npx tsx bench/analysis-engine.ts
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { delongAuc } from '../src/analysis/delong';
import { analyzeReads } from '../src/analysis/engine';
import { parseReadLog } from '../src/io/read-log-parse';
import { atMost, machineNote, plain, printResult, spread, timeOnce, type Figure } from './support/figures';
import { simulateReadLog, simulateReadRows } from './simulate-log';


const figures: Figure[] = [];
const notes: string[] = [machineNote('start')];

const big = simulateReadRows({ seed: 1, readers: 50, cases: 1000 });
const first = timeOnce(() => analyzeReads(big, { boot: 0 }));
const runs = spread(Array.from({ length: 5 }, () => timeOnce(() => analyzeReads(big, { boot: 0 }))));
figures.push(plain('analyzeReads 100,000 reads, first run', first, 'ms'));
figures.push(atMost('analyzeReads 100,000 reads, median of 5', runs.p50, 'ms', 1000));

const mid = simulateReadRows({ seed: 2, readers: 12, cases: 1000 });
const boot = spread(Array.from({ length: 3 }, () => timeOnce(() => analyzeReads(mid, { seed: 1, boot: 2000 }))));
const none = spread(Array.from({ length: 3 }, () => timeOnce(() => analyzeReads(mid, { boot: 0 }))));
figures.push(atMost('analyzeReads 24,000 reads with 2,000 resamples, median of 3', boot.p50, 'ms', 5000));
figures.push(plain('  of which without bootstrap', none.p50, 'ms'));

const rng = (() => {
  let s = 12345;
  return () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648);
})();
const pos = Array.from({ length: 400_000 }, () => Math.round((rng() + 0.3) * 1000) / 10);
const neg = Array.from({ length: 600_000 }, () => Math.round(rng() * 1000) / 10);
const delong = spread(Array.from({ length: 3 }, () => timeOnce(() => delongAuc(pos, neg))));
figures.push(plain('delongAuc 1,000,000 scores, median of 3', delong.p50, 'ms'));

const csv = simulateReadLog({ seed: 1, readers: 50, cases: 1000 });
const parse = spread(Array.from({ length: 3 }, () => timeOnce(() => parseReadLog(csv))));
figures.push(plain('parseReadLog 100,000 reads (11 MB), median of 3', parse.p50, 'ms'));

// The whole command, three times after one run that builds or refreshes dist-cli/heed.mjs.
const dir = mkdtempSync(join(tmpdir(), 'heed-bench-engine-'));
try {
  const file = join(dir, 'reads.csv');
  writeFileSync(file, csv);
  const args = ['bin/heed.js', 'analyze', file, '--json', '--boot', '0'];
  spawnSync(process.execPath, args, { stdio: 'ignore' });
  const timeTool = existsSync('/usr/bin/time');
  const walls: number[] = [];
  const peaks: number[] = [];
  for (let i = 0; i < 3; i++) {
    const t = performance.now();
    const res = timeTool
      ? spawnSync('/usr/bin/time', ['-v', process.execPath, ...args], { encoding: 'utf8', maxBuffer: 1 << 28 })
      : spawnSync(process.execPath, args, { encoding: 'utf8', maxBuffer: 1 << 28 });
    walls.push(performance.now() - t);
    const rss = /Maximum resident set size \(kbytes\): (\d+)/.exec(res.stderr ?? '')?.[1];
    if (rss !== undefined) peaks.push(Number(rss) / 1024);
    if (res.status !== 0) notes.push(`heed analyze failed: ${(res.stderr ?? '').split('\n')[0]}`);
  }
  figures.push(atMost('heed analyze --json --boot 0, 100,000 reads, whole command, median of 3', spread(walls).p50, 'ms', 1000));
  if (peaks.length > 0) figures.push(atMost('  its peak RSS, median of 3', spread(peaks).p50, 'MB', 300));
  else notes.push('peak RSS not measured: /usr/bin/time is missing (Debian package time)');
} finally {
  rmSync(dir, { recursive: true, force: true });
}
notes.push(machineNote('end'));

printResult({ bench: 'analysis-engine', figures, notes });
