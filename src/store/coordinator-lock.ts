/**
 * The coordinator lock, as stored: the passphrase's salted PBKDF2 hash (core/passphrase.ts) and
 * whether the coordinator's side is locked. Locked is a stored fact, not screen state, so a
 * reload (or a second window) during a reading session comes back locked. Every change is one
 * transaction with its event on the workstation's own chain (studyId null).
 */
import { hashPassphrase, passphraseProblem, verifyPassphrase } from '../core/passphrase';
import type { HeedDb } from './db';
import { appendEvent } from './events';
import { InputError } from './input-error';
import type { StoredSetting } from './records';

export const DEFAULT_IDLE_MINUTES = 15;
/** What a coordinator types to reset a forgotten passphrase (the reset is logged; no data is touched). */
export const RESET_PHRASE = 'reset the lock';

export type LockInfo = { hasPassphrase: boolean; locked: boolean; idleMinutes: number };

type LockRecord = Extract<StoredSetting, { key: 'coordinator-lock' }>;
type StateRecord = Extract<StoredSetting, { key: 'lock-state' }>;

const lockRecord = async (db: HeedDb): Promise<LockRecord | undefined> => {
  const record = await db.settings.get('coordinator-lock');
  return record?.key === 'coordinator-lock' ? record : undefined;
};

export const readLock = async (db: HeedDb): Promise<LockInfo> => {
  const [record, state] = await Promise.all([lockRecord(db), db.settings.get('lock-state')]);
  return {
    hasPassphrase: record !== undefined,
    locked: record !== undefined && state?.key === 'lock-state' && state.locked,
    idleMinutes: record?.idleMinutes ?? DEFAULT_IDLE_MINUTES,
  };
};

/** Why these idle minutes are refused, or null (whole minutes, 1 to 240). */
export const idleProblem = (minutes: number): string | null =>
  Number.isInteger(minutes) && minutes >= 1 && minutes <= 240 ? null : 'Idle minutes must be a whole number from 1 to 240.';

/** Sets the first passphrase. Refused when one is already set (reset it first) or it is too short. */
export const setPassphrase = async (db: HeedDb, passphrase: string, repeat: string, idleMinutes: number = DEFAULT_IDLE_MINUTES): Promise<void> => {
  const problem = passphraseProblem(passphrase) ?? (passphrase === repeat ? null : 'The two passphrases differ.') ?? idleProblem(idleMinutes);
  if (problem) throw new InputError(problem);
  const hash = await hashPassphrase(passphrase);
  await db.transaction('rw', db.settings, db.events, async () => {
    if (await lockRecord(db)) throw new InputError('A passphrase is already set; reset the lock to choose a new one.');
    const setAt = new Date().toISOString();
    const record: LockRecord = { key: 'coordinator-lock', hash, idleMinutes, setAt };
    await db.settings.put(record);
    await appendEvent(db, null, 'lock-set', { idleMinutes, iterations: hash.iterations });
  });
};

/** Locks the coordinator's side (a reading session opened, or idle). Does nothing without a passphrase. */
export const engageLock = (db: HeedDb, why: string): Promise<boolean> =>
  db.transaction('rw', db.settings, async () => {
    if (!(await lockRecord(db))) return false;
    const state = await db.settings.get('lock-state');
    if (state?.key === 'lock-state' && state.locked) return true;
    const record: StateRecord = { key: 'lock-state', locked: true, since: new Date().toISOString(), why };
    await db.settings.put(record);
    return true;
  });

/** Unlocks with the passphrase; a wrong one is logged and refused. */
export const unlock = async (db: HeedDb, passphrase: string): Promise<boolean> => {
  const record = await lockRecord(db);
  if (!record) return true;
  const ok = await verifyPassphrase(passphrase, record.hash);
  await db.transaction('rw', db.settings, db.events, async () => {
    const open: StateRecord = { key: 'lock-state', locked: false, since: new Date().toISOString(), why: 'passphrase' };
    if (ok) await db.settings.put(open);
    await appendEvent(db, null, ok ? 'lock-unlocked' : 'lock-refused', {});
  });
  return ok;
};

/**
 * Removes the passphrase and the lock when the coordinator has forgotten it; studies, readers,
 * reads and events are untouched. Needs the reset phrase typed exactly, and is logged.
 */
export const resetLock = (db: HeedDb, typed: string): Promise<void> => {
  if (typed.trim().toLowerCase() !== RESET_PHRASE) return Promise.reject(new InputError(`Type “${RESET_PHRASE}” to reset the lock.`));
  return db.transaction('rw', db.settings, db.events, async () => {
    await db.settings.delete('coordinator-lock');
    await db.settings.delete('lock-state');
    await appendEvent(db, null, 'lock-reset', { keptData: true });
  });
};
