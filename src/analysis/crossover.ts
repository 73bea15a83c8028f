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
 * another (SPEC Contract 2). Reads must already be one reader's reads of one finding. Each case
 * gives at most one pair: its first unaided read and the first aided read in another period.
 * Example: crossoverPairs(reads).length.
 */
export const crossoverPairs = (reads: readonly ReadRow[]): CrossoverPair[] => {
  const byCase = new Map<string, { u: ReadRow[]; a: ReadRow[] }>();
  for (const r of reads) {
    let e = byCase.get(r.case_id);
    if (e === undefined) {
      e = { u: [], a: [] };
      byCase.set(r.case_id, e);
    }
    (isAided(r) ? e.a : e.u).push(r);
  }
  const pairs: CrossoverPair[] = [];
  for (const { u, a } of byCase.values()) {
    const unaided = u[0];
    if (unaided === undefined) continue;
    const aided = a.find((x) => x.period !== unaided.period);
    if (aided !== undefined) pairs.push({ unaided, aided });
  }
  return pairs;
};

/**
 * Paired accuracy with McNemar's exact test (SPEC Contract 2) over crossover pairs.
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
