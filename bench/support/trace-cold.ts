/**
 * Where a relaunch's page time goes (diagnostic, not part of `npm run bench`): one build, a stored
 * profile, N relaunches each with a Chromium performance trace from navigation to the start
 * screen's `ready`. Prints, per launch, the renderer main thread's busy time by
 * kind (script compile, module evaluation, function calls, style/layout/paint, GC) and the
 * resource timing of each script, and self time per original source file (CPU samples mapped through
 * the build's sourcemaps; @jridgewell/trace-mapping comes with the build tools, it is not a direct
 * dependency). Traces are kept in bench-results/trace-cold-N.json.
 * Run: npx tsx bench/support/trace-cold.ts DIST [runs] (DIST built with `npx vite build --outDir DIST`)
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { TraceMap, originalPositionFor } from '@jridgewell/trace-mapping';
import { startStaticServer } from '../../scripts/lib/static-server.mjs';
import { removeProfileDir, startChromium, waitForSignal } from '../../test/e2e/support/chromium';
import { RESULTS_DIR, benchProfileDir } from './app-under-test';
import { machineNote } from './figures';

const [dist] = process.argv.slice(2);
const RUNS = Number(process.argv[3] ?? 3);
if (!dist) throw new Error('usage: trace-cold.ts DIST [runs]');

const maps = new Map<string, TraceMap | null>();
type TraceEvent = { name: string; cat: string; ph: string; ts: number; dur?: number; pid: number; tid: number; args?: Record<string, unknown> };

const server = await startStaticServer({ root: dist });
const profile = benchProfileDir();
// HEED_TRACE_CATEGORIES=a,b adds trace categories (e.g. fonts,mojom,ipc)
const CATEGORIES = ['disabled-by-default-v8.cpu_profiler', 'devtools.timeline', 'v8', 'v8.execute', 'blink.user_timing', 'loading', 'disabled-by-default-devtools.timeline', 'blink', 'netlog', 'navigation',
  ...(process.env.HEED_TRACE_CATEGORIES ?? '').split(',').filter(Boolean)];
console.log(machineNote('start'));
try {
  const first = await startChromium(profile, server.url);
  await waitForSignal(first.page, 'ready');
  await first.stop();
  for (let run = 0; run < RUNS; run++) {
    const chrome = await startChromium(profile, 'about:blank');
    await chrome.browser.startTracing(chrome.page, { categories: CATEGORIES });
    await chrome.page.goto(server.url);
    await waitForSignal(chrome.page, 'ready');
    const timing = await chrome.page.evaluate(() => ({
      origin: performance.timeOrigin,
      nav: performance.getEntriesByType('navigation').map((e) => e.toJSON() as Record<string, number>)[0],
      res: performance.getEntriesByType('resource').map((e) => { const r = e as PerformanceResourceTiming; return [r.name.replace(/.*\//, ''), Math.round(r.startTime), Math.round(r.responseStart), Math.round(r.responseEnd), r.transferSize] as const; }),
      marks: [...document.body.attributes].map((a) => a.name),
    }));
    const buffer = await chrome.browser.stopTracing();
    await chrome.stop();
    const events = (JSON.parse(buffer.toString()) as { traceEvents: TraceEvent[] }).traceEvents;
    // kept for a closer look (chrome://tracing or the DevTools performance panel can open it)
    mkdirSync(RESULTS_DIR, { recursive: true });
    writeFileSync(join(RESULTS_DIR, `trace-cold-${run + 1}.json`), buffer);
    // the renderer's main thread: the thread named CrRendererMain in the process that ran our page
    const mains = events.filter((e) => e.name === 'thread_name' && e.args?.name === 'CrRendererMain');
    // the page's renderer: the main thread that compiled the entry chunk
    const busiest = mains.find((m) => events.some((e) => e.pid === m.pid && e.tid === m.tid && JSON.stringify(e.args ?? {}).includes('/assets/index-')));
    if (!busiest) throw new Error('no renderer main thread in the trace');
    const onMain = events.filter((e) => e.pid === busiest.pid && e.tid === busiest.tid && e.ph === 'X' && e.dur !== undefined);
    const navStart = events.find((e) => e.name === 'navigationStart' && e.pid === busiest.pid)?.ts ?? Math.min(...onMain.map((e) => e.ts));
    // top-level slices only (not nested in another slice on the same thread)
    onMain.sort((a, b) => a.ts - b.ts || (b.dur ?? 0) - (a.dur ?? 0));
    const top: TraceEvent[] = [];
    let end = -Infinity;
    for (const e of onMain) { if (e.ts >= end) { top.push(e); end = e.ts + (e.dur ?? 0); } }
    const byName = new Map<string, number>();
    for (const e of top) byName.set(e.name, (byName.get(e.name) ?? 0) + (e.dur ?? 0) / 1000);
    // nested kinds of interest, summed wherever they occur
    const kinds = ['v8.compile', 'v8.compileModule', 'V8.CompileCode', 'v8.produceModuleCache', 'v8.produceCache', 'v8.evaluateModule', 'EvaluateScript', 'FunctionCall', 'ParseHTML', 'UpdateLayoutTree', 'Layout', 'Paint', 'MinorGC', 'MajorGC', 'V8.GCScavenger', 'v8.run', 'RunMicrotasks', 'TimerFire', 'EventDispatch', 'v8.parseOnBackground', 'V8.ParseFunction', 'v8.deserializeOnBackground'];
    const sums = kinds.map((k) => [k, onMain.filter((e) => e.name === k).reduce((s, e) => s + (e.dur ?? 0) / 1000, 0)] as const).filter(([, v]) => v > 0.5);
    const cacheInfo = events.filter((e) => (e.name === 'v8.compileModule' || e.name === 'v8.compile') && e.pid === busiest.pid).map((e) => JSON.stringify(e.args?.data ?? e.args)).slice(0, 6);
    const busy = top.reduce((s, e) => s + (e.dur ?? 0) / 1000, 0);
    const lastEnd = Math.max(...top.map((e) => e.ts + (e.dur ?? 0)));
    console.log(`\nrun ${run + 1}: main thread busy ${busy.toFixed(0)} ms of ${((lastEnd - navStart) / 1000).toFixed(0)} ms after navigation start`);
    console.log(`  navigation: ${JSON.stringify(Object.fromEntries(Object.entries(timing.nav ?? {}).filter(([k, v]) => typeof v === 'number' && v > 0 && /Start|End|domInteractive|domComplete/.test(k)).map(([k, v]) => [k, Math.round(v as number)])))}`);
    console.log(`  resources [name, start, responseStart, responseEnd, transfer]: ${JSON.stringify(timing.res)}`);
    console.log(`  top-level slices (ms): ${[...byName].sort((a, b) => b[1] - a[1]).slice(0, 12).map(([k, v]) => `${k} ${v.toFixed(1)}`).join(', ')}`);
    console.log(`  kinds (ms, nested included): ${sums.map(([k, v]) => `${k} ${v.toFixed(1)}`).join(', ')}`);
    console.log(`  compile args: ${cacheInfo.join(' | ')}`);
    console.log(`  self time by script (cpu profile samples, ms): ${selfTimeByScript(events, busiest.pid, navStart).join(', ')}`);
    // a timeline of the long slices
    console.log(`  long slices: ${top.filter((e) => (e.dur ?? 0) > 8000).map((e) => `${e.name}@${((e.ts - navStart) / 1000).toFixed(0)}+${((e.dur ?? 0) / 1000).toFixed(0)}`).join(', ')}`);
  }
  console.log(machineNote('end'));
} finally {
  removeProfileDir(profile);
  await server.close();
}

type ProfileNode = { id: number; callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number } };
/** Self time per script URL (and for our chunks, per original source file), from the trace's CPU profile. */
function selfTimeByScript(events: TraceEvent[], pid: number, navStart: number): string[] {
  const nodes = new Map<number, ProfileNode>();
  const totals = new Map<string, number>();
  let t = 0;
  for (const e of events) {
    if (e.pid !== pid) continue;
    if (e.name === 'Profile') t = Number((e.args?.data as { startTime?: number } | undefined)?.startTime ?? 0);
    if (e.name !== 'ProfileChunk') continue;
    const data = e.args?.data as { cpuProfile?: { nodes?: ProfileNode[]; samples?: number[] }; timeDeltas?: number[] } | undefined;
    for (const n of data?.cpuProfile?.nodes ?? []) nodes.set(n.id, n);
    const samples = data?.cpuProfile?.samples ?? [];
    const deltas = data?.timeDeltas ?? [];
    for (let i = 0; i < samples.length; i++) {
      const d = deltas[i] ?? 0;
      t += d;
      if (t < navStart) continue;
      const node = nodes.get(samples[i] ?? -1);
      if (!node) continue;
      const f = node.callFrame;
      const key = f.url ? originalSource(f.url, f.lineNumber, f.columnNumber) : `(${f.functionName || 'anonymous'})`;
      totals.set(key, (totals.get(key) ?? 0) + (deltas[i + 1] ?? d) / 1000);
    }
  }
  return [...totals].sort((a, b) => b[1] - a[1]).slice(0, 25).map(([k, v]) => `${k} ${v.toFixed(0)}`);
}

/** A built chunk's position as its original file (a package name for node_modules), via the sourcemap. */
function originalSource(url: string, line: number, column: number): string {
  const name = url.replace(/.*\//, '');
  if (!url.includes('/assets/')) return name;
  let map = maps.get(name);
  if (map === undefined) {
    const file = `${dist}/assets/${name}.map`;
    map = existsSync(file) ? new TraceMap(readFileSync(file, 'utf8')) : null;
    maps.set(name, map);
  }
  if (map === null) return name;
  const source = originalPositionFor(map, { line: line + 1, column: Math.max(0, column) }).source ?? name;
  const nm = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(source);
  return nm?.[1] ?? source.replace(/.*\/src\//, 'src/');
}
