import type { ReadRow } from '../core/read-log';
import { brier } from './brier';
import { calibration, type Calibration } from './calibration';
import { aucOfSet } from './auc-of-set';
import type { AucSummary } from './delong';
import { allRows, readColumns, type ReadColumns } from './read-columns';
import { sortedSet, type ReadSet } from './read-set';
import { timeOfSorted, type TimeSummary } from './reading-time';
import { relianceOf, type Reliance } from './reliance';
import { wilson, type Proportion } from './wilson';

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
  const cols = readColumns(reads);
  return conditionSectionOf(cols, sortedSet(cols, allRows(cols)));
};

/** conditionSection of a set of reads held as columns (the engine's path; same numbers). */
export const conditionSectionOf = (cols: ReadColumns, set: ReadSet): ConditionSection | null => {
  const { rows } = set;
  const n = rows.length;
  if (n === 0) return null;
  const truth = new Uint8Array(n);
  const scores = new Float64Array(n);
  const forecast = new Float64Array(n);
  let probabilities = true;
  let tp = 0;
  let tn = 0;
  let positives = 0;
  for (let k = 0; k < n; k++) {
    const r = rows[k] as number;
    const y = cols.truth[r] as number;
    const d = cols.finalCall[r] as number;
    truth[k] = y;
    if (y === 1) {
      positives++;
      if (d === 1) tp++;
    } else if (d === 0) tn++;
    scores[k] = cols.score[r] as number;
    const likelihood = cols.likelihood[r] as number;
    if (Number.isNaN(likelihood)) probabilities = false;
    else forecast[k] = likelihood / 100;
  }
  const time = timeOfSorted(cols, set.byTime);
  return {
    n,
    accuracy: wilson(tp + tn, n),
    sensitivity: wilson(tp, positives),
    specificity: wilson(tn, n - positives),
    auc: aucOfSet(cols, set),
    brier: probabilities ? brier(scores, truth) : null,
    median_ms: time.median_ms,
    time,
    calibration: probabilities ? calibration(forecast, truth) : null,
  };
};

/** conditionSection plus the reliance metrics (agreement, over/under-reliance, kappa, caution split). */
export const aidedSection = (reads: readonly ReadRow[]): AidedSection | null => {
  const cols = readColumns(reads);
  return aidedSectionOf(cols, sortedSet(cols, allRows(cols)));
};

/** aidedSection of a set of reads held as columns. */
export const aidedSectionOf = (cols: ReadColumns, set: ReadSet): AidedSection | null => {
  const base = conditionSectionOf(cols, set);
  return base === null ? null : { ...base, ...relianceOf(cols, set.rows) };
};
