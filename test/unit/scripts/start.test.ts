// The launcher's refusals happen before any build, so they are cheap to check end to end.
import { spawnSync } from 'node:child_process';
import path from 'node:path';

const start = (env: Record<string, string>) => {
  const clean = Object.fromEntries(Object.entries(process.env).filter(([k]) => !k.startsWith('HEED_') && k !== 'DISPLAY' && k !== 'WAYLAND_DISPLAY'));
  return spawnSync(process.execPath, [path.resolve('scripts/start.mjs')], { env: { ...clean, ...env }, encoding: 'utf8', timeout: 30_000 });
};

describe('npm start refusals', () => {
  it.each([
    [{ HEED_MODE: 'bogus' }, 'heed: HEED_MODE="bogus" is not one of electron, chromium, serve'],
    [{ HEED_PORT: 'abc' }, 'heed: HEED_PORT="abc" is not a port number (1-65535)'],
    [{ HEED_DEBUG_PORT: '99999' }, 'heed: HEED_DEBUG_PORT="99999" is not a port number (1-65535)'],
    // HEED_CHROMIUM names any existing file, so the check reaches the display on machines without Chromium.
    [{ HEED_MODE: 'chromium', HEED_CHROMIUM: process.execPath }, 'heed: HEED_MODE=chromium, but there is no display'],
  ])('%j exits 1 with one line saying what is wrong', (env, message) => {
    const run = start(env);
    expect(run.status).toBe(1);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toContain(message);
    expect(run.stdout).not.toContain('building');
  });
});
