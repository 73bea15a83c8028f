// Where `heed analyze FILE --json --boot 0` spends its time, phase by phase, cold and warm: a
// small entry (the CLI's own steps: read the file, parse from bytes, columns, analysis, JSON) is
// bundled with esbuild as the CLI is, then run in fresh Node processes. In each process the steps
// run `--reps` times on the same bytes: the first run is cold (what the CLI pays: code parsed,
// run unoptimised, optimised on a background thread), the last warm (optimised code: the floor
// of the work itself). Also times Node's start, the CLI's start (`heed --help`) and the command on
// a log with a header only (start plus loading the analyze code).
// Prints medians over the processes, and the 1-minute load average before and after.
// Usage: npx tsx bench/support/analyze-phases.ts [FILE] [--procs 5] [--reps 4]
// FILE defaults to the 100,000-read simulated log of seed 1 (written to a temporary folder).
import { spawnSync } from 'node:child_process';
import { loadavg, tmpdir } from 'node:os';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { simulateReadLog } from '../simulate-log';

const ROOT = resolve(import.meta.dirname, '../..');
const args = process.argv.slice(2);
const flag = (name: string, fallback: number): number => {
  const i = args.indexOf(name);
  return i === -1 ? fallback : Number(args[i + 1]);
};
const procs = flag('--procs', 5);
const reps = flag('--reps', 4);
const given = args.find((a, i) => !a.startsWith('--') && !args[i - 1]?.startsWith('--'));

// the entry run in each process: one line of JSON, each phase's ms per repetition
const ENTRY = `
import { readFileSync } from 'node:fs';
const { readAnalyzeInput } = await import(${JSON.stringify(join(ROOT, 'src/cli/analyze-input.ts'))});
const { parseReadLogColumns } = await import(${JSON.stringify(join(ROOT, 'src/io/read-log-parse.ts'))});
const { columnsOfLog } = await import(${JSON.stringify(join(ROOT, 'src/analysis/read-columns.ts'))});
const { analyzeColumns } = await import(${JSON.stringify(join(ROOT, 'src/analysis/engine.ts'))});
const phases = { read: [], parse: [], columns: [], analysis: [], json: [] };
for (let k = 0; k < Number(process.argv[3]); k++) {
  let t = performance.now();
  const bytes = await readAnalyzeInput(process.argv[2]);
  phases.read.push(performance.now() - t); t = performance.now();
  const log = parseReadLogColumns(bytes);
  phases.parse.push(performance.now() - t); t = performance.now();
  const cols = columnsOfLog(log);
  phases.columns.push(performance.now() - t); t = performance.now();
  const report = analyzeColumns(cols, { seed: 1, boot: 0, covariance: 'jackknife', includeWithdrawn: false });
  phases.analysis.push(performance.now() - t); t = performance.now();
  const text = JSON.stringify(report) + '\\n';
  phases.json.push(performance.now() - t);
  if (text.length < 2) throw new Error('no report');
}
process.stdout.write(JSON.stringify(phases));
`;

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length === 0 ? Number.NaN : (s[(s.length - 1) >> 1] as number);
};

const wallOf = (cmd: string, argv: string[]): number => {
  const t = performance.now();
  const res = spawnSync(cmd, argv, { encoding: 'utf8', maxBuffer: 1 << 28 });
  if (res.status !== 0) throw new Error(`${cmd} ${argv.join(' ')} failed: ${res.stderr}`);
  return performance.now() - t;
};

const dir = mkdtempSync(join(tmpdir(), 'heed-phases-'));
try {
  const file = given ?? join(dir, 'reads.csv');
  if (given === undefined) writeFileSync(file, simulateReadLog({ seed: 1, readers: 50, cases: 1000 }));
  const { build } = await import('esbuild');
  const entry = join(dir, 'entry.mjs');
  writeFileSync(entry, ENTRY);
  const bundle = join(dir, 'phases.mjs');
  await build({ entryPoints: [entry], bundle: true, platform: 'node', target: 'node20', format: 'esm', outfile: bundle, logLevel: 'silent', absWorkingDir: ROOT,
    banner: { js: "import { createRequire as __heedRequire } from 'node:module'; const require = __heedRequire(import.meta.url);" } });
  const loadBefore = loadavg()[0] as number;
  const cold: Record<string, number[]> = {};
  const warm: Record<string, number[]> = {};
  const starts: { node: number[]; cli: number[]; empty: number[] } = { node: [], cli: [], empty: [] };
  const headerOnly = join(dir, 'header.csv');
  writeFileSync(headerOnly, `${readFileSync(file, 'utf8').split('\n', 1)[0]}\n`);
  for (let p = 0; p < procs; p++) {
    starts.node.push(wallOf(process.execPath, ['-e', '0']));
    starts.cli.push(wallOf(process.execPath, [join(ROOT, 'bin/heed.js'), '--help']));
    starts.empty.push(wallOf(process.execPath, [join(ROOT, 'bin/heed.js'), 'analyze', headerOnly, '--json', '--boot', '0']));
    const res = spawnSync(process.execPath, [bundle, file, String(reps)], { encoding: 'utf8', maxBuffer: 1 << 28 });
    if (res.status !== 0) throw new Error(res.stderr);
    const phases = JSON.parse(res.stdout) as Record<string, number | number[]>;
    for (const [name, v] of Object.entries(phases)) {
      const list = Array.isArray(v) ? v : [v];
      (cold[name] ??= []).push(list[0] as number);
      (warm[name] ??= []).push(list[list.length - 1] as number);
    }
  }
  console.log(`${procs} processes x ${reps} runs each on ${file}; 1-minute load ${loadBefore.toFixed(2)} before, ${(loadavg()[0] as number).toFixed(2)} after`);
  console.log(`node -e 0 (Node's own start), wall: ${median(starts.node).toFixed(0)} ms`);
  console.log(`node bin/heed.js --help (start, bundle check, CLI entry), wall: ${median(starts.cli).toFixed(0)} ms`);
  console.log(`node bin/heed.js analyze on a header-only log (the above plus the analyze code loaded), wall: ${median(starts.empty).toFixed(0)} ms`);
  console.log('phase        cold (first run) ms   warm (last run) ms');
  let coldSum = 0;
  let warmSum = 0;
  for (const name of Object.keys(cold)) {
    const c = median(cold[name] as number[]);
    const w = median(warm[name] as number[]);
    coldSum += c;
    warmSum += w;
    console.log(`${name.padEnd(12)} ${c.toFixed(0).padStart(18)} ${w.toFixed(0).padStart(20)}`);
  }
  console.log(`${'sum'.padEnd(12)} ${coldSum.toFixed(0).padStart(18)} ${warmSum.toFixed(0).padStart(20)}`);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
