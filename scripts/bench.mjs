// `npm run bench`: runs each benchmark under bench/ that exists, one child process at a time,
// collects the figures it prints, writes bench-results/summary.json and prints a compact table.
// Targets are reported, not asserted: the exit code is non-zero only when a benchmark crashes.
//
// A benchmark reports figures best with one line `BENCH_RESULT {"bench", "figures": [{name,
// value, unit, target?, met?}], "notes": []}` (bench/support/figures.ts prints it). Without one,
// lines shaped `label: number unit` are picked up as figures, and the printed lines are kept.
//
// Usage: node scripts/bench.mjs [name ...]   (names filter, e.g. `reading-latency cold-start`)
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { join, relative } from 'node:path';

const ROOT = join(import.meta.dirname, '..');
const BENCH = join(ROOT, 'bench');
const OUT = join(ROOT, 'bench-results');

// The known benchmarks, in the order they run. Any other script directly under bench/ runs after
// them under its own name; helpers live in bench/support/ (or are listed in HELPERS).
const PLAN = [
  { name: 'reading-latency', candidates: ['reading-latency.ts'] },
  { name: 'cold-start', candidates: ['cold-start.ts'] },
  { name: 'launcher-cold-start', candidates: ['cold-start.mjs'] },
  { name: 'analysis-engine', candidates: ['analysis-engine.ts'] },
  { name: 'analysis-vs-python', candidates: ['analysis-vs-python.ts', 'analysis-vs-python.mjs', 'analysis-vs-python.sh'] },
  { name: 'case-import', candidates: ['case-import.ts'] },
];
const HELPERS = new Set(['simulate-log.ts']);
const RUNNERS = {
  '.ts': (file) => [process.execPath, [join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs'), file]],
  '.mjs': (file) => [process.execPath, [file]],
  '.sh': (file) => ['sh', [file]],
};
const extOf = (file) => Object.keys(RUNNERS).find((e) => file.endsWith(e));

const present = existsSync(BENCH) ? readdirSync(BENCH).filter((f) => extOf(f) !== undefined) : [];
const planned = new Set(PLAN.flatMap((p) => p.candidates));
const entries = [
  ...PLAN.map((p) => ({ name: p.name, candidates: p.candidates, file: p.candidates.find((c) => present.includes(c)) ?? null })),
  ...present.filter((f) => !planned.has(f) && !HELPERS.has(f)).sort()
    .map((f) => ({ name: f.slice(0, -extOf(f).length), candidates: [f], file: f })),
];

const MARKER = 'BENCH_RESULT ';
// Tried in turn: `label: [word] number unit`, `label<two or more spaces>number unit`, `label number unit`.
const NUMBER = '(-?\\d+(?:\\.\\d+)?(?:e[+-]?\\d+)?)(?:\\s*([A-Za-z%/µ]+))?';
const LOOSE = [
  new RegExp(`^\\s*([A-Za-z][^:=<>]{0,80}?)\\s*[:=]\\s*(?:([A-Za-z]+)\\s+)?${NUMBER}`),
  new RegExp(`^\\s*([A-Za-z][^:=<>]{0,80}?)()\\s{2,}${NUMBER}`),
  new RegExp(`^\\s*([A-Za-z][^:=<>\\d]{0,80}?)() ${NUMBER}`),
];
const looseFigure = (line) => {
  for (const pattern of LOOSE) {
    const m = pattern.exec(line);
    if (m) return { name: [m[1].trim(), m[2]].filter(Boolean).join(' '), value: Number(m[3]), unit: m[4] ?? '' };
  }
  return null;
};

/** Figures and notes out of a benchmark's printed text. */
const collect = (stdout) => {
  const lines = stdout.split('\n');
  const marked = lines.filter((l) => l.startsWith(MARKER));
  if (marked.length > 0) {
    const figures = [];
    const notes = [];
    for (const line of marked) {
      const result = JSON.parse(line.slice(MARKER.length));
      for (const f of result.figures ?? []) figures.push({ ...f, bench: result.bench });
      notes.push(...(result.notes ?? []));
    }
    return { figures, notes, source: 'BENCH_RESULT' };
  }
  const figures = lines.map(looseFigure).filter((f) => f !== null);
  return { figures, notes: [], source: figures.length > 0 ? 'printed lines' : 'none' };
};

// A hung benchmark is ended (its whole process group) and counted as crashed.
const TIMEOUT_S = Number(process.env.HEED_BENCH_TIMEOUT_S ?? 1800);

const run = ({ file, ext }) => new Promise((resolve) => {
  const [command, args] = RUNNERS[ext](file);
  const started = performance.now();
  const child = spawn(command, args, { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'], detached: true });
  const timer = setTimeout(() => {
    console.error(`bench: ${relative(ROOT, file)} ran past ${TIMEOUT_S} s; ending it`);
    try { process.kill(-child.pid, 'SIGKILL'); } catch { /* already gone */ }
  }, TIMEOUT_S * 1000);
  child.on('exit', () => clearTimeout(timer));
  let stdout = '';
  child.stdout.on('data', (chunk) => { stdout += chunk; process.stdout.write(chunk); });
  child.on('error', (error) => resolve({ code: null, error: error.message, stdout, seconds: (performance.now() - started) / 1000 }));
  child.on('close', (code, sig) => resolve({ code, signal: sig, stdout, seconds: (performance.now() - started) / 1000 }));
});

const filter = process.argv.slice(2);
const unknown = filter.filter((n) => !entries.some((e) => e.name === n));
if (unknown.length > 0) {
  console.error(`bench: unknown benchmark ${unknown.join(', ')} (known: ${entries.map((e) => e.name).join(', ')})`);
  process.exit(2);
}

const summary = {
  startedAt: new Date().toISOString(),
  machine: { cores: availableParallelism(), node: process.version, loadAverageAtStart: loadavg() },
  benchmarks: [],
};
for (const { name, candidates, file } of entries.filter((e) => filter.length === 0 || filter.includes(e.name))) {
  if (file === null) {
    console.log(`\n== ${name}: skipped, no ${candidates.map((c) => `bench/${c}`).join(' or ')} yet`);
    summary.benchmarks.push({ name, status: 'missing' });
    continue;
  }
  const script = { file: join(BENCH, file), ext: extOf(file) };
  console.log(`\n== ${name}: ${relative(ROOT, script.file)}`);
  const result = await run(script);
  const crashed = result.code !== 0;
  let collected = { figures: [], notes: [], source: 'none' };
  let parseError = null;
  try { collected = collect(result.stdout); } catch (e) { parseError = `could not read its BENCH_RESULT line: ${e.message}`; }
  summary.benchmarks.push({
    name, file: relative(ROOT, script.file), status: crashed ? 'crashed' : 'ok',
    exitCode: result.code, signal: result.signal ?? null, error: result.error ?? parseError,
    seconds: Math.round(result.seconds * 10) / 10, figuresFrom: collected.source,
    figures: collected.figures, notes: collected.notes,
    printed: result.stdout.split('\n').filter((l) => l.trim() !== '' && !l.startsWith(MARKER)).slice(-60),
  });
}
summary.machine.loadAverageAtEnd = loadavg();
summary.finishedAt = new Date().toISOString();

mkdirSync(OUT, { recursive: true });
writeFileSync(join(OUT, 'summary.json'), JSON.stringify(summary, null, 2) + '\n');

const show = (v) => (!Number.isFinite(v) ? String(v) : v !== 0 && Math.abs(v) < 0.1 ? v.toPrecision(3) : String(Math.round(v * 10) / 10));
console.log('\nbenchmark            figure                                                     value  target');
for (const b of summary.benchmarks) {
  if (b.status !== 'ok') {
    console.log(`${b.name.padEnd(20)} ${b.status}${b.exitCode !== undefined ? ` (exit ${b.exitCode ?? b.signal ?? b.error})` : ''}`);
    continue;
  }
  if (b.error) console.log(`${b.name.padEnd(20)} ok, but ${b.error}`);
  else if (b.figures.length === 0) console.log(`${b.name.padEnd(20)} ok, printed no figures (see summary.json "printed")`);
  for (const f of b.figures) {
    const target = f.target === undefined ? '' : `${f.target} ${f.met ? 'met' : 'NOT met'}`;
    console.log(`${b.name.padEnd(20)} ${f.name.slice(0, 52).padEnd(52)} ${show(f.value).padStart(9)} ${(f.unit ?? '').padEnd(5)} ${target}`);
  }
}
console.log(`\nwrote ${relative(ROOT, join(OUT, 'summary.json'))}; load average at start ${summary.machine.loadAverageAtStart.map((l) => l.toFixed(1)).join('/')}, at end ${summary.machine.loadAverageAtEnd.map((l) => l.toFixed(1)).join('/')} on ${summary.machine.cores} cores`);
const crashedNames = summary.benchmarks.filter((b) => b.status === 'crashed').map((b) => b.name);
if (crashedNames.length > 0) {
  console.error(`bench: crashed: ${crashedNames.join(', ')}`);
  process.exit(1);
}
