import type { ReadRow } from '../core/read-log';
import { seededInts, type SeededInts } from './prng';
import { quantileSorted } from './quantile';
import { allRows, firstAppearance, readColumns, type ReadColumns } from './read-columns';
import { partitionReads, sectionReads, type ReadSet, type SectionReads } from './read-set';

export const AVERAGED_FIGURES = [
  'unaided_accuracy', 'aided_accuracy', 'accuracy_difference',
  'unaided_sensitivity', 'aided_sensitivity', 'unaided_specificity', 'aided_specificity',
  'unaided_auc', 'aided_auc', 'auc_difference',
  'agreement', 'overreliance', 'underreliance',
] as const;

export type AveragedFigure = (typeof AVERAGED_FIGURES)[number];

export type AveragedValue = {
  /** mean over readers of each reader's estimate; null when no reader has one */
  estimate: number | null;
  /** 95% percentile bootstrap interval; null without bootstrap or when too few resamples define it */
  lower: number | null;
  upper: number | null;
  /** readers whose estimate entered the mean */
  readers: number;
};

export type ReaderAveraged = Record<AveragedFigure, AveragedValue> & { boot: number; seed: number };

const F = AVERAGED_FIGURES.length;
const IDX = Object.fromEntries(AVERAGED_FIGURES.map((f, i) => [f, i])) as Record<AveragedFigure, number>;

// One reader's reads of one condition in flat typed arrays, so a resample only reweights them.
// kind: a read's five flags as one number (truth 1, correct 2, suggestion shown 4, followed 8,
// suggestion wrong 16); slot: 2·level + truth, its place in the weighted histogram of levels.
// byCase: the same kind and slot by case number (kind NO_READ and slot 2·levels, both left out of
// the figures, where the reader has no read of the case), when each case is read at most once and
// at least half the cases are read: a resample then visits only the cases it drew (about 63%).
type Cond = { n: number; caseIdx: Int32Array; kind: Uint8Array; slot: Int32Array; levels: number; byCase: { kind: Uint8Array; slot: Int32Array } | null };

const TRUTH = 1, CORRECT = 2, HAS_AI = 4, FOLLOW = 8, AI_WRONG = 16, NO_READ = 32;

// One reader's reads of one condition, given by row numbers in read order and by score.
const toCond = (cols: ReadColumns, set: ReadSet, caseIndex: Int32Array, cases: number, byCase: boolean): Cond | null => {
  const n = set.rows.length;
  if (n === 0) return null;
  // score levels: the distinct scores ascending; a read's level is its score's place among them
  const levelOf = cols.runScratch;
  let levels = 0;
  for (let k = 0; k < n; k++) {
    const r = set.byScore[k] as number;
    if (k > 0 && cols.score[r] !== cols.score[set.byScore[k - 1] as number]) levels++;
    levelOf[r] = levels;
  }
  levels++;
  const c: Cond = { n, levels, caseIdx: new Int32Array(n), kind: new Uint8Array(n), slot: new Int32Array(n), byCase: null };
  for (let i = 0; i < n; i++) {
    const r = set.rows[i] as number;
    const y = cols.truth[r] as number;
    const d = cols.finalCall[r] as number;
    const a = cols.aiCall[r] as number;
    c.caseIdx[i] = caseIndex[cols.case[r] as number] as number;
    let kind = y === 1 ? TRUTH : 0;
    if (d === y) kind |= CORRECT;
    if (a !== -1) {
      kind |= HAS_AI;
      if (d === a) kind |= FOLLOW;
      if (a !== y) kind |= AI_WRONG;
    }
    c.kind[i] = kind;
    c.slot[i] = 2 * (levelOf[r] as number) + y;
  }
  if (byCase) c.byCase = byCaseOf(c, cases);
  return c;
};

const byCaseOf = (c: Cond, cases: number): Cond['byCase'] => {
  if (2 * c.n < cases) return null;
  const kind = new Uint8Array(cases).fill(NO_READ);
  const slot = new Int32Array(cases).fill(2 * c.levels);
  for (let i = 0; i < c.n; i++) {
    const j = c.caseIdx[i] as number;
    if (kind[j] !== NO_READ) return null;
    kind[j] = c.kind[i] as number;
    slot[j] = c.slot[i] as number;
  }
  return { kind, slot };
};

