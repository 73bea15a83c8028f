import type { ReadRow } from '../core/read-log';
import { delongPairedTest, type PairedAucTest } from './delong-paired';
import { mcnemar, type McNemar } from './mcnemar';
import { finalScore, isAided } from './read-scores';
import { wilson, type Proportion } from './wilson';

export type CrossoverPair = { unaided: ReadRow; aided: ReadRow };

export type PairedAccuracy = {
  /** number of pairs */
  n: number;
  unaided_accuracy: Proportion;
  aided_accuracy: Proportion;
  /** aided minus unaided accuracy; null when n = 0 */
  accuracy_difference: number | null;
  /** b = right unaided and wrong aided, c = the reverse */
  mcnemar: McNemar;
};

export type CrossoverSection = PairedAccuracy & {
  /** the same, restricted to pairs whose aided read had a wrong suggestion */
  wrong_suggestion: PairedAccuracy;
  /** paired DeLong test of aided minus unaided AUC over the pairs; null with < 2 pairs per class */
  auc_difference: PairedAucTest | null;
};

/**
 * Crossover pairs: the same reader, case and finding read unaided in one period and aided in
 * another (docs/methods.md). Reads must already be one reader's reads of one finding. Each case
 * gives at most one pair: its first unaided read and the first aided read in another period.
 * Example: crossoverPairs(reads).length.
 */
export const crossoverPairs = (reads: readonly ReadRow[]): CrossoverPair[] => {
  // Per case, in order of first appearance: the first unaided read, and the aided reads (most
  // cases have one, kept without an array).
  const byCase = new Map<string, CaseReads>();
  for (const r of reads) {
    let e = byCase.get(r.case_id);
    if (e === undefined) {
      e = { unaided: null, aided: null, moreAided: null };
      byCase.set(r.case_id, e);
    }
    if (!isAided(r)) {
      if (e.unaided === null) e.unaided = r;
    } else if (e.aided === null) e.aided = r;
    else if (e.moreAided === null) e.moreAided = [r];
    else e.moreAided.push(r);
  }
  const pairs: CrossoverPair[] = [];
  for (const { unaided, aided, moreAided } of byCase.values()) {
    if (unaided === null || aided === null) continue;
    const other = aided.period !== unaided.period ? aided : moreAided?.find((x) => x.period !== unaided.period);
    if (other !== undefined) pairs.push({ unaided, aided: other });
  }
  return pairs;
};

type CaseReads = { unaided: ReadRow | null; aided: ReadRow | null; moreAided: ReadRow[] | null };

/**
 * Paired accuracy with McNemar's exact test (docs/methods.md) over crossover pairs.
 * Example: pairedAccuracy(pairs).mcnemar.p.
 */
export const pairedAccuracy = (pairs: readonly CrossoverPair[]): PairedAccuracy => {
  let ru = 0;
  let ra = 0;
  let b = 0;
  let c = 0;
  for (const { unaided, aided } of pairs) {
    const u = unaided.final_call === unaided.truth;
    const a = aided.final_call === aided.truth;
    if (u) ru++;
    if (a) ra++;
    if (u && !a) b++;
    if (!u && a) c++;
  }
  const n = pairs.length;
  return {
    n,
    unaided_accuracy: wilson(ru, n),
    aided_accuracy: wilson(ra, n),
    accuracy_difference: n === 0 ? null : (ra - ru) / n,
    mcnemar: mcnemar(b, c),
  };
};

/**
 * The crossover section of one reader and finding: paired accuracy, the same on pairs with a
 * wrong suggestion, and the paired DeLong AUC difference. Null when there are no pairs.
 * Throws RangeError when a confidence is outside 0..100.
 * Example: crossoverSection(reads)?.accuracy_difference.
 */
export const crossoverSection = (reads: readonly ReadRow[]): CrossoverSection | null => crossoverFromPairs(crossoverPairs(reads), true);

/**
 * The crossover section from given pairs. withAuc false leaves auc_difference null: used for
 * pairs pooled over readers, where the DeLong variance would ignore the readers' clustering.
 */
export const crossoverFromPairs = (pairs: readonly CrossoverPair[], withAuc: boolean): CrossoverSection | null => {
  if (pairs.length === 0) return null;
  const wrong = pairs.filter((p) => p.aided.ai_call !== null && p.aided.ai_call !== p.aided.truth);
  return { ...pairedAccuracy(pairs), wrong_suggestion: pairedAccuracy(wrong), auc_difference: withAuc ? pairedAuc(pairs) : null };
};

const pairedAuc = (pairs: readonly CrossoverPair[]): PairedAucTest | null => {
  const up: number[] = [];
  const un: number[] = [];
  const ap: number[] = [];
  const an: number[] = [];
  for (const { unaided, aided } of pairs) {
    if (unaided.truth === 1) {
      up.push(finalScore(unaided));
      ap.push(finalScore(aided));
    } else {
      un.push(finalScore(unaided));
      an.push(finalScore(aided));
    }
  }
  if (up.length < 2 || un.length < 2) return null;
  return delongPairedTest({ positives: up, negatives: un }, { positives: ap, negatives: an });
};
