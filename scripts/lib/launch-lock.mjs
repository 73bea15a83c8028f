// One launcher per Chromium profile. A second `npm start` would otherwise reuse the server and
// start Chromium again on the same profile, and Chromium opens a second app window on the same
// database. The lock is a small file in the profile folder naming the launcher's process and
// address; a lock whose process is gone (a crashed launcher) is taken over, never obeyed.
import { linkSync, mkdirSync, readFileSync, renameSync, unlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export const LOCK_FILE = 'heed-launcher.lock';
/** A launcher that has not served anything after this long is taken as dead (builds take ~1 min). */
export const UNSERVED_LIMIT_MS = 10 * 60 * 1000;

/** Whether a process with this id exists (EPERM: it exists but belongs to another user). */
export const processIsAlive = (pid) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return error?.code === 'EPERM';
  }
};

/**
 * Reads a lock's text; null when it is not a lock this launcher wrote (damaged or foreign).
 * @param {string} text
 * @returns {{ pid: number; startedAt: number; mode: string; url: string | null } | null}
 */
export const parseLock = (text) => {
  let value;
  try {
    value = JSON.parse(text);
  } catch {
    return null;
  }
  if (value === null || typeof value !== 'object') return null;
  const { pid, startedAt, mode, url } = value;
  if (!Number.isSafeInteger(pid) || pid <= 0 || !Number.isFinite(startedAt) || typeof mode !== 'string') return null;
  if (url !== null && typeof url !== 'string') return null;
  return { pid, startedAt, mode, url };
};

/**
 * The decision on a lock found in the profile: 'running' (send the user to that Heed) or 'stale'
 * (take it over), with the reason. `proves` is whether the lock's address proved it holds the
 * profile token (null when the lock has no address yet); it guards against a process id that the
 * system gave to another program after the launcher died.
 * @param {{ holder: ReturnType<typeof parseLock>; alive: boolean; proves: boolean | null; now: number }} facts
 */
export const judgeLock = ({ holder, alive, proves, now }) => {
  if (holder === null) return { state: 'stale', reason: 'the lock file is damaged' };
  if (!alive) return { state: 'stale', reason: `its launcher (process ${holder.pid}) is no longer running` };
  if (holder.url !== null && proves === false) return { state: 'stale', reason: `process ${holder.pid} no longer serves Heed at ${holder.url}` };
  if (holder.url === null && now - holder.startedAt > UNSERVED_LIMIT_MS) return { state: 'stale', reason: `process ${holder.pid} never started serving` };
  return { state: 'running' };
};

const readText = (file) => {
  try {
    return readFileSync(file, 'utf8');
  } catch (error) {
    if (error?.code === 'ENOENT') return null;
    throw error;
  }
};

// Writes the whole lock to a private file first and links it into place: link() fails when the
// name exists, so two launchers cannot both win, and no one ever reads a half-written lock.
const tryCreate = (file, content) => {
  const draft = `${file}.${process.pid}.draft`;
  writeFileSync(draft, content, { mode: 0o600 });
  try {
    linkSync(draft, file);
    return true;
  } catch (error) {
    if (error?.code === 'EEXIST') return false;
    throw error;
  } finally {
    unlinkSync(draft);
  }
};

// Moves a stale lock aside, then checks that what was moved is the lock judged stale; if another
// launcher replaced it meanwhile, that new lock is put back (link() again refuses to overwrite).
const removeStale = (file, staleText) => {
  const aside = `${file}.${process.pid}.stale`;
  try {
    renameSync(file, aside);
  } catch (error) {
    if (error?.code === 'ENOENT') return;
    throw error;
  }
  if (readText(aside) !== staleText) {
    try {
      linkSync(aside, file);
    } catch {
      // a third launcher holds the name now; it wins
    }
  }
  unlinkSync(aside);
};

/**
 * Takes the profile's launcher lock, or says who holds it.
 * @param {{ dir: string; mode: string; pid?: number; now?: () => number; isAlive?: (pid: number) => boolean; proves?: (url: string) => Promise<boolean> }} o
 * @returns {Promise<{ ok: true; took: string | null; setUrl(url: string): void; release(): void } | { ok: false; holder: NonNullable<ReturnType<typeof parseLock>> }>}
 */
export const acquireLaunchLock = async ({ dir, mode, pid = process.pid, now = Date.now, isAlive = processIsAlive, proves = async () => false }) => {
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  const file = path.join(dir, LOCK_FILE);
  const record = { pid, startedAt: now(), mode, url: null };
  let took = null;
  for (let attempt = 0; attempt < 5; attempt += 1) {
    if (tryCreate(file, JSON.stringify(record))) {
      const mine = () => parseLock(readText(file) ?? '')?.pid === pid;
      return {
        ok: true,
        took,
        setUrl: (url) => {
          if (!mine()) return;
          record.url = url;
          const next = `${file}.${process.pid}.next`;
          writeFileSync(next, JSON.stringify(record), { mode: 0o600 });
          renameSync(next, file);
        },
        release: () => {
          if (mine()) unlinkSync(file);
        },
      };
    }
    const text = readText(file);
    if (text === null) continue;
    const holder = parseLock(text);
    const alive = holder !== null && holder.pid !== pid && isAlive(holder.pid);
    const verdict = judgeLock({ holder, alive, proves: alive && holder.url !== null ? await proves(holder.url) : null, now: now() });
    if (verdict.state === 'running' && holder !== null) return { ok: false, holder };
    took = verdict.reason;
    removeStale(file, text);
  }
  throw new Error(`could not take the launcher lock ${file}: other launchers keep replacing it`);
};
