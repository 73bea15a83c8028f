/**
 * From a coordinator's assumptions to the shared simulated-reader model (core/simulated-readers.ts).
 *
 * AUC. In that model a reader's own rating is X = mu*t + R_t + TR_t + C_t + TC_t + RC_t + E, every
 * term normal, drawn separately for t = 0 and t = 1. For one reader the difference between a
 * present and an absent case's rating is normal with mean mu + (R_1 - R_0) + (TR_1 - TR_0) and
 * variance 2(case + readerCase + modalityCase + error); averaging the binormal AUC
 * Phi(mean / sd) over readers (a normal mean with variance 2(reader + modalityReader)) gives
 *   E[AUC] = Phi(mu / sqrt(2V)),  V = the sum of all six variance components,
 * since E[Phi(a + bZ)] = Phi(a / sqrt(1 + b^2)). So mu = sqrt(2V) * PhiInv(auc-unaided) and the
 * aided own look gets aidedShift = sqrt(2V) * PhiInv(auc-unaided + auc-difference) - mu.
 *
 * Over-reliance. --overreliance and --overreliance-spread are the mean and sd of the model's
 * followWrong Beta (the chance a reader whose own call was right follows a wrong suggestion).
 *
 * Two parameter sets: `relianceParameters` (the full model, for the reliance questions) and
 * `ownLookParameters` (reliance switched off: no suggestion is followed, confidence unchanged), for
 * the AUC questions, so the tested aided-minus-unaided difference is the assumed one and the
 * null (difference 0) is exactly true. How much reliance itself moves the aided AUC depends on
 * the model's accuracy and is not part of the assumed difference.
 */
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import { DEFAULT_SIMULATION, type SimulationParameters } from '../../core/simulated-readers';
import { PRESETS, type PlanAssumptions, type VarianceComponents } from './assumptions';

export const totalVariance = (v: VarianceComponents): number => v.reader + v.case + v.readerCase + v.modalityReader + v.modalityCase + v.error;

/** mu of the Roe & Metz model whose reader-averaged binormal AUC is `auc`. */
export const muForAuc = (auc: number, v: VarianceComponents): number => Math.sqrt(2 * totalVariance(v)) * normalQuantile(auc, 0, 1);

/** The reader-averaged binormal AUC of a given mu (inverse of muForAuc). */
export const aucForMu = (mu: number, v: VarianceComponents): number => normalCdf(mu / Math.sqrt(2 * totalVariance(v)), 0, 1);

const NEVER = 1e-12; // a Beta mean must be inside (0, 1): this one never fires in any study size

export const relianceParameters = (a: PlanAssumptions, aucDifference = a.aucDifference): SimulationParameters => {
  const variance = { ...PRESETS[a.preset].variance };
  const mu = muForAuc(a.aucUnaided, variance);
  return {
    ...DEFAULT_SIMULATION,
    variance,
    mu,
    aidedShift: muForAuc(a.aucUnaided + aucDifference, variance) - mu,
    followWrong: { mean: a.overreliance, sd: a.overrelianceSpread },
  };
};

export const ownLookParameters = (a: PlanAssumptions, aucDifference = a.aucDifference): SimulationParameters => ({
  ...relianceParameters(a, aucDifference),
  followWrong: { mean: NEVER, sd: 0 },
  acceptRight: { mean: NEVER, sd: 0 },
  changeWhenAgreeing: 0,
  agreeBoost: 0,
  disagreeKeep: 1,
});
