import type { Bit, ReadRow } from '../../core/read-log';

export type CaseReviewItem = {
  case_id: string;
  finding: string;
  period: number;
  /** 'followed-wrong': final call followed a wrong suggestion; 'rejected-right': went against a right one */
  kind: 'followed-wrong' | 'rejected-right';
  /** sequential reads only */
  first_call: Bit | null;
  final_call: Bit;
  suggestion_call: Bit;
  suggestion_score: number | null;
  truth: Bit;
};

/**
 * The reads worth looking at again: every aided read whose final call followed a wrong
 * suggestion or went against a right one (the reads counted by over- and under-reliance,
 * docs/methods.md), in period and reading order. Practice reads are left out, as in every statistic.
 * Example: truth 0, suggestion 1, final 1 → one item of kind 'followed-wrong'.
 */
export const caseReview = (reads: readonly ReadRow[]): CaseReviewItem[] => {
  const out: { item: CaseReviewItem; order: number }[] = [];
  for (const r of reads) {
    if (r.practice === 1 || r.ai_call === null) continue;
    const followed = r.final_call === r.ai_call;
    const aiRight = r.ai_call === r.truth;
    if (followed === aiRight) continue;
    out.push({
      order: r.order,
      item: {
        case_id: r.case_id, finding: r.finding, period: r.period,
        kind: followed ? 'followed-wrong' : 'rejected-right',
        first_call: r.initial_call, final_call: r.final_call,
        suggestion_call: r.ai_call, suggestion_score: r.ai_score, truth: r.truth,
      },
    });
  }
  out.sort((a, b) => a.item.period - b.item.period || a.order - b.order);
  return out.map((o) => o.item);
};
