/**
 * Where an answer's commit spends its time (diagnostic for reading-latency.ts, HEED_BENCH_PHASES=1):
 * IndexedDB's own prototypes are wrapped in the page to stamp, in page time, each read-write
 * transaction over `reads` (its first request, its first write request, `complete`). Paired with the
 * Enter before it and the app's `saved` and `case-painted` signals, one read splits into:
 *   Enter -> first request           (key handling, the app's code before the store is asked)
 *   first request -> first write     (the reads of the step check, one round trip, and the hash)
 *   first write -> complete          (the writes and the strict flush)
 *   complete -> saved                (Dexie resolving, the app's code after the commit)
 *   saved -> painted                 (render, draw, and the wait for the next animation frame)
 */
import type { Page } from 'playwright-core';
import { z } from 'zod';
import { spread, type Spread } from './figures';

const KEY = '__heedCommitPhases';

// A string, so no transpiler helper leaks into the page.
const INSTALL = `(() => {
  const key = ${JSON.stringify(KEY)};
  const txs = [];
  Reflect.set(window, key, txs);
  const open = new WeakMap();
  // Dexie binds IDBDatabase.transaction when it opens, so transactions are seen at their first request
  const entryOf = (t) => {
    let entry = open.get(t);
    if (!entry && t.mode === 'readwrite' && t.objectStoreNames.contains('reads')) {
      entry = { created: performance.now(), firstWrite: null, complete: null };
      txs.push(entry);
      open.set(t, entry);
      t.addEventListener('complete', () => { entry.complete = performance.now(); });
    }
    return entry;
  };
  for (const [proto, names] of [[IDBObjectStore.prototype, ['get', 'put', 'add', 'openCursor']], [IDBIndex.prototype, ['get', 'openCursor']]]) {
    for (const name of names) {
      const native = proto[name];
      proto[name] = function (...args) {
        const entry = entryOf(this.transaction || this.objectStore.transaction);
        if (entry && entry.firstWrite === null && (name === 'put' || name === 'add')) entry.firstWrite = performance.now();
        return native.apply(this, args);
      };
    }
  }
})()`;

const txSchema = z.array(z.object({ created: z.number(), firstWrite: z.number().nullable(), complete: z.number().nullable() }));

export type CommitPhases = { toTransaction: Spread; reads: Spread; writeAndFlush: Spread; completeToSaved: Spread; savedToPainted: Spread };

export const installCommitPhases = async (page: Page): Promise<void> => { await page.evaluate(INSTALL); };

export const resetCommitPhases = async (page: Page): Promise<void> => {
  await page.evaluate((key) => { const txs: unknown = Reflect.get(window, key); if (Array.isArray(txs)) txs.length = 0; }, KEY);
};

/** Splits each read (Enter, saved, painted from the latency probe) by the transaction that followed its Enter. */
export const commitPhases = async (page: Page, reads: { enter: number; saved: number; painted: number }[]): Promise<CommitPhases> => {
  const txs = txSchema.parse(await page.evaluate((key) => Reflect.get(window, key), KEY));
  const rows = reads.flatMap((r) => {
    const t = txs.find((x) => x.created > r.enter && x.created < r.saved);
    return t && t.firstWrite !== null && t.complete !== null ? [{ r, t: { created: t.created, firstWrite: t.firstWrite, complete: t.complete } }] : [];
  });
  if (rows.length === 0) throw new Error(`no commit transaction was seen between an Enter and its saved signal (${txs.length} read-write transactions seen: ${JSON.stringify(txs.slice(0, 3))}; first read ${JSON.stringify(reads[0])})`);
  return {
    toTransaction: spread(rows.map(({ r, t }) => t.created - r.enter)),
    reads: spread(rows.map(({ t }) => t.firstWrite - t.created)),
    writeAndFlush: spread(rows.map(({ t }) => t.complete - t.firstWrite)),
    completeToSaved: spread(rows.map(({ r, t }) => r.saved - t.complete)),
    savedToPainted: spread(rows.map(({ r }) => r.painted - r.saved)),
  };
};
