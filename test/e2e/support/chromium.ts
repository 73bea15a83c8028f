/**
 * Debian's Chromium started by hand, driven over CDP by playwright-core. We own the process, so
 * a test can kill it outright (a crash, not a close) and start it again on the same profile.
 * Over CDP, browser.close() only disconnects: stop() kills Chromium itself.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { storeEngineArgs, type StoreEngine } from '../../../scripts/lib/store-engine.mjs';

export const CHROMIUM = process.env.HEED_CHROMIUM ?? '/usr/bin/chromium';

const FLAGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
  '--disable-component-update', '--disable-sync', '--remote-debugging-port=0', '--window-size=1400,900',
];

export type RunningChromium = { browser: Browser; page: Page; process: ChildProcess; kill: () => Promise<void>; stop: () => Promise<void> };

export const newProfileDir = (): string => mkdtempSync(join(tmpdir(), 'heed-e2e-profile-'));
export const removeProfileDir = (dir: string): void => rmSync(dir, { recursive: true, force: true });

const waitForExit = (child: ChildProcess): Promise<void> =>
  child.exitCode !== null || child.signalCode !== null ? Promise.resolve() : new Promise((resolve) => child.once('exit', () => resolve()));

/**
 * `engine` is the IndexedDB engine: SQLite by default, as npm start gives a new profile
 * (scripts/lib/store-engine.mjs); LevelDB only for the benchmark that compares the two.
 */
export const startChromium = async (profileDir: string, url: string, engine: StoreEngine = 'sqlite'): Promise<RunningChromium> => {
  const child = spawn(CHROMIUM, [...FLAGS, ...storeEngineArgs(engine), `--user-data-dir=${profileDir}`, 'about:blank'], { stdio: ['ignore', 'ignore', 'pipe'], detached: true });
  const wsUrl = await new Promise<string>((resolve, reject) => {
    let buffered = '';
    const timer = setTimeout(() => reject(new Error(`Chromium did not start: ${buffered.slice(-500)}`)), 30_000);
    child.stderr?.on('data', (chunk: Buffer) => {
      buffered += chunk.toString();
      const match = /DevTools listening on (ws:\/\/\S+)/.exec(buffered);
      if (match?.[1]) { clearTimeout(timer); resolve(match[1]); }
    });
    child.once('exit', (code) => { clearTimeout(timer); reject(new Error(`Chromium exited (${code}): ${buffered.slice(-500)}`)); });
  });
  const browser = await chromium.connectOverCDP(wsUrl);
  const context = browser.contexts()[0];
  if (!context) throw new Error('Chromium has no default context');
  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto(url);
  const killGroup = async (signal: NodeJS.Signals) => {
    if (child.pid !== undefined && child.exitCode === null && child.signalCode === null) {
      try { process.kill(-child.pid, signal); } catch { /* already gone */ }
    }
    await waitForExit(child);
  };
  return {
    browser, page, process: child,
    kill: async () => { await killGroup('SIGKILL'); },
    stop: async () => { await browser.close().catch(() => undefined); await killGroup('SIGTERM'); },
  };
};

/** Waits until the app has signalled `name` more than `after` times (see src/ui/signals.ts). */
export const waitForSignal = async (page: Page, name: string, after = 0): Promise<number> => {
  const handle = await page.waitForFunction(
    ([attr, min]) => { const n = Number(document.body.getAttribute(attr as string) ?? 0); return n > (min as number) ? n : 0; },
    [`data-heed-${name}`, after] as const,
    { timeout: 60_000 },
  );
  return Number(await handle.jsonValue());
};

export const signalCount = (page: Page, name: string): Promise<number> =>
  page.evaluate((attr) => Number(document.body.getAttribute(attr) ?? 0), `data-heed-${name}`);

/**
 * One fresh profile for a test file, made before its tests and removed (with Chromium stopped)
 * after them. `launch()` starts Chromium on that profile, again after a kill if asked.
 */
export const useChromiumProfile = (url: string) => {
  let profile = '';
  let running: RunningChromium | null = null;
  beforeAll(() => { profile = newProfileDir(); });
  afterAll(async () => { await running?.stop(); removeProfileDir(profile); });
  return {
    launch: async (): Promise<RunningChromium> => { running = await startChromium(profile, url); return running; },
    current: (): RunningChromium => {
      if (!running) throw new Error('Chromium has not been launched in this test file');
      return running;
    },
  };
};
