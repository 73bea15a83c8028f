import { covarianceSums, deviations } from './covariance-sums';
import { placements } from './delong';
import { jackknifeAuc } from './jackknife-auc';
import type { OrCovariances } from './jackknife-covariance';

/** How the Obuchowski-Rockette error covariances of the AUCs are estimated. */
export type CovarianceMethod = 'jackknife' | 'delong';

export const COVARIANCE_METHODS: readonly CovarianceMethod[] = ['jackknife', 'delong'];

/**
 * Per-case deviations of every (modality, reader) AUC, with the weights that turn their summed
 * cross-products into covariances: Cov(θa, θb) = Σ over groups of weight · Σk∈group devA[k]·devB[k].
 */
export type CaseDeviations = {
  auc: number[][];
  dev: Float64Array[][];
  groups: { from: number; to: number; weight: number }[];
};

/**
 * Case deviations for the chosen method, scores[modality][reader][case], truth per case.
 * jackknife: leave-one-case-out AUCs minus their mean, one group of all c cases, weight (c − 1)/c
 *   (Hillis, Obuchowski, Schartz & Berbaum 2005).
 * delong: the structural components (placement values) of DeLong, DeLong & Clarke-Pearson (1988),
 *   Biometrics 44:837-845: V10 over the m positives, weight 1/(m(m − 1)), and V01 over the
 *   n negatives, weight 1/(n(n − 1)), so Cov(θa, θb) = S10ab/m + S01ab/n with S the sample
 *   covariances of the placement values: the DeLong covariance of AUCs read on the same cases,
 *   across modalities and readers alike.
 * Throws RangeError (from the AUC code) when a class has fewer than 2 cases or a score is not finite.
 * Example: caseDeviations('delong', scores, truth).groups → [{0, m, 1/(m(m−1))}, {m, m+n, 1/(n(n−1))}].
 */
export const caseDeviations = (method: CovarianceMethod, scores: number[][][], truth: readonly (0 | 1)[]): CaseDeviations => {
  const c = truth.length;
  if (method === 'jackknife') {
    const jk = scores.map((modality, i) => modality.map((readerScores, j) => named(i, j, () => jackknifeAuc(readerScores, truth))));
    return {
      auc: jk.map((m) => m.map((x) => x.auc)),
      dev: jk.map((m) => m.map((x) => deviations(x.leaveOneOut, 0, c))),
      groups: [{ from: 0, to: c, weight: (c - 1) / c }],
    };
  }
  const pos: number[] = [];
  const neg: number[] = [];
  for (let k = 0; k < c; k++) (truth[k] === 1 ? pos : neg).push(k);
  const m = pos.length;
  const n = neg.length;
  if (m < 2 || n < 2) throw new RangeError(`DeLong covariances need at least 2 cases of each truth: ${m} with truth 1, ${n} with truth 0`);
  const parts = scores.map((modality, i) => modality.map((s, j) => named(i, j, () => placements(pos.map((k) => s[k] as number), neg.map((k) => s[k] as number)))));
  return {
    auc: parts.map((row) => row.map((p) => p.auc)),
    dev: parts.map((row) => row.map((p) => {
      const d = new Float64Array(m + n);
      d.set(deviations(p.v10, 0, m));
      d.set(deviations(p.v01, 0, n), m);
      return d;
    })),
    groups: [{ from: 0, to: m, weight: 1 / (m * (m - 1)) }, { from: m, to: m + n, weight: 1 / (n * (n - 1)) }],
  };
};

const named = <T>(i: number, j: number, f: () => T): T => {
  try {
    return f();
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`Obuchowski-Rockette, modality ${i} reader ${j}: ${error.message}`);
    throw error;
  }
};

const weightedSums = (dev: readonly (readonly Float64Array[])[], groups: CaseDeviations['groups']) => {
  let diag = 0;
  let sameReader = 0;
  let sameModality = 0;
  let other = 0;
  for (const g of groups) {
    const s = covarianceSums(dev, g.from, g.to);
    diag += g.weight * s.diag;
    sameReader += g.weight * s.sameReader;
    sameModality += g.weight * s.sameModality;
    other += g.weight * s.other;
  }
  return { diag, sameReader, sameModality, other };
};

/**
 * The four averaged covariances varE, cov1, cov2, cov3 of Obuchowski & Rockette (1995) from case
 * deviations of t ≥ 2 modalities and r ≥ 2 readers (definitions in jackknife-covariance.ts).
 * Example: averagedCovariances(caseDeviations('delong', scores, truth)).cov2.
 */
export const averagedCovariances = (d: CaseDeviations): OrCovariances => {
  const t = d.dev.length;
  const r = d.dev[0]?.length ?? 0;
  const s = weightedSums(d.dev, d.groups);
  return {
    varE: s.diag / (t * r),
    cov1: s.sameReader / (t * (t - 1) * r),
    cov2: s.sameModality / (t * r * (r - 1)),
    cov3: s.other / (t * (t - 1) * r * (r - 1)),
  };
};

/** varE and cov2 of one modality alone (its r ≥ 2 readers), for the single-treatment analysis. */
export const singleModalityCovariances = (d: CaseDeviations, modality: number): { varE: number; cov2: number } => {
  const row = d.dev[modality] as Float64Array[];
  const r = row.length;
  const s = weightedSums([row], d.groups);
  return { varE: s.diag / r, cov2: s.sameModality / (r * (r - 1)) };
};
