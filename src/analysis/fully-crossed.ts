import type { Bit, ReadRow } from '../core/read-log';
import { finalScore, isAided } from './read-scores';

export type CrossedInput = { scores: number[][][]; truth: Bit[]; readers: string[]; cases: string[] };

export type Crossing = { input: CrossedInput; reason: null } | { input: null; reason: string };

/**
 * Whether one finding's non-practice reads form a fully crossed design, and if so the
 * Obuchowski-Rockette input: scores[modality][reader][case] of the derived score (modality 0
 * unaided, 1 aided), truth per case. Fully crossed means every case is read by every reader
 * exactly once unaided and exactly once aided, with at least 2 readers and 2 cases of each truth.
 * Readers and cases keep first-seen order. Otherwise input is null and reason says why.
 * Example: fullyCrossed(reads).reason → 'reader R2 has no aided read of case C7'.
 */
export const fullyCrossed = (reads: readonly ReadRow[]): Crossing => {
  const readerIdx = new Map<string, number>();
  const caseIdx = new Map<string, number>();
  const truthOf = new Map<string, Bit>();
  for (const r of reads) {
    if (!readerIdx.has(r.reader_id)) readerIdx.set(r.reader_id, readerIdx.size);
    if (!caseIdx.has(r.case_id)) caseIdx.set(r.case_id, caseIdx.size);
    const t = truthOf.get(r.case_id);
    if (t === undefined) truthOf.set(r.case_id, r.truth);
    else if (t !== r.truth) return { input: null, reason: `case ${r.case_id} has different truth on different reads` };
  }
  const R = readerIdx.size;
  const C = caseIdx.size;
  if (R < 2) return { input: null, reason: `needs at least 2 readers, has ${R}` };
  const truth = [...truthOf.values()];
  const positives = truth.filter((t) => t === 1).length;
  if (positives < 2 || C - positives < 2) return { input: null, reason: `needs at least 2 cases of each truth, has ${positives} positive and ${C - positives} negative` };
  const scores = [0, 1].map(() => Array.from({ length: R }, () => new Array<number>(C).fill(Number.NaN)));
  for (const r of reads) {
    const m = isAided(r) ? 1 : 0;
    const row = scores[m]?.[readerIdx.get(r.reader_id) ?? 0] as number[];
    const c = caseIdx.get(r.case_id) ?? 0;
    if (!Number.isNaN(row[c] as number)) {
      return { input: null, reason: `reader ${r.reader_id} read case ${r.case_id} ${m === 1 ? 'aided' : 'unaided'} more than once` };
    }
    row[c] = finalScore(r);
  }
  const readers = [...readerIdx.keys()];
  const cases = [...caseIdx.keys()];
  for (let m = 0; m < 2; m++) {
    for (let i = 0; i < R; i++) {
      const c = scores[m]?.[i]?.findIndex((v) => Number.isNaN(v)) ?? -1;
      if (c !== -1) return { input: null, reason: `reader ${readers[i]} has no ${m === 1 ? 'aided' : 'unaided'} read of case ${cases[c]}` };
    }
  }
  return { input: { scores, truth, readers, cases }, reason: null };
};
