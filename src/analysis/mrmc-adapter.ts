// The one place the engine meets the Obuchowski-Rockette analysis, so its shape stays in one file.
import type { ReadRow } from '../core/read-log';
import { fullyCrossedOf } from './fully-crossed';
import { allRows, readColumns, type ReadColumns } from './read-columns';
import { obuchowskiRockette, type ORResult } from './obuchowski-rockette';
import type { CovarianceMethod } from './or-covariances';

export type MrmcResult = ORResult;

export type Mrmc = { result: MrmcResult | null; note: string | null };

/**
 * Obuchowski-Rockette analysis (with Hillis' degrees of freedom) of the reader-averaged AUC
 * difference, aided minus unaided, for one finding's non-practice reads when the design is
 * fully crossed; otherwise result is null and note says why. A RangeError from the analysis
 * (e.g. a degenerate data set) also gives null with its message as the note. covariance chooses
 * the error covariance estimate: 'jackknife' (default) or 'delong' (docs/methods.md).
 * Example: mrmc(reads, 'delong').result?.random.p.
 */
export const mrmc = (reads: readonly ReadRow[], covariance: CovarianceMethod = 'jackknife'): Mrmc => {
  const cols = readColumns(reads);
  return mrmcOf(cols, allRows(cols), covariance);
};

/** mrmc of reads given as row numbers into columns (the engine's path). */
export const mrmcOf = (cols: ReadColumns, rows: Int32Array, covariance: CovarianceMethod): Mrmc => {
  const crossing = fullyCrossedOf(cols, rows);
  if (crossing.input === null) return { result: null, note: `not fully crossed: ${crossing.reason}` };
  try {
    return { result: obuchowskiRockette({ scores: crossing.input.scores, truth: crossing.input.truth, covariance }), note: null };
  } catch (error) {
    if (error instanceof RangeError) return { result: null, note: error.message };
    throw error;
  }
};
