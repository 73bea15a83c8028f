import type { ReadRow } from '../../core/read-log';
import { wilson, type Proportion } from '../wilson';

export type ScoreBand = {
  /** shown score from lower (inclusive) to upper (exclusive; the last band includes 1) */
  lower: number;
  upper: number;
  /** share of reads whose final call followed the suggestion, when the suggestion was right */
  followed_right: Proportion;
  /** the same when the suggestion was wrong (its k and n are over-reliance within the band) */
  followed_wrong: Proportion;
};

export const SCORE_EDGES = [0, 0.2, 0.4, 0.6, 0.8, 1] as const;

/**
 * Reliance against the shown score: aided reads grouped by the suggestion's score into
 * [0,0.2), [0.2,0.4), [0.4,0.6), [0.6,0.8), [0.8,1.0]; in each band the share following the
 * suggestion (final call = suggestion's call), separately when the suggestion was right and
 * wrong, with Wilson intervals. Reads without a shown call or score are left out.
 * Example: a wrong suggestion at 0.85 followed and one at 0.9 not → band [0.8,1]: followed_wrong 1 of 2.
 */
export const scoreBands = (reads: readonly ReadRow[]): ScoreBand[] => {
  const bands = SCORE_EDGES.length - 1;
  const counts = Array.from({ length: bands }, () => ({ rk: 0, rn: 0, wk: 0, wn: 0 }));
  for (const r of reads) {
    if (r.ai_call === null || r.ai_score === null) continue;
    const c = counts[Math.min(bands - 1, Math.floor(r.ai_score * bands))];
    if (c === undefined) throw new RangeError(`shown score outside [0,1]: ${r.ai_score} (case ${r.case_id})`);
    const followed = r.final_call === r.ai_call ? 1 : 0;
    if (r.ai_call === r.truth) {
      c.rn++;
      c.rk += followed;
    } else {
      c.wn++;
      c.wk += followed;
    }
  }
  return counts.map((c, b) => ({
    lower: SCORE_EDGES[b] as number,
    upper: SCORE_EDGES[b + 1] as number,
    followed_right: wilson(c.rk, c.rn),
    followed_wrong: wilson(c.wk, c.wn),
  }));
};
