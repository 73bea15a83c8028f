import type { ReadRow } from '../../core/read-log';

/**
 * Whether a read log shows all of one reader's periods complete, for reports made from a log
 * alone (the app knows from its sessions). A log does not say how many cases a period holds, so
 * the rule is: the reader has reads in every period from 1 to the highest period any reader of
 * the log reached, and in each period as many reads as the most any reader has there. A reader
 * still reading, or a log cut short, is taken as not complete, which keeps the case review out.
 * Example: R1 with 40 reads in periods 1 and 2 while R2 has 40 and 40 → true.
 */
export const readerComplete = (rows: readonly ReadRow[], readerId: string): boolean => {
  const most = new Map<number, number>();
  const perReader = new Map<string, Map<number, number>>();
  for (const r of rows) {
    let m = perReader.get(r.reader_id);
    if (m === undefined) {
      m = new Map();
      perReader.set(r.reader_id, m);
    }
    m.set(r.period, (m.get(r.period) ?? 0) + 1);
  }
  for (const m of perReader.values()) for (const [p, n] of m) most.set(p, Math.max(most.get(p) ?? 0, n));
  const mine = perReader.get(readerId);
  if (mine === undefined) return false;
  let last = 0;
  for (const p of most.keys()) last = Math.max(last, p);
  for (let p = 1; p <= last; p++) if ((mine.get(p) ?? 0) < (most.get(p) ?? 0) || !mine.has(p)) return false;
  return true;
};
