/**
 * Runs a plan: M simulated studies of the design (core/simulated-readers.ts through Heed's
 * analysis pieces, see simulated-study.ts), then the curves, one simulated study per step.
 * `planSteps` is a generator that yields progress after every simulated study, so a caller can
 * show progress and stop (a Web Worker drains it in slices and checks a cancel flag between
 * them); `runPlan` drains it at once (the CLI).
 *
 * Three sets of studies at the design point, each from its own streams of the seed:
 *  - reliance ('plan/reliance/<s>'): the full model; over-reliance intervals, coverage and power,
 *    and the notice effect;
 *  - AUC power ('plan/auc/<s>'): the own-look model at the assumed AUC difference;
 *  - AUC null ('plan/null/<s>'): the own-look model at difference 0 (the test's type I error).
 * Curves: the reliance and AUC-power sets again at a small grid of readers, cases and planted
 * errors around the design (x0.5, x1.5, x2), with a tenth of the studies (at least 20): enough for a plot.
 * Throws RangeError for assumptions out of range or a case set too small for the planted errors.
 */
import type { StudyDesign } from '../../core/design';
import { RESEARCH_CAUTION } from '../../core/research-caution';
import { deriveSeed } from '../../core/rng';
import type { SimulationParameters } from '../../core/simulated-readers';
import { wilsonHalfWidth } from '../wilson';
import { checkAssumptions, PRESETS, type PlanAssumptions } from './assumptions';
import { ownLookParameters, relianceParameters } from './model-mapping';
import { caseMix, planDesign, type PlanDesign } from './plan-design';
import type { CurvePoint, PlanReport, Rate } from './plan-report';
import { ALPHA, pairedDiffers, showsAbove } from './power-tests';
import { fillRows, preparedAucOutcome, preparedOutcomes, prepareStudy, simulatedReaders, type PreparedStudy } from './simulated-study';

export type PlanInput = { assumptions: PlanAssumptions; base: StudyDesign | null; curves?: boolean };
export type PlanProgress = { done: number; total: number };

export const OVERRELIANCE_TEST = `one-sided one-sample t-test of the reader over-reliance rates against the reference (alpha ${ALPHA}); readers are the random units`;
export const NOTICE_TEST = `two-sided paired t-test of each reader's over-reliance without minus with the caution notice (alpha ${ALPHA})`;
export const AUC_TEST = `Obuchowski-Rockette random-reader, random-case F test of the aided minus unaided AUC with Hillis (2007) degrees of freedom (alpha ${ALPHA})`;

const rate = (hits: number, studies: number): Rate => {
  const r = studies > 0 ? hits / studies : 0;
  return { rate: r, mcse: studies > 0 ? Math.sqrt((r * (1 - r)) / studies) : 0, studies };
};

const median = (xs: number[]): number | null => {
  if (xs.length === 0) return null;
  const s = Float64Array.from(xs).sort();
  const m = s.length >> 1;
  return s.length % 2 === 1 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
};

const mean = (xs: number[]): number | null => (xs.length === 0 ? null : xs.reduce((s, x) => s + x, 0) / xs.length);

type RelianceTally = { power: Rate; coverage: Rate; halfWidths: number[]; trueRates: number[]; notice: Rate; wrongPerReader: number };

function* relianceSet(study: PreparedStudy, p: SimulationParameters, a: PlanAssumptions, sims: number, stream: string): Generator<void, RelianceTally> {
  let power = 0, covered = 0, intervals = 0, notice = 0, wrongReads = 0;
  const halfWidths: number[] = [];
  const trueRates: number[] = [];
  for (let s = 0; s < sims; s++) {
    const seed = deriveSeed(a.seed, `${stream}/${s}`);
    fillRows(study, p, seed, a.noticeEffect);
    const outcomes = preparedOutcomes(study, p, seed, a.noticeEffect);
    const rates: number[] = [];
    const differences: number[] = [];
    for (const o of outcomes) {
      const { estimate, lower, upper, n } = o.overreliance;
      wrongReads += n;
      if (estimate === null || lower === null || upper === null || o.trueRate === null) continue;
      rates.push(estimate);
      halfWidths.push((upper - lower) / 2);
      trueRates.push(o.trueRate);
      intervals++;
      if (lower <= o.trueRate && o.trueRate <= upper) covered++;
      if (o.noticeShown.estimate !== null && o.noticeNotShown.estimate !== null) differences.push(o.noticeNotShown.estimate - o.noticeShown.estimate);
    }
    if (showsAbove(rates, a.reference)) power++;
    if (pairedDiffers(differences)) notice++;
    yield;
  }
  return { power: rate(power, sims), coverage: rate(covered, intervals), halfWidths, trueRates, notice: rate(notice, sims), wrongPerReader: wrongReads / (sims * study.readers.length) };
}

