/**
 * Chromium's own start with and without extra command-line flags (diagnostic, not part of `npm run
 * bench`), as the launcher starts it: a headed app window (`--app=URL`, scripts/lib/launch-plan.mjs)
 * on an X server (Xvfb here), each variant on its own stored profile, launches alternating A, B,
 * B, A... The DevTools port is only used after the start screen is ready, to read the page's own
 * clock, so nothing attaches to the browser while it starts. Per launch: spawn to "DevTools
 * listening" (the browser process up), spawn to the page's navigation start, spawn to `ready`.
 * Run: npx tsx bench/support/ab-flags.ts DIST [rounds] [flag ...] (flags default to the set below).
 * Two builds in the same app window, launcher flags only: npx tsx bench/support/ab-flags.ts DIST_A:DIST_B [rounds].
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { rmSync } from 'node:fs';
import { median } from 'simple-statistics';
import { chromium } from 'playwright-core';
import { chromiumArgs } from '../../scripts/lib/launch-plan.mjs';
import { startStaticServer } from '../../scripts/lib/static-server.mjs';
import { CHROMIUM } from '../../test/e2e/support/chromium';
import { benchProfileDir } from './app-under-test';
import { machineNote } from './figures';

const [distArg, roundsText, ...given] = process.argv.slice(2);
if (!distArg) throw new Error('usage: ab-flags.ts DIST [rounds] [flag ...] | DIST_A:DIST_B [rounds]');
const [dist = distArg, distB] = distArg.split(':');
const ROUNDS = Number(roundsText ?? 8);
const EXTRA = given.length > 0 ? given : ['--disable-extensions', '--disable-features=Translate,MediaRouter', '--disable-default-apps'];

type Run = { upMs: number; navMs: number; readyMs: number };

const startXvfb = async (): Promise<{ display: string; stop: () => void }> => {
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

const launch = async (display: string, url: string, profileDir: string, extra: string[]): Promise<Run> => {
  const args = [...chromiumArgs({ url, profileDir, isRoot: process.getuid?.() === 0, debugPort: 0, engine: 'sqlite' }), ...extra];
  const spawnedAt = Date.now();
  const child = spawn(CHROMIUM, args, { stdio: ['ignore', 'ignore', 'pipe'], detached: true, env: { ...process.env, DISPLAY: display } });
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
    await new Promise((resolve) => setTimeout(resolve, 4000));
    const browser = await chromium.connectOverCDP(wsUrl);
    const page = browser.contexts().flatMap((c) => c.pages()).find((p) => p.url().startsWith(url.split('?')[0] ?? url));
    if (!page) throw new Error('the app window was not found');
    const handle = await page.waitForFunction(() => document.body.getAttribute('data-heed-ready')
      ? { origin: performance.timeOrigin, entries: performance.getEntriesByName('heed-ready').map((e) => e.startTime) }
      : null, undefined, { timeout: 60_000 });
    const seen = (await handle.jsonValue()) as { origin: number; entries: number[] };
    await browser.close().catch(() => undefined);
    const readyAt = seen.entries[0] ?? Number.NaN;
    return { upMs: upAt - spawnedAt, navMs: seen.origin - spawnedAt, readyMs: seen.origin + readyAt - spawnedAt };
  } finally {
    await stopGroup(child);
  }
};

const xvfb = await startXvfb();
const servers = await Promise.all([dist, distB ?? dist].map((root) => startStaticServer({ root })));
const sides = (distB === undefined
  ? [{ name: 'launcher flags', extra: [] as string[], url: servers[0]?.url ?? '' }, { name: `+ ${EXTRA.join(' ')}`, extra: EXTRA, url: servers[0]?.url ?? '' }]
  : [{ name: dist, extra: [] as string[], url: servers[0]?.url ?? '' }, { name: distB, extra: [] as string[], url: servers[1]?.url ?? '' }])
  .map((s) => ({ ...s, profile: benchProfileDir(), runs: [] as Run[] }));
console.log(machineNote('start'));
try {
  for (const side of sides) await launch(xvfb.display, side.url, side.profile, side.extra); // demo set generated
  for (let round = 0; round < ROUNDS; round++) {
    for (const side of round % 2 === 0 ? sides : [...sides].reverse()) side.runs.push(await launch(xvfb.display, side.url, side.profile, side.extra));
  }
  for (const side of sides) {
    const med = (pick: (r: Run) => number) => Math.round(median(side.runs.map(pick)));
    console.log(`${side.name}: browser up ${med((r) => r.upMs)} | navigation start ${med((r) => r.navMs)} | ready ${med((r) => r.readyMs)} (ms after spawn, medians of ${side.runs.length}); ready: ${side.runs.map((r) => Math.round(r.readyMs)).join(', ')}`);
  }
  // launch by launch: each round's two launches ran back to back, so their difference is the least noisy figure
  const [a, b] = sides;
  if (a && b) {
    const diff = (pick: (r: Run) => number) => Math.round(median(a.runs.map((r, i) => pick(r) - pick(b.runs[i] ?? r))));
    console.log(`paired (${a.name} minus ${b.name}), median of ${ROUNDS} rounds: browser up ${diff((r) => r.upMs)} | navigation start ${diff((r) => r.navMs)} | ready ${diff((r) => r.readyMs)} ms`);
  }
  console.log(machineNote('end'));
} finally {
  for (const server of servers) await server.close();
  xvfb.stop();
  for (const side of sides) rmSync(side.profile, { recursive: true, force: true });
}
