import type { ReadRow } from '../core/read-log';
import { cohenKappa, type Kappa } from './cohen-kappa';
import { wilson, type Proportion } from './wilson';

export type Reliance = {
  /** P(d = a) */
  agreement: Proportion;
  /**
   * over-reliance, unconditional: following a wrong suggestion, k = #(d = a, a ≠ y), n = #(a ≠ y),
   * whatever the reader thought first. The form conditional on a first right call is
   * `overreliance_given_first_right` of the sequential section (docs/methods.md).
   */
  overreliance: Proportion;
  /**
   * under-reliance, unconditional: rejecting a right suggestion, k = #(d ≠ a, a = y), n = #(a = y).
   * The form conditional on a first wrong call is `underreliance_given_first_wrong` (sequential).
   */
  underreliance: Proportion;
  /** P(d = y | a = y) and P(d = y | a ≠ y) */
  accuracy_ai_right: Proportion;
  accuracy_ai_wrong: Proportion;
  /** the suggestion's own accuracy on these reads, P(a = y) */
  ai_accuracy: Proportion;
  /** Cohen's kappa of d against a, SE of Fleiss, Cohen & Everitt (1969) */
  kappa: { estimate: number | null; se: number | null };
  /** over-reliance among reads with and without the caution notice */
  caution: { shown: Proportion; not_shown: Proportion };
};

/**
 * Reliance on the suggestion over aided reads (docs/methods.md, "Reliance"), with y = truth,
 * d = final call, a = ai_call; Wilson intervals throughout. Reads without a suggestion call are
 * ignored. These are the unconditional forms: they need no initial call, so they work for
 * concurrent reads too. The unconditional counts are a common way to report reliance; we know of
 * no single paper that defines them, so no source is claimed.
 * Throws nothing for empty input: proportions with n = 0 are null.
 * Example: reliance(aidedReads).overreliance.estimate → share of wrong suggestions followed.
 */
export const reliance = (reads: readonly ReadRow[]): Reliance => {
  let n = 0;
  let agree = 0;
  let wrong = 0;
  let followedWrong = 0;
  let rejectedRight = 0;
  let rightCorrect = 0;
  let wrongCorrect = 0;
  const caution = [[0, 0], [0, 0]] as [[number, number], [number, number]];
  const d: number[] = [];
  const a: number[] = [];
  for (const r of reads) {
    if (r.ai_call === null) continue;
    n++;
    d.push(r.final_call);
    a.push(r.ai_call);
    const follows = r.final_call === r.ai_call;
    const correct = r.final_call === r.truth;
    if (follows) agree++;
    if (r.ai_call !== r.truth) {
      wrong++;
      if (follows) followedWrong++;
      if (correct) wrongCorrect++;
      const cs = caution[r.caution_shown];
      cs[1]++;
      if (follows) cs[0]++;
    } else {
      if (!follows) rejectedRight++;
      if (correct) rightCorrect++;
    }
  }
  const kappa: Kappa = cohenKappa(d, a);
  return {
    agreement: wilson(agree, n),
    overreliance: wilson(followedWrong, wrong),
    underreliance: wilson(rejectedRight, n - wrong),
    accuracy_ai_right: wilson(rightCorrect, n - wrong),
    accuracy_ai_wrong: wilson(wrongCorrect, wrong),
    ai_accuracy: wilson(n - wrong, n),
    kappa: { estimate: kappa.estimate, se: kappa.se },
    caution: { shown: wilson(caution[1][0], caution[1][1]), not_shown: wilson(caution[0][0], caution[0][1]) },
  };
};
