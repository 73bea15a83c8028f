import type { ReadRow } from '../core/read-log';
import { fleissKappa } from './fleiss-kappa';

export type ReadersAgreement = { kappa: number | null; readers: number; cases: number };

/**
 * Fleiss' (1971) kappa of final calls across readers for one finding and condition: each case
 * is a subject, each reader a rater (their first read of the case counts). Only cases read by
 * every reader of the condition enter, as the statistic needs equal raters per subject.
 * kappa is null with fewer than 2 readers or no such case.
 * Example: readersAgreement(unaidedReads).kappa.
 */
export const readersAgreement = (reads: readonly ReadRow[]): ReadersAgreement => {
  const readers = new Set<string>();
  const byCase = new Map<string, Map<string, 0 | 1>>();
  for (const r of reads) {
    readers.add(r.reader_id);
    let calls = byCase.get(r.case_id);
    if (calls === undefined) {
      calls = new Map();
      byCase.set(r.case_id, calls);
    }
    if (!calls.has(r.reader_id)) calls.set(r.reader_id, r.final_call);
  }
  const counts: number[][] = [];
  for (const calls of byCase.values()) {
    if (calls.size !== readers.size) continue;
    let ones = 0;
    for (const c of calls.values()) ones += c;
    counts.push([calls.size - ones, ones]);
  }
  if (readers.size < 2 || counts.length === 0) return { kappa: null, readers: readers.size, cases: counts.length };
  return { kappa: fleissKappa(counts), readers: readers.size, cases: counts.length };
};
