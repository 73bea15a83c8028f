import type { ReadRow } from '../core/read-log';
import { delongPairedTest, type PairedAucTest } from './delong-paired';
import { mcnemar, type McNemar } from './mcnemar';
import { allRows, readColumns, type ReadColumns } from './read-columns';
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
  const cols = readColumns(reads);
  const unaided: number[] = [];
  const aided: number[] = [];
  pairsOfOneReader(cols, allRows(cols), unaided, aided);
  return unaided.map((u, k) => ({ unaided: reads[u] as ReadRow, aided: reads[aided[k] as number] as ReadRow }));
};

/** Crossover pairs as row numbers: unaided[k] and aided[k] form pair k. */
export type PairRows = { unaided: Int32Array; aided: Int32Array };

/**
 * crossoverPairs of reads given as row numbers into columns, of one reader or several: pairs are
 * formed within each reader, readers in order of first appearance. `readers` counts them.
 */
export const crossoverPairsOf = (cols: ReadColumns, rows: Int32Array): PairRows & { readers: number } => {
  const perReader = byFirstReader(cols, rows);
  const unaided: number[] = [];
  const aided: number[] = [];
  for (const readerRows of perReader) pairsOfOneReader(cols, readerRows, unaided, aided);
  return { unaided: Int32Array.from(unaided), aided: Int32Array.from(aided), readers: perReader.length };
};

// One reader's pairs: per case, in order of first appearance, its first unaided read and the
// first aided read in another period.
const pairsOfOneReader = (cols: ReadColumns, rows: Int32Array, outU: number[], outA: number[]): void => {
  // per case its first unaided and first aided read, in the columns' scratch (left all −1 again)
  const [firstU, firstA] = cols.caseScratch;
  const order: number[] = [];
  let moreAided: Map<number, number[]> | null = null;
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const c = cols.case[r] as number;
    if (firstU[c] === -1 && firstA[c] === -1) order.push(c);
    if (cols.aided[r] === 0) {
      if (firstU[c] === -1) firstU[c] = r;
    } else if (firstA[c] === -1) firstA[c] = r;
    else {
      moreAided ??= new Map();
      const list = moreAided.get(c);
      if (list === undefined) moreAided.set(c, [r]);
      else list.push(r);
    }
  }
  for (const c of order) {
    const u = firstU[c] as number;
    const a = firstA[c] as number;
    firstU[c] = -1;
    firstA[c] = -1;
    if (u === -1 || a === -1) continue;
    const period = cols.period[u] as number;
    const other = cols.period[a] !== period ? a : moreAided?.get(c)?.find((x) => cols.period[x] !== period);
    if (other !== undefined) {
      outU.push(u);
      outA.push(other);
    }
  }
};

// Rows grouped by reader, readers in order of first appearance; one reader's rows need no grouping.
const byFirstReader = (cols: ReadColumns, rows: Int32Array): Int32Array[] => {
  if (rows.length === 0) return [];
  const first = cols.reader[rows[0] as number];
  let one = true;
  for (let k = 1; k < rows.length && one; k++) one = cols.reader[rows[k] as number] === first;
  if (one) return [rows];
  const groups = new Map<number, number[]>();
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const id = cols.reader[r] as number;
    const list = groups.get(id);
    if (list === undefined) groups.set(id, [r]);
    else list.push(r);
  }
  return [...groups.values()].map((g) => Int32Array.from(g));
};

/**
 * Paired accuracy with McNemar's exact test (docs/methods.md) over crossover pairs.
 * Example: pairedAccuracy(pairs).mcnemar.p.
 */
export const pairedAccuracy = (pairs: readonly CrossoverPair[]): PairedAccuracy => {
  const { cols, pairs: rows } = pairColumns(pairs);
  return pairedAccuracyOf(cols, rows);
};

/** pairedAccuracy of pairs given as row numbers into columns. */
export const pairedAccuracyOf = (cols: ReadColumns, pairs: PairRows): PairedAccuracy => {
  let ru = 0;
  let ra = 0;
  let b = 0;
  let c = 0;
  const n = pairs.unaided.length;
  for (let k = 0; k < n; k++) {
    const ur = pairs.unaided[k] as number;
    const ar = pairs.aided[k] as number;
    const u = cols.finalCall[ur] === cols.truth[ur];
    const a = cols.finalCall[ar] === cols.truth[ar];
    if (u) ru++;
    if (a) ra++;
    if (u && !a) b++;
    if (!u && a) c++;
  }
  return {
    n,
    unaided_accuracy: wilson(ru, n),
    aided_accuracy: wilson(ra, n),
    accuracy_difference: n === 0 ? null : (ra - ru) / n,
    mcnemar: mcnemar(b, c),
  };
};

// Pairs of row objects as columns: pair k is rows 2k (unaided) and 2k + 1 (aided).
const pairColumns = (pairs: readonly CrossoverPair[]): { cols: ReadColumns; pairs: PairRows } => {
  const cols = readColumns(pairs.flatMap((p) => [p.unaided, p.aided]));
  return { cols, pairs: { unaided: Int32Array.from(pairs, (_, k) => 2 * k), aided: Int32Array.from(pairs, (_, k) => 2 * k + 1) } };
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
  const { cols, pairs: rows } = pairColumns(pairs);
  return crossoverOf(cols, rows, withAuc);
};

/** crossoverFromPairs of pairs given as row numbers into columns (the engine's path; same numbers). */
export const crossoverOf = (cols: ReadColumns, pairs: PairRows, withAuc: boolean): CrossoverSection | null => {
  const n = pairs.unaided.length;
  if (n === 0) return null;
  const wrongU: number[] = [];
  const wrongA: number[] = [];
  for (let k = 0; k < n; k++) {
    const a = pairs.aided[k] as number;
    const ai = cols.aiCall[a] as number;
    if (ai !== -1 && ai !== cols.truth[a]) {
      wrongU.push(pairs.unaided[k] as number);
      wrongA.push(a);
    }
  }
  const wrong = { unaided: Int32Array.from(wrongU), aided: Int32Array.from(wrongA) };
  return { ...pairedAccuracyOf(cols, pairs), wrong_suggestion: pairedAccuracyOf(cols, wrong), auc_difference: withAuc ? pairedAuc(cols, pairs) : null };
};

const pairedAuc = (cols: ReadColumns, pairs: PairRows): PairedAucTest | null => {
  const up: number[] = [];
  const un: number[] = [];
  const ap: number[] = [];
  const an: number[] = [];
  for (let k = 0; k < pairs.unaided.length; k++) {
    const u = pairs.unaided[k] as number;
    const a = pairs.aided[k] as number;
    if (cols.truth[u] === 1) {
      up.push(cols.score[u] as number);
      ap.push(cols.score[a] as number);
    } else {
      un.push(cols.score[u] as number);
      an.push(cols.score[a] as number);
    }
  }
  if (up.length < 2 || un.length < 2) return null;
  return delongPairedTest({ positives: up, negatives: un }, { positives: ap, negatives: an });
};
