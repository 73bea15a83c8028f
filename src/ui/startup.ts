/**
 * The first queries of a launch, started before React renders: the coordinator lock and the start
 * screen's data load while the first render runs, instead of one after the other behind it. Each
 * is handed out once (to the first screen that asks), and only soon after the launch (a start
 * screen opened later, e.g. after the lock screen, queries again so it shows what is stored then).
 */
import { readLock, type LockInfo } from '../store/coordinator-lock';
import type { HeedDb } from '../store/db';
import { loadHome, type HomeData } from './screens/home-data';

let startedAt = 0;
const FRESH_MS = 3000;

const fresh = (): boolean => performance.now() - startedAt < FRESH_MS;

// One query started at launch and handed to the first screen that asks while it is still fresh.
const launchQuery = <T>(load: (db: HeedDb) => Promise<T>) => {
  let started: Promise<T> | null = null;
  return {
    start: (db: HeedDb): void => {
      started = load(db);
      // a failure is reported by the screen that takes the promise
      started.catch(() => undefined);
    },
    take: (db: HeedDb): Promise<T> => {
      const taken = started;
      started = null;
      return taken && fresh() ? taken : load(db);
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
