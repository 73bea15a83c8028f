/**
 * The design planner's speed (issue 11). Two figures:
 *  - `heed plan` with 1,000 simulated studies of 10 readers x 200 cases x 2 periods (the default
 *    design, curves included), run as the CLI runs it (bin/heed.js, the esbuild bundle), timed
 *    wall-clock from spawn to exit, with the child's CPU time; target <= 10 s on 2 cores.
 *  - the app's dry run of 200 studies with the panel's defaults for the demo set (8 readers x 120
 *    cases, curves included): timed as `heed plan --sims 200` with those sizes, the same engine
 *    bundled as the app's worker bundles it; a proxy for the in-app figure (the worker runs the
 *    same code in Chromium's V8, not timed here); target <= 3 s.
 * HEED_BENCH_PLAN_SIMS=N changes the CLI run's studies. The load average is printed beside them:
 * on a shared machine wall time grows with it.
 */
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { atMost, printResult } from './support/figures';

const root = join(import.meta.dirname, '..');
const sims = Number(process.env.HEED_BENCH_PLAN_SIMS ?? 1000);
const notes: string[] = [`load average before: ${loadavg().map((x) => x.toFixed(1)).join(' ')}`];

// warm the CLI bundle so its build is not timed
spawnSync(process.execPath, [join(root, 'bin', 'heed.js'), '--help'], { cwd: root });
type Timed = { wall: number; cpu: number; report: { sims: number; curves: { sims: number; points: unknown[] } } };
const timedPlan = (args: string[]): Timed => {
  const t0 = performance.now();
  const run = spawnSync('/usr/bin/time', ['-f', 'CPU_SECONDS %U %S', process.execPath, join(root, 'bin', 'heed.js'), 'plan', ...args, '--json'], { cwd: root, encoding: 'utf8', maxBuffer: 64 << 20 });
  const wall = (performance.now() - t0) / 1000;
  if (run.status !== 0) throw new Error(`heed plan failed: ${run.stderr}`);
  const cpu = /CPU_SECONDS ([\d.]+) ([\d.]+)/.exec(run.stderr);
  return { wall, cpu: cpu ? Number(cpu[1]) + Number(cpu[2]) : Number.NaN, report: JSON.parse(run.stdout) as Timed['report'] };
};
const main = timedPlan(['--sims', String(sims)]);
const cliSeconds = main.wall;
const cliCpu = main.cpu;
const report = main.report;
notes.push(`heed plan: ${report.sims} studies at the design point x 3 sets (reliance, AUC power, AUC null) + curves (${report.curves.points.length} points, ${report.curves.sims} studies each off the design)`);

const app = timedPlan(['--sims', '200', '--readers', '8', '--cases', '120']);
const appSeconds = app.wall;
notes.push(`dry run proxy: CPU ${app.cpu.toFixed(1)} s; 200 studies x 3 sets + curves (${app.report.curves.sims} studies per point off the design)`);
notes.push(`load average after: ${loadavg().map((x) => x.toFixed(1)).join(' ')}`);

printResult({
  bench: 'plan',
  figures: [
    atMost(`heed plan, ${sims} studies, 10 readers x 200 cases x 2 periods (wall)`, cliSeconds, 's', 10),
    { name: 'heed plan CPU time (user + system)', value: cliCpu, unit: 's' },
    atMost('dry run of 200 studies, 8 readers x 120 cases (bundled engine in Node, proxy; wall)', appSeconds, 's', 3),
  ],
  notes,
});
