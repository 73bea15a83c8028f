// Benchmark: `heed analyze FILE --json` against the same per-reader figures computed with numpy +
// scikit-learn + statsmodels (bench/analysis-vs-python.py), on a simulated 100,000-read log
// (50 readers x 1000 cases x 2 periods, bench/simulate-log.ts). Also times the
// Obuchowski-Rockette analysis alone (target: 10 readers x 1000 cases <= 1 s), and the same
// command on 1,000,000 reads (500 readers): time against the 100,000-read time, and peak RSS.
// Prints figures; no pass/fail. Needs Debian's python3-{numpy,scipy,sklearn,statsmodels,pandas}
// and /usr/bin/time (package `time`). Usage: npx tsx bench/analysis-vs-python.ts
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { obuchowskiRockette } from '../src/analysis/obuchowski-rockette';
import { simulateReadLog } from './simulate-log';

type Timed = { ok: boolean; wallS: number | null; peakMb: number | null; stdout: string; stderr: string };

// Runs a command under /usr/bin/time -v and reads wall clock and peak RSS from its report.
const timed = (cmd: string, args: string[]): Timed => {
  const res = spawnSync('/usr/bin/time', ['-v', cmd, ...args], { encoding: 'utf8', maxBuffer: 1 << 30 });
  const err = res.stderr ?? '';
  const wall = /Elapsed \(wall clock\) time \(h:mm:ss or m:ss\): ([\d:.]+)/.exec(err)?.[1];
  const rss = /Maximum resident set size \(kbytes\): (\d+)/.exec(err)?.[1];
  const wallS = wall === undefined ? null : wall.split(':').map(Number).reduce((s, v) => s * 60 + v, 0);
  return { ok: res.status === 0, wallS, peakMb: rss === undefined ? null : Number(rss) / 1024, stdout: res.stdout ?? '', stderr: err };
};

const fmt = (t: Timed) => (t.ok ? `${t.wallS?.toFixed(2)} s wall, ${t.peakMb?.toFixed(0)} MB peak RSS` : 'FAILED');

const dir = mkdtempSync(join(tmpdir(), 'heed-bench-'));
try {
  const file = join(dir, 'reads.csv');
  const t0 = performance.now();
  writeFileSync(file, simulateReadLog({ seed: 1, readers: 50, cases: 1000 }));
  console.log(`simulated log: 50 readers x 1000 cases x 2 periods, ${(readFileSync(file).length / 1e6).toFixed(1)} MB, ${((performance.now() - t0) / 1000).toFixed(2)} s to write`);

  const runs: [string, string[]][] = [
    ['heed analyze --json --boot 0', ['bin/heed.js', 'analyze', file, '--json', '--boot', '0']],
    ['heed analyze --json (default bootstrap)', ['bin/heed.js', 'analyze', file, '--json']],
  ];
  const heed = runs.map(([label, args]) => {
    const t = timed(process.execPath, args);
    console.log(`${label.padEnd(42)} ${fmt(t)}`);
    if (!t.ok) console.log(`  heed analyze is not ready or failed: ${t.stderr.split('\n').find((l) => l.startsWith('heed')) ?? t.stderr.split('\n')[0]}`);
    return t;
  });

  const pyOut = join(dir, 'python.json');
  const py = timed('/usr/bin/python3', ['bench/analysis-vs-python.py', file, pyOut]);
  console.log(`${'python numpy + scikit-learn + statsmodels'.padEnd(42)} ${fmt(py)}`);
  if (!py.ok) console.log(py.stderr.slice(-800));
  else console.log(`  ${py.stdout.trim()}`);

  const [noBoot] = heed;
  if (noBoot?.ok && py.ok && noBoot.wallS !== null && py.wallS !== null) {
    console.log(`ratio heed (--boot 0) / python: wall ${(noBoot.wallS / py.wallS).toFixed(2)}, peak RSS ${((noBoot.peakMb ?? 0) / (py.peakMb ?? 1)).toFixed(2)}`);
    // a light sanity check that both computed the same thing
    type Entry = { reader_id: string; unaided: { auc: { estimate: number; se: number } } | null };
    const h: { readers: Entry[] } = JSON.parse(noBoot.stdout);
    const p: { readers: Entry[] } = JSON.parse(readFileSync(pyOut, 'utf8'));
    let worst = 0;
    for (const e of p.readers) {
      const o = h.readers.find((x) => x.reader_id === e.reader_id);
      if (e.unaided && o?.unaided) worst = Math.max(worst, Math.abs(e.unaided.auc.estimate - o.unaided.auc.estimate), Math.abs(e.unaided.auc.se - o.unaided.auc.se));
    }
    console.log(`largest |heed − python| over unaided AUC and SE: ${worst.toExponential(2)}`);
  }

  // Scale (issue 10): 1,000,000 reads (500 readers x 1000 cases x 2 periods), the same command;
  // targets: time <= 10.5 x the 100,000-read time, peak RSS <= 600 MB. The two runs are taken
  // one after the other, so they see about the same machine load.
  const bigFile = join(dir, 'reads-1m.csv');
  writeFileSync(bigFile, simulateReadLog({ seed: 1, readers: 500, cases: 1000 }));
  const small = timed(process.execPath, ['bin/heed.js', 'analyze', file, '--json', '--boot', '0']);
  const million = timed(process.execPath, ['bin/heed.js', 'analyze', bigFile, '--json', '--boot', '0']);
  rmSync(bigFile, { force: true });
  // lines shaped `label  value unit` are the runner's figures (scripts/bench.mjs)
  if (!million.ok) console.log(`heed analyze on 1,000,000 reads FAILED: ${million.stderr.split('\n')[0]}`);
  if (million.ok && million.wallS !== null) console.log(`heed analyze --boot 0 on 1,000,000 reads, wall  ${million.wallS.toFixed(2)} s`);
  if (million.ok && small.ok && million.wallS !== null && small.wallS !== null) {
    const ratio = million.wallS / small.wallS;
    console.log(`ratio of 1,000,000 to 100,000 reads, wall  ${ratio.toFixed(2)} x`);
    console.log(`  target <= 10.5 x: ${ratio <= 10.5 ? 'met' : 'NOT met'} (100,000 reads took ${small.wallS.toFixed(2)} s in this pair)`);
  }
  if (million.peakMb !== null) {
    console.log(`heed analyze on 1,000,000 reads, peak RSS  ${million.peakMb.toFixed(0)} MB`);
    console.log(`  target <= 600 MB: ${million.peakMb <= 600 ? 'met' : 'NOT met'}`);
  }

  // Obuchowski-Rockette alone, median of 5 runs
  for (const [readers, cases] of [[10, 1000], [50, 1000]] as const) {
    const truth: (0 | 1)[] = Array.from({ length: cases }, (_, k) => (k % 5 < 2 ? 1 : 0));
    let x = 12345;
    const u = () => ((x = (Math.imul(x, 1103515245) + 12345) >>> 0) / 2 ** 32);
    const scores = [0, 1].map(() => Array.from({ length: readers }, () => truth.map((y) => Math.round((y + 2 * u()) * 100) / 100)));
    const times: number[] = [];
    for (let i = 0; i < 5; i++) {
      const s = performance.now();
      obuchowskiRockette({ scores, truth });
      times.push(performance.now() - s);
    }
    times.sort((a, b) => a - b);
    console.log(`obuchowskiRockette ${readers} readers x ${cases} cases: median ${times[2]?.toFixed(1)} ms (of 5; first ${times[0]?.toFixed(1)}..${times[4]?.toFixed(1)})`);
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}
