/**
 * The answer scale a study asks readers to use, and the rule that turns a rating into a call.
 *
 * - `call-confidence`: present/absent and a 0..100 confidence (the derived score of
 *   src/core/derived-score.ts is the likelihood).
 * - `five-point`: an ordinal rating 1 (definitely absent) ... 5 (definitely present), labels
 *   editable per study. Only the order of ratings means anything (no probability).
 * - `percent`: a 0..100 likelihood that the finding is present.
 *
 * On a rating scale the call is not asked: it follows from the study's stated threshold,
 * call = rating >= presentFrom ? present : absent. Choosing the threshold is the study's decision;
 * the defaults (4 of 5, 50 of 100) are common practice with no source.
 */
import type { Bit } from './read-log';

export const ANSWER_SCALES = ['call-confidence', 'five-point', 'percent'] as const;
export type AnswerScaleKind = (typeof ANSWER_SCALES)[number];

export type AnswerScale = {
  kind: AnswerScaleKind;
  /** five-point only: the words for ratings 1..5 */
  labels: string[];
  /** rating at or above which the call is "present" (five-point 2..5, percent 1..100); unused on call-confidence */
  presentFrom: number;
};

export const DEFAULT_FIVE_POINT_LABELS = ['Definitely absent', 'Probably absent', 'Uncertain', 'Probably present', 'Definitely present'];

export const defaultAnswerScale = (kind: AnswerScaleKind = 'call-confidence'): AnswerScale => ({
  kind,
  labels: [...DEFAULT_FIVE_POINT_LABELS],
  presentFrom: kind === 'five-point' ? 4 : 50,
});

/** Lowest and highest rating of a rating scale; null on call-confidence, which has none. */
export const ratingRange = (kind: AnswerScaleKind): { min: number; max: number; integer: boolean } | null =>
  kind === 'five-point' ? { min: 1, max: 5, integer: true } : kind === 'percent' ? { min: 0, max: 100, integer: false } : null;

/** Plain-language reason why `rating` is not a rating of this scale, or null when it is. */
export const ratingProblem = (kind: AnswerScaleKind, rating: number): string | null => {
  const range = ratingRange(kind);
  if (range === null) return 'this scale takes a call and a confidence, not a rating';
  if (range.integer && !Number.isInteger(rating)) return `a ${kind} rating must be a whole number ${range.min} to ${range.max}`;
  if (!(rating >= range.min && rating <= range.max)) return `a ${kind} rating must be ${range.min} to ${range.max}`;
  return null;
};

/**
 * The call that a rating stands for under the study's threshold: 1 when rating >= presentFrom.
 * Throws RangeError when the rating does not belong to the scale.
 * Example: callFromRating({ kind: 'five-point', presentFrom: 4, labels }, 4) === 1; (..., 3) === 0.
 */
export const callFromRating = (scale: AnswerScale, rating: number): Bit => {
  const problem = ratingProblem(scale.kind, rating);
  if (problem !== null) throw new RangeError(`${problem}, got ${rating}`);
  return rating >= scale.presentFrom ? 1 : 0;
};

/** Whether the scale states a probability (calibration and Brier make sense): not the ordinal five-point scale. */
export const isProbabilityScale = (kind: AnswerScaleKind): boolean => kind !== 'five-point';

/** The threshold rule in words, for the design summary and the reading view. */
export const thresholdWords = (scale: AnswerScale): string => {
  if (scale.kind === 'call-confidence') return 'the reader gives the call';
  if (scale.kind === 'five-point') {
    const label = scale.labels[scale.presentFrom - 1] ?? String(scale.presentFrom);
    return `rating ${scale.presentFrom} (“${label}”) or more counts as a “present” call`;
  }
  return `${scale.presentFrom}% or more counts as a “present” call`;
};
