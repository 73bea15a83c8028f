import fCdf from '@stdlib/stats-base-dists-f-cdf';
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import type { OrCovariances } from './jackknife-covariance';
import { averagedCovariances, caseDeviations, type CovarianceMethod } from './or-covariances';
import { singleTreatments, type ORTreatment } from './or-single-treatment';
import { readerCountWarning } from './or-warning';

/** One test of the reader-averaged AUC difference (aided minus unaided), with its 95% interval. */
export type ORTest = {
  difference: number;
  se: number;
  lower: number;
  upper: number;
  /** F statistic; for the fixed-reader test it is the chi-square over df1 (ddf is Infinity) */
  f: number;
  df1: number;
  /** denominator degrees of freedom; Infinity (JSON: null) for the fixed-reader test */
  ddf: number;
  p: number;
};

export type ORResult = {
  /** random readers, random cases: Obuchowski-Rockette F with Hillis (2007) ddf */
  random: ORTest;
  /** readers fixed, cases random */
  fixedReaders: ORTest;
  /** cases fixed, readers random: the modality-by-reader ANOVA of the AUCs */
  fixedCases: ORTest;
  /** Mann-Whitney AUC of each [modality][reader] */
  auc: number[][];
  /** how the error covariances were estimated: case jackknife or DeLong structural components */
  covarianceMethod: CovarianceMethod;
  /** the error variance and covariances the tests used, by covarianceMethod */
  covariances: OrCovariances;
  /** each modality's reader-averaged AUC with its own interval (single-treatment analysis) */
  treatments: ORTreatment[];
  /** a caution about the random-reader result (fewer than 4 readers), else null */
  warning: string | null;
  /** mean squares of the AUCs: modality, modality × reader */
  msT: number;
  msTR: number;
};

/**
 * Obuchowski-Rockette analysis of a fully crossed study (every reader reads every case in both
 * modalities): is the reader-averaged AUC different aided (modality 1) vs unaided (modality 0)?
 * Obuchowski & Rockette (1995), Commun Stat Simul Comput 24:285-308, with the error covariances
 * estimated by the case jackknife of the AUCs (Hillis, Obuchowski, Schartz & Berbaum 2005,
 * Stat Med 24:1579-1607) or, with covariance 'delong', by the DeLong, DeLong & Clarke-Pearson
 * (1988) structural components (or-covariances.ts), and Hillis' (2007, Stat Med 26:596-619)
 * denominator degrees of freedom. Each modality also gets its own single-treatment interval
 * (or-single-treatment.ts), and fewer than 4 readers a warning (or-warning.ts). docs/methods.md.
 * With t = 2 modalities, r readers, θij the AUC of modality i and reader j, θ̄i. the reader mean:
 *   MS(T)  = r Σi (θ̄i. − θ̄..)² / (t − 1)
 *   MS(TR) = Σij (θij − θ̄i. − θ̄.j + θ̄..)² / ((t − 1)(r − 1))
 *   varE, cov1, cov2, cov3 from averagedCovariances (definitions in jackknife-covariance.ts).
 * Random readers and cases: D = MS(TR) + r·max(cov2 − cov3, 0), F = MS(T)/D on (t − 1, ddfH),
 *   ddfH = D² / (MS(TR)² / ((t − 1)(r − 1))), se = sqrt(2D/r), CI difference ± t(0.975; ddfH)·se.
 * Fixed readers: D = varE − cov1 + (r − 1)·max(cov2 − cov3, 0), χ² = (t − 1)MS(T)/D on t − 1 df,
 *   se = sqrt(2D/r), normal CI and p (Hillis 2007, section on fixed readers; form from memory).
 * Fixed cases: F = MS(T)/MS(TR) on (t − 1, (t − 1)(r − 1)), se = sqrt(2·MS(TR)/r), t CI.
 * When a denominator is 0: p = 1 if the difference is 0, else 0; ddfH falls back to
 * (t − 1)(r − 1) when MS(TR) and the covariance term are both 0, and to Infinity when only MS(TR) is.
 * Throws RangeError when there are not exactly 2 modalities, fewer than 2 readers, modalities
 * or readers differ in size, case counts do not match truth, a truth value is not 0/1, a class
 * has fewer than 2 cases, or a score is not finite.
 * Example: obuchowskiRockette({ scores: [[r1u, r2u], [r1a, r2a]], truth, covariance: 'delong' }).random.p
 */
