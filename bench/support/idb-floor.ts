/**
 * The disk's floor under the reading view's commit: bare IndexedDB transactions with the same
 * durability as the app (`durability: 'strict'`), in the same Chromium and origin, writing records
 * of the same size as one committed answer. It uses the last answer the app stored (the read and
 * its answer event, copied from the app's own database) so the bytes match, and a database of its
 * own ('heed-floor-bench', deleted afterwards), so nothing of the app's is touched.
 *
 * Per transaction, in page time: from creating the transaction to its `complete` event (the data
 * flushed), and from creating it to the first animation frame after `complete` (the earliest a
 * next case could be painted if rendering cost nothing). Three shapes:
 *   one     - one record holding the read and the event (the brief's "one record of the same size")
 *   two     - the read and the event in two stores, as the app writes them, with no reads
 *   relaxed - `two` with relaxed durability, to show what the flush itself costs
 *   checked - `two` after the app's four reads (issued at once), as the commit does, without Dexie
 * Transactions are spaced by GAP_MS (the benchmark's readers press a key every ~100 ms), so each
 * flush is on its own, as in reading.
 */
import type { Page } from 'playwright-core';
import { z } from 'zod';
import { spread, type Spread } from './figures';

const sampleSchema = z.object({ commitMs: z.number(), frameMs: z.number() });
const floorSchema = z.object({
  bytes: z.number(),
  one: z.array(sampleSchema),
  two: z.array(sampleSchema),
  relaxed: z.array(sampleSchema),
  checked: z.array(sampleSchema),
});

export type FloorShape = { commit: Spread; frame: Spread };
export type IdbFloor = { bytes: number; one: FloorShape; two: FloorShape; relaxed: FloorShape; checked: FloorShape };

const GAP_MS = 60;

// A string evaluated in the page (no transpiler helper can leak into it); it resolves to the samples.
const floorScript = (count: number): string => `(async () => {
  const count = ${count};
  const gap = ${GAP_MS};
  const request = (r) => new Promise((resolve, reject) => { r.onsuccess = () => resolve(r.result); r.onerror = () => reject(r.error); });
  const open = (name, upgrade) => { const r = upgrade ? indexedDB.open(name, 1) : indexedDB.open(name); if (upgrade) r.onupgradeneeded = () => upgrade(r.result); return request(r); };
  const app = await open('heed', null);
  const tx = app.transaction(['reads', 'events'], 'readonly');
  const lastEvent = await new Promise((resolve, reject) => {
    const c = tx.objectStore('events').openCursor(null, 'prev');
    c.onsuccess = () => resolve(c.result ? c.result.value : null);
    c.onerror = () => reject(c.error);
  });
  if (!lastEvent || !lastEvent.detail || !lastEvent.detail.read) throw new Error('no answer event stored yet');
  const read = await request(tx.objectStore('reads').get(lastEvent.detail.read.id));
  app.close();
  const bytes = JSON.stringify(read).length + JSON.stringify(lastEvent).length;
  await request(indexedDB.deleteDatabase('heed-floor-bench'));
  const db = await open('heed-floor-bench', (d) => {
    d.createObjectStore('answers', { keyPath: 'id' });
    d.createObjectStore('reads', { keyPath: 'id' });
    d.createObjectStore('events', { keyPath: 'seq', autoIncrement: true });
  });
  const frame = () => new Promise((resolve) => requestAnimationFrame(() => resolve(performance.now())));
  const pause = () => new Promise((resolve) => setTimeout(resolve, gap));
  const run = async (shape) => {
    const samples = [];
    for (let i = 0; i < count; i++) {
      await pause();
      const t0 = performance.now();
      const stores = shape === 'one' ? ['answers'] : ['reads', 'events'];
      const t = db.transaction(stores, 'readwrite', { durability: shape === 'relaxed' ? 'relaxed' : 'strict' });
      const id = shape + '/' + i;
      if (shape === 'checked') {
        // the app's shape, bare: its four reads at once (session, this step, the step before, the
        // chain head), then the two writes
        await Promise.all([
          request(t.objectStore('reads').get(id)),
          request(t.objectStore('reads').get('two/' + i)),
          request(t.objectStore('reads').get('two/' + Math.max(0, i - 1))),
          new Promise((resolve) => { const c = t.objectStore('events').openCursor(null, 'prev'); c.onsuccess = () => resolve(c.result ? c.result.value : null); }),
        ]);
      }
      if (shape === 'one') t.objectStore('answers').put({ id, read, event: lastEvent });
      else {
        t.objectStore('reads').put({ ...read, id });
        const event = { ...lastEvent };
        delete event.seq;
        t.objectStore('events').add(event);
      }
      const committed = await new Promise((resolve, reject) => { t.oncomplete = () => resolve(performance.now()); t.onerror = () => reject(t.error); t.onabort = () => reject(t.error); });
      const painted = await frame();
      samples.push({ commitMs: committed - t0, frameMs: painted - t0 });
    }
    return samples;
  };
  const one = await run('one');
  const two = await run('two');
  const relaxed = await run('relaxed');
  const checked = await run('checked');
  db.close();
  await request(indexedDB.deleteDatabase('heed-floor-bench'));
  return { bytes, one, two, relaxed, checked };
})()`;

const shapeOf = (samples: { commitMs: number; frameMs: number }[]): FloorShape => ({
  commit: spread(samples.map((s) => s.commitMs)),
  frame: spread(samples.map((s) => s.frameMs)),
});

/** Measures the floor in the page (the app's database must hold at least one answer). */
export const measureIdbFloor = async (page: Page, count: number): Promise<IdbFloor> => {
  const raw = floorSchema.parse(await page.evaluate(floorScript(count)));
  return { bytes: raw.bytes, one: shapeOf(raw.one), two: shapeOf(raw.two), relaxed: shapeOf(raw.relaxed), checked: shapeOf(raw.checked) };
};
