// `heed analyze`'s bootstrap in two threads: this thread computes the first half of each
// finding's resamples, a worker thread (boot-worker.ts) the second half, and the halves are
// joined in resample order, so the report is the one-thread report to the last bit (every
// resample's draws come from the same seeded stream: bootstrapResamples). Small analyses stay
// in one thread, where starting a thread would cost more than it saves.
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { bootstrapResamples, type BootstrapPlan } from '../analysis/reader-bootstrap';
import type { BootAnswer, BootJob } from './boot-worker';

/**
 * Reads x resamples from which a second thread is started (bench/README.md, "Bootstrap in two
 * threads, fifth session"): a thread costs 0.1-0.2 s of CPU to start and load its code, and at
 * 20,000 reads x 1,000 resamples (the bootstrap about 0.2 s) two threads gained nothing measurable;
 * at 100,000 reads x 1,000 resamples the bootstrap is most of a second.
 */
export const THREADS_FROM = 50_000_000;

/** 1 or 2: HEED_BOOT_THREADS when set to 1 or 2, else 2 from THREADS_FROM reads x resamples. */
export const bootThreads = (reads: number, boot: number): 1 | 2 => {
  const forced = process.env.HEED_BOOT_THREADS;
  if (forced === '1' || forced === '2') return forced === '1' ? 1 : 2;
  return reads * boot >= THREADS_FROM ? 2 : 1;
};

// The worker: next to the bundle (dist-cli/boot-worker.mjs; this code sits in a chunk below it)
// or, run from the sources through tsx (HEED_CLI_LOADER=tsx), boot-worker.ts beside this file,
// loaded with tsx's loader registered in the thread first. Null when the file is missing.
const startWorker = (): Worker | null => {
  const here = import.meta.url;
  if (here.endsWith('.ts')) {
    const api = import.meta.resolve('tsx/esm/api');
    const file = new URL('./boot-worker.ts', here).href;
    return new Worker(`import(${JSON.stringify(api)}).then((m) => { m.register(); return import(${JSON.stringify(file)}); });`, { eval: true });
  }
  for (const rel of ['./boot-worker.mjs', '../boot-worker.mjs']) {
    const file = fileURLToPath(new URL(rel, here));
    if (existsSync(file)) return new Worker(file);
  }
  return null;
};

/** The second thread failed or stopped; this thread's own errors (a RangeError of a bad option) are thrown as they are. */
export class BootThreadError extends Error {}

/** A started worker thread that will compute resamples once given a job. */
export type BootThread = { run: (plans: BootstrapPlan[]) => Promise<Float64Array[]>; stop: () => void };

/** Starts the second thread now (so it loads while this one works); null when its file is missing. */
export const startBootThread = (): BootThread | null => {
  const worker = startWorker();
  if (worker === null) return null;
  let settle: ((a: BootAnswer) => void) | null = null;
  let early: BootAnswer | null = null;
  const deliver = (a: BootAnswer) => {
    if (settle !== null) settle(a);
    else early ??= a;
  };
  worker.on('message', (a: BootAnswer) => deliver(a));
  worker.on('error', (error) => deliver({ ok: false, message: error.message }));
  worker.on('exit', (code) => deliver({ ok: false, message: `the thread stopped (exit code ${code}) before it answered` }));
  return {
    stop: () => void worker.terminate(),
    run: async (plans) => {
      const from = plans.map((p) => half(p.boot));
      const job: BootJob = { plans, from, to: plans.map((p) => p.boot) };
      const answer = new Promise<BootAnswer>((resolve) => {
        settle = resolve;
        if (early !== null) resolve(early);
      });
      worker.postMessage(job);
      let mine: Float64Array[];
      let theirs: BootAnswer;
      try {
        // this thread's half while the worker computes its own
        mine = plans.map((p) => bootstrapResamples(p, 0, half(p.boot)));
        theirs = await answer;
      } finally {
        void worker.terminate();
      }
      if (!theirs.ok) throw new BootThreadError(`the bootstrap's second thread failed: ${theirs.message}`);
      return mine.map((m, i) => {
        const t = theirs.draws[i] as Float64Array;
        const joined = new Float64Array(m.length + t.length);
        joined.set(m);
        joined.set(t, m.length);
        return joined;
      });
    },
  };
};

const half = (boot: number): number => Math.ceil(boot / 2);
