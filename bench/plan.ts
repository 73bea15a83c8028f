/**
 * The design planner's speed (issue 11). Two figures:
 *  - `heed plan` with 1,000 simulated studies of 10 readers x 200 cases x 2 periods (the default
 *    design, curves included), run as the CLI runs it (bin/heed.js, the esbuild bundle), timed
 *    wall-clock from spawn to exit, with the child's CPU time; target <= 10 s on 2 cores.
 *  - the app's dry run of 200 studies: the same engine (planSteps, drained as the Web Worker
 *    drains it) in this process with the panel's defaults for the demo set (8 readers x 120 cases);
 *    a proxy for the in-app figure (the worker runs the same code in Chromium's V8); target <= 3 s.
 * HEED_BENCH_PLAN_SIMS=N changes the CLI run's studies. The load average is printed beside them:
 * on a shared machine wall time grows with it.
 */
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { DEFAULT_ASSUMPTIONS } from '../src/analysis/planner/assumptions';
import { planSteps } from '../src/analysis/planner/run-plan';
import { atMost, printResult } from './support/figures';

const root = join(import.meta.dirname, '..');
const sims = Number(process.env.HEED_BENCH_PLAN_SIMS ?? 1000);
const notes: string[] = [`load average before: ${loadavg().map((x) => x.toFixed(1)).join(' ')}`];

// warm the CLI bundle so its build is not timed
spawnSync(process.execPath, [join(root, 'bin', 'heed.js'), '--help'], { cwd: root });
const t0 = performance.now();
const cli = spawnSync('/usr/bin/time', ['-f', 'CPU_SECONDS %U %S', process.execPath, join(root, 'bin', 'heed.js'), 'plan', '--sims', String(sims), '--json'], { cwd: root, encoding: 'utf8', maxBuffer: 64 << 20 });
const cliSeconds = (performance.now() - t0) / 1000;
if (cli.status !== 0) throw new Error(`heed plan failed: ${cli.stderr}`);
const cpu = /CPU_SECONDS ([\d.]+) ([\d.]+)/.exec(cli.stderr);
const cliCpu = cpu ? Number(cpu[1]) + Number(cpu[2]) : Number.NaN;
const report = JSON.parse(cli.stdout) as { sims: number; curves: { sims: number; points: unknown[] } };
notes.push(`heed plan: ${report.sims} studies at the design point x 3 sets (reliance, AUC power, AUC null) + curves (${report.curves.points.length} points, ${report.curves.sims} studies each off the design)`);

const a = { ...DEFAULT_ASSUMPTIONS, readers: 8, cases: 120, sims: 200 };
const t1 = performance.now();
const steps = planSteps({ assumptions: a, base: null });
let total = 0;
for (let s = steps.next(); s.done !== true; s = steps.next()) total = s.value.total;
const appSeconds = (performance.now() - t1) / 1000;
notes.push(`dry run proxy: ${total} simulated studies in all (200 at the design point per set, plus curves)`);
notes.push(`load average after: ${loadavg().map((x) => x.toFixed(1)).join(' ')}`);

printResult({
  bench: 'plan',
  figures: [
    atMost(`heed plan, ${sims} studies, 10 readers x 200 cases x 2 periods (wall)`, cliSeconds, 's', 10),
    { name: 'heed plan CPU time (user + system)', value: cliCpu, unit: 's' },
    atMost('dry run of 200 studies, 8 readers x 120 cases (engine in Node, proxy)', appSeconds, 's', 3),
  ],
  notes,
});
