import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { singleModalityCovariances, type CaseDeviations } from './or-covariances';

/** A 95% interval of one modality's reader-averaged AUC; ddf Infinity (JSON null) means normal. */
export type ORInterval = { se: number; ddf: number; lower: number; upper: number };

export type ORTreatment = {
  /** 0 unaided, 1 aided (the modality index of the scores) */
  modality: number;
  /** reader-averaged AUC of this modality */
  auc: number;
  /** readers and cases random: Hillis' single-treatment ddf */
  random: ORInterval;
  /** readers fixed, cases random */
  fixedReaders: ORInterval;
  /** cases fixed, readers random */
  fixedCases: ORInterval;
  /** MS(R), the reader mean square of this modality's AUCs */
  msR: number;
  /** this modality's error variance and same-modality, different-reader covariance */
  varE: number;
  cov2: number;
};

/**
 * Single-treatment Obuchowski-Rockette analysis of each modality on its own: the reader-averaged
 * AUC θ̄ of r readers with a 95% interval, from the OR model θj = μ + Rj + εj with
 * Var(εj) = varE and Cov(εj, εj') = cov2 (same covariance method as the two-modality analysis):
 *   MS(R) = Σj (θj − θ̄)² / (r − 1)
 *   random readers and cases: V = (MS(R) + r·max(cov2, 0)) / r, ddf = (MS(R) + r·max(cov2, 0))² /
 *     (MS(R)² / (r − 1)), interval θ̄ ± t(0.975; ddf)·sqrt(V)  (Hillis' ddf applied to one
 *     treatment; the form follows from E[MS(R)] = σ²R + varE − cov2, derived here and from memory
 *     of Hillis' papers, not copied from a printed formula)
 *   fixed readers: V = (varE + (r − 1)·max(cov2, 0)) / r, normal interval (cov2 truncated at 0 as
 *     in the two-modality fixed-reader test)
 *   fixed cases: V = MS(R) / r, t interval on r − 1 df.
 * When MS(R) is 0 the random ddf is Infinity if cov2 > 0, else r − 1 (as the two-modality test).
 * Intervals are not clipped to [0,1]. Throws nothing beyond what caseDeviations threw.
 * Example: singleTreatments(caseDeviations('jackknife', scores, truth))[1].random.lower.
 */
export const singleTreatments = (d: CaseDeviations): ORTreatment[] => d.auc.map((aucs, modality) => {
  const r = aucs.length;
  const mean = aucs.reduce((s, v) => s + v, 0) / r;
  const msR = aucs.reduce((s, v) => s + (v - mean) ** 2, 0) / (r - 1);
  const { varE, cov2 } = singleModalityCovariances(d, modality);
  const cov2Plus = Math.max(cov2, 0);
  const dRandom = msR + r * cov2Plus;
  let ddf: number;
  if (msR > 0) ddf = (dRandom * dRandom) / ((msR * msR) / (r - 1));
  else ddf = dRandom > 0 ? Infinity : r - 1;
  return {
    modality,
    auc: mean,
    random: interval(mean, dRandom / r, ddf),
    fixedReaders: interval(mean, Math.max(0, varE + (r - 1) * cov2Plus) / r, Infinity),
    fixedCases: interval(mean, msR / r, r - 1),
    msR,
    varE,
    cov2,
  };
});

const interval = (estimate: number, variance: number, ddf: number): ORInterval => {
  const se = Math.sqrt(variance);
  const crit = ddf === Infinity ? normalQuantile(0.975, 0, 1) : tQuantile(0.975, ddf);
  return { se, ddf, lower: estimate - crit * se, upper: estimate + crit * se };
};
