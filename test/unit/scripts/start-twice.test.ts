// `npm start` twice on one profile: the second launcher opens nothing and sends the user to the
// first; after the first is killed (SIGKILL, as in a crash) its lock does not block a new start.
// The launcher runs from a copy of scripts/ beside a tiny dist/, so no build is needed (with no
// renderer sources beside it, dist/ counts as up to date).
import { spawn, spawnSync } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { LOCK_FILE, parseLock } from '../../../scripts/lib/launch-lock.mjs';

const base = mkdtempSync(path.join(tmpdir(), 'heed-start-twice-'));
const root = path.join(base, 'app');
cpSync(path.resolve('scripts'), path.join(root, 'scripts'), { recursive: true });
mkdirSync(path.join(root, 'dist'));
writeFileSync(path.join(root, 'dist', 'index.html'), '<!doctype html><title>Heed</title>');
const config = path.join(base, 'config');
const lockFile = path.join(config, 'heed', 'chromium-profile', LOCK_FILE);

const freePort = (): Promise<number> => new Promise((resolve) => {
  const probe = createServer().listen(0, '127.0.0.1', () => {
    const address = probe.address();
    probe.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
  });
});

const launcherEnv = (port: number) => ({
  ...Object.fromEntries(Object.entries(process.env).filter(([k]) => !k.startsWith('HEED_') && k !== 'DISPLAY' && k !== 'WAYLAND_DISPLAY')),
  HEED_MODE: 'serve', HEED_PORT: String(port), XDG_CONFIG_HOME: config, HOME: base,
});
const script = path.join(root, 'scripts', 'start.mjs');

/** Starts a launcher that keeps running and resolves once it says it is serving. */
const startServing = (port: number): Promise<{ child: ChildProcess; output: () => string }> => new Promise((resolve, reject) => {
  const child = spawn(process.execPath, [script], { env: launcherEnv(port) });
  let text = '';
  const timer = setTimeout(() => reject(new Error(`launcher did not serve in time:\n${text}`)), 20_000);
  const read = (chunk: Buffer) => {
    text += chunk.toString('utf8');
    if (text.includes('serving dist/ at')) {
      clearTimeout(timer);
      resolve({ child, output: () => text });
    }
  };
  child.stdout.on('data', read);
  child.stderr.on('data', read);
  child.on('exit', (code) => reject(new Error(`launcher exited (${code}) before serving:\n${text}`)));
});

const gone = (child: ChildProcess) => new Promise<void>((resolve) => {
  if (child.exitCode !== null || child.signalCode !== null) resolve();
  else child.on('exit', () => resolve());
});

describe('npm start twice on one profile', () => {
  it('the second start opens nothing and names the running Heed; a crashed launcher\'s lock does not block', async () => {
    const port = await freePort();
    const first = await startServing(port);
    try {
      const held = parseLock(readFileSync(lockFile, 'utf8'));
      expect(held).toMatchObject({ pid: first.child.pid, mode: 'serve', url: `http://127.0.0.1:${port}/` });

      // A second launcher on the same profile, even on another port, stops at once.
      const second = spawnSync(process.execPath, [script], { env: launcherEnv(await freePort()), encoding: 'utf8', timeout: 20_000 });
      expect(second.status).toBe(0);
      expect(second.stdout).toContain(`heed: Heed is already running with this profile (launcher process ${first.child.pid}`);
      expect(second.stdout).toContain(`it serves http://127.0.0.1:${port}/`);
      expect(second.stdout).not.toContain('serving dist/');
      expect(parseLock(readFileSync(lockFile, 'utf8'))?.pid).toBe(first.child.pid);
    } finally {
      first.child.kill('SIGKILL');
      await gone(first.child);
    }

    // The killed launcher left its lock behind; the next start takes it over and serves.
    expect(parseLock(readFileSync(lockFile, 'utf8'))?.pid).toBe(first.child.pid);
    const third = await startServing(port);
    try {
      expect(third.output()).toContain(`took over a stale launcher lock (its launcher (process ${first.child.pid}) is no longer running)`);
      expect(parseLock(readFileSync(lockFile, 'utf8'))?.pid).toBe(third.child.pid);
      expect(await (await fetch(`http://127.0.0.1:${port}/`)).text()).toContain('<title>Heed</title>');
    } finally {
      third.child.kill('SIGTERM');
      await gone(third.child);
    }
    // A launcher stopped the ordinary way removes its lock.
    expect(() => readFileSync(lockFile, 'utf8')).toThrow(/ENOENT/);
  });
});
