import type { ReadRow } from '../../core/read-log';

export type SwitchCounts = {
  /** sequential reads in this group */
  n: number;
  /** final call the same as the first call */
  kept: number;
  /** first call wrong, final call right */
  better: number;
  /** first call right, final call wrong */
  worse: number;
};

export type SwitchingSplit = { suggestion_right: SwitchCounts; suggestion_wrong: SwitchCounts };

/**
 * First call to final call of sequential reads (those with a first call and a shown
 * suggestion), split by whether the suggestion was right. With yes/no calls every change is
 * either for the better or for the worse, so kept + better + worse = n; summed over both groups,
 * better and worse are the engine's beneficial and detrimental counts (docs/methods.md).
 * Null when there is no sequential read.
 * Example: first call wrong, right suggestion, final call right → suggestion_right.better 1.
 */
export const switchingSplit = (reads: readonly ReadRow[]): SwitchingSplit | null => {
  const right: SwitchCounts = { n: 0, kept: 0, better: 0, worse: 0 };
  const wrong: SwitchCounts = { n: 0, kept: 0, better: 0, worse: 0 };
  for (const r of reads) {
    if (r.assistance !== 'sequential' || r.initial_call === null || r.ai_call === null) continue;
    const g = r.ai_call === r.truth ? right : wrong;
    g.n++;
    if (r.initial_call === r.final_call) g.kept++;
    else if (r.final_call === r.truth) g.better++;
    else g.worse++;
  }
  return right.n + wrong.n === 0 ? null : { suggestion_right: right, suggestion_wrong: wrong };
};
