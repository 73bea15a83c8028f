import { derivedScore } from '../core/derived-score';
import type { ReadRow } from '../core/read-log';

/**
 * Derived final score s of a read (docs/formats.md, "The read log"): call 1 → 50 + confidence/2, call 0 →
 * 50 − confidence/2, on 0..100. When the confidence is empty (the study asked none), it is
 * taken as 100, so s is 100 or 0 and the AUC reduces to the call's (sensitivity + specificity)/2.
 * Throws RangeError when a confidence is outside 0..100.
 * Example: finalScore({ final_call: 1, final_confidence: null, ... }) → 100.
 */
export const finalScore = (r: ReadRow): number => derivedScore(r.final_call, r.final_confidence ?? 100);

/** Derived initial score s0 of a sequential read (confidence empty → 100, as finalScore); null without an initial call. */
export const initialScore = (r: ReadRow): number | null =>
  r.initial_call === null ? null : derivedScore(r.initial_call, r.initial_confidence ?? 100);

/** "Aided" reads are those with a suggestion shown (docs/methods.md). */
export const isAided = (r: ReadRow): boolean => r.assistance !== 'none';
