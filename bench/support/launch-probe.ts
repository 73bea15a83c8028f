/**
 * One timed launch: Chromium started on a profile, the app opened, until the home screen
 * signals `ready` (src/ui/signals.ts). Wall clock covers the whole launch; page time
 * (performance.now, relative to performance.timeOrigin = navigation start) the in-page part.
 * The probe also counts Workers the page creates: the demo generator runs in one, so a count
 * of 0 proves a relaunch found the demo set already stored.
 */
import { z } from 'zod';
import { startChromium, waitForSignal, type RunningChromium } from '../../test/e2e/support/chromium';

const PROBE_KEY = '__heedLaunchProbe';

// A string, not a function: it must run before the app's own scripts, untouched by any transpiler.
const INIT_SCRIPT = `(() => {
  const probe = { mountedAt: null, readyAt: null, readyScreen: null, workers: 0, dbOpenCalledAt: null, dbOpenedAt: null };
  Reflect.set(window, ${JSON.stringify(PROBE_KEY)}, probe);
  // when the app first asks IndexedDB for its database, and when that open succeeds
  const nativeOpen = IDBFactory.prototype.open;
  IDBFactory.prototype.open = function (...args) {
    const request = nativeOpen.apply(this, args);
    if (probe.dbOpenCalledAt === null) {
      probe.dbOpenCalledAt = performance.now();
      request.addEventListener('success', () => { if (probe.dbOpenedAt === null) probe.dbOpenedAt = performance.now(); });
    }
    return request;
  };
  window.addEventListener('heed:mounted', (e) => { if (probe.mountedAt === null) probe.mountedAt = e.detail.at; });
  window.addEventListener('heed:ready', (e) => {
    if (probe.readyAt === null) { probe.readyAt = e.detail.at; probe.readyScreen = e.detail.screen; }
  });
  const Native = window.Worker;
  window.Worker = class extends Native { constructor(...args) { super(...args); probe.workers += 1; } };
})();`;

const probeSchema = z.object({
  mountedAt: z.number().nullable(),
  readyAt: z.number(),
  readyScreen: z.string(),
  workers: z.number().int(),
  dbOpenCalledAt: z.number().nullable(),
  dbOpenedAt: z.number().nullable(),
  timeOrigin: z.number(),
  scriptsLoadedAt: z.number(),
  scriptBytesFromNetwork: z.number(),
  domContentLoadedAt: z.number(),
});

/** The page's part of a launch, in page time (ms after navigation start), for the breakdown. */
export type LaunchBreakdown = {
  /** the last of the app's scripts and styles fetched (resource timing responseEnd) */
  scriptsLoadedMs: number;
  /** bytes of them that came over the network (0 when all came from the browser's cache) */
  scriptBytesFromNetwork: number;
  /** DOMContentLoaded: the entry module evaluated */
  domContentLoadedMs: number;
  /** the app's first indexedDB.open, and its success */
  dbOpenCalledMs: number | null;
  dbOpenedMs: number | null;
};

export type Launch = {
  chrome: RunningChromium;
  /** wall clock from spawning Chromium to the ready signal seen by this process */
  wallMs: number;
  /** wall clock from spawning Chromium to the page's navigation start */
  browserStartMs: number;
  /** page time from navigation start to the app's first `mounted` signal */
  mountedMs: number | null;
  /** page time from navigation start to the home screen's `ready` signal */
  readyMs: number;
  /** Workers the page created (1 when the demo set was generated) */
  workers: number;
  breakdown: LaunchBreakdown;
};

export const timedLaunch = async (profileDir: string, url: string): Promise<Launch> => {
  const spawnedAt = Date.now();
  const chrome = await startChromium(profileDir, 'about:blank');
  await chrome.page.addInitScript({ content: INIT_SCRIPT });
  await chrome.page.goto(url);
  await waitForSignal(chrome.page, 'ready');
  const seenAt = Date.now();
  const probe = probeSchema.parse(await chrome.page.evaluate((key) => {
    const resources = performance.getEntriesByType('resource').filter((e): e is PerformanceResourceTiming => e instanceof PerformanceResourceTiming && /\.(js|css)$/.test(new URL(e.name).pathname));
    const nav = performance.getEntriesByType('navigation')[0];
    return {
      ...Reflect.get(window, key), timeOrigin: performance.timeOrigin,
      scriptsLoadedAt: resources.reduce((m, e) => Math.max(m, e.responseEnd), 0),
      scriptBytesFromNetwork: resources.reduce((sum, e) => sum + e.transferSize, 0),
      domContentLoadedAt: nav instanceof PerformanceNavigationTiming ? nav.domContentLoadedEventStart : 0,
    };
  }, PROBE_KEY));
  if (probe.readyScreen !== 'home') throw new Error(`expected the home screen to be ready first, got "${probe.readyScreen}"`);
  return {
    chrome, wallMs: seenAt - spawnedAt, browserStartMs: probe.timeOrigin - spawnedAt,
    mountedMs: probe.mountedAt, readyMs: probe.readyAt, workers: probe.workers,
    breakdown: {
      scriptsLoadedMs: probe.scriptsLoadedAt, scriptBytesFromNetwork: probe.scriptBytesFromNetwork,
      domContentLoadedMs: probe.domContentLoadedAt, dbOpenCalledMs: probe.dbOpenCalledAt, dbOpenedMs: probe.dbOpenedAt,
    },
  };
};
