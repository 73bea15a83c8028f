/**
 * The true over-reliance of each simulated reader, the figure a reader's interval should cover.
 * Heed's over-reliance (analysis/reliance.ts) is the share of wrong suggestions a reader's final
 * call follows. In the simulated-reader model a read with a wrong suggestion on truth t follows it
 *   when the own call was right (probability P_t), with the reader's followWrong f, and
 *   when the own call was already wrong (it agrees), unless the reader changes anyway (changeWhenAgreeing c),
 * so P(follow | t) = P_t f + (1 - P_t)(1 - c), times (1 - notice effect) when the notice is shown.
 * Given the reader's own terms, the aided own rating on a random case is normal with mean
 * mu_a t + R_t + TR_t (mu_a = mu + aidedShift) and variance case + readerCase + modalityCase + error,
 * and the own call is X > mu_a / 2, which gives P_1 = Phi((mu_a/2 + R_1 + TR_1)/s), P_0 = Phi((mu_a/2 - R_0 - TR_0)/s).
 *
 * The reader's terms are those the model draws: this file repeats the model's draws from the
 * stream 'sim/reader/<code>' in its order (R pair, unaided TR pair, aided TR pair, then followWrong).
 * test/unit/analysis/planner/reader-truth.test.ts checks it against the model's own answers, so a
 * change of draw order in core/simulated-readers.ts makes that test fail.
 */
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { createRng, type Rng } from '../../core/rng';
import { betaDraw, type SimulationParameters } from '../../core/simulated-readers';

export type ReaderTruth = { followWrong: number; ownRight: { t0: number; t1: number } };

// the model's Box-Muller draw, value for value
const normal = (rng: Rng): number => {
  const u = 1 - rng.float();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng.float());
};

export const readerTruth = (code: string, p: SimulationParameters, seed: number): ReaderTruth => {
  const rng = createRng(seed, `sim/reader/${code}`);
  const sd = (v: number): number => Math.sqrt(v);
  const r0 = normal(rng) * sd(p.variance.reader);
  const r1 = normal(rng) * sd(p.variance.reader);
  normal(rng); // unaided TR, t = 0
  normal(rng); // unaided TR, t = 1
  const tr0 = normal(rng) * sd(p.variance.modalityReader);
  const tr1 = normal(rng) * sd(p.variance.modalityReader);
  const followWrong = betaDraw(rng, p.followWrong);
  const v = p.variance;
  const s = Math.sqrt(v.case + v.readerCase + v.modalityCase + v.error);
  const half = (p.mu + p.aidedShift) / 2;
  return { followWrong, ownRight: { t0: normalCdf((half - r0 - tr0) / s, 0, 1), t1: normalCdf((half + r1 + tr1) / s, 0, 1) } };
};

/** P(final call follows a wrong suggestion) on one read of truth t, with or without the notice. */
export const followProbability = (truth: ReaderTruth, t: 0 | 1, p: SimulationParameters, noticeShown: boolean, noticeEffect: number): number => {
  const right = t === 1 ? truth.ownRight.t1 : truth.ownRight.t0;
  const base = right * truth.followWrong + (1 - right) * (1 - p.changeWhenAgreeing);
  return noticeShown ? base * (1 - noticeEffect) : base;
};
