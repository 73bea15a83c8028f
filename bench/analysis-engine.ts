// Speed of the analysis engine: analyzeReads on a simulated 100,000-read log (50 readers x 1000
// cases x 2 periods) without bootstrap, the 2,000-resample bootstrap on 24,000 reads (12 x 1000
// x 2), DeLong on 1,000,000 scores, and parsing the 100,000-read CSV. Prints figures; targets
// are reported, not asserted. Run: npx tsx bench/analysis-engine.ts
import { loadavg } from 'node:os';
import { delongAuc } from '../src/analysis/delong';
import { analyzeReads } from '../src/analysis/engine';
import { parseReadLog } from '../src/io/read-log-parse';
import { atMost, plain, printResult, spread, type Figure } from './support/figures';
import { simulateReadLog, simulateReadRows } from './simulate-log';

const time = (f: () => unknown): number => {
  const t = performance.now();
  f();
  return performance.now() - t;
};

const figures: Figure[] = [];
const notes: string[] = [`load average at start ${loadavg().map((v) => v.toFixed(2)).join(' ')} on this machine`];

const big = simulateReadRows({ seed: 1, readers: 50, cases: 1000 });
const first = time(() => analyzeReads(big, { boot: 0 }));
const runs = spread(Array.from({ length: 5 }, () => time(() => analyzeReads(big, { boot: 0 }))));
figures.push(plain('analyzeReads 100,000 reads, first run', first, 'ms'));
figures.push(atMost('analyzeReads 100,000 reads, median of 5', runs.p50, 'ms', 1000));

const mid = simulateReadRows({ seed: 2, readers: 12, cases: 1000 });
const boot = spread(Array.from({ length: 3 }, () => time(() => analyzeReads(mid, { seed: 1, boot: 2000 }))));
const none = spread(Array.from({ length: 3 }, () => time(() => analyzeReads(mid, { boot: 0 }))));
figures.push(atMost('analyzeReads 24,000 reads with 2,000 resamples, median of 3', boot.p50, 'ms', 5000));
figures.push(plain('  of which without bootstrap', none.p50, 'ms'));

const rng = (() => {
  let s = 12345;
  return () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648);
})();
const pos = Array.from({ length: 400_000 }, () => Math.round((rng() + 0.3) * 1000) / 10);
const neg = Array.from({ length: 600_000 }, () => Math.round(rng() * 1000) / 10);
const delong = spread(Array.from({ length: 3 }, () => time(() => delongAuc(pos, neg))));
figures.push(plain('delongAuc 1,000,000 scores, median of 3', delong.p50, 'ms'));

const csv = simulateReadLog({ seed: 1, readers: 50, cases: 1000 });
const parse = spread(Array.from({ length: 3 }, () => time(() => parseReadLog(csv))));
figures.push(plain('parseReadLog 100,000 reads (11 MB), median of 3', parse.p50, 'ms'));

printResult({ bench: 'analysis-engine', figures, notes });
