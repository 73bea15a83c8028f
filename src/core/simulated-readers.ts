/**
 * Simulated readers: answers a study's schedule as readers of given skill and reliance would,
 * from a seed. Used by `heed simulate`, tests and benchmarks, and meant for the design planner:
 * `simulateAnswers(design, manifest, suggestions, readers, parameters, seed)` is pure, and the
 * same inputs always give the same answers, whatever other readers are simulated beside them.
 *
 * The model, per reader j, case-finding k and period:
 * 1. Own judgement (the Roe & Metz 1997 model of a rating study). For truth t in {0,1} and
 *    modality m (unaided, or the reader's own look before using a suggestion):
 *      X = mu*t + R_jt + C_kt + RC_jkt + TR_jmt + TC_kmt + E
 *    with independent normal terms of variances `variance.reader`, `.case`, `.readerCase`,
 *    `.modalityReader`, `.modalityCase`, `.error` (drawn separately for t = 0 and t = 1, as Roe
 *    and Metz do), plus `aidedShift` added to mu when a suggestion is on offer.
 *    Own call = X > mu/2; own confidence = 100*|2*Phi(X - mu/2) - 1|, so the derived 0..100
 *    score 50 +/- confidence/2 equals 100*Phi(X - mu/2), a monotone map of X (the AUC of the
 *    scores is that of X). This is how the model's ratings map onto the call-confidence scale.
 * 2. Reliance, when a suggestion is shown and differs from the own call: the reader follows a
 *    wrong suggestion (own call right) with probability f_j ~ Beta(mean `followWrong.mean`,
 *    sd `followWrong.sd`), and takes up a right suggestion (own call wrong) with probability
 *    a_j ~ Beta(`acceptRight`); a suggestion that agrees is kept, except that with probability
 *    `changeWhenAgreeing` the reader changes anyway. Sequential reads record the own call as the
 *    initial call; concurrent reads record only the final call.
 * 3. Confidence after the suggestion: agreeing raises it by `agreeBoost` of the way to 100;
 *    keeping a call against the suggestion multiplies it by `disagreeKeep`; a changed call gets
 *    `changedConfidence`.
 * 4. Reading time, log-normal per condition: total ms = median_c * exp(sigma*Z) * speed_j with
 *    speed_j = exp(readerSpeedSd * Z_j); sequential reads split it into an initial part
 *    (`initialShare` of the total) and the rest.
 * Random streams (core/rng.ts), each opened once per simulated study:
 *  - 'sim/reader/<code>': R pair, unaided TR pair, aided TR pair, followWrong, acceptRight, speed
 *    (planner/reader-truth.ts repeats the first draws in this order);
 *  - 'sim/case/<case>/<finding>': C pair, unaided TC pair, aided TC pair;
 *  - 'sim/rc/<code>': the reader's RC pair of every (case, finding) of the case set, in manifest order;
 *  - 'sim/read/<code>/p<period>': per step in reading order, a Box-Muller pair (error term, time
 *    term), then one uniform for the reliance choice when a suggestion is shown.
 * Every stream belongs to one reader or one case, so a reader's answers do not depend on which
 * other readers are simulated. The schedules come from a prepared design (simulated-design.ts),
 * built once and reusable across studies: `simulateDraws(prepared, parameters, seed)`.
 * Throws RangeError for a parameter out of range (a Beta sd too large for its mean, a negative
 * variance or median).
 */
import type { CaseSetManifest } from './case-set';
import type { Assistance, StudyDesign } from './design';
import type { Bit } from './read-log';
import { createRng, type Rng } from './rng';
import type { AnswerPart } from './session';
import { prepareDesign, type PreparedDesign, type PreparedReader, type PreparedStep, type SimulatedReader } from './simulated-design';
import type { SuggestionRow } from './suggestions';

export type { SimulatedReader } from './simulated-design';

export type BetaSpec = { mean: number; sd: number };

