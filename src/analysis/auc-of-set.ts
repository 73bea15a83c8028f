import type { ReadColumns } from './read-columns';
import type { ReadSet } from './read-set';
import { MIDRANKS_FROM, sampleCovariance, summarizeAuc, type AucSummary } from './delong';

/**
 * aucSummary (Mann-Whitney AUC, DeLong SE) of a set of reads given as row numbers, from the
 * set's rows already sorted by score: one sweep over runs of tied scores gives each read's
 * placement value (DeLong et al. 1988; the midrank form of Sun & Xu 2014), with no sort.
 * Each placement is computed by the same arithmetic as `placements` in delong.ts (by counts
 * below MIDRANKS_FROM scores, by midranks from there), and the sums run over the reads in
 * `rows` order, so the result equals aucSummary of the same scores to the last bit.
 * Example: aucOfSet(cols, set).estimate.
 */
export const aucOfSet = (cols: ReadColumns, set: ReadSet): AucSummary => {
  const { score, truth, runScratch: runAt } = cols;
  const { rows, byScore } = set;
  let m = 0;
  for (let k = 0; k < rows.length; k++) m += truth[rows[k] as number] as number;
  const n = rows.length - m;
  if (m === 0 || n === 0) return { estimate: null, se: null, lower: null, upper: null };
  const byMidranks = m + n >= MIDRANKS_FROM;
  // each tie run's placement for its positives and its negatives, then each read's by its run
  const posPlace = new Float64Array(rows.length);
  const negPlace = new Float64Array(rows.length);
  let i0 = 0;
  let j0 = 0;
  let runs = 0;
  for (let k = 0; k < byScore.length;) {
    const v = score[byScore[k] as number] as number;
    let e = k;
    let i = i0;
    let j = j0;
    while (e < byScore.length && score[byScore[e] as number] === v) {
      if (truth[byScore[e] as number] === 1) i++;
      else j++;
      runAt[byScore[e] as number] = runs;
      e++;
    }
    if (byMidranks) {
      const tz = (i0 + j0 + 1 + i + j) / 2;
      posPlace[runs] = (tz - (i0 + 1 + i) / 2) / n;
      negPlace[runs] = 1 - (tz - (j0 + 1 + j) / 2) / m;
    } else {
      posPlace[runs] = (j0 + (j - j0) / 2) / n;
      negPlace[runs] = (m - i + (i - i0) / 2) / m;
    }
    runs++;
    i0 = i;
    j0 = j;
    k = e;
  }
  const v10 = new Float64Array(m);
  const v01 = new Float64Array(n);
  let ip = 0;
  let ineg = 0;
  let sum = 0;
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const run = runAt[r] as number;
    if (truth[r] === 1) {
      const p = posPlace[run] as number;
      v10[ip++] = p;
      sum += p;
    } else v01[ineg++] = negPlace[run] as number;
  }
  const auc = sum / m;
  const s10 = sampleCovariance(v10, v10);
  const s01 = sampleCovariance(v01, v01);
  const variance = s10 === null || s01 === null ? null : s10 / m + s01 / n;
  return summarizeAuc(auc, variance === null ? null : Math.sqrt(variance));
};
