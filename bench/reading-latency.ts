/**
 * Reading latency in real Chromium (run: npx tsx bench/reading-latency.ts).
 *
 * A fresh profile, the app built and served; first launch to the home screen's `ready` (this
 * includes generating and storing the demo set); a study with the aided condition
 * "concurrent", readers enrolled until one whose first period is aided, and that period read
 * with the keyboard for READS cases. Per read, in page time: Enter keydown to `heed:saved`
 * (the durable commit), to `heed:case-painted` of the next case (commit + render + draw: the
 * figure with the 50 ms p95 target), and to the frame after that paint. A screenshot of the
 * reading view goes to bench-results/reading-view.png.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { removeProfileDir } from '../test/e2e/support/chromium';
import { homePage, readingPage, studyPage } from '../test/e2e/support/pages';
import { benchProfileDir, buildAndServe, machineNote, RESULTS_DIR } from './support/app-under-test';
import { plain, printResult, spread, spreadFigures, type Figure } from './support/figures';
import { timedLaunch } from './support/launch-probe';
import { collectLatencyRecord, installLatencyProbe, pairTimings } from './support/latency-probe';

const READS = Number(process.env.HEED_BENCH_READS ?? 100);
const SCREENSHOT_AT = Math.min(50, READS);

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

    // Sequences are UA (unaided first) and AU (aided first), assigned in permuted blocks of two:
    // enrol until one reader has AU.
    const study = studyPage(page);
    let reader = '';
    for (const code of ['B01', 'B02', 'B03', 'B04']) {
      await study.enrol(code);
      await study.enrolled(code);
      const sequence = await study.sequenceOf(code);
      if (sequence === 'AU') { reader = code; break; }
    }
    if (reader === '') throw new Error('no enrolled reader was given the aided-first sequence AU');

    await installLatencyProbe(page);
    const paintedBefore = await study.startPeriod(reader, 1);
    const reading = readingPage(page);
    await reading.waitForCase(paintedBefore);
    const first = await reading.state();
    if (first.assistance !== 'concurrent') throw new Error(`period 1 of ${reader} is "${first.assistance}", expected concurrent`);
    if ((await reading.suggestionText()) === null) throw new Error('the aided period shows no model suggestion');

    let practice = 0;
    for (let i = 1; i <= READS; i++) {
      if (await reading.isDone()) throw new Error(`the period ended after ${i - 1} reads, fewer than ${READS}`);
      if ((await page.getByText('Practice case').count()) > 0) practice++;
      await reading.answerByKeys(i % 3 === 0 ? 1 : 0, 1 + (i % 9));
      if (i === SCREENSHOT_AT) {
        mkdirSync(RESULTS_DIR, { recursive: true });
        await page.screenshot({ path: join(RESULTS_DIR, 'reading-view.png') });
      }
    }
    const timings = pairTimings(await collectLatencyRecord(page));
    if (timings.length !== READS) throw new Error(`recorded ${timings.length} Enter presses for ${READS} reads`);

    // HEED_BENCH_DUMP=1 prints every read: commit, paint and frame-after times in ms.
    if (process.env.HEED_BENCH_DUMP) console.log(timings.map((t) => `${t.commitMs.toFixed(1)} ${t.paintedMs.toFixed(1)} ${t.frameAfterMs.toFixed(1)}`).join('\n'));
    const frames = spread(timings.map((t) => t.frameAfterMs - t.paintedMs));
    const figures: Figure[] = [
      plain('first launch, fresh profile, to home ready (wall)', launch.wallMs, 'ms'),
      plain('first launch: navigation to ready (page)', launch.readyMs, 'ms'),
      ...spreadFigures('Enter to next case painted', spread(timings.map((t) => t.paintedMs)), 'ms', 50),
      ...spreadFigures('Enter to frame after paint', spread(timings.map((t) => t.frameAfterMs)), 'ms'),
      ...spreadFigures('Enter to saved (durable commit)', spread(timings.map((t) => t.commitMs)), 'ms'),
      ...spreadFigures('paint signal to frame after', frames, 'ms'),
      plain('reads measured', timings.length, 'reads'),
    ];
    notes.push(
      `reader ${reader}, sequence AU, period 1 (aided, concurrent); ${practice} of the ${READS} reads were practice cases`,
      'first launch includes generating and storing the demo set; the 1.5 s cold-start target is for a stored profile (bench/cold-start.ts)',
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