export type SimulationParameters = {
  /** separation of present from absent cases in own judgement, in units of the error sd. Default 1.5
   * (Roe & Metz 1997 used 0.75, 1.5 and 2.5; 1.5 gives an AUC near 0.86; values from memory). */
  mu: number;
  /** added to mu when a suggestion is on offer (own look sharpened by the aid). Default 0 (a guess: the aid acts through reliance only). */
  aidedShift: number;
  /** variance components of the Roe & Metz model. Defaults: reader 0.011, case 0.1, readerCase 0.2,
   * modalityReader 0.011, modalityCase 0.1, error 0.6, as this repository remembers the
   * "low reader variability" structure of Roe & Metz (1997) Table 1 (from memory; see test/reference/support/roe-metz.ts). */
  variance: { reader: number; case: number; readerCase: number; modalityReader: number; modalityCase: number; error: number };
  /** P(follow a wrong suggestion | own call right), per reader. Default mean 0.25, sd 0.1 (a guess of the order reported in automation-bias studies). */
  followWrong: BetaSpec;
  /** P(take up a right suggestion | own call wrong), per reader. Default mean 0.6, sd 0.15 (a guess). */
  acceptRight: BetaSpec;
  /** P(change a call the suggestion agrees with). Default 0.01 (a guess: slips). */
  changeWhenAgreeing: number;
  /** share of the way to 100 that confidence rises when the suggestion agrees. Default 0.3 (a guess). */
  agreeBoost: number;
  /** factor on confidence when keeping a call against the suggestion. Default 0.8 (a guess). */
  disagreeKeep: number;
  /** confidence in a call changed to the suggestion's. Default 55 (a guess). */
  changedConfidence: number;
  /** median total reading time in ms per assistance. Defaults 12000 none, 10000 concurrent,
   * 15000 sequential (guesses for a single-image, one-finding task). */
  medianMs: Record<Assistance, number>;
  /** sd of log reading time within a reader. Default 0.5 (common practice: reading times are right-skewed, roughly log-normal; value a guess). */
  timeSigma: number;
  /** sd of the log speed factor between readers. Default 0.25 (a guess). */
  readerSpeedSd: number;
  /** share of a sequential read's time spent before the initial call. Default 0.7 (a guess). */
  initialShare: number;
};

export const DEFAULT_SIMULATION: SimulationParameters = {
  mu: 1.5,
  aidedShift: 0,
  variance: { reader: 0.011, case: 0.1, readerCase: 0.2, modalityReader: 0.011, modalityCase: 0.1, error: 0.6 },
  followWrong: { mean: 0.25, sd: 0.1 },
  acceptRight: { mean: 0.6, sd: 0.15 },
  changeWhenAgreeing: 0.01,
  agreeBoost: 0.3,
  disagreeKeep: 0.8,
  changedConfidence: 55,
  medianMs: { none: 12000, concurrent: 10000, sequential: 15000 },
  timeSigma: 0.5,
  readerSpeedSd: 0.25,
  initialShare: 0.7,
};

/** One simulated answer to one step of a reader's period, in reading order. */
export type SimulatedAnswer = {
  readerCode: string;
  period: number;
  itemIndex: number;
  caseId: string;
  finding: string;
  assistance: Assistance;
  initial: AnswerPart | null;
  final: AnswerPart;
};

const normal = (rng: Rng): number => {
  const u = 1 - rng.float(); // (0, 1]
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng.float());
};

// Marsaglia & Tsang (2000) gamma sampler, shape >= 1; shape < 1 by the usual boost.
const gamma = (rng: Rng, shape: number): number => {
  if (shape < 1) return gamma(rng, shape + 1) * (1 - rng.float()) ** (1 / shape);
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    const x = normal(rng);
    const v = (1 + c * x) ** 3;
    if (v <= 0) continue;
    const u = 1 - rng.float();
    if (Math.log(u) < 0.5 * x * x + d - d * v + d * Math.log(v)) return d * v;
  }
};

/** A Beta draw with the given mean and sd (alpha = m*k, beta = (1-m)*k, k = m(1-m)/sd^2 - 1). */
export const betaDraw = (rng: Rng, spec: BetaSpec): number => {
  const { mean: m, sd } = spec;
  if (!(m > 0 && m < 1)) throw new RangeError(`a Beta mean must be in (0, 1), got ${m}`);
  if (sd === 0) return m;
  const k = (m * (1 - m)) / (sd * sd) - 1;
  if (!(k > 0)) throw new RangeError(`a Beta sd of ${sd} is too large for mean ${m} (it must be below ${Math.sqrt(m * (1 - m)).toFixed(3)})`);
  const a = gamma(rng, m * k);
  return a / (a + gamma(rng, (1 - m) * k));
};