type AucTally = { rejections: Rate | null; halfWidths: number[]; differences: number[]; note: string | null };

function* aucSet(study: PreparedStudy, p: SimulationParameters, a: PlanAssumptions, sims: number, stream: string): Generator<void, AucTally> {
  let rejected = 0;
  const halfWidths: number[] = [];
  const differences: number[] = [];
  for (let s = 0; s < sims; s++) {
    const seed = deriveSeed(a.seed, `${stream}/${s}`);
    fillRows(study, p, seed, 0);
    const { outcome, note } = preparedAucOutcome(study);
    // a design that is not fully crossed never will be: say why and stop
    if (outcome === null) return { rejections: null, halfWidths, differences, note };
    if (outcome.p < ALPHA) rejected++;
    halfWidths.push(outcome.halfWidth);
    differences.push(outcome.difference);
    yield;
  }
  return { rejections: rate(rejected, sims), halfWidths, differences, note: null };
}

const curveFactors = [0.5, 1.5, 2] as const;

export function* planSteps(input: PlanInput): Generator<PlanProgress, PlanReport> {
  const a = input.assumptions;
  checkAssumptions(a);
  const plan = planDesign(a, input.base);
  // one prepared study for the three sets: its rows are refilled by each simulated study
  const study = prepareStudy(plan, simulatedReaders(plan, a.readers));
  const full = relianceParameters(a);
  const ownLook = ownLookParameters(a);
  const nullLook = ownLookParameters(a, 0);
  const curveSims = Math.max(20, Math.round(a.sims / 10));
  const points: { vary: CurvePoint['vary']; assumptions: PlanAssumptions }[] = [];
  if (input.curves !== false) {
    for (const f of curveFactors) points.push({ vary: 'readers', assumptions: { ...a, readers: Math.max(2, Math.round(a.readers * f)) } });
    for (const f of curveFactors) points.push({ vary: 'cases', assumptions: { ...a, cases: Math.max(8, Math.round(a.cases * f)) } });
    for (const f of curveFactors) points.push({ vary: 'wrong', assumptions: { ...a, wrong: { mode: a.wrong.mode, value: a.wrong.mode === 'count' ? Math.round(a.wrong.value * f) : Math.min(1, a.wrong.value * f) } } });
  }
  const total = 3 * a.sims + points.reduce((s, pt) => s + curveSims * (pt.vary === 'wrong' ? 1 : 2), 0);
  let done = 0;
  const progress = (): PlanProgress => ({ done: ++done, total });

  const rel = yield* counted(relianceSet(study, full, a, a.sims, 'plan/reliance'), progress);
  const power = yield* counted(aucSet(study, ownLook, a, a.sims, 'plan/auc'), progress);
  const nul = yield* counted(aucSet(study, nullLook, a, a.sims, 'plan/null'), progress);
  done = 3 * a.sims;

  const curvePoints: CurvePoint[] = [];
  const skipped: string[] = [];
  for (const pt of points) {
    let ptPlan: PlanDesign;
    try {
      ptPlan = planDesign(pt.assumptions, input.base);
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      skipped.push(`${pt.vary} at ${JSON.stringify({ readers: pt.assumptions.readers, cases: pt.assumptions.cases, wrong: pt.assumptions.wrong.value })}: ${error.message}`);
      done += curveSims * (pt.vary === 'wrong' ? 1 : 2);
      continue;
    }
    const ptStudy = prepareStudy(ptPlan, simulatedReaders(ptPlan, pt.assumptions.readers));
    const r = yield* counted(relianceSet(ptStudy, full, pt.assumptions, curveSims, `plan/curve/${pt.vary}/reliance`), progress);
    const auc = pt.vary === 'wrong' ? null : yield* counted(aucSet(ptStudy, ownLook, pt.assumptions, curveSims, `plan/curve/${pt.vary}/auc`), progress);
    curvePoints.push({
      vary: pt.vary, readers: pt.assumptions.readers, cases: pt.assumptions.cases, wrong_reads_per_reader: r.wrongPerReader,
      overreliance_power: r.power, auc_power: auc?.rejections ?? null, median_halfwidth: median(r.halfWidths),
    });
  }
  const mainPoint = (vary: CurvePoint['vary']): CurvePoint => ({
    vary, readers: a.readers, cases: a.cases, wrong_reads_per_reader: rel.wrongPerReader, overreliance_power: rel.power,
    auc_power: vary === 'wrong' ? null : power.rejections, median_halfwidth: median(rel.halfWidths),
  });
  if (input.curves !== false) for (const vary of ['readers', 'cases', 'wrong'] as const) curvePoints.push(mainPoint(vary));
  curvePoints.sort((x, y) => x.vary.localeCompare(y.vary) || x.readers - y.readers || x.cases - y.cases || x.wrong_reads_per_reader - y.wrong_reads_per_reader);

  const mix = caseMix(a.cases, a.prevalence);
  const noticeSplit = plan.design.caution.mode === 'random-half';
  const planted = plan.suggestions.filter((s) => s.planted);
  return {
    seed: a.seed,
    sims: a.sims,
    finding: plan.finding,
    research_notice: RESEARCH_CAUTION,
    design: {
      readers: a.readers, cases: a.cases, positives: mix.positives, negatives: mix.negatives,
      sequences: plan.design.sequences.map((s) => `${s.label}: ${s.periods.join(' then ')}`), periods: plan.design.sequences[0]?.periods.length ?? 0,
      planted_false_positive: planted.filter((s) => s.call === 1).length, planted_false_negative: planted.filter((s) => s.call === 0).length,
      caution: plan.design.caution.mode, from_study: input.base !== null,
    },
    assumptions: { ...a, preset_source: PRESETS[a.preset].source },
    model: { mu: full.mu, aided_shift: full.aidedShift, variance: full.variance, follow_wrong: full.followWrong },
    overreliance: {
      wrong_reads_per_reader: rel.wrongPerReader,
      assumed_rate: a.overreliance,
      expected_halfwidth: wilsonHalfWidth(a.overreliance, Math.round(rel.wrongPerReader)),
      median_halfwidth: median(rel.halfWidths),
      mean_true_rate: mean(rel.trueRates),
      coverage: rel.coverage,
      reference: a.reference,
      power: rel.power,
      test: OVERRELIANCE_TEST,
    },
    notice: {
      effect: a.noticeEffect,
      power: noticeSplit ? rel.notice : null,
      reason: noticeSplit ? null : `the design shows the caution notice ${plan.design.caution.mode === 'off' ? 'to nobody' : 'on every aided read'}, so there is no split to compare`,
      test: NOTICE_TEST,
    },
    auc: {
      unaided: a.aucUnaided,
      difference: a.aucDifference,
      power: power.rejections,
      type_i_error: nul.rejections,
      median_halfwidth: median(power.halfWidths),
      mean_difference: mean(power.differences),
      note: power.note,
      test: AUC_TEST,
    },
    curves: { sims: input.curves === false ? 0 : curveSims, points: curvePoints, skipped },
  };
}

