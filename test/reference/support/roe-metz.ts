import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { obuchowskiRockette } from '../../../src/analysis/obuchowski-rockette';
import type { CovarianceMethod } from '../../../src/analysis/or-covariances';

/**
 * Null simulation of fully crossed two-modality studies under the Roe & Metz (1997) model
 * (Acad Radiol 4:298-303): the rating of case k by reader j in modality i is
 *   X = μ·y_k + R_jt + τR_ijt + C_k + τC_ik + RC_jk + E_ijk,
 * t = y_k the case's truth, every component normal with mean 0, the reader terms drawn
 * separately for each truth (else they would shift both classes alike and leave the AUC alone).
 * No modality effect: the null hypothesis holds, so each test should reject about 5% of studies.
 * ROE_METZ_LOW is a low-AUC configuration as we remember it from Roe & Metz (1997) Table 1
 * (from memory, not checked against the paper): μ = 0.75 (AUC ≈ 0.70), σ²R = σ²τR = 0.011,
 * σ²C = σ²τC = 0.1, σ²RC = 0.2, σ²E = 0.6.
 */
export type RoeMetzConfig = {
  mu: number;
  r: number; tr: number; c: number; tc: number; rc: number; e: number;
};

export const ROE_METZ_LOW: RoeMetzConfig = { mu: 0.75, r: 0.011, tr: 0.011, c: 0.1, tc: 0.1, rc: 0.2, e: 0.6 };

/** Which effects stay fixed over the simulated studies (drawn once), for the fixed-reader / fixed-case tests. */
export type Scenario = 'random' | 'fixed-readers' | 'fixed-cases';

export type NullRun = {
  studies: number;
  rejections: { random: number; fixedReaders: number; fixedCases: number };
  rate: { random: number; fixedReaders: number; fixedCases: number };
  /**
   * Share of single-treatment 95% intervals (both modalities of every study) that hold the true
   * reader-averaged AUC: the random-reader interval in scenario 'random' (true AUC
   * Φ(μ / sqrt(2·(σ²R + σ²τR + σ²C + σ²τC + σ²RC + σ²E))), the reader terms averaged over the
   * reader population) and the fixed-reader interval in 'fixed-readers' (the mean over the fixed
   * readers of Φ((μ + ΔRj) / sqrt(2·(σ²C + σ²τC + σ²RC + σ²E))), ΔRj their positive-minus-negative
   * reader effect); null in 'fixed-cases'. The formulas follow from the model (our derivation).
   */
  coverage: number | null;
};

type Normal = () => number;

const normalSource = (seed: number): Normal => {
  const rng = xoroshiro128plus(seed);
  let spare: number | null = null;
  // Box-Muller, both values used
  return () => {
    if (spare !== null) {
      const v = spare;
      spare = null;
      return v;
    }
    const u = 1 - uniformFloat64(rng);
    const w = uniformFloat64(rng);
    const radius = Math.sqrt(-2 * Math.log(u));
    spare = radius * Math.sin(2 * Math.PI * w);
    return radius * Math.cos(2 * Math.PI * w);
  };
};

const draws = (normal: Normal, n: number, variance: number): Float64Array => {
  const sd = Math.sqrt(variance);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = sd * normal();
  return out;
};

/**
 * Runs `studies` null studies of `readers` x `cases` (half positive) and counts p < alpha.
 * 'fixed-readers' draws R once and sets σ²τR to 0 (a fixed τR would be a real modality
 * difference for those readers); 'fixed-cases' draws C once and sets σ²τC to 0, for the same reason.
 * Example: nullRun({ seed: 1, studies: 2000, readers: 5, cases: 100 }).rate.random ≈ 0.05.
 */
export const nullRun = (options: {
  seed: number; studies: number; readers: number; cases: number;
  config?: RoeMetzConfig; scenario?: Scenario; alpha?: number; covariance?: CovarianceMethod;
}): NullRun => {
  const { seed, studies, readers, cases, scenario = 'random', alpha = 0.05 } = options;
  const base = options.config ?? ROE_METZ_LOW;
  const config = {
    ...base,
    tr: scenario === 'fixed-readers' ? 0 : base.tr,
    tc: scenario === 'fixed-cases' ? 0 : base.tc,
  } satisfies RoeMetzConfig;
  const normal = normalSource(seed);
  const truth: (0 | 1)[] = Array.from({ length: cases }, (_, k) => (k < cases / 2 ? 1 : 0));
  const fixedR = draws(normal, readers * 2, config.r);
  const fixedC = draws(normal, cases, config.c);
  const rejections = { random: 0, fixedReaders: 0, fixedCases: 0 };
  const caseVar = 2 * (config.c + config.tc + config.rc + config.e);
  let trueAuc: number | null = null;
  if (scenario === 'random') trueAuc = normalCdf(config.mu / Math.sqrt(caseVar + 2 * (config.r + config.tr)), 0, 1);
  if (scenario === 'fixed-readers') {
    let sum = 0;
    for (let j = 0; j < readers; j++) sum += normalCdf((config.mu + (fixedR[j * 2 + 1] as number) - (fixedR[j * 2] as number)) / Math.sqrt(caseVar), 0, 1);
    trueAuc = sum / readers;
  }
  let covered = 0;
  for (let s = 0; s < studies; s++) {
    const rEff = scenario === 'fixed-readers' ? fixedR : draws(normal, readers * 2, config.r);
    const cEff = scenario === 'fixed-cases' ? fixedC : draws(normal, cases, config.c);
    const trEff = draws(normal, 2 * readers * 2, config.tr);
    const tcEff = draws(normal, 2 * cases, config.tc);
    const rcEff = draws(normal, readers * cases, config.rc);
    const scores = [0, 1].map((i) => Array.from({ length: readers }, (_, j) => {
      const row = new Array<number>(cases);
      for (let k = 0; k < cases; k++) {
        const y = truth[k] as 0 | 1;
        row[k] = config.mu * y + (rEff[j * 2 + y] as number) + (trEff[(i * readers + j) * 2 + y] as number)
          + (cEff[k] as number) + (tcEff[i * cases + k] as number) + (rcEff[j * cases + k] as number)
          + Math.sqrt(config.e) * normal();
      }
      return row;
    }));
    const res = obuchowskiRockette({ scores, truth, covariance: options.covariance ?? 'jackknife' });
    for (const t of res.treatments) {
      const interval = scenario === 'random' ? t.random : t.fixedReaders;
      if (trueAuc !== null && interval.lower <= trueAuc && trueAuc <= interval.upper) covered++;
    }
    if (res.random.p < alpha) rejections.random++;
    if (res.fixedReaders.p < alpha) rejections.fixedReaders++;
    if (res.fixedCases.p < alpha) rejections.fixedCases++;
  }
  return {
    studies,
    rejections,
    rate: {
      random: rejections.random / studies,
      fixedReaders: rejections.fixedReaders / studies,
      fixedCases: rejections.fixedCases / studies,
    },
    coverage: trueAuc === null ? null : covered / (2 * studies),
  };
};
