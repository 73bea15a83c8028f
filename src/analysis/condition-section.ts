import type { ReadRow } from '../core/read-log';
import { brier } from './brier';
import { calibration, type Calibration } from './calibration';
import { classification } from './classification';
import { aucSummary, type AucSummary } from './delong';
import { finalLikelihood, finalScore } from './read-scores';
import { readingTime, type TimeSummary } from './reading-time';
import { reliance, type Reliance } from './reliance';
import type { Proportion } from './wilson';

export type ConditionSection = {
  n: number;
  accuracy: Proportion;
  sensitivity: Proportion;
  specificity: Proportion;
  /** Mann-Whitney AUC of the derived score, DeLong SE, CI clipped to [0,1] */
  auc: AucSummary;
  /** null when any read's scale states no probability (five-point) */
  brier: number | null;
  median_ms: number | null;
  time: TimeSummary;
  /** reliability of s/100 against truth: ECE over 10 bins [0,0.1) … [0.9,1.0]; null when any read is five-point */
  calibration: Calibration | null;
};

export type AidedSection = ConditionSection & Reliance;

/**
 * Metrics of one condition over a set of reads (docs/methods.md): accuracy, sensitivity,
 * specificity, AUC, Brier score, reading time and calibration of the derived score. The AUC uses
 * the rating where the read has one; Brier and calibration need a probability, so they are null
 * when any read is on the five-point scale.
 * Returns null for no reads. Throws RangeError when a confidence is outside 0..100.
 * Example: conditionSection(unaidedReads)?.auc.estimate.
 */
export const conditionSection = (reads: readonly ReadRow[]): ConditionSection | null => {
  const n = reads.length;
  if (n === 0) return null;
  const calls = new Uint8Array(n);
  const truth = new Uint8Array(n);
  const scores = new Float64Array(n);
  const times = new Float64Array(n);
  const forecast = new Float64Array(n);
  let positives = 0;
  for (const r of reads) positives += r.truth;
  const pos = new Float64Array(positives);
  const neg = new Float64Array(n - positives);
  let ip = 0;
  let ineg = 0;
  let probabilities = true;
  for (let i = 0; i < n; i++) {
    const r = reads[i] as ReadRow;
    calls[i] = r.final_call;
    truth[i] = r.truth;
    const s = finalScore(r);
    scores[i] = s;
    const likelihood = finalLikelihood(r);
    if (likelihood === null) probabilities = false;
    else forecast[i] = likelihood / 100;
    times[i] = r.total_ms;
    if (r.truth === 1) pos[ip++] = s;
    else neg[ineg++] = s;
  }
  const c = classification(calls, truth);
  const time = readingTime(times);
  return {
    n,
    accuracy: c.accuracy,
    sensitivity: c.sensitivity,
    specificity: c.specificity,
    auc: aucSummary(pos, neg),
    brier: probabilities ? brier(scores, truth) : null,
    median_ms: time.median_ms,
    time,
    calibration: probabilities ? calibration(forecast, truth) : null,
  };
};

/** conditionSection plus the reliance metrics (agreement, over/under-reliance, kappa, caution split). */
export const aidedSection = (reads: readonly ReadRow[]): AidedSection | null => {
  const base = conditionSection(reads);
  return base === null ? null : { ...base, ...reliance(reads) };
};