// Runs a set, yielding progress after each of its studies.
function* counted<T>(set: Generator<void, T>, progress: () => PlanProgress): Generator<PlanProgress, T> {
  for (;;) {
    const step = set.next();
    if (step.done === true) return step.value;
    yield progress();
  }
}

/** The whole plan at once (the CLI); `onProgress` is called after every simulated study. */
export const runPlan = (input: PlanInput, onProgress?: (p: PlanProgress) => void): PlanReport => {
  const steps = planSteps(input);
  for (;;) {
    const step = steps.next();
    if (step.done === true) return step.value;
    onProgress?.(step.value);
  }
};

const drain = <T>(set: Generator<void, T>): T => {
  for (;;) {
    const step = set.next();
    if (step.done === true) return step.value;
  }
};

/** Rejection rate of the random-reader AUC test over `sims` own-look studies at `difference` (validation and tests). */
export const aucRejections = (a: PlanAssumptions, sims: number, difference: number, base: StudyDesign | null = null): { rejections: Rate | null; meanDifference: number | null; note: string | null } => {
  checkAssumptions({ ...a, aucDifference: difference });
  const plan = planDesign(a, base);
  const t = drain(aucSet(prepareStudy(plan, simulatedReaders(plan, a.readers)), ownLookParameters(a, difference), a, sims, difference === 0 ? 'plan/null' : 'plan/auc'));
  return { rejections: t.rejections, meanDifference: mean(t.differences), note: t.note };
};
