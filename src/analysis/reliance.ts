import type { ReadRow } from '../core/read-log';
import { cohenKappaTable, type Kappa } from './cohen-kappa';
import type { ReadColumns } from './read-columns';
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
  // only the four columns it reads: the planner calls this per reader of every simulated study
  const n = reads.length;
  const cols: RelianceColumns = { aiCall: new Int8Array(n), finalCall: new Uint8Array(n), truth: new Uint8Array(n), caution: new Uint8Array(n) };
  for (let i = 0; i < n; i++) {
    const r = reads[i] as ReadRow;
    cols.aiCall[i] = r.ai_call ?? -1;
    cols.finalCall[i] = r.final_call;
    cols.truth[i] = r.truth;
    cols.caution[i] = r.caution_shown;
  }
  return relianceOf(cols, Int32Array.from({ length: n }, (_, i) => i));
};

/** The columns reliance reads. */
export type RelianceColumns = Pick<ReadColumns, 'aiCall' | 'finalCall' | 'truth' | 'caution'>;

/** reliance over reads given as row numbers into columns (the engine's path; same numbers). */
export const relianceOf = (cols: RelianceColumns, rows: Int32Array): Reliance => {
  let n = 0;
  let agree = 0;
  let wrong = 0;
  let followedWrong = 0;
  let rejectedRight = 0;
  let rightCorrect = 0;
  let wrongCorrect = 0;
  const caution = [[0, 0], [0, 0]] as [[number, number], [number, number]];
  // Cohen's kappa of d against a: its 2×2 table, counted here
  const table = [[0, 0], [0, 0]] as [[number, number], [number, number]];
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const a = cols.aiCall[r] as number;
    if (a === -1) continue;
    const d = cols.finalCall[r] as number;
    const y = cols.truth[r] as number;
    n++;
    table[d as 0 | 1][a as 0 | 1]++;
    const follows = d === a;
    const correct = d === y;
    if (follows) agree++;
    if (a !== y) {
      wrong++;
      if (follows) followedWrong++;
      if (correct) wrongCorrect++;
      const cs = caution[cols.caution[r] as 0 | 1];
      cs[1]++;
      if (follows) cs[0]++;
    } else {
      if (!follows) rejectedRight++;
      if (correct) rightCorrect++;
    }
  }
  const kappa: Kappa = cohenKappaTable(table);
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
