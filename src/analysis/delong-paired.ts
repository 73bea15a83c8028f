import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { placements, sampleCovariance } from './delong';

/** One condition's scores over the same cases: positives[i] and negatives[j] are the same cases in every condition. */
export type ConditionScores = { positives: ArrayLike<number>; negatives: ArrayLike<number> };

export type DelongCovariance = { aucs: number[]; covariance: number[][] };

/**
 * DeLong, DeLong & Clarke-Pearson (1988) covariance matrix of the AUCs of several conditions
 * read on the same cases: S = S10/m + S01/n, S10[a][b] = cov(v10_a, v10_b) over positives,
 * S01 likewise over negatives (placements from midranks, Sun & Xu 2014).
 * Throws RangeError when conditions differ in case counts, a class has fewer than 2 cases, or
 * a score is not finite.
 * Example: delongCovariance([{positives, negatives}, {positives: p2, negatives: n2}]).covariance[0][1].
 */
export const delongCovariance = (conditions: ConditionScores[]): DelongCovariance => {
  const first = conditions[0];
  if (first === undefined) throw new RangeError('delongCovariance needs at least one condition');
  const m = first.positives.length;
  const n = first.negatives.length;
  if (m < 2 || n < 2) throw new RangeError(`DeLong covariance needs at least 2 cases per class: ${m} positives, ${n} negatives`);
  const parts = conditions.map((c, k) => {
    if (c.positives.length !== m || c.negatives.length !== n) {
      throw new RangeError(`condition ${k} has ${c.positives.length}/${c.negatives.length} cases, condition 0 has ${m}/${n}`);
    }
    return placements(c.positives, c.negatives);
  });
  const covariance = parts.map((a) => parts.map((b) =>
    (sampleCovariance(a.v10, b.v10) as number) / m + (sampleCovariance(a.v01, b.v01) as number) / n));
  return { aucs: parts.map((p) => p.auc), covariance };
};

export type PairedAucTest = { auc1: number; auc2: number; difference: number; se: number; z: number | null; p: number | null };

/**
 * Paired DeLong test of two AUCs on the same cases: difference = auc2 − auc1,
 * se = sqrt(S11 + S22 − 2·S12), z = difference / se, two-sided p = 2·Φ(−|z|).
 * z and p are null when se is 0 (identical rankings).
 * Throws as delongCovariance.
 * Example: delongPairedTest(unaided, aided).p.
 */
export const delongPairedTest = (first: ConditionScores, second: ConditionScores): PairedAucTest => {
  const { aucs, covariance } = delongCovariance([first, second]);
  const [auc1, auc2] = aucs as [number, number];
  const c = covariance as [[number, number], [number, number]];
  const variance = Math.max(0, c[0][0] + c[1][1] - 2 * c[0][1]);
  const se = Math.sqrt(variance);
  const difference = auc2 - auc1;
  if (!(se > 0)) return { auc1, auc2, difference, se, z: null, p: null };
  const z = difference / se;
  return { auc1, auc2, difference, se, z, p: Math.min(1, 2 * normalCdf(-Math.abs(z), 0, 1)) };
};