// Weighted figures of one condition into out[offset..]: accuracy, sensitivity, specificity, AUC
// (Mann-Whitney over a weighted histogram of score levels, ties ½), then reliance when aided.
const condFigures = (c: Cond, work: Workspace, out: Float64Array, aided: boolean): void => {
  // Every sum here is of whole numbers (weights times 0 or 1) far below 2^53, so exact in any
  // order: the weights are summed per kind of read and per histogram slot in one pass without
  // branches, then the figures are read off the 32 kinds.
  const { hist, kinds } = work;
  hist.fill(0, 0, 2 * c.levels + 1);
  kinds.fill(0);
  if (c.byCase !== null) sumDrawn(c.byCase.kind, c.byCase.slot, work);
  else sumReads(c, work.w, hist, kinds);
  figuresOf(c.levels, hist, kinds, out, aided);
};

// The figures of one condition from its sums per kind and per histogram slot.
const figuresOf = (levels: number, hist: Int32Array, kinds: Int32Array, out: Float64Array, aided: boolean): void => {
  let nw = 0, correct = 0, p = 0, tp = 0, tn = 0, ai = 0, agree = 0, wrong = 0, fw = 0, rr = 0;
  for (let k = 0; k < 32; k++) {
    const wk = kinds[k] as number;
    if (wk === 0) continue;
    nw += wk;
    const ok = k & CORRECT ? 1 : 0;
    correct += wk * ok;
    if (k & TRUTH) {
      p += wk;
      tp += wk * ok;
    } else tn += wk * ok;
    if (k & HAS_AI) {
      ai += wk;
      const f = k & FOLLOW ? 1 : 0;
      agree += wk * f;
      if (k & AI_WRONG) {
        wrong += wk;
        fw += wk * f;
      } else rr += wk * (1 - f);
    }
  }
  const q = nw - p;
  let below = 0;
  let u = 0;
  for (let l = 0; l < levels; l++) {
    const neg = hist[2 * l] as number;
    u += (hist[2 * l + 1] as number) * (below + 0.5 * neg);
    below += neg;
  }
  out[aided ? IDX.aided_accuracy : IDX.unaided_accuracy] = nw > 0 ? correct / nw : Number.NaN;
  out[aided ? IDX.aided_sensitivity : IDX.unaided_sensitivity] = p > 0 ? tp / p : Number.NaN;
  out[aided ? IDX.aided_specificity : IDX.unaided_specificity] = q > 0 ? tn / q : Number.NaN;
  out[aided ? IDX.aided_auc : IDX.unaided_auc] = p > 0 && q > 0 ? u / (p * q) : Number.NaN;
  if (aided) {
    out[IDX.agreement] = ai > 0 ? agree / ai : Number.NaN;
    out[IDX.overreliance] = wrong > 0 ? fw / wrong : Number.NaN;
    out[IDX.underreliance] = ai - wrong > 0 ? rr / (ai - wrong) : Number.NaN;
  }
};

// weights per kind and slot, read by read
const sumReads = (c: Cond, w: Int32Array, hist: Int32Array, kinds: Int32Array): void => {
  const { caseIdx, kind, slot } = c;
  for (let i = 0; i < c.n; i++) {
    const wi = w[caseIdx[i] as number] as number;
    const k = kind[i] as number;
    kinds[k] = (kinds[k] as number) + wi;
    const h = slot[i] as number;
    hist[h] = (hist[h] as number) + wi;
  }
};

// the same sums over the drawn cases only (a case not drawn adds 0); a case the reader did not
// read goes to kind NO_READ and slot 2·levels, which the figures leave out
const sumDrawn = (kind: Uint8Array, slot: Int32Array, work: Workspace): void => {
  const { hist, kinds, drawn, drawnWeight } = work;
  const m = work.drawnCount;
  for (let j = 0; j < m; j++) {
    const c = drawn[j] as number;
    const wc = drawnWeight[j] as number;
    const k = kind[c] as number;
    kinds[k] = (kinds[k] as number) + wc;
    const h = slot[c] as number;
    hist[h] = (hist[h] as number) + wc;
  }
};

