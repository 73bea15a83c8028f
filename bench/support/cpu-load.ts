/**
 * Background load for the benchmarks: CPU-bound child processes (a busy loop each), as on a
 * reading workstation where a viewer, dictation or a browser run beside Heed. Each child is
 * ended by its own pid.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { loadavg } from 'node:os';

export type CpuLoad = { count: number; stop: () => void };

export const startCpuLoad = (count: number): CpuLoad => {
  const children: ChildProcess[] = Array.from({ length: count }, () =>
    spawn(process.execPath, ['-e', 'for (;;) { Math.sqrt(Math.random()); }'], { stdio: 'ignore' }));
  return {
    count,
    stop: () => { for (const child of children) if (child.exitCode === null) child.kill('SIGKILL'); },
  };
};

/** The 1-minute load average, rounded, for notes. */
export const loadNow = (): number => Math.round((loadavg()[0] ?? 0) * 100) / 100;
