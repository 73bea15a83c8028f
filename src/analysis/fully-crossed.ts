import type { Bit, ReadRow } from '../core/read-log';
import { allRows, firstAppearance, readColumns, type ReadColumns } from './read-columns';

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
  const cols = readColumns(reads);
  return fullyCrossedOf(cols, allRows(cols));
};

/** fullyCrossed of reads given as row numbers into columns (the engine's path; same result). */
export const fullyCrossedOf = (cols: ReadColumns, rows: Int32Array): Crossing => {
  const readerOf = firstAppearance(cols.reader, rows, cols.readerIds.length);
  const caseOf = firstAppearance(cols.case, rows, cols.caseCount);
  const R = readerOf.count;
  const C = caseOf.count;
  const truth = new Array<Bit>(C);
  const truthSet = new Uint8Array(C);
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const c = caseOf.number[k] as number;
    const t = cols.truth[r] as Bit;
    if (truthSet[c] === 0) {
      truthSet[c] = 1;
      truth[c] = t;
    } else if (truth[c] !== t) return { input: null, reason: `case ${cols.caseIds[cols.case[r] as number]} has different truth on different reads` };
  }
  if (R < 2) return { input: null, reason: `needs at least 2 readers, has ${R}` };
  const positives = truth.filter((t) => t === 1).length;
  if (positives < 2 || C - positives < 2) return { input: null, reason: `needs at least 2 cases of each truth, has ${positives} positive and ${C - positives} negative` };
  const scores = [0, 1].map(() => Array.from({ length: R }, () => new Array<number>(C).fill(Number.NaN)));
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const m = cols.aided[r] as number;
    const row = scores[m]?.[readerOf.number[k] as number] as number[];
    const c = caseOf.number[k] as number;
    if (!Number.isNaN(row[c] as number)) {
      return { input: null, reason: `reader ${cols.readerIds[cols.reader[r] as number]} read case ${cols.caseIds[cols.case[r] as number]} ${m === 1 ? 'aided' : 'unaided'} more than once` };
    }
    row[c] = cols.score[r] as number;
  }
  const readers = Array.from(readerOf.first, (i) => cols.readerIds[i] as string);
  const cases = Array.from(caseOf.first, (i) => cols.caseIds[i] as string);
  for (let m = 0; m < 2; m++) {
    for (let i = 0; i < R; i++) {
      const c = scores[m]?.[i]?.findIndex((v) => Number.isNaN(v)) ?? -1;
      if (c !== -1) return { input: null, reason: `reader ${readers[i]} has no ${m === 1 ? 'aided' : 'unaided'} read of case ${cases[c]}` };
    }
  }
  return { input: { scores, truth, readers, cases }, reason: null };
};