// sumDrawn of both conditions in one pass over the drawn cases (the second into hist2, kinds2)
const sumDrawnBoth = (u: { kind: Uint8Array; slot: Int32Array }, a: { kind: Uint8Array; slot: Int32Array }, work: Workspace): void => {
  const { hist, kinds, hist2, kinds2, drawn, drawnWeight } = work;
  const uk = u.kind, us = u.slot, ak = a.kind, as = a.slot;
  const m = work.drawnCount;
  for (let j = 0; j < m; j++) {
    const c = drawn[j] as number;
    const wc = drawnWeight[j] as number;
    const k = uk[c] as number;
    kinds[k] = (kinds[k] as number) + wc;
    const h = us[c] as number;
    hist[h] = (hist[h] as number) + wc;
    const k2 = ak[c] as number;
    kinds2[k2] = (kinds2[k2] as number) + wc;
    const h2 = as[c] as number;
    hist2[h2] = (hist2[h2] as number) + wc;
  }
};

type ReaderConds = { unaided: Cond | null; aided: Cond | null };

const readerFigures = (r: ReaderConds, work: Workspace, out: Float64Array): void => {
  out.fill(Number.NaN);
  const u = r.unaided, a = r.aided;
  if (u !== null && a !== null && u.byCase !== null && a.byCase !== null) {
    const { hist, kinds, hist2, kinds2 } = work;
    hist.fill(0, 0, 2 * u.levels + 1);
    kinds.fill(0);
    hist2.fill(0, 0, 2 * a.levels + 1);
    kinds2.fill(0);
    sumDrawnBoth(u.byCase, a.byCase, work);
    figuresOf(u.levels, hist, kinds, out, false);
    figuresOf(a.levels, hist2, kinds2, out, true);
  } else {
    if (u) condFigures(u, work, out, false);
    if (a) condFigures(a, work, out, true);
  }
  out[IDX.accuracy_difference] = (out[IDX.aided_accuracy] as number) - (out[IDX.unaided_accuracy] as number);
  out[IDX.auc_difference] = (out[IDX.aided_auc] as number) - (out[IDX.unaided_auc] as number);
};

/**
 * Reader-averaged figures (the mean over readers of each reader's accuracy, sensitivity,
 * specificity and AUC per condition, their aided − unaided differences, and reliance) with 95%
 * percentile intervals from a seeded two-way bootstrap: each resample draws readers with
 * replacement and, independently, cases with replacement (the same cases for every reader), then
 * recomputes the reader-averaged figures (Efron & Tibshirani 1993 percentile method; two-way
 * resampling of readers and cases as in Beiden, Wagner & Campbell 2000). `boot` = 0 gives point
 * estimates only. Reads must be one finding's non-practice reads.
 * Throws RangeError when boot is not a whole number ≥ 0 or the seed not a whole number.
 * Example: readerAveraged(reads, { seed: 1, boot: 2000 }).auc_difference.lower.
 */
export const readerAveraged = (reads: readonly ReadRow[], options: { seed: number; boot: number }): ReaderAveraged => {
  const cols = readColumns(reads);
  const all = allRows(cols);
  const parts = partitionReads(sectionReads(cols, all), cols.reader, cols.readerIds.length).filter((p) => p !== null);
  return readerAveragedOf(cols, all, parts, options);
};

/**
 * readerAveraged of reads held as columns: `all` the finding's reads (cases are numbered in order
 * of first appearance there), `perReader` each reader's share in order of first appearance.
 */
export const readerAveragedOf = (cols: ReadColumns, all: Int32Array, perReader: readonly SectionReads[], options: { seed: number; boot: number }): ReaderAveraged => {
  const plan = bootstrapPlanOf(cols, all, perReader, options);
  return readerAveragedOfDraws(plan, bootstrapResamples(plan, 0, plan.boot));
};

