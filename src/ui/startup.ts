/**
 * The first queries of a launch, started before React renders: the coordinator lock and the start
 * screen's data load while the entry module finishes, instead of one after the other behind the
 * first render. Each is handed out once (to the first screen that asks), and only soon after the
 * launch (a start screen opened later, e.g. after the lock screen, queries again so it shows what
 * is stored then).
 *
 * The first render waits for both (`drawWhenSettled`), up to a limit: on a relaunch they arrive
 * within a few tens of milliseconds of the entry module, and the screens then take the settled
 * values as their first state, so the start screen is rendered, laid out and painted once instead
 * of three times ("Opening…", then the header with "Opening Heed…", then the lists). On a first
 * launch (the demo set is generated: seconds) the limit passes and the placeholders show as before.
 */
import { readLock, type LockInfo } from '../store/coordinator-lock';
import type { HeedDb } from '../store/db';
import { loadHome, type HomeData } from './screens/home-data';

let startedAt = 0;
const FRESH_MS = 3000;

const fresh = (): boolean => performance.now() - startedAt < FRESH_MS;

/** One query started at launch and handed to the first screen that asks while it is still fresh. */
export const launchQuery = <T>(load: (db: HeedDb) => Promise<T>, isFresh: () => boolean = fresh) => {
  let started: Promise<T> | null = null;
  let settled: { value: T } | null = null;
  return {
    start: (db: HeedDb): void => {
      const query = load(db);
      started = query;
      settled = null;
      // a failure is reported by the screen that takes the promise
      query.then((value) => { if (started === query) settled = { value }; }, () => undefined);
    },
    /** Resolves once the launch's query has succeeded or failed (at once when none was started). */
    settledOrFailed: (): Promise<void> => (started ?? Promise.resolve()).then(() => undefined, () => undefined),
    /** The launch's result if it has already arrived (and is fresh); handed out once, like take(). */
    takeSettled: (): T | undefined => {
      const value = settled !== null && isFresh() ? settled.value : undefined;
      if (value !== undefined) { started = null; settled = null; }
      return value;
    },
    take: (db: HeedDb): Promise<T> => {
      const taken = started;
      started = null;
      settled = null;
      return taken && isFresh() ? taken : load(db);
    },
  };
};

const lock = launchQuery<LockInfo>(readLock);
const home = launchQuery<HomeData>(loadHome);

export const startLoading = (db: HeedDb): void => {
  startedAt = performance.now();
  // the database opens on the first query; these start it now
  lock.start(db);
  home.start(db);
};

export const lockAtLaunch = (db: HeedDb): Promise<LockInfo> => lock.take(db);

export const homeAtLaunch = (db: HeedDb): Promise<HomeData> => home.take(db);

/** The lock as read at launch, if it has arrived: the coordinator gate's first state. */
export const lockSettledAtLaunch = (): LockInfo | undefined => lock.takeSettled();

/** The start screen's data as loaded at launch, if it has arrived: its first state. */
export const homeSettledAtLaunch = (): HomeData | undefined => home.takeSettled();

/** How long the first render waits for the launch's queries (ms after the entry module ran). */
export const FIRST_RENDER_WAIT_MS = 400;

/**
 * Calls `draw` once: when every query in `settled` has answered (`draw(true)`), or after `waitMs`
 * (`draw(false)`), whichever is first.
 */
export const drawWhenSettled = (
  settled: Promise<unknown>, draw: (answered: boolean) => void, waitMs: number,
  setTimer: (run: () => void, ms: number) => unknown = setTimeout,
): void => {
  let drawn = false;
  const once = (answered: boolean): void => { if (drawn) return; drawn = true; draw(answered); };
  void settled.then(() => { once(true); }, () => { once(true); });
  setTimer(() => { once(false); }, waitMs);
};

/** Resolves once both launch queries have answered (or failed). */
export const launchSettled = (): Promise<void> => Promise.all([lock.settledOrFailed(), home.settledOrFailed()]).then(() => undefined);
