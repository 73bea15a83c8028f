/**
 * Does a committed IndexedDB write survive Chromium being killed? A small page writes records in a
 * loop, each in its own strict-durability transaction; Chromium's process group is SIGKILLed at a
 * random moment 100-500 ms in, relaunched on the same profile, and the records still there are
 * counted against those whose transaction had completed before the kill. Run once per engine:
 * Chromium's default LevelDB engine and its SQLite engine (feature IdbSqliteBackingStore), which
 * npm start gives every new profile (scripts/lib/store-engine.mjs).
 *
 * A "whole-store loss" is a relaunch that finds fewer records than were confirmed; Chromium's log
 * then says "Corruption: checksum mismatch" and "IndexedDB recovering from a corrupted (and
 * deleted) database". HEED_BENCH_KILL_CYCLES sets the kills per engine (default 100; each is about
 * 1.5 s), HEED_BENCH_KILL_ENGINES the engines (default leveldb,sqlite). The page is not Heed: this
 * measures the browser's store, which Heed cannot repair; the crash-run e2e test measures Heed
 * itself on the SQLite engine.
 */
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { StoreEngine } from '../scripts/lib/store-engine.mjs';
import { newProfileDir, removeProfileDir, startChromium } from '../test/e2e/support/chromium';
import { machineNote, plain, printResult, type Figure } from './support/figures';

const CYCLES = Number(process.env.HEED_BENCH_KILL_CYCLES ?? 100);
const ENGINES = (process.env.HEED_BENCH_KILL_ENGINES ?? 'leveldb,sqlite').split(',') as StoreEngine[];

const PAGE = `<!doctype html><title>store kill</title><script>
const openDb = () => new Promise((resolve, reject) => {
  const request = indexedDB.open('kill', 1);
  request.onupgradeneeded = () => request.result.createObjectStore('answers', { keyPath: 'k' });
  request.onsuccess = () => resolve(request.result);
  request.onerror = () => reject(request.error);
});
window.count = async () => {
  const db = await openDb();
  return new Promise((resolve) => { const q = db.transaction('answers').objectStore('answers').count(); q.onsuccess = () => { db.close(); resolve(q.result); }; });
};
window.confirmed = 0;
// records of about an answer and its event (~500 bytes), one strict transaction each
window.writeFrom = async (start) => {
  const db = await openDb();
  for (let i = start; ; i++) {
    await new Promise((resolve, reject) => {
      const t = db.transaction('answers', 'readwrite', { durability: 'strict' });
      t.objectStore('answers').put({ k: i, v: 'x'.repeat(500) });
      t.oncomplete = resolve; t.onerror = () => reject(t.error);
    });
    window.confirmed = i + 1;
  }
};
</script>`;

type Outcome = { cycles: number; wholeStoreLosses: number; writesLost: number };

const runEngine = async (url: string, engine: StoreEngine): Promise<Outcome> => {
  const profile = newProfileDir();
  let confirmed = 0;
  const outcome: Outcome = { cycles: CYCLES, wholeStoreLosses: 0, writesLost: 0 };
  try {
    for (let cycle = 0; cycle < CYCLES; cycle++) {
      const chrome = await startChromium(profile, url, engine);
      const found = await chrome.page.evaluate(() => (window as unknown as { count: () => Promise<number> }).count());
      if (found < confirmed) {
        outcome.wholeStoreLosses += found === 0 ? 1 : 0;
        outcome.writesLost += confirmed - found;
        console.log(`${engine}: relaunch ${cycle} found ${found} of ${confirmed} confirmed records`);
      }
      confirmed = found;
      void chrome.page.evaluate((start) => { void (window as unknown as { writeFrom: (s: number) => Promise<void> }).writeFrom(start); }, found).catch(() => undefined);
      await new Promise((resolve) => { setTimeout(resolve, 100 + Math.random() * 400); });
      confirmed = await chrome.page.evaluate(() => (window as unknown as { confirmed: number }).confirmed).then((n) => Math.max(n, confirmed), () => confirmed);
      await chrome.kill();
    }
  } finally {
    removeProfileDir(profile);
  }
  return outcome;
};

const server = createServer((_request, response) => { response.writeHead(200, { 'content-type': 'text/html' }); response.end(PAGE); });
await new Promise<void>((resolve) => { server.listen(0, '127.0.0.1', resolve); });
const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/`;
const figures: Figure[] = [];
for (const engine of ENGINES) {
  const o = await runEngine(url, engine);
  figures.push(plain(`${engine}: kills`, o.cycles, 'kills'), plain(`${engine}: relaunches that found the whole store deleted`, o.wholeStoreLosses, 'relaunches'), plain(`${engine}: confirmed records lost`, o.writesLost, 'records'));
}
server.close();
printResult({
  bench: 'store-kill',
  figures,
  notes: [machineNote('during the run'), 'Chromium: /usr/bin/chromium (Debian); a loss on the LevelDB engine deletes every origin record, Chromium logs it as a corrupted and deleted database'],
});
process.exit(0);
