import type { ReadRow } from '../core/read-log';
import { fleissKappa } from './fleiss-kappa';
import { allRows, firstAppearance, readColumns, type ReadColumns } from './read-columns';

export type ReadersAgreement = { kappa: number | null; readers: number; cases: number };

/**
 * Fleiss' (1971) kappa of final calls across readers for one finding and condition: each case
 * is a subject, each reader a rater (their first read of the case counts). Only cases read by
 * every reader of the condition enter, as the statistic needs equal raters per subject.
 * kappa is null with fewer than 2 readers or no such case.
 * Example: readersAgreement(unaidedReads).kappa.
 */
export const readersAgreement = (reads: readonly ReadRow[]): ReadersAgreement => {
  const cols = readColumns(reads);
  return readersAgreementOf(cols, allRows(cols));
};

/** readersAgreement of reads given as row numbers into columns (the engine's path; same numbers). */
export const readersAgreementOf = (cols: ReadColumns, rows: Int32Array): ReadersAgreement => {
  // readers and cases numbered in order of first appearance, then one flat table of who read what
  const n = rows.length;
  const readerOf = firstAppearance(cols.reader, rows, cols.readerIds.length);
  const caseOf = firstAppearance(cols.case, rows, cols.caseCount);
  const R = readerOf.count;
  const C = caseOf.count;
  // a flat table while it stays small; a sparse set for odd logs of very many readers and cases
  const flat = R * C <= 1 << 24 ? new Uint8Array(R * C) : null;
  const sparse = flat === null ? new Set<number>() : null;
  const raters = new Int32Array(C);
  const ones = new Int32Array(C);
  for (let k = 0; k < n; k++) {
    const c = caseOf.number[k] as number;
    const cell = c * R + (readerOf.number[k] as number);
    if (flat !== null) {
      if (flat[cell] === 1) continue;
      flat[cell] = 1;
    } else if (sparse !== null) {
      if (sparse.has(cell)) continue;
      sparse.add(cell);
    }
    raters[c] = (raters[c] as number) + 1;
    ones[c] = (ones[c] as number) + (cols.finalCall[rows[k] as number] as number);
  }
  const counts: number[][] = [];
  for (let c = 0; c < C; c++) if (raters[c] === R) counts.push([R - (ones[c] as number), ones[c] as number]);
  if (R < 2 || counts.length === 0) return { kappa: null, readers: R, cases: counts.length };
  return { kappa: fleissKappa(counts), readers: R, cases: counts.length };
};
