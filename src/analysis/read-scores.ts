import { isProbabilityScale } from '../core/answer-scale';
import { derivedScore } from '../core/derived-score';
import type { ReadRow } from '../core/read-log';

/**
 * The final ROC score s of a read. On a rating scale (five-point, percent) it is the rating
 * itself: only the ranks matter for the AUC. On call-confidence it is the derived score (docs/formats.md,
 * "The read log"): call 1 → 50 + confidence/2, call 0 → 50 − confidence/2, on 0..100. When the
 * confidence is empty (the study asked none), it is taken as 100, so s is 100 or 0 and the AUC
 * reduces to the call's (sensitivity + specificity)/2.
 * Throws RangeError when a confidence is outside 0..100.
 * Example: finalScore({ final_call: 1, final_confidence: null, ... }) → 100.
 */
export const finalScore = (r: ReadRow): number => scoreOf(r.final_rating, r.final_call, r.final_confidence);

/** The score of a rating, or else of a call and its confidence (empty → 100): finalScore's rule on bare cells. */
export const scoreOf = (rating: number | null, call: 0 | 1, confidence: number | null): number => rating ?? derivedScore(call, confidence ?? 100);

/** Initial ROC score s0 of a sequential read (the rating, else derived with confidence empty → 100, as finalScore); null without an initial call. */
export const initialScore = (r: ReadRow): number | null =>
  r.initial_call === null ? null : scoreOf(r.initial_rating, r.initial_call, r.initial_confidence);

/**
 * The final score as a likelihood on 0..100, where the scale states one (call-confidence's derived
 * score, percent's rating); null on the ordinal five-point scale. Used for calibration, Brier and
 * weight of advice, which need a probability.
 */
export const finalLikelihood = (r: ReadRow): number | null => (isProbabilityScale(r.scale) ? finalScore(r) : null);

/** initialScore as a likelihood on 0..100 (see finalLikelihood); null on five-point or without an initial call. */
export const initialLikelihood = (r: ReadRow): number | null => (isProbabilityScale(r.scale) ? initialScore(r) : null);

/** "Aided" reads are those with a suggestion shown (docs/methods.md). */
export const isAided = (r: ReadRow): boolean => r.assistance !== 'none';
