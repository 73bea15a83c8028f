/** The shape of a plan's answer: what `heed plan --json` prints and the dry-run panel shows. */
import type { CautionMode } from '../../core/design';
import type { PlanAssumptions, VarianceComponents } from './assumptions';

/** A simulated rejection or coverage rate, with its Monte Carlo standard error sqrt(rate(1 - rate)/studies). */
export type Rate = { rate: number; mcse: number; studies: number };

export type CurveDimension = 'readers' | 'cases' | 'wrong';

export type CurvePoint = {
  vary: CurveDimension;
  readers: number;
  cases: number;
  /** wrong-suggestion reads per reader at this point (planted and the model's own errors) */
  wrong_reads_per_reader: number;
  overreliance_power: Rate;
  /** null on the planted-errors curve: planted errors do not change the own-look AUC model */
  auc_power: Rate | null;
  median_halfwidth: number | null;
};

export type PlanReport = {
  seed: number;
  sims: number;
  finding: string;
  research_notice: string;
  design: {
    readers: number; cases: number; positives: number; negatives: number;
    sequences: string[]; periods: number; planted_false_positive: number; planted_false_negative: number;
    caution: CautionMode; from_study: boolean;
  };
  assumptions: PlanAssumptions & { preset_source: string };
  model: { mu: number; aided_shift: number; variance: VarianceComponents; follow_wrong: { mean: number; sd: number } };
  overreliance: {
    wrong_reads_per_reader: number;
    assumed_rate: number;
    expected_halfwidth: number | null;
    median_halfwidth: number | null;
    mean_true_rate: number | null;
    coverage: Rate;
    reference: number;
    power: Rate;
    test: string;
  };
  notice: {
    effect: number;
    power: Rate | null;
    reason: string | null;
    test: string;
  };
  auc: {
    unaided: number;
    difference: number;
    power: Rate | null;
    type_i_error: Rate | null;
    median_halfwidth: number | null;
    mean_difference: number | null;
    note: string | null;
    test: string;
  };
  curves: { sims: number; points: CurvePoint[]; skipped: string[] };
};