/**
 * What the resamples of one finding need, in plain data (numbers and typed arrays, so it can be
 * copied to another thread): each reader's reads as flat arrays, the counts of readers and cases,
 * and the point estimates.
 */
export type BootstrapPlan = {
  seed: number;
  boot: number;
  readers: ReaderConds[];
  cases: number;
  maxLevels: number;
  estimate: (number | null)[];
  readersUsed: number[];
};

/**
 * The plan of readerAveragedOf's resamples (same arguments). Throws RangeError when boot is not a
 * whole number >= 0 or the seed not a whole number.
 */
export const bootstrapPlanOf = (cols: ReadColumns, all: Int32Array, perReader: readonly SectionReads[], options: { seed: number; boot: number; byCase?: boolean }): BootstrapPlan => {
  const { seed, boot } = options;
  if (!Number.isInteger(boot) || boot < 0) throw new RangeError(`boot must be a whole number >= 0, got ${boot}`);
  seededInts(seed);
  const cases = firstAppearance(cols.case, all, cols.caseCount);
  const caseIndex = new Int32Array(cols.caseCount);
  cases.first.forEach((c, i) => {
    caseIndex[c] = i;
  });
  // byCase false: every reader's sums read by read (the tests compare the two ways)
  const byCase = options.byCase ?? true;
  const readers: ReaderConds[] = perReader.map((g) => ({ unaided: toCond(cols, g.unaided, caseIndex, cases.count, byCase), aided: toCond(cols, g.aided, caseIndex, cases.count, byCase) }));
  let maxLevels = 1;
  for (const r of readers) maxLevels = Math.max(maxLevels, r.unaided?.levels ?? 0, r.aided?.levels ?? 0);
  const plan: BootstrapPlan = { seed, boot, readers, cases: cases.count, maxLevels, estimate: [], readersUsed: [] };
  const work = workspace(plan);
  work.w.fill(1);
  listDrawn(work);
  average(plan, work, null);
  plan.estimate = Array.from(work.sum, (s, f) => ((work.cnt[f] as number) > 0 ? s / (work.cnt[f] as number) : null));
  plan.readersUsed = Array.from(work.cnt);
  return plan;
};

type Workspace = {
  hist: Int32Array; kinds: Int32Array; hist2: Int32Array; kinds2: Int32Array; one: Float64Array; sum: Float64Array; cnt: Int32Array;
  w: Int32Array; picks: Int32Array; figures: Float64Array; computed: Uint8Array;
  /** the cases of weight > 0 (drawnCount of them) and their weights */
  drawn: Int32Array; drawnWeight: Int32Array; drawnCount: number;
};

const workspace = (plan: BootstrapPlan): Workspace => {
  const R = plan.readers.length;
  return {
    hist: new Int32Array(2 * plan.maxLevels + 1), kinds: new Int32Array(NO_READ + 1),
    hist2: new Int32Array(2 * plan.maxLevels + 1), kinds2: new Int32Array(NO_READ + 1), one: new Float64Array(F),
    sum: new Float64Array(F), cnt: new Int32Array(F), w: new Int32Array(plan.cases), picks: new Int32Array(R),
    figures: new Float64Array(R * F), computed: new Uint8Array(R),
    drawn: new Int32Array(plan.cases), drawnWeight: new Int32Array(plan.cases), drawnCount: 0,
  };
};

// Reader-averaged figures under the case weights work.w, over the readers work.picks (all
// readers in order when picks is null) into work.sum and work.cnt. Each reader's figures are
// computed once per resample, however often the resample draws them (a draw of R readers from R
// holds about 63% of them), then added in the order drawn, as if recomputed.
const average = (plan: BootstrapPlan, work: Workspace, picks: Int32Array | null): void => {
  const { sum, cnt, computed, figures, one } = work;
  const R = plan.readers.length;
  sum.fill(0);
  cnt.fill(0);
  computed.fill(0);
  for (let i = 0; i < R; i++) {
    const k = picks === null ? i : (picks[i] as number);
    if (computed[k] === 0) {
      readerFigures(plan.readers[k] as ReaderConds, work, one);
      figures.set(one, k * F);
      computed[k] = 1;
    }
    for (let f = 0; f < F; f++) {
      const v = figures[k * F + f] as number;
      if (!Number.isNaN(v)) {
        sum[f] = (sum[f] as number) + v;
        cnt[f] = (cnt[f] as number) + 1;
      }
    }
  }
};

