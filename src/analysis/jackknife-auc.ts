import { placements } from './delong';

export type JackknifeAuc = {
  /** the Mann-Whitney AUC on all cases (ties count ½) */
  auc: number;
  /** pseudo[k]: the AUC with case k left out, in the order of the cases given */
  leaveOneOut: Float64Array;
};

/**
 * Leave-one-case-out AUCs for the case jackknife (Efron 1982; used for the Obuchowski-Rockette
 * covariances by Hillis, Obuchowski, Schartz & Berbaum 2005, Stat Med 24:1579-1607).
 * O(c log c) for all c cases together, not c re-sorts: with the DeLong structural components
 * (placement values) v10, v01 of DeLong, DeLong & Clarke-Pearson (1988), m positives, n negatives,
 *   AUC without positive i = (m·AUC − v10[i]) / (m − 1),
 *   AUC without negative j = (n·AUC − v01[j]) / (n − 1),
 * because positive i contributes n·v10[i] of the m·n pair scores (and likewise for negatives).
 * Throws RangeError when the lengths differ, a truth value is not 0/1, a class has fewer than
 * 2 cases (leaving one out would empty it), or a score is not finite.
 * Example: jackknifeAuc([0.9, 0.4, 0.1, 0.4], [1, 1, 0, 0]) → auc 0.875,
 *   leaveOneOut [0.75, 1, 0.75, 1].
 */
export const jackknifeAuc = (scores: ArrayLike<number>, truth: ArrayLike<number>): JackknifeAuc => {
  const c = scores.length;
  if (truth.length !== c) throw new RangeError(`jackknifeAuc: ${c} scores but ${truth.length} truth values`);
  const pos: number[] = [];
  const neg: number[] = [];
  for (let k = 0; k < c; k++) {
    const y = truth[k];
    if (y === 1) pos.push(k);
    else if (y === 0) neg.push(k);
    else throw new RangeError(`jackknifeAuc: truth of case ${k} is ${String(y)}, not 0 or 1`);
  }
  const m = pos.length;
  const n = neg.length;
  if (m < 2 || n < 2) throw new RangeError(`jackknifeAuc needs at least 2 cases of each truth: ${m} with truth 1, ${n} with truth 0`);
  const { v10, v01, auc } = placements(pos.map((k) => scores[k] as number), neg.map((k) => scores[k] as number));
  const leaveOneOut = new Float64Array(c);
  for (let i = 0; i < m; i++) leaveOneOut[pos[i] as number] = (m * auc - (v10[i] as number)) / (m - 1);
  for (let j = 0; j < n; j++) leaveOneOut[neg[j] as number] = (n * auc - (v01[j] as number)) / (n - 1);
  return { auc, leaveOneOut };
};
