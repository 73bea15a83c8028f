/**
 * Reading latency in real Chromium (run: npx tsx bench/reading-latency.ts).
 *
 * A fresh profile, the app built and served; first launch to the home screen's `ready` (this
 * includes generating and storing the demo set); a study with the aided condition
 * "concurrent", readers enrolled until one whose first period is aided, and that period read
 * with the keyboard (P or A, a confidence digit, and Enter a reader's pause later: ENTER_AFTER_MS
 * below): the practice cases first (not measured), then READS main cases quiet and
 * READS more with two CPU-bound processes running beside the browser (started here, the load
 * average reported). Per read, in page time: Enter keydown to `heed:saved` (the durable commit),
 * to `heed:case-painted` of the next case (commit + render + draw: the figure with the targets,
 * p95 <= 25 ms quiet and <= 33 ms under load), and to the frame after that paint. A screenshot of the
 * reading view goes to bench-results/reading-view.png.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { removeProfileDir } from '../test/e2e/support/chromium';
import { homePage, readingPage, studyPage } from '../test/e2e/support/pages';
import { benchProfileDir, buildAndServe, RESULTS_DIR } from './support/app-under-test';
import { machineNote, plain, printResult, spread, spreadFigures, type Figure } from './support/figures';
import { timedLaunch } from './support/launch-probe';
import { enrolAidedFirstReader, readPracticeCases } from './support/reading-setup';
import { loadNow, startCpuLoad } from './support/cpu-load';
import { collectLatencyRecord, installLatencyProbe, pairTimings, resetLatencyRecord, type ReadTiming } from './support/latency-probe';
import { measureIdbFloor, type IdbFloor } from './support/idb-floor';
import { commitPhases, installCommitPhases, resetCommitPhases, type CommitPhases } from './support/commit-phases';

// reads per phase (quiet, then under load); the demo period has 120 main cases
const READS = Number(process.env.HEED_BENCH_READS ?? 55);
const SCREENSHOT_AT = Math.min(50, READS);
// HEED_BENCH_TRACE=file.json also records a Chrome trace of the quiet reads.
// HEED_BENCH_PHASES=1 also splits each commit into its phases (bench/support/commit-phases.ts)
const PHASES = Boolean(process.env.HEED_BENCH_PHASES);
// The pause between the confidence digit and Enter (ms). A reader choosing a confidence and then
// committing takes well over 100 ms; pressed at once (0, the method before the sixth session), the
// digit's own frame is still pending when Enter is handled, and Chromium then holds the page's
// IndexedDB replies until that frame is drawn (bench/README.md, "Reading view p95, sixth session").
const ENTER_AFTER_MS = Number(process.env.HEED_BENCH_ENTER_AFTER_MS ?? 100);

const app = await buildAndServe();
const profile = benchProfileDir();
const notes: string[] = [machineNote('start')];
try {
  const launch = await timedLaunch(profile, app.url);
  const { page } = launch.chrome;
  try {
    if (launch.workers !== 1) notes.push(`expected the demo generator to run once on a fresh profile, it ran ${launch.workers} times`);
    await homePage(page).waitUntilReady();
    await homePage(page).newStudy({ name: 'Latency bench', aidedMode: 'concurrent' });

    const study = studyPage(page);
    const reader = await enrolAidedFirstReader(study, ['B01', 'B02', 'B03', 'B04']);

    await installLatencyProbe(page);
    const paintedBefore = await study.startPeriod(reader, 1);
    const reading = readingPage(page);
    await reading.waitForCase(paintedBefore);
    const first = await reading.state();
    if (first.assistance !== 'concurrent') throw new Error(`period 1 of ${reader} is "${first.assistance}", expected concurrent`);
    if ((await reading.suggestionText()) === null) throw new Error('the aided period shows no model suggestion');

    const practice = await readPracticeCases(page, reading);

    if (PHASES) await installCommitPhases(page);
    // P or A, the digit, a reader's pause, then Enter (ENTER_AFTER_MS = 0: all three at once)
    const answer = async (call: 0 | 1, digit: number): Promise<void> => {
      if (ENTER_AFTER_MS <= 0) { await reading.answerByKeys(call, digit); return; }
      await page.keyboard.press(call === 1 ? 'p' : 'a');
      await page.keyboard.press(String(digit));
      await new Promise((resolve) => { setTimeout(resolve, ENTER_AFTER_MS); });
      await reading.commitWithKeys([]);
    };
    const split = new Map<string, CommitPhases>();
    const phase = async (label: string, reads: number): Promise<ReadTiming[]> => {
      await resetLatencyRecord(page);
      if (PHASES) await resetCommitPhases(page);
      for (let i = 1; i <= reads; i++) {
        if (await reading.isDone()) throw new Error(`the period ended during the ${label} reads, after ${i - 1} of ${reads}`);
        await answer(i % 3 === 0 ? 1 : 0, 1 + (i % 9));
        if (label === 'quiet' && i === Math.min(SCREENSHOT_AT, reads)) {
          mkdirSync(RESULTS_DIR, { recursive: true });
          await page.screenshot({ path: join(RESULTS_DIR, 'reading-view.png') });
        }
      }
      const timings = pairTimings(await collectLatencyRecord(page));
      if (timings.length !== reads) throw new Error(`recorded ${timings.length} Enter presses for ${reads} ${label} reads`);
      // HEED_BENCH_DUMP=1 prints every read: commit, paint and frame-after times in ms.
      if (PHASES) split.set(label, await commitPhases(page, timings.map((t) => ({ enter: t.enterAt, saved: t.enterAt + t.commitMs, painted: t.enterAt + t.paintedMs }))));
      if (process.env.HEED_BENCH_DUMP) console.log(timings.map((t) => `${label} ${t.commitMs.toFixed(1)} ${t.paintedMs.toFixed(1)} ${t.frameAfterMs.toFixed(1)}`).join('\n'));
      return timings;
    };

    const loadBefore = loadNow();
    // HEED_BENCH_TRACE=file.json records a Chrome trace of the quiet reads (CDP Tracing)
    const trace = process.env.HEED_BENCH_TRACE;
    if (trace) await launch.chrome.browser.startTracing(page, { path: trace, categories: ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'blink.user_timing', 'IndexedDB', 'toplevel', 'v8.execute'] });
    const quiet = await phase('quiet', READS);
    if (trace) await launch.chrome.browser.stopTracing();
    const floorQuiet = await measureIdbFloor(page, READS);
    const loadQuiet = loadNow();
    // Two CPU-bound processes beside the browser, started after a short settle so they count in the load
    const load = startCpuLoad(2);
    let loaded: ReadTiming[];
    let loadUnder: number;
    let floorLoaded: IdbFloor;
    try {
      await new Promise((resolve) => { setTimeout(resolve, 3000); });
      loaded = await phase('under load', READS);
      floorLoaded = await measureIdbFloor(page, READS);
      loadUnder = loadNow();
    } finally {
      load.stop();
    }

    const phaseFigures = (label: string, timings: ReadTiming[], p95Limit: number): Figure[] => [
      ...spreadFigures(`${label}: Enter to next case painted`, spread(timings.map((t) => t.paintedMs)), 'ms', p95Limit),
      ...spreadFigures(`${label}: Enter to frame after paint`, spread(timings.map((t) => t.frameAfterMs)), 'ms'),
      ...spreadFigures(`${label}: Enter to saved (durable commit)`, spread(timings.map((t) => t.commitMs)), 'ms'),
      plain(`${label}: paint signal to frame after p50`, spread(timings.map((t) => t.frameAfterMs - t.paintedMs)).p50, 'ms'),
      ...phaseSplit(label),
    ];
    const phaseSplit = (label: string): Figure[] => {
      const p = split.get(label);
      if (!p) return [];
      const pair = (name: string, x: { p50: number; p95: number }): Figure[] => [plain(`${label}: ${name} p50`, x.p50, 'ms'), plain(`${label}: ${name} p95`, x.p95, 'ms')];
      return [
        ...pair('Enter to first request of the commit', p.toTransaction),
        ...pair('first request to first write (step-check reads)', p.reads),
        ...pair('first write to complete (writes + flush)', p.writeAndFlush),
        ...pair('complete to saved signal', p.completeToSaved),
        ...pair('saved to next case painted', p.savedToPainted),
      ];
    };
    // The floor: bare IndexedDB transactions (strict durability) of an answer's size, same page (bench/support/idb-floor.ts)
    const floorFigures = (label: string, floor: IdbFloor): Figure[] => [
      ...spreadFigures(`${label} floor: one record, strict, to complete`, floor.one.commit, 'ms'),
      ...spreadFigures(`${label} floor: one record, strict, to next frame`, floor.one.frame, 'ms'),
      ...spreadFigures(`${label} floor: read + event, strict, to complete`, floor.two.commit, 'ms'),
      ...spreadFigures(`${label} floor: read + event, relaxed, to complete`, floor.relaxed.commit, 'ms'),
      ...spreadFigures(`${label} floor: 4 reads then read + event, strict, to complete`, floor.checked.commit, 'ms'),
    ];
    const figures: Figure[] = [
      plain('first launch, fresh profile, to home ready (wall)', launch.wallMs, 'ms'),
      plain('first launch: navigation to ready (page)', launch.readyMs, 'ms'),
      ...phaseFigures('quiet', quiet, 25),
      ...phaseFigures('under load', loaded, 33),
      ...floorFigures('quiet', floorQuiet),
      ...floorFigures('under load', floorLoaded),
      plain('reads measured per phase', READS, 'reads'),
      plain('1-min load average after the quiet reads', loadQuiet, ''),
      plain('1-min load average after the reads under load', loadUnder, ''),
    ];
    notes.push(
      `reader ${reader}, sequence AU, period 1 (aided, concurrent); the ${practice} practice cases were read first and not measured`,
      ENTER_AFTER_MS > 0 ? `keys per read: P or A, a confidence digit, then Enter ${ENTER_AFTER_MS} ms later (HEED_BENCH_ENTER_AFTER_MS)` : 'keys per read: P or A, a confidence digit and Enter at once (HEED_BENCH_ENTER_AFTER_MS=0)',
      `quiet: ${READS} reads with no load of our own (1-min load average ${loadBefore} before, ${loadQuiet} after; other work on the machine counts in it)`,
      `under load: the next ${READS} reads with 2 CPU-bound processes (node busy loops) running beside the browser; 1-min load average ${loadUnder} after`,
      `floor: ${READS} bare IndexedDB transactions per shape after each phase, ${floorQuiet.bytes} bytes of JSON per answer (the last stored read and its event), spaced 60 ms; "to next frame" adds the wait for the first animation frame after the flush`,
      'first launch includes generating and storing the demo set; the cold-start target is for a stored profile (bench/cold-start.ts)',
      'screenshot of the reading view: bench-results/reading-view.png',
      machineNote('end'),
    );
    printResult({ bench: 'reading-latency', figures, notes });
  } finally {
    await launch.chrome.stop();
  }
} finally {
  removeProfileDir(profile);
  await app.close();
}
