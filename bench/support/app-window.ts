/**
 * The launcher's real app window, timed the way a user meets it: Chromium started with the
 * launcher's own command line (`--app=URL`, scripts/lib/launch-plan.mjs) on an X server (Xvfb
 * here), headed, with no DevTools client attached while it starts. Only once the start screen
 * has surely finished does this process connect over the DevTools port, to read the page's own
 * clock: navigation start (performance.timeOrigin) and the app's user-timing marks
 * (`heed-mounted`, `heed-ready`, src/ui/signals.ts). The one difference from `npm start` is
 * `--remote-debugging-port=0`, which the launcher adds only when HEED_DEBUG_PORT is set.
 * Used by bench/cold-start.ts and bench/support/ab-flags.ts.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chromium } from 'playwright-core';
import { chromiumArgs } from '../../scripts/lib/launch-plan.mjs';
import { CHROMIUM } from '../../test/e2e/support/chromium';

export type WindowLaunch = {
  /** spawn to "DevTools listening" on stderr: the browser process is up */
  upMs: number;
  /** spawn to the page's navigation start */
  navMs: number;
  /** spawn to the start screen's `ready` mark */
  readyMs: number;
  /** navigation start to `mounted` and to `ready` (page time) */
  pageMountedMs: number;
  pageReadyMs: number;
  /** true when the DevTools connection was made before `ready` (the figure then includes it) */
  attachedEarly: boolean;
  /** the demo generator's worker script was fetched (the stored demo set was not found) */
  demoGenerated: boolean;
};

export type Display = { display: string; stop: () => void };

/** An X server for the window: a private Xvfb when installed, else null (the caller may skip). */
export const startXvfb = async (): Promise<Display | null> => {
  if (spawnSync('sh', ['-c', 'command -v Xvfb'], { stdio: 'ignore' }).status !== 0) return null;
  const display = `:${90 + Math.floor(Math.random() * 400)}`;
  const child = spawn('Xvfb', [display, '-screen', '0', '1400x900x24', '-nolisten', 'tcp'], { stdio: 'ignore' });
  await new Promise((resolve) => setTimeout(resolve, 800));
  if (child.exitCode !== null) throw new Error(`Xvfb ${display} did not start`);
  return { display, stop: () => { child.kill('SIGTERM'); } };
};

const stopGroup = async (child: ChildProcess): Promise<void> => {
  if (child.pid !== undefined && child.exitCode === null && child.signalCode === null) {
    try { process.kill(-child.pid, 'SIGTERM'); } catch { /* gone */ }
  }
  if (child.exitCode === null && child.signalCode === null) await new Promise((resolve) => child.once('exit', resolve));
};

/** How long to leave the window alone before connecting (HEED_BENCH_WINDOW_WAIT_MS, default 4000). */
const ATTACH_AFTER_MS = Number(process.env.HEED_BENCH_WINDOW_WAIT_MS ?? 4000);

/**
 * One launch of the app window on `profileDir`, stopped again before returning. `extra` flags go
 * after the launcher's own (a later `--disable-features` replaces an earlier one in Chromium).
 */
export const windowLaunch = async (display: string, url: string, profileDir: string, extra: string[] = []): Promise<WindowLaunch> => {
  // `--heed-binary=PATH` among the extra flags (diagnostic) starts that executable instead of CHROMIUM
  const binary = extra.find((f) => f.startsWith('--heed-binary='))?.slice('--heed-binary='.length) ?? CHROMIUM;
  const args = [...chromiumArgs({ url, profileDir, isRoot: process.getuid?.() === 0, debugPort: 0, engine: 'sqlite' }), ...extra.filter((f) => !f.startsWith('--heed-binary='))];
  const spawnedAt = Date.now();
  const child = spawn(binary, args, { stdio: ['ignore', 'ignore', 'pipe'], detached: true, env: { ...process.env, DISPLAY: display } });
  try {
    const { wsUrl, upAt } = await new Promise<{ wsUrl: string; upAt: number }>((resolve, reject) => {
      let buffered = '';
      const timer = setTimeout(() => reject(new Error(`Chromium did not start: ${buffered.slice(-400)}`)), 30_000);
      child.stderr?.on('data', (chunk: Buffer) => {
        buffered += chunk.toString();
        const m = /DevTools listening on (ws:\/\/\S+)/.exec(buffered);
        if (m?.[1]) { clearTimeout(timer); resolve({ wsUrl: m[1], upAt: Date.now() }); }
      });
    });
    // attach only once the page has surely finished starting; its own clock gives the times
    await new Promise((resolve) => setTimeout(resolve, Math.max(0, ATTACH_AFTER_MS - (Date.now() - spawnedAt))));
    const attachedAt = Date.now();
    const browser = await chromium.connectOverCDP(wsUrl);
    try {
      const page = browser.contexts().flatMap((c) => c.pages()).find((p) => p.url().startsWith(url.split('?')[0] ?? url));
      if (!page) throw new Error('the app window was not found');
      const handle = await page.waitForFunction(() => document.body.getAttribute('data-heed-ready')
        ? {
            origin: performance.timeOrigin,
            ready: performance.getEntriesByName('heed-ready')[0]?.startTime ?? Number.NaN,
            mounted: performance.getEntriesByName('heed-mounted')[0]?.startTime ?? Number.NaN,
            demo: performance.getEntriesByType('resource').some((e) => /demo-worker-[^/]*\.js$/.test(e.name)),
          }
        : null, undefined, { timeout: 60_000 });
      const seen = (await handle.jsonValue()) as { origin: number; ready: number; mounted: number; demo: boolean };
      const readyAt = seen.origin + seen.ready;
      return {
        upMs: upAt - spawnedAt, navMs: seen.origin - spawnedAt, readyMs: readyAt - spawnedAt,
        pageMountedMs: seen.mounted, pageReadyMs: seen.ready, attachedEarly: readyAt > attachedAt, demoGenerated: seen.demo,
      };
    } finally {
      await browser.close().catch(() => undefined);
    }
  } finally {
    await stopGroup(child);
  }
};
