// The launcher lock: one `npm start` per Chromium profile, and a lock left by a crashed launcher
// never blocks the next start.
import { existsSync, mkdirSync, mkdtempSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { LOCK_FILE, UNSERVED_LIMIT_MS, acquireLaunchLock, judgeLock, parseLock, processIsAlive } from '../../../scripts/lib/launch-lock.mjs';

const base = mkdtempSync(path.join(tmpdir(), 'heed-lock-'));
let n = 0;
const freshDir = () => {
  const dir = path.join(base, `profile-${(n += 1)}`);
  mkdirSync(dir);
  return dir;
};
const lockText = (dir: string) => readFileSync(path.join(dir, LOCK_FILE), 'utf8');
const holder = { pid: 4242, startedAt: 1_000_000, mode: 'chromium', url: 'http://127.0.0.1:5178/' };

describe('judgeLock', () => {
  it('obeys a live launcher that proves it serves this profile', () => {
    expect(judgeLock({ holder, alive: true, proves: true, now: 2_000_000 })).toEqual({ state: 'running' });
  });

  it('obeys a live launcher that is still building (no address yet) for up to ten minutes', () => {
    const starting = { ...holder, url: null };
    expect(judgeLock({ holder: starting, alive: true, proves: null, now: holder.startedAt + UNSERVED_LIMIT_MS })).toEqual({ state: 'running' });
    expect(judgeLock({ holder: starting, alive: true, proves: null, now: holder.startedAt + UNSERVED_LIMIT_MS + 1 }).state).toBe('stale');
  });

  it.each([
    [{ holder, alive: false, proves: null }, 'its launcher (process 4242) is no longer running'],
    // The process id was given to another program after the launcher died.
    [{ holder, alive: true, proves: false }, 'process 4242 no longer serves Heed at http://127.0.0.1:5178/'],
    [{ holder: null, alive: false, proves: null }, 'the lock file is damaged'],
  ])('takes over a stale lock: %j', (facts, reason) => {
    expect(judgeLock({ ...facts, now: 2_000_000 })).toEqual({ state: 'stale', reason });
  });
});

describe('parseLock', () => {
  it('reads what the launcher writes and nothing else', () => {
    expect(parseLock(JSON.stringify(holder))).toEqual(holder);
    expect(parseLock(JSON.stringify({ ...holder, url: null }))).toEqual({ ...holder, url: null });
    expect(parseLock('')).toBeNull();
    expect(parseLock('{"pid": -1, "startedAt": 1, "mode": "serve", "url": null}')).toBeNull();
    expect(parseLock('{"pid": 1.5, "startedAt": 1, "mode": "serve", "url": null}')).toBeNull();
    expect(parseLock('{"pid": 7, "startedAt": 1, "mode": "serve", "url": 3}')).toBeNull();
    expect(parseLock('null')).toBeNull();
  });
});

describe('acquireLaunchLock', () => {
  it('takes a free profile, records the address once serving, and lets go on release', async () => {
    const dir = freshDir();
    const lock = await acquireLaunchLock({ dir, mode: 'serve', pid: 101, now: () => 5 });
    expect(lock.ok).toBe(true);
    if (!lock.ok) return;
    expect(lock.took).toBeNull();
    expect(JSON.parse(lockText(dir))).toEqual({ pid: 101, startedAt: 5, mode: 'serve', url: null });
    expect(statSync(path.join(dir, LOCK_FILE)).mode & 0o077).toBe(0);
    lock.setUrl('http://127.0.0.1:6000/');
    expect(parseLock(lockText(dir))?.url).toBe('http://127.0.0.1:6000/');
    lock.release();
    expect(existsSync(path.join(dir, LOCK_FILE))).toBe(false);
  });

  it('refuses a second launcher while the first runs and proves it is this Heed', async () => {
    const dir = freshDir();
    const first = await acquireLaunchLock({ dir, mode: 'chromium', pid: 201, now: () => 10 });
    if (!first.ok) throw new Error('first launcher refused');
    first.setUrl('http://127.0.0.1:5178/');
    const asked: string[] = [];
    const second = await acquireLaunchLock({
      dir, mode: 'chromium', pid: 202, now: () => 20, isAlive: (pid) => pid === 201,
      proves: async (url) => { asked.push(url); return true; },
    });
    expect(second).toEqual({ ok: false, holder: { pid: 201, startedAt: 10, mode: 'chromium', url: 'http://127.0.0.1:5178/' } });
    expect(asked).toEqual(['http://127.0.0.1:5178/']);
    // The refused launcher leaves the first one's lock alone.
    expect(parseLock(lockText(dir))?.pid).toBe(201);
  });

  it('takes over the lock of a crashed launcher, and a damaged lock', async () => {
    const dir = freshDir();
    writeFileSync(path.join(dir, LOCK_FILE), JSON.stringify({ ...holder, pid: 301 }));
    const lock = await acquireLaunchLock({ dir, mode: 'serve', pid: 302, isAlive: () => false });
    expect(lock.ok && lock.took).toBe('its launcher (process 301) is no longer running');
    expect(parseLock(lockText(dir))?.pid).toBe(302);

    const damaged = freshDir();
    writeFileSync(path.join(damaged, LOCK_FILE), '{"pid":');
    const again = await acquireLaunchLock({ dir: damaged, mode: 'serve', pid: 303 });
    expect(again.ok && again.took).toBe('the lock file is damaged');
  });

  it('does not release a lock that another launcher has taken over since', async () => {
    const dir = freshDir();
    const old = await acquireLaunchLock({ dir, mode: 'serve', pid: 401 });
    if (!old.ok) throw new Error('refused');
    const next = await acquireLaunchLock({ dir, mode: 'serve', pid: 402, isAlive: () => false });
    expect(next.ok).toBe(true);
    old.release();
    old.setUrl('http://127.0.0.1:1/');
    expect(parseLock(lockText(dir))).toMatchObject({ pid: 402, url: null });
  });

  it('knows a live process from a gone one', () => {
    expect(processIsAlive(process.pid)).toBe(true);
    expect(processIsAlive(2 ** 22 + 12_345)).toBe(false);
  });
});
