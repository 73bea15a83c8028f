/**
 * Benchmark harness: the results page of a simulated study (bench/simulate-log.ts), rendered by
 * the app's own ResultsPage from the engine's report, timed from the moment the analysis has
 * finished. URL parameters: readers, cases, boot, seed, aided (sequential|concurrent).
 * Publishes window.heedBench = { analysisMs, renderMs, paintedMs, idleMs, longTasks } when done.
 */
import { createRoot } from 'react-dom/client';
import { flushSync } from 'react-dom';
import { analyzeReads } from '../../src/analysis/engine';
import { rocCurves } from '../../src/analysis/roc-curves';
import { ResultsPage } from '../../src/ui/results/ResultsPage';
import '../../src/ui/styles.css';
import { simulateReadRows } from '../simulate-log';

type BenchResult = { analysisMs: number; renderMs: number; paintedMs: number; idleMs: number; longTasks: number; plots: number };
declare global {
  // oxlint-disable-next-line typescript/consistent-type-definitions
  interface Window { heedBench?: BenchResult; heedOpenNumbers?: () => Promise<number> }
}

const params = new URLSearchParams(location.search);
const num = (name: string, fallback: number) => Number(params.get(name) ?? fallback);
const rows = simulateReadRows({ seed: num('seed', 1), readers: num('readers', 20), cases: num('cases', 500), aided: params.get('aided') === 'concurrent' ? 'concurrent' : 'sequential' });

const longTasks: { start: number; end: number }[] = [];
new PerformanceObserver((list) => { for (const e of list.getEntries()) longTasks.push({ start: e.startTime, end: e.startTime + e.duration }); }).observe({ type: 'longtask', buffered: true });

const a0 = performance.now();
const report = analyzeReads(rows, { seed: 1, boot: num('boot', 200) });
const roc = rocCurves(rows);
const t0 = performance.now();
const root = createRoot(document.getElementById('root') as HTMLElement);
flushSync(() => root.render(<main className="page page-wide results-screen"><h1>Results: simulated study</h1><ResultsPage report={report} roc={roc} /></main>));
const t1 = performance.now();
requestAnimationFrame(() => setTimeout(() => {
  const t2 = performance.now();
  // idle: 300 ms without a long task after the first paint
  const check = () => {
    const last = longTasks.reduce((m, t) => Math.max(m, t.end), t2);
    if (performance.now() - last >= 300) {
      window.heedBench = { analysisMs: t0 - a0, renderMs: t1 - t0, paintedMs: t2 - t0, idleMs: Math.max(t2, last) - t0, longTasks: longTasks.filter((t) => t.end > t0).length, plots: document.querySelectorAll('.plot svg').length };
    } else setTimeout(check, 50);
  };
  check();
}, 0));

// Click-to-shown time of the reliance numbers table (one row per reader), run by the benchmark after the page is idle.
window.heedOpenNumbers = async () => {
  const details = document.querySelector('[aria-labelledby^="reliance-"] details.numbers');
  if (!(details instanceof HTMLDetailsElement)) throw new Error('no reliance numbers on the page');
  const clicked = performance.now();
  details.open = true;
  await new Promise<void>((resolve) => {
    const wait = (): void => { if (details.querySelector('table')) requestAnimationFrame(() => resolve()); else requestAnimationFrame(wait); };
    wait();
  });
  return performance.now() - clicked;
};
