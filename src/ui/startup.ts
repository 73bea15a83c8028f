/**
 * The first queries of a launch, started before React renders: the coordinator lock and the start
 * screen's data load while the first render runs, instead of one after the other behind it. Each
 * is handed out once (to the first screen that asks), and only soon after the launch (a start
 * screen opened later, e.g. after the lock screen, queries again so it shows what is stored then).
 */
import { readLock, type LockInfo } from '../store/coordinator-lock';
import type { HeedDb } from '../store/db';
import { loadHome, type HomeData } from './screens/home-data';

let lock: Promise<LockInfo> | null = null;
let home: Promise<HomeData> | null = null;
let startedAt = 0;
const FRESH_MS = 3000;

const fresh = (): boolean => performance.now() - startedAt < FRESH_MS;

export const startLoading = (db: HeedDb): void => {
  startedAt = performance.now();
  // the database opens on the first query; these start it now
  lock = readLock(db);
  home = loadHome(db);
  // a failure is reported by the screen that takes the promise
  lock.catch(() => undefined);
  home.catch(() => undefined);
};

export const lockAtLaunch = (db: HeedDb): Promise<LockInfo> => {
  const started = lock;
  lock = null;
  return started && fresh() ? started : readLock(db);
};

export const homeAtLaunch = (db: HeedDb): Promise<HomeData> => {
  const started = home;
  home = null;
  return started && fresh() ? started : loadHome(db);
};
