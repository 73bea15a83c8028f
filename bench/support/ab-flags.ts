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
import { rmSync } from 'node:fs';
import { median } from 'simple-statistics';
import { startStaticServer } from '../../scripts/lib/static-server.mjs';
import { benchProfileDir } from './app-under-test';
import { startXvfb, windowLaunch, type WindowLaunch } from './app-window';
import { machineNote } from './figures';

const [distArg, roundsText, ...given] = process.argv.slice(2);
if (!distArg) throw new Error('usage: ab-flags.ts DIST [rounds] [flag ...] | DIST_A:DIST_B [rounds]');
const [dist = distArg, distB] = distArg.split(':');
const ROUNDS = Number(roundsText ?? 8);
const EXTRA = given.length > 0 ? given : ['--disable-extensions', '--disable-features=Translate,MediaRouter', '--disable-default-apps'];

type Run = WindowLaunch;
const launch = windowLaunch;

const xvfb = await startXvfb();
if (xvfb === null) throw new Error('ab-flags.ts needs Xvfb');
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
    console.log(`${side.name}: browser up ${med((r) => r.upMs)} | navigation start ${med((r) => r.navMs)} | ready ${med((r) => r.readyMs)} (ms after spawn, medians of ${side.runs.length}) | navigation to ready ${med((r) => r.pageReadyMs)} (page); ready: ${side.runs.map((r) => Math.round(r.readyMs)).join(', ')}${side.runs.some((r) => r.attachedEarly) ? ` (${side.runs.filter((r) => r.attachedEarly).length} attached before ready)` : ''}`);
  }
  // launch by launch: each round's two launches ran back to back, so their difference is the least noisy figure
  const [a, b] = sides;
  if (a && b) {
    const diff = (pick: (r: Run) => number) => Math.round(median(a.runs.map((r, i) => pick(r) - pick(b.runs[i] ?? r))));
    console.log(`paired (${a.name} minus ${b.name}), median of ${ROUNDS} rounds: browser up ${diff((r) => r.upMs)} | navigation start ${diff((r) => r.navMs)} | ready ${diff((r) => r.readyMs)} | navigation to ready ${diff((r) => r.pageReadyMs)} ms`);
  }
  console.log(machineNote('end'));
} finally {
  for (const server of servers) await server.close();
  xvfb.stop();
  for (const side of sides) rmSync(side.profile, { recursive: true, force: true });
}
