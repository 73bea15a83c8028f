import { quantileSorted, sortValues } from './quantile';
import type { ReadColumns } from './read-columns';

export type TimeSummary = { n: number; median_ms: number | null; q1_ms: number | null; q3_ms: number | null; iqr_ms: number | null };

/**
 * Reading time of a set of reads: median and interquartile range of total_ms (quartiles by
 * Hyndman & Fan definition 7, see quantile.ts). n = 0 gives nulls.
 * Throws RangeError on a non-finite time.
 * Example: readingTime([1000, 2000, 3000, 4000]) → median 2500, q1 1750, q3 3250, iqr 1500.
 */
export const readingTime = (ms: ArrayLike<number>): TimeSummary => summaryOfSorted(sortValues(ms));

/** readingTime of reads given as row numbers already sorted by time (no sort). */
export const timeOfSorted = (cols: ReadColumns, byTime: Int32Array): TimeSummary => {
  const s = new Float64Array(byTime.length);
  for (let k = 0; k < byTime.length; k++) s[k] = cols.totalMs[byTime[k] as number] as number;
  return summaryOfSorted(s);
};

const summaryOfSorted = (s: Float64Array): TimeSummary => {
  const q1 = quantileSorted(s, 0.25);
  const q3 = quantileSorted(s, 0.75);
  return { n: s.length, median_ms: quantileSorted(s, 0.5), q1_ms: q1, q3_ms: q3, iqr_ms: q1 === null || q3 === null ? null : q3 - q1 };
};

/**
 * Ratio of aided to unaided median reading time (above 1: the suggestion slows reading).
 * Null when either median is missing or the unaided median is 0.
 * Example: timeRatio(3000, 2000) → 1.5.
 */
export const timeRatio = (aidedMedian: number | null, unaidedMedian: number | null): number | null =>
  aidedMedian === null || unaidedMedian === null || unaidedMedian === 0 ? null : aidedMedian / unaidedMedian;