// One resample's draws from the seeded stream: C cases with replacement as weights, then R readers.
const drawResample = (rng: SeededInts, work: Workspace, C: number, R: number): void => {
  const { w, picks } = work;
  w.fill(0);
  for (let j = 0; j < C; j++) {
    const c = rng.below(C);
    w[c] = (w[c] as number) + 1;
  }
  for (let i = 0; i < R; i++) picks[i] = rng.below(R);
};

const listDrawn = (work: Workspace): void => {
  const { w, drawn, drawnWeight } = work;
  let m = 0;
  for (let c = 0; c < w.length; c++) {
    const wc = w[c] as number;
    if (wc === 0) continue;
    drawn[m] = c;
    drawnWeight[m] = wc;
    m++;
  }
  work.drawnCount = m;
};

/**
 * The reader-averaged figures of resamples [from, to) of a plan: resample b is the b-th draw of
 * the seeded stream (the draws of the resamples before `from` are made and dropped), so the
 * pieces of any split of [0, boot), joined in order, are bit for bit the whole. Returns
 * (to − from)·F numbers, resample by resample in the order of AVERAGED_FIGURES (NaN where no
 * drawn reader has the figure). Throws RangeError unless 0 <= from <= to <= boot, whole numbers.
 */
export const bootstrapResamples = (plan: BootstrapPlan, from: number, to: number): Float64Array => {
  if (!Number.isInteger(from) || !Number.isInteger(to) || from < 0 || from > to || to > plan.boot) {
    throw new RangeError(`resamples must be a range within 0..${plan.boot}, got ${from}..${to}`);
  }
  const out = new Float64Array((to - from) * F);
  if (to === from) return out;
  const rng = seededInts(plan.seed);
  const work = workspace(plan);
  const R = plan.readers.length;
  const C = plan.cases;
  for (let b = 0; b < from; b++) drawResample(rng, work, C, R);
  for (let b = from; b < to; b++) {
    drawResample(rng, work, C, R);
    listDrawn(work);
    average(plan, work, work.picks);
    const { sum, cnt } = work;
    const at = (b - from) * F;
    for (let f = 0; f < F; f++) out[at + f] = (cnt[f] as number) > 0 ? (sum[f] as number) / (cnt[f] as number) : Number.NaN;
  }
  return out;
};

/**
 * The reader-averaged figures of a plan with its percentile intervals from the figures of all its
 * resamples (bootstrapResamples of [0, boot), or its pieces joined in order).
 * Throws RangeError when draws does not hold boot·F numbers.
 */
export const readerAveragedOfDraws = (plan: BootstrapPlan, draws: Float64Array): ReaderAveraged => {
  const { boot, seed, estimate, readersUsed } = plan;
  if (draws.length !== boot * F) throw new RangeError(`expected ${boot * F} resampled figures, got ${draws.length}`);
  const result = { boot, seed } as ReaderAveraged;
  const column = new Float64Array(boot);
  AVERAGED_FIGURES.forEach((name, f) => {
    let n = 0;
    for (let b = 0; b < boot; b++) {
      const v = draws[b * F + f] as number;
      if (!Number.isNaN(v)) column[n++] = v;
    }
    const defined = column.slice(0, n).sort();
    // common practice, no source: an interval from fewer than half the resamples is not reported
    const ok = boot > 0 && defined.length >= boot / 2 && estimate[f] !== null;
    result[name] = {
      estimate: estimate[f] ?? null,
      lower: ok ? quantileSorted(defined, 0.025) : null,
      upper: ok ? quantileSorted(defined, 0.975) : null,
      readers: readersUsed[f] ?? 0,
    };
  });
  return result;
};
