// `heed analyze` with its bootstrap in one or two threads (src/cli/boot-threads.ts), as a user
// runs it (node bin/heed.js): the same report to the last byte, a thread's failure ends the
// command with one line and exit code 1, and a small log starts no thread.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateReadLog } from '../../../bench/simulate-log';

const dir = mkdtempSync(join(tmpdir(), 'heed-threads-'));
const log = join(dir, 'reads.csv');
writeFileSync(log, simulateReadLog({ seed: 2, readers: 7, cases: 120, aided: 'concurrent' }));
const heed = (env: Record<string, string>, ...args: string[]) => {
  const r = spawnSync(process.execPath, ['bin/heed.js', 'analyze', log, ...args], { encoding: 'utf8', cwd: process.cwd(), env: { ...process.env, ...env }, timeout: 120_000 });
  return { code: r.status, out: r.stdout, err: r.stderr };
};

describe('heed analyze in two threads', () => {
  // with a few resamples every one of them moves the interval ends; with many, the tails
  it.each([[['--json', '--boot', '3']], [['--json', '--boot', '5', '--seed', '9']], [['--json', '--boot', '301', '--seed', '5']], [['--boot', '40']]])('prints the one-thread report byte for byte: %j', (args) => {
    const one = heed({ HEED_BOOT_THREADS: '1' }, ...args);
    const two = heed({ HEED_BOOT_THREADS: '2' }, ...args);
    expect(one.code).toBe(0);
    expect(two.code).toBe(0);
    expect(two.err).toBe('');
    expect(one.out.length).toBeGreaterThan(1000);
    expect(two.out).toBe(one.out);
  });
  it('ends with one line and exit code 1 when the second thread fails', () => {
    const r = heed({ HEED_BOOT_THREADS: '2', HEED_BOOT_THREAD_FAIL: '1' }, '--json', '--boot', '50');
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toBe("heed: the bootstrap's second thread failed: failure asked for by HEED_BOOT_THREAD_FAIL\n");
  });
  it('starts no thread for a small log (below THREADS_FROM reads x resamples)', () => {
    // a thread would fail here; none is started, so the command succeeds
    const r = heed({ HEED_BOOT_THREADS: '', HEED_BOOT_THREAD_FAIL: '1' }, '--json', '--boot', '200');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).group.boot).toBe(200);
  });
});
