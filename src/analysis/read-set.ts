import { argsort } from './argsort';
import type { ReadColumns } from './read-columns';

/**
 * One condition's reads as row numbers into ReadColumns, three ways: in the order of the reads
 * (sums run in this order, so results match the per-object code to the last bit), by score
 * ascending (AUC placements) and by reading time ascending (median, quartiles). The two sorted
 * orders are made once per finding and condition; every smaller set (a reader, a subgroup) keeps
 * its share of them by `partition`, which preserves order, so nothing is sorted again.
 */
export type ReadSet = { rows: Int32Array; byScore: Int32Array; byTime: Int32Array };

/** The reads of one finding, reader or subgroup: all of them in order, and each condition as a ReadSet. */
export type SectionReads = { all: Int32Array; unaided: ReadSet; aided: ReadSet };

/** A ReadSet of the given rows, sorting them by score and by time (stable). */
export const sortedSet = (cols: ReadColumns, rows: Int32Array): ReadSet => ({
  rows,
  byScore: orderBy(cols.score, rows),
  byTime: orderBy(cols.totalMs, rows),
});

const orderBy = (values: Float64Array, rows: Int32Array): Int32Array => {
  const v = new Float64Array(rows.length);
  for (let k = 0; k < rows.length; k++) v[k] = values[rows[k] as number] as number;
  const perm = argsort(v);
  const out = new Int32Array(rows.length);
  for (let k = 0; k < rows.length; k++) out[k] = rows[perm[k] as number] as number;
  return out;
};

/** Rows split by condition (aided or not), each sorted: the reads of one finding or a stand-alone set. */
export const sectionReads = (cols: ReadColumns, all: Int32Array): SectionReads => {
  const [unaided, aided] = partition(all, cols.aided, 2) as [Int32Array, Int32Array];
  return { all, unaided: sortedSet(cols, unaided), aided: sortedSet(cols, aided) };
};

/**
 * Rows split by a small-integer key per row (0..keys−1), each part in the order given.
 * Example: partition(Int32Array.of(4, 1, 2), key, 2) with key 0,1,0 at rows 4,1,2 → [[4, 2], [1]].
 */
export const partition = (rows: Int32Array, key: ArrayLike<number>, keys: number): Int32Array[] => {
  const count = new Int32Array(keys);
  for (let k = 0; k < rows.length; k++) {
    const c = key[rows[k] as number] as number;
    count[c] = (count[c] as number) + 1;
  }
  const parts = Array.from(count, (c) => new Int32Array(c));
  count.fill(0);
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const c = key[r] as number;
    (parts[c] as Int32Array)[count[c] as number] = r;
    count[c] = (count[c] as number) + 1;
  }
  return parts;
};

/** A ReadSet split by a key per row: each part keeps its reads' order and both sorted orders. */
export const partitionSet = (set: ReadSet, key: ArrayLike<number>, keys: number): ReadSet[] => {
  const rows = partition(set.rows, key, keys);
  const byScore = partition(set.byScore, key, keys);
  const byTime = partition(set.byTime, key, keys);
  return rows.map((r, i) => ({ rows: r, byScore: byScore[i] as Int32Array, byTime: byTime[i] as Int32Array }));
};

/** SectionReads split by a key per row (readers, attribute values); parts with no read are null. */
export const partitionReads = (reads: SectionReads, key: ArrayLike<number>, keys: number): (SectionReads | null)[] => {
  const all = partition(reads.all, key, keys);
  const unaided = partitionSet(reads.unaided, key, keys);
  const aided = partitionSet(reads.aided, key, keys);
  return all.map((a, i) => (a.length === 0 ? null : { all: a, unaided: unaided[i] as ReadSet, aided: aided[i] as ReadSet }));
};
