/**
 * Paired cold starts of two builds (diagnostic, not part of `npm run bench`): on a shared machine
 * the load moves a lot between runs, so two builds are compared launch by launch, alternating,
 * each on its own stored profile. Run: npx tsx bench/support/ab-cold.ts DIST_A DIST_B [rounds]
 * (two folders made by `vite build --outDir ...`); HEED_AB_SERVER_A=path/to/static-server.mjs serves
 * build A with another server module. Prints the medians of each build's figures.
 */
import { median } from 'simple-statistics';
import { startStaticServer } from '../../scripts/lib/static-server.mjs';
import { removeProfileDir } from '../../test/e2e/support/chromium';
import { benchProfileDir } from './app-under-test';
import { machineNote } from './figures';
import { timedLaunch, type Launch } from './launch-probe';

const [distA, distB] = process.argv.slice(2);
const ROUNDS = Number(process.argv[4] ?? 6);
if (!distA || !distB) throw new Error('usage: ab-cold.ts DIST_A DIST_B [rounds]');

// HEED_AB_SERVER_A: another static-server module for build A (e.g. an older checkout's), so the
// server's own headers are compared too
type Serve = (options: { root: string }) => Promise<{ url: string; close: () => Promise<void> }>;
const serverModule: unknown = process.env.HEED_AB_SERVER_A ? await import(process.env.HEED_AB_SERVER_A) : null;
const serveA = serverModule !== null && typeof serverModule === 'object' && 'startStaticServer' in serverModule
  ? (serverModule.startStaticServer as Serve) : startStaticServer;
const sides = await Promise.all([distA, distB].map(async (root, i) => ({
  root, server: await (i === 0 ? serveA : startStaticServer)({ root }), profile: benchProfileDir(), runs: [] as Launch[],
})));
console.log(machineNote('start'));
try {
  // first launches: the demo set is generated on each profile
  for (const side of sides) { const first = await timedLaunch(side.profile, side.server.url); await first.chrome.stop(); }
  for (let round = 0; round < ROUNDS; round++) {
    for (const side of round % 2 === 0 ? sides : [...sides].reverse()) {
      const launch = await timedLaunch(side.profile, side.server.url);
      await launch.chrome.stop();
      side.runs.push(launch);
    }
  }
  for (const side of sides) {
    const med = (pick: (l: Launch) => number | null) => Math.round(median(side.runs.map((l) => pick(l) ?? Number.NaN)));
    console.log(`${side.root}: wall ${med((l) => l.wallMs)} | browser start ${med((l) => l.browserStartMs)} | scripts loaded ${med((l) => l.breakdown.scriptsLoadedMs)} (${med((l) => l.breakdown.scriptBytesFromNetwork)} B from network) | entry run ${med((l) => l.breakdown.domContentLoadedMs)} | db open called ${med((l) => l.breakdown.dbOpenCalledMs)} | db opened ${med((l) => l.breakdown.dbOpenedMs)} | mounted ${med((l) => l.mountedMs)} | ready ${med((l) => l.readyMs)} (page ms, medians of ${side.runs.length})`);
  }
  // launch by launch: each round's two launches ran back to back, so their difference is the least noisy figure
  const [a, b] = sides;
  if (a && b) {
    const diff = (pick: (l: Launch) => number | null) => Math.round(median(a.runs.map((l, i) => (pick(l) ?? Number.NaN) - (pick(b.runs[i] ?? l) ?? Number.NaN))));
    console.log(`paired (${a.root} minus ${b.root}), median of ${ROUNDS} rounds: wall ${diff((l) => l.wallMs)} | db opened ${diff((l) => l.breakdown.dbOpenedMs)} | mounted ${diff((l) => l.mountedMs)} | ready ${diff((l) => l.readyMs)} ms`);
  }
  console.log(machineNote('end'));
} finally {
  for (const side of sides) { await side.server.close(); removeProfileDir(side.profile); }
}
