/**
 * In-page recorder for the reading benchmark. Everything is stamped in page time
 * (performance.now): the Enter keydown (a capturing listener, so it runs before the app's
 * own handler), the app's `heed:saved` and `heed:case-painted` signals (their detail.at), and
 * the frame after each paint (one more requestAnimationFrame from inside the paint signal,
 * which itself fires in the frame after the pixels were drawn).
 */
import type { Page } from 'playwright-core';
import { z } from 'zod';

const KEY = '__heedLatencyProbe';

// A string, so no transpiler helper leaks into the page.
const INSTALL = `(() => {
  const r = { enters: [], saved: [], painted: [], frameAfter: [] };
  window.addEventListener('keydown', (e) => { if (e.key === 'Enter') r.enters.push(performance.now()); }, { capture: true });
  window.addEventListener('heed:saved', (e) => { r.saved.push(e.detail.at); });
  window.addEventListener('heed:case-painted', (e) => {
    const index = r.painted.length;
    r.painted.push({ at: e.detail.at, caseId: String(e.detail.caseId) });
    requestAnimationFrame(() => { r.frameAfter.push({ index, at: performance.now() }); });
  });
  Reflect.set(window, ${JSON.stringify(KEY)}, r);
})()`;

const recordSchema = z.object({
  enters: z.array(z.number()),
  saved: z.array(z.number()),
  painted: z.array(z.object({ at: z.number(), caseId: z.string() })),
  frameAfter: z.array(z.object({ index: z.number().int(), at: z.number() })),
});

export type LatencyRecord = z.infer<typeof recordSchema>;

/** One committed read: Enter to saved, Enter to the next case painted, Enter to the frame after. */
export type ReadTiming = { commitMs: number; paintedMs: number; frameAfterMs: number; nextCase: string };

export const installLatencyProbe = async (page: Page): Promise<void> => { await page.evaluate(INSTALL); };

/** Waits until the frame after every paint so far has run, then reads the record. */
export const collectLatencyRecord = async (page: Page): Promise<LatencyRecord> => {
  await page.waitForFunction(`(() => { const r = window[${JSON.stringify(KEY)}]; return r.frameAfter.length === r.painted.length; })()`);
  return recordSchema.parse(await page.evaluate((key) => Reflect.get(window, key), KEY));
};

/**
 * Pairs each Enter with the first `saved` and the first paint after it. Throws when a signal
 * is missing or arrives after the next Enter: the measurement would then be meaningless.
 */
export const pairTimings = (r: LatencyRecord): ReadTiming[] =>
  r.enters.map((enter, i) => {
    const nextEnter = r.enters[i + 1] ?? Infinity;
    const saved = r.saved.find((at) => at > enter);
    const paintIndex = r.painted.findIndex((p) => p.at > enter);
    const painted = r.painted[paintIndex];
    const frame = r.frameAfter.find((f) => f.index === paintIndex);
    if (saved === undefined || saved > nextEnter) throw new Error(`read ${i + 1}: no "saved" signal between this Enter and the next`);
    if (!painted || painted.at > nextEnter) throw new Error(`read ${i + 1}: no "case-painted" signal between this Enter and the next`);
    if (!frame) throw new Error(`read ${i + 1}: the frame after the paint was never recorded`);
    return { commitMs: saved - enter, paintedMs: painted.at - enter, frameAfterMs: frame.at - enter, nextCase: painted.caseId };
  });