// Standard normal CDF (Abramowitz & Stegun 26.2.17, |error| < 7.5e-8): enough for a confidence.
const phi = (x: number): number => {
  const t = 1 / (1 + 0.2316419 * Math.abs(x));
  const d = 0.3989422804014327 * Math.exp((-x * x) / 2);
  const p = d * t * (0.31938153 + t * (-0.356563782 + t * (1.781477937 + t * (-1.821255978 + t * 1.330274429))));
  return x >= 0 ? 1 - p : p;
};

const clampConfidence = (c: number): number => Math.max(0, Math.min(100, Math.round(c)));

type Terms = { t0: number; t1: number };
const pair = (rng: Rng, variance: number): Terms => ({ t0: normal(rng) * Math.sqrt(variance), t1: normal(rng) * Math.sqrt(variance) });

const checkParameters = (p: SimulationParameters): void => {
  for (const [name, v] of Object.entries(p.variance)) if (!(v >= 0)) throw new RangeError(`variance.${name} must be >= 0, got ${v}`);
  for (const [name, v] of Object.entries(p.medianMs)) if (!(v > 0)) throw new RangeError(`medianMs.${name} must be > 0, got ${v}`);
};

/** The answers of one simulated study, one entry per prepared step (flat typed arrays, reusable). */
export type SimulatedDraws = {
  ownCall: Uint8Array;
  ownConfidence: Float64Array;
  finalCall: Uint8Array;
  finalConfidence: Float64Array;
  initialMs: Float64Array;
  finalMs: Float64Array;
};

export const emptyDraws = (steps: number): SimulatedDraws => ({
  ownCall: new Uint8Array(steps), ownConfidence: new Float64Array(steps), finalCall: new Uint8Array(steps),
  finalConfidence: new Float64Array(steps), initialMs: new Float64Array(steps), finalMs: new Float64Array(steps),
});

const TWO_PI = 2 * Math.PI;

