// The second thread of `heed analyze`'s bootstrap (src/cli/boot-threads.ts): it gets each
// finding's plan and a range of resamples, computes their figures and sends them back. Any
// failure is sent back as a message, so the command can end with it.
import { parentPort } from 'node:worker_threads';
import { bootstrapResamples, type BootstrapPlan } from '../analysis/reader-bootstrap';

export type BootJob = { plans: BootstrapPlan[]; from: number[]; to: number[] };
export type BootAnswer = { ok: true; draws: Float64Array[] } | { ok: false; message: string };

const port = parentPort;
if (port === null) throw new Error('boot-worker runs only as a worker thread');
port.once('message', (job: BootJob) => {
  let answer: BootAnswer;
  try {
    if (process.env.HEED_BOOT_THREAD_FAIL === '1') throw new Error('failure asked for by HEED_BOOT_THREAD_FAIL');
    answer = { ok: true, draws: job.plans.map((plan, i) => bootstrapResamples(plan, job.from[i] as number, job.to[i] as number)) };
  } catch (error) {
    answer = { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  port.postMessage(answer, answer.ok ? answer.draws.map((d) => d.buffer as ArrayBuffer) : []);
});
