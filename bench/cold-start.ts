/**
 * Cold start in real Chromium (run: npx tsx bench/cold-start.ts).
 *
 * First launch: a fresh profile, so the demo case set is generated and stored before the home
 * screen is ready. Then RUNS relaunches on that same profile (demo already stored; Chromium
 * stopped in between): from spawning Chromium, which then opens the app URL, to the home
 * screen's `ready` signal. Wall clock for the whole; page time (relative to
 * performance.timeOrigin, the navigation start) for the in-page part. A relaunch that creates
 * a Worker would mean the demo set was generated again, which is reported as a failure.
 *
 * The harness above drives a headless Chromium over DevTools from its first moment, which a user's
 * launch does not have. So the same relaunches are then timed in the launcher's real app window
 * (bench/support/app-window.ts: headed, `--app=URL` with the launcher's flags, on Xvfb, nothing
 * attached until the start screen is ready; times from the page's own clock): that is what
 * "relaunch" means to a user, and the 0.8 s quiet target is read on it. Skipped with a note when
 * Xvfb is not installed.
 */
import { median } from 'simple-statistics';
import { removeProfileDir } from '../test/e2e/support/chromium';
import { benchProfileDir, buildAndServe } from './support/app-under-test';
import { atMost, machineNote, plain, printResult, type Figure } from './support/figures';
import { startXvfb, windowLaunch, type WindowLaunch } from './support/app-window';
import { timedLaunch, type Launch } from './support/launch-probe';

const RUNS = Number(process.env.HEED_BENCH_COLD_RUNS ?? 5);

const app = await buildAndServe();
const profile = benchProfileDir();
const notes: string[] = [machineNote('start')];
try {
  const first = await timedLaunch(profile, app.url);
  await first.chrome.stop();
  if (first.workers !== 1) throw new Error(`first launch on a fresh profile created ${first.workers} Workers, expected 1 (the demo generator)`);

  const runs: Launch[] = [];
  for (let i = 0; i < RUNS; i++) {
    const launch = await timedLaunch(profile, app.url);
    await launch.chrome.stop();
    if (launch.workers !== 0) throw new Error(`relaunch ${i + 1} generated the demo set again (${launch.workers} Workers): the stored set was not found`);
    runs.push(launch);
  }
  const med = (pick: (l: Launch) => number) => median(runs.map(pick));
  const figures: Figure[] = [
    plain('first launch, fresh profile, to ready (wall)', first.wallMs, 'ms'),
    plain('first launch: navigation to ready (page)', first.readyMs, 'ms'),
    atMost(`relaunch to ready, median of ${RUNS} (wall, harness: headless, DevTools attached)`, med((l) => l.wallMs), 'ms', 1500),
    plain(`relaunch: Chromium start to navigation, median`, med((l) => l.browserStartMs), 'ms'),
    plain(`relaunch: navigation to ready (page), median`, med((l) => l.readyMs), 'ms'),
    plain(`relaunch: navigation to app mounted (page), median`, med((l) => l.mountedMs ?? Number.NaN), 'ms'),
    plain(`relaunch to ready, slowest of ${RUNS} (wall)`, Math.max(...runs.map((l) => l.wallMs)), 'ms'),
    // where the page's part goes (page time after navigation start, medians)
    plain('relaunch: navigation to scripts and styles loaded, median', med((l) => l.breakdown.scriptsLoadedMs), 'ms'),
    plain('relaunch: script and style bytes over the network, median', med((l) => l.breakdown.scriptBytesFromNetwork), 'bytes'),
    plain('relaunch: navigation to entry module run (DOMContentLoaded), median', med((l) => l.breakdown.domContentLoadedMs), 'ms'),
    plain('relaunch: navigation to first indexedDB.open, median', med((l) => l.breakdown.dbOpenCalledMs ?? Number.NaN), 'ms'),
    plain('relaunch: navigation to database open, median', med((l) => l.breakdown.dbOpenedMs ?? Number.NaN), 'ms'),
  ];
  notes.push(`relaunch wall times: ${runs.map((l) => Math.round(l.wallMs)).join(', ')} ms`, machineNote('harness end'));
  figures.push(...(await appWindowFigures(app.url, notes)));
  notes.push(machineNote('end'));
  printResult({ bench: 'cold-start', figures, notes });
} finally {
  removeProfileDir(profile);
  await app.close();
}

/**
 * The same relaunches in the launcher's real app window, on a profile of its own (its first
 * launch generates the demo set): spawn to the start screen's `ready`, as a user gets it.
 */
async function appWindowFigures(url: string, out: string[]): Promise<Figure[]> {
  const xvfb = await startXvfb();
  if (xvfb === null) { out.push('app window not timed: Xvfb is not installed'); return []; }
  const windowProfile = benchProfileDir();
  try {
    const first = await windowLaunch(xvfb.display, url, windowProfile);
    if (!first.demoGenerated) throw new Error('app window: the first launch on a fresh profile did not generate the demo set');
    const runs: WindowLaunch[] = [];
    for (let i = 0; i < RUNS; i++) {
      const launch = await windowLaunch(xvfb.display, url, windowProfile);
      if (launch.demoGenerated) throw new Error(`app window: relaunch ${i + 1} generated the demo set again`);
      runs.push(launch);
    }
    const med = (pick: (l: WindowLaunch) => number) => median(runs.map(pick));
    const early = runs.filter((l) => l.attachedEarly).length;
    out.push(
      `app window relaunch (spawn to ready) times: ${runs.map((l) => Math.round(l.readyMs)).join(', ')} ms`,
      ...(early > 0 ? [`app window: ${early} of ${RUNS} relaunches were not ready when DevTools connected (raise HEED_BENCH_WINDOW_WAIT_MS)`] : []),
    );
    return [
      atMost(`relaunch to ready in the app window, median of ${RUNS} (spawn to ready; quiet target)`, med((l) => l.readyMs), 'ms', 800),
      plain('app window relaunch: spawn to navigation start, median', med((l) => l.navMs), 'ms'),
      plain('app window relaunch: navigation to mounted (page), median', med((l) => l.pageMountedMs), 'ms'),
      plain('app window relaunch: navigation to ready (page), median', med((l) => l.pageReadyMs), 'ms'),
      plain('app window: first launch, fresh profile, spawn to ready', first.readyMs, 'ms'),
    ];
  } finally {
    xvfb.stop();
    removeProfileDir(windowProfile);
  }
}
