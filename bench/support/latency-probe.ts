/**
 * In-page recorder for the reading benchmark. Everything is stamped in page time
 * (performance.now): the Enter keydown that commits an answer (a capturing listener, so it runs
 * before the app's own handler; an Enter that continues from a cover such as a break is not one), the app's `heed:saved` and `heed:case-painted` signals (their detail.at), and
 * the frame after each paint (one more requestAnimationFrame from inside the paint signal,
 * which itself fires in the frame after the pixels were drawn).
 */
import type { Page } from 'playwright-core';
import { z } from 'zod';

const KEY = '__heedLatencyProbe';

// A string, so no transpiler helper leaks into the page.
const INSTALL = `(() => {
  const key = ${JSON.stringify(KEY)};
  Reflect.set(window, key, { enters: [], saved: [], painted: [], frameAfter: [] });
  const r = () => Reflect.get(window, key);
  window.addEventListener('keydown', (e) => { if (e.key === 'Enter' && document.querySelector('[role=dialog]') === null) r().enters.push(performance.now()); }, { capture: true });
  window.addEventListener('heed:saved', (e) => { r().saved.push(e.detail.at); });
  window.addEventListener('heed:case-painted', (e) => {
    const record = r();
    const index = record.painted.length;
    record.painted.push({ at: e.detail.at, caseId: String(e.detail.caseId) });
    requestAnimationFrame(() => { record.frameAfter.push({ index, at: performance.now() }); });
  });
})()`;

const recordSchema = z.object({
  enters: z.array(z.number()),
  saved: z.array(z.number()),
  painted: z.array(z.object({ at: z.number(), caseId: z.string() })),
  frameAfter: z.array(z.object({ index: z.number().int(), at: z.number() })),
});

export type LatencyRecord = z.infer<typeof recordSchema>;

/** One committed read: Enter to saved, Enter to the next case painted, Enter to the frame after. */
export type ReadTiming = { commitMs: number; paintedMs: number; frameAfterMs: number; nextCase: string; enterAt: number };

export const installLatencyProbe = async (page: Page): Promise<void> => { await page.evaluate(INSTALL); };

/** Starts a new record (the listeners stay): what comes next is measured on its own. */
export const resetLatencyRecord = async (page: Page): Promise<void> => {
  await collectLatencyRecord(page);
  await page.evaluate((key) => { Reflect.set(window, key, { enters: [], saved: [], painted: [], frameAfter: [] }); }, KEY);
};

/** Waits until the frame after every paint so far has run, then reads the record. */
export const collectLatencyRecord = async (page: Page): Promise<LatencyRecord> => {
  // a function, not a string: the app's Content Security Policy forbids evaluating strings
  await page.waitForFunction((key) => {
    const r: unknown = Reflect.get(window, key);
    if (typeof r !== 'object' || r === null) return false;
    const frames: unknown = Reflect.get(r, 'frameAfter');
    const painted: unknown = Reflect.get(r, 'painted');
    return Array.isArray(frames) && Array.isArray(painted) && frames.length === painted.length;
  }, KEY);
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
    return { commitMs: saved - enter, paintedMs: painted.at - enter, frameAfterMs: frame.at - enter, nextCase: painted.caseId, enterAt: enter };
  });
