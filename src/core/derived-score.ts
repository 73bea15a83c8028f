import { score100, type Score100 } from './units';

/**
 * Likelihood that the finding is present on a 0..100 scale, from a call and a confidence
 * (docs/formats.md, "The read log"): call 1 gives 50 + confidence/2, call 0 gives 50 - confidence/2.
 * Example: derivedScore(1, 80) === 90; derivedScore(0, 80) === 10.
 * Throws RangeError when the confidence is outside 0..100.
 */
export const derivedScore = (call: 0 | 1, confidence: number): Score100 => {
  const c = score100(confidence);
  return score100(call === 1 ? 50 + c / 2 : 50 - c / 2);
};
