import type { ReadRow } from '../../core/read-log';

export type MeanConfidence = { n: number; mean: number | null };

export type FollowedConfidence = { wrong: MeanConfidence; right: MeanConfidence };

/**
 * Mean stated final confidence (0..100) over aided reads whose final call followed the
 * suggestion, separately when the suggestion was wrong and when it was right: a reader who is
 * as sure when following a wrong suggestion as a right one cannot tell them apart.
 * Reads without a stated confidence are left out; n = 0 gives mean null.
 * Example: followed wrong at 60 and 80, followed right at 90 → wrong 70 (n 2), right 90 (n 1).
 */
export const followedConfidence = (reads: readonly ReadRow[]): FollowedConfidence => {
  const acc = { wrong: { n: 0, sum: 0 }, right: { n: 0, sum: 0 } };
  for (const r of reads) {
    if (r.ai_call === null || r.final_confidence === null || r.final_call !== r.ai_call) continue;
    const g = r.ai_call === r.truth ? acc.right : acc.wrong;
    g.n++;
    g.sum += r.final_confidence;
  }
  const mean = (g: { n: number; sum: number }): MeanConfidence => ({ n: g.n, mean: g.n === 0 ? null : g.sum / g.n });
  return { wrong: mean(acc.wrong), right: mean(acc.right) };
};
