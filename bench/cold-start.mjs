#!/usr/bin/env node
// Cold start of `npm start` in Chromium mode: wall time from spawning the launcher to the page's
// first contentful paint, read over the DevTools protocol (HEED_DEBUG_PORT). Runs with a fresh
// profile each time (first launch) and with one reused profile (later launches). Needs a display;
// without one it starts its own Xvfb when available. Usage: node bench/cold-start.mjs [runs]
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const runs = Number(process.argv[2] ?? 5);
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

const freePort = () => new Promise((resolve, reject) => {
  const s = createServer();
  s.once('error', reject);
  s.listen(0, '127.0.0.1', () => {
    const { port } = s.address();
    s.close(() => resolve(port));
  });
});

/** Waits until Chromium lists the app's page; connecting before that can leave Playwright waiting forever. */
const waitForPage = async (port, httpPort, deadline) => {
  while (Date.now() < deadline) {
    try {
      const res = await fetch(`http://127.0.0.1:${port}/json/list`);
      const targets = res.ok ? await res.json() : [];
      if (targets.some((t) => t.type === 'page' && t.url.includes(`127.0.0.1:${httpPort}`))) return;
    } catch {
      // not up yet
    }
    await sleep(25);
  }
  throw new Error('Chromium did not show the app page in time');
};

const once = async (configHome, display) => {
  const debugPort = await freePort();
  const httpPort = await freePort();
  const started = Date.now();
  const child = spawn(process.execPath, [path.join(root, 'scripts', 'start.mjs')], {
    env: { ...process.env, DISPLAY: display, HEED_MODE: 'chromium', HEED_DEBUG_PORT: String(debugPort), HEED_PORT: String(httpPort), XDG_CONFIG_HOME: configHome },
    stdio: ['ignore', 'pipe', 'ignore'],
  });
  let said = '';
  child.stdout.setEncoding('utf8');
  child.stdout.on('data', (t) => { said += t; });
  const exited = new Promise((r) => child.once('exit', r));
  try {
    await waitForPage(debugPort, httpPort, started + 30_000);
    // The paint entry stays in the page's timeline, so connecting late does not skew the figure;
    // on a first launch the demo-set worker can keep the connection waiting for a while.
    const browser = await chromium.connectOverCDP(`http://127.0.0.1:${debugPort}`, { timeout: 120_000 });
    const context = browser.contexts()[0];
    const page = context.pages().find((p) => p.url().includes(`:${httpPort}`)) ?? await context.waitForEvent('page');
    await page.waitForFunction(() => performance.getEntriesByName('first-contentful-paint').length > 0, null, { timeout: 30_000 });
    const paintedAt = await page.evaluate(() => performance.timeOrigin + performance.getEntriesByName('first-contentful-paint')[0].startTime);
    await browser.close();
    return { ms: paintedAt - started, rebuilt: said.includes('building') };
  } finally {
    child.kill('SIGTERM');
    await exited;
  }
};

const summary = (label, values) => {
  const sorted = [...values].sort((a, b) => a - b);
  const median = sorted[Math.floor(sorted.length / 2)];
  console.log(`${label}: median ${median.toFixed(0)} ms, min ${sorted[0].toFixed(0)} ms, max ${sorted.at(-1).toFixed(0)} ms (${values.length} runs)`);
};

let xvfb = null;
let display = process.env.DISPLAY;
if (!display) {
  if (!existsSync('/usr/bin/Xvfb')) {
    console.error('bench: no DISPLAY and no Xvfb; cannot measure a window');
    process.exit(2);
  }
  display = ':97';
  xvfb = spawn('/usr/bin/Xvfb', [display, '-screen', '0', '1400x900x24'], { stdio: 'ignore' });
  await sleep(500);
}

// Build once first, so the figures are start-up only.
await new Promise((resolve) => spawn(process.execPath, [path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build'], { cwd: root, stdio: 'ignore' }).on('exit', resolve));

const fresh = [];
const warm = [];
let rebuilt = 0;
// Someone editing src/ meanwhile makes the launcher rebuild; such runs are measured again.
const measure = async (home) => {
  for (let attempt = 0; attempt < 3; attempt += 1) {
    const run = await once(home, display);
    if (!run.rebuilt) return run.ms;
    rebuilt += 1;
  }
  throw new Error('the renderer kept being rebuilt; stop editing src/ while benchmarking');
};
const warmHome = mkdtempSync(path.join(tmpdir(), 'heed-bench-warm-'));
try {
  for (let i = 0; i < runs; i += 1) {
    const home = mkdtempSync(path.join(tmpdir(), 'heed-bench-fresh-'));
    try {
      fresh.push(await measure(home));
    } finally {
      rmSync(home, { recursive: true, force: true });
    }
  }
  await measure(warmHome); // the first launch on this profile creates it
  for (let i = 0; i < runs; i += 1) warm.push(await measure(warmHome));
} finally {
  rmSync(warmHome, { recursive: true, force: true });
  xvfb?.kill('SIGTERM');
}
console.log(`launch to first contentful paint, Chromium mode, ${process.platform}, Node ${process.version}`);
summary('fresh profile', fresh);
summary('reused profile', warm);
if (rebuilt > 0) console.log(`(${rebuilt} runs that rebuilt the renderer were measured again)`);
