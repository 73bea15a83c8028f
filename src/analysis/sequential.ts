import type { ReadRow } from '../core/read-log';
import { allRows, readColumns, type ReadColumns } from './read-columns';
import { weightOfAdvice, weightOfAdviceAbsolute, type WeightOfAdvice } from './weight-of-advice';
import { wilson, type Proportion } from './wilson';

export type SequentialSection = {
  n: number;
  /** #(d0 ≠ d) */
  changed: Proportion;
  /** #(d0 ≠ a and d = a) */
  toward_ai: Proportion;
  /** #(d0 ≠ y and d = y) */
  beneficial: Proportion;
  /** #(d0 = y and d ≠ y) */
  detrimental: Proportion;
  /** relative AI reliance (Schemmer et al. 2023): k = #(d0 ≠ y, a = y, d = y), n = #(d0 ≠ y, a = y) */
  rair: Proportion;
  /** relative self-reliance (Schemmer et al. 2023): k = #(d0 = y, a ≠ y, d = y), n = #(d0 = y, a ≠ y) */
  rsr: Proportion;
  /**
   * over-reliance given the reader was first right, = 1 − rsr (Schemmer et al. 2023):
   * k = #(d0 = y, a ≠ y, d ≠ y), n = #(d0 = y, a ≠ y). Not the unconditional `overreliance`
   * of the aided section, whose n is every wrong suggestion.
   */
  overreliance_given_first_right: Proportion;
  /**
   * under-reliance given the reader was first wrong, = 1 − rair (Schemmer et al. 2023):
   * k = #(d0 ≠ y, a = y, d ≠ y), n = #(d0 ≠ y, a = y). Not the unconditional `underreliance`.
   */
  underreliance_given_first_wrong: Proportion;
  /** weight of advice, signed form (Harvey & Fischer 1997): (s − s0)/(100p − s0) in [0,1] */
  woa_signed: WeightOfAdvice;
  /** weight of advice, absolute form (Yaniv 2004): |s − s0|/|100p − s0| in [0,1] */
  woa_absolute: WeightOfAdvice;
  /** the signed form under its first name, kept so older readers of the JSON keep working */
  woa: WeightOfAdvice;
};

/**
 * Sequential-reading metrics (docs/methods.md) over reads with an initial call d0, a suggestion
 * call a and a final call d; counts as proportions of the n sequential reads (Wilson intervals).
 * RAIR and RSR follow Schemmer, Kuehl, Benz, Bartos & Satzger (2023), "Appropriate reliance on
 * AI advice", IUI '23 (the conditional over- and under-reliance are their complements: a wrong
 * final call with binary calls means following the wrong suggestion, or rejecting the right one).
 * Weight of advice in both forms, see weight-of-advice.ts. Definitions: docs/methods.md.
 * Returns null when no read qualifies. Throws RangeError when a confidence is outside 0..100.
 * Example: sequentialSection(reads)?.changed.k → number of reads whose call changed.
 */
export const sequentialSection = (reads: readonly ReadRow[]): SequentialSection | null => {
  const cols = readColumns(reads);
  return sequentialOf(cols, allRows(cols));
};

/** sequentialSection over reads given as row numbers into columns (the engine's path; same numbers). */
export const sequentialOf = (cols: ReadColumns, rows: Int32Array): SequentialSection | null => {
  let n = 0;
  let changed = 0;
  let toward = 0;
  let beneficial = 0;
  let detrimental = 0;
  let rairK = 0;
  let rairN = 0;
  let rsrK = 0;
  let rsrN = 0;
  const s: number[] = [];
  const s0: number[] = [];
  const p: number[] = [];
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    if (cols.sequential[r] !== 1) continue;
    n++;
    const d0 = cols.initialCall[r] as number;
    const d = cols.finalCall[r] as number;
    const a = cols.aiCall[r] as number;
    const y = cols.truth[r] as number;
    if (d0 !== d) changed++;
    if (d0 !== a && d === a) toward++;
    if (d0 !== y && d === y) beneficial++;
    if (d0 === y && d !== y) detrimental++;
    if (d0 !== y && a === y) {
      rairN++;
      if (d === y) rairK++;
    }
    if (d0 === y && a !== y) {
      rsrN++;
      if (d === y) rsrK++;
    }
    // weight of advice compares likelihoods with the suggestion's probability: not on five-point
    const final = cols.likelihood[r] as number;
    const initial = cols.initialLikelihood[r] as number;
    const advice = cols.aiScore[r] as number;
    if (!Number.isNaN(advice) && !Number.isNaN(final) && !Number.isNaN(initial)) {
      s.push(final);
      s0.push(initial);
      p.push(advice);
    }
  }
  if (n === 0) return null;
  const signed = weightOfAdvice(s, s0, p);
  return {
    n,
    changed: wilson(changed, n),
    toward_ai: wilson(toward, n),
    beneficial: wilson(beneficial, n),
    detrimental: wilson(detrimental, n),
    rair: wilson(rairK, rairN),
    rsr: wilson(rsrK, rsrN),
    overreliance_given_first_right: wilson(rsrN - rsrK, rsrN),
    underreliance_given_first_wrong: wilson(rairN - rairK, rairN),
    woa_signed: signed,
    woa_absolute: weightOfAdviceAbsolute(s, s0, p),
    woa: signed,
  };
};
