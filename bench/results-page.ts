/**
 * The coordinator's results page for a large study: 20 readers x 500 cases (sequential crossover,
 * 20,000 reads, simulated by bench/simulate-log.ts), target: interactive within 2 s after the
 * analysis finishes (issue 7).
 *
 * How: bench/results-page/ is a harness page built by vite from the app's own ResultsPage; it
 * simulates the log, runs the engine and the ROC curves in the page (timed apart: "analysis"),
 * then from that moment renders the page and stamps (page time, performance.now): the React
 * commit ("rendered"), the frame after it ("painted", every plot drawn by then, since plots draw
 * in effects), and "interactive": the end of the last long task (Long Tasks API) once 300 ms pass
 * with none. Then it opens the 20-reader reliance numbers table and times click to the frame
 * after it shows. Debian Chromium headless on a fresh profile. HEED_BENCH_READERS / _CASES change the size.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { newProfileDir, removeProfileDir, startChromium } from '../test/e2e/support/chromium';
import { startStaticServer } from '../scripts/lib/static-server.mjs';
import { ROOT } from './support/app-under-test';
import { atMost, machineNote, plain, printResult } from './support/figures';

const readers = Number(process.env.HEED_BENCH_READERS ?? 20);
const cases = Number(process.env.HEED_BENCH_CASES ?? 500);
const notes = [machineNote('before')];
const outDir = mkdtempSync(join(tmpdir(), 'heed-bench-results-'));
execFileSync(process.execPath, [join(ROOT, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', join(ROOT, 'bench', 'results-page'), '--config', join(ROOT, 'vite.config.ts'), '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: ROOT, stdio: ['ignore', 'ignore', 'inherit'] });
const server = await startStaticServer({ root: outDir });
const profile = newProfileDir();
const chrome = await startChromium(profile, 'about:blank');
try {
  const { page } = chrome;
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto(new URL(`index.html?readers=${readers}&cases=${cases}&boot=1000`, server.url).href);
  await page.waitForFunction(() => window.heedBench, null, { timeout: 600_000 });
  const r = await page.evaluate(() => window.heedBench);
  if (!r) throw new Error('the harness reported nothing');
  const openMs = await page.evaluate(() => window.heedOpenNumbers?.() ?? Promise.reject(new Error('no probe')));
  notes.push(`${readers} readers x ${cases} cases, ${r.plots} plots drawn, ${r.longTasks} long tasks after the analysis`, machineNote('after'));
  printResult({
    bench: 'results-page',
    figures: [
      plain('analysis in the page (engine, 1000 resamples, and ROC curves)', r.analysisMs, 'ms'),
      plain('analysis finished to page rendered (React commit)', r.renderMs, 'ms'),
      plain('analysis finished to page painted', r.paintedMs, 'ms'),
      atMost('analysis finished to interactive (no long task for 300 ms)', r.idleMs, 'ms', 2000),
      plain('open the 20-reader reliance numbers table', openMs, 'ms'),
    ],
    notes,
  });
} finally {
  await chrome.stop();
  removeProfileDir(profile);
  await server.close();
  rmSync(outDir, { recursive: true, force: true });
}