/** Simulates one study of a prepared design; `into` (sized for its steps) is reused when given. */
export const simulateDraws = (prepared: PreparedDesign, parameters: SimulationParameters, seed: number, into?: SimulatedDraws): SimulatedDraws => {
  checkParameters(parameters);
  const p = parameters;
  const v = p.variance;
  const { steps, cells } = prepared;
  const out = into !== undefined && into.ownCall.length === steps.length ? into : emptyDraws(steps.length);
  // case terms, 6 per cell: C (t0, t1), unaided TC (t0, t1), aided TC (t0, t1)
  const caseTerms = new Float64Array(cells.length * 6);
  const sdCase = Math.sqrt(v.case);
  const sdModalityCase = Math.sqrt(v.modalityCase);
  cells.forEach((cell, i) => {
    const rng = createRng(seed, `sim/case/${cell.caseId}/${cell.finding}`);
    for (let k = 0; k < 6; k++) caseTerms[i * 6 + k] = normal(rng) * (k < 2 ? sdCase : sdModalityCase);
  });
  const rc = new Float64Array(cells.length * 2);
  const sdReaderCase = Math.sqrt(v.readerCase);
  const sdError = Math.sqrt(v.error);
  for (const { reader, periods } of prepared.readers) {
    const rr = createRng(seed, `sim/reader/${reader.code}`);
    const r = pair(rr, v.reader);
    const trUnaided = pair(rr, v.modalityReader);
    const trAided = pair(rr, v.modalityReader);
    const followWrong = betaDraw(rr, p.followWrong);
    const acceptRight = betaDraw(rr, p.acceptRight);
    const speed = Math.exp(p.readerSpeedSd * normal(rr));
    const rcRng = createRng(seed, `sim/rc/${reader.code}`);
    for (let i = 0; i < cells.length; i++) {
      const radius = Math.sqrt(-2 * Math.log(1 - rcRng.float())) * sdReaderCase;
      const angle = TWO_PI * rcRng.float();
      rc[2 * i] = radius * Math.cos(angle);
      rc[2 * i + 1] = radius * Math.sin(angle);
    }
    for (const period of periods) {
      const rng = createRng(seed, `sim/read/${reader.code}/p${period.period}`);
      for (let s = period.from; s < period.to; s++) {
        const step = steps[s] as PreparedStep;
        const truth = step.truth;
        const aided = step.assistance !== 'none';
        const radius = Math.sqrt(-2 * Math.log(1 - rng.float()));
        const angle = TWO_PI * rng.float();
        const base = step.cell * 6 + truth;
        const mu = p.mu + (aided ? p.aidedShift : 0);
        const x = mu * truth + (truth === 1 ? r.t1 : r.t0) + (caseTerms[base] as number) + (rc[2 * step.cell + truth] as number)
          + (truth === 1 ? (aided ? trAided : trUnaided).t1 : (aided ? trAided : trUnaided).t0) + (caseTerms[base + (aided ? 4 : 2)] as number)
          + radius * Math.cos(angle) * sdError;
        const ownCall: Bit = x > mu / 2 ? 1 : 0;
        const ownConfidence = clampConfidence(100 * Math.abs(2 * phi(x - mu / 2) - 1));
        const totalMs = Math.max(1, Math.round(p.medianMs[step.assistance] * Math.exp(p.timeSigma * radius * Math.sin(angle)) * speed));
        const shown = step.shown;
        let finalCall = ownCall;
        let finalConfidence = ownConfidence;
        if (shown) {
          const u = rng.float();
          if (shown.call === ownCall) {
            if (u < p.changeWhenAgreeing) { finalCall = ownCall === 1 ? 0 : 1; finalConfidence = p.changedConfidence; }
            else finalConfidence = clampConfidence(ownConfidence + (100 - ownConfidence) * p.agreeBoost);
          } else {
            const follow = ownCall === truth ? followWrong : acceptRight;
            if (u < follow) { finalCall = shown.call; finalConfidence = p.changedConfidence; }
            else finalConfidence = clampConfidence(ownConfidence * p.disagreeKeep);
          }
        }
        const sequential = step.assistance === 'sequential';
        const initialMs = Math.max(1, Math.round(totalMs * p.initialShare));
        out.ownCall[s] = ownCall;
        out.ownConfidence[s] = ownConfidence;
        out.finalCall[s] = finalCall;
        out.finalConfidence[s] = finalConfidence;
        out.initialMs[s] = initialMs;
        out.finalMs[s] = Math.max(totalMs, sequential ? initialMs + 1 : 1);
      }
    }
  }
  return out;
};

/** The answers as records, in reading order (reader, period, item, finding). */
export const answersOf = (prepared: PreparedDesign, draws: SimulatedDraws): SimulatedAnswer[] => {
  const ask = prepared.design.askConfidence;
  return prepared.steps.map((step, s) => {
    const ownCall = draws.ownCall[s] as Bit;
    const sequential = step.assistance === 'sequential';
    return {
      readerCode: (prepared.readers[step.reader] as PreparedReader).reader.code, period: step.period, itemIndex: step.itemIndex,
      caseId: step.caseId, finding: step.finding, assistance: step.assistance,
      initial: sequential ? { call: ownCall, confidence: ask ? (draws.ownConfidence[s] as number) : null, ms: draws.initialMs[s] as number } : null,
      final: { call: draws.finalCall[s] as Bit, confidence: ask ? (draws.finalConfidence[s] as number) : null, ms: draws.finalMs[s] as number },
    };
  });
};

export const simulateAnswers = (
  design: StudyDesign, manifest: CaseSetManifest, suggestions: readonly SuggestionRow[], readers: readonly SimulatedReader[],
  parameters: SimulationParameters, seed: number,
): SimulatedAnswer[] => {
  checkParameters(parameters);
  const prepared = prepareDesign(design, manifest, suggestions, readers);
  return answersOf(prepared, simulateDraws(prepared, parameters, seed));
};