export const obuchowskiRockette = (input: { scores: number[][][]; truth: (0 | 1)[]; covariance?: CovarianceMethod }): ORResult => {
  const { scores, truth } = input;
  const covarianceMethod = input.covariance ?? 'jackknife';
  if (covarianceMethod !== 'jackknife' && covarianceMethod !== 'delong') {
    throw new RangeError(`covariance must be jackknife or delong, got ${JSON.stringify(covarianceMethod)}`);
  }
  checkShape(scores, truth);
  const t = 2;
  const r = (scores[0] as number[][]).length;
  const deviations = caseDeviations(covarianceMethod, scores, truth);
  const { auc } = deviations;
  const covariances = averagedCovariances(deviations);
  const { varE, cov1, cov2, cov3 } = covariances;

  const modalityMean = auc.map((row) => row.reduce((s, v) => s + v, 0) / r);
  const readerMean = Array.from({ length: r }, (_, j) => auc.reduce((s, row) => s + (row[j] as number), 0) / t);
  const grand = modalityMean.reduce((s, v) => s + v, 0) / t;
  const msT = (r * modalityMean.reduce((s, v) => s + (v - grand) ** 2, 0)) / (t - 1);
  let ssTR = 0;
  for (let i = 0; i < t; i++) {
    for (let j = 0; j < r; j++) {
      ssTR += ((auc[i]?.[j] as number) - (modalityMean[i] as number) - (readerMean[j] as number) + grand) ** 2;
    }
  }
  const dfTR = (t - 1) * (r - 1);
  const msTR = ssTR / dfTR;
  const difference = (modalityMean[1] as number) - (modalityMean[0] as number);
  const readerCovTerm = Math.max(cov2 - cov3, 0);

  const dRandom = msTR + r * readerCovTerm;
  let ddfH: number;
  if (msTR > 0) ddfH = (dRandom * dRandom) / ((msTR * msTR) / dfTR);
  else ddfH = dRandom > 0 ? Infinity : dfTR;
  const random = fTest(difference, msT, dRandom, t - 1, ddfH, r);

  const dFixedReaders = Math.max(0, varE - cov1 + (r - 1) * readerCovTerm);
  const fixedReaders = fTest(difference, msT, dFixedReaders, t - 1, Infinity, r);

  const fixedCases = fTest(difference, msT, msTR, t - 1, dfTR, r);

  return {
    random, fixedReaders, fixedCases, auc, covarianceMethod, covariances, msT, msTR,
    treatments: singleTreatments(deviations),
    warning: readerCountWarning(r),
  };
};

// F = MS(T)/D on (df1, ddf), se of the difference sqrt(2D/r); ddf Infinity means normal / chi-square.
const fTest = (difference: number, msT: number, denominator: number, df1: number, ddf: number, r: number): ORTest => {
  const se = Math.sqrt((2 * denominator) / r);
  const crit = ddf === Infinity ? normalQuantile(0.975, 0, 1) : tQuantile(0.975, ddf);
  let f: number;
  let p: number;
  if (denominator > 0) {
    f = msT / denominator;
    // with df1 = 1 the F test is the two-sided t (or z) test of the difference
    p = ddf === Infinity ? 2 * normalCdf(-Math.sqrt(f), 0, 1) : 1 - fCdf(f, df1, ddf);
  } else {
    f = msT > 0 ? Infinity : 0;
    p = msT > 0 ? 0 : 1;
  }
  return { difference, se, lower: difference - crit * se, upper: difference + crit * se, f, df1, ddf, p: Math.min(1, Math.max(0, p)) };
};

const checkShape = (scores: number[][][], truth: (0 | 1)[]): void => {
  if (scores.length !== 2) throw new RangeError(`Obuchowski-Rockette needs exactly 2 modalities (unaided, aided), got ${scores.length}`);
  const [unaided, aided] = scores as [number[][], number[][]];
  const r = unaided.length;
  if (r < 2) throw new RangeError(`Obuchowski-Rockette needs at least 2 readers, got ${r}`);
  if (aided.length !== r) throw new RangeError(`modality 1 has ${aided.length} readers, modality 0 has ${r}`);
  const c = truth.length;
  let positives = 0;
  for (let k = 0; k < c; k++) {
    const y = truth[k];
    if (y !== 0 && y !== 1) throw new RangeError(`truth of case ${k} is ${String(y)}, not 0 or 1`);
    positives += y;
  }
  if (positives === 0 || positives === c) {
    throw new RangeError(`Obuchowski-Rockette needs cases of both truths: ${positives} with truth 1, ${c - positives} with truth 0`);
  }
  for (const [i, modality] of scores.entries()) {
    for (const [j, readerScores] of modality.entries()) {
      if (readerScores.length !== c) throw new RangeError(`modality ${i} reader ${j} has ${readerScores.length} scores, truth has ${c} cases`);
      for (let k = 0; k < c; k++) {
        if (!Number.isFinite(readerScores[k])) throw new RangeError(`modality ${i} reader ${j} case ${k}: score ${String(readerScores[k])} is not a finite number`);
      }
    }
  }
};
