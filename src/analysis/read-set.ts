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
  let aidedCount = 0;
  for (let k = 0; k < all.length; k++) aidedCount += cols.aided[all[k] as number] as number;
  const unaided = new Int32Array(all.length - aidedCount);
  const aided = new Int32Array(aidedCount);
  splitByFlag(all, cols.aided, unaided, aided);
  return { all, unaided: sortedSet(cols, unaided), aided: sortedSet(cols, aided) };
};

// rows with flag 0 into `off`, flag 1 into `on`, each in the order given (both sized to fit)
const splitByFlag = (rows: Int32Array, flag: Uint8Array, off: Int32Array, on: Int32Array): void => {
  let a = 0;
  let b = 0;
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    if (flag[r] === 1) on[b++] = r;
    else off[a++] = r;
  }
};

// The hot loops below are small functions that only ever see Int32Array keys, so V8 keeps one
// fast form of each (a key given now as Uint8Array, now as Int32Array slowed every loop down).

/** How many of `rows` have each key value 0..keys−1. */
const countKeys = (rows: Int32Array, key: Int32Array, keys: number): Int32Array => {
  const count = new Int32Array(keys);
  for (let k = 0; k < rows.length; k++) {
    const c = key[rows[k] as number] as number;
    count[c] = (count[c] as number) + 1;
  }
  return count;
};

// `rows` dealt into `parts` by key, in the order given; `fill` (one slot per key) is zeroed first
const deal = (rows: Int32Array, key: Int32Array, parts: Int32Array[], fill: Int32Array): void => {
  fill.fill(0);
  for (let k = 0; k < rows.length; k++) {
    const r = rows[k] as number;
    const c = key[r] as number;
    (parts[c] as Int32Array)[fill[c] as number] = r;
    fill[c] = (fill[c] as number) + 1;
  }
};

const partsOf = (count: Int32Array): Int32Array[] => Array.from(count, (c) => new Int32Array(c));

/**
 * Rows split by a small-integer key per row (0..keys−1), each part in the order given.
 * Example: partition(Int32Array.of(4, 1, 2), key, 2) with key 0,1,0 at rows 4,1,2 → [[4, 2], [1]].
 */
export const partition = (rows: Int32Array, key: Int32Array, keys: number): Int32Array[] => {
  const count = countKeys(rows, key, keys);
  const parts = partsOf(count);
  deal(rows, key, parts, count);
  return parts;
};

// a set's three orders hold the same rows, so one count sizes the parts of all three
const partitionSetCounted = (set: ReadSet, key: Int32Array, count: Int32Array, fill: Int32Array): ReadSet[] => {
  const rows = partsOf(count);
  const byScore = partsOf(count);
  const byTime = partsOf(count);
  deal(set.rows, key, rows, fill);
  deal(set.byScore, key, byScore, fill);
  deal(set.byTime, key, byTime, fill);
  return rows.map((r, i) => ({ rows: r, byScore: byScore[i] as Int32Array, byTime: byTime[i] as Int32Array }));
};

/** A ReadSet split by a key per row: each part keeps its reads' order and both sorted orders. */
export const partitionSet = (set: ReadSet, key: Int32Array, keys: number): ReadSet[] =>
  partitionSetCounted(set, key, countKeys(set.rows, key, keys), new Int32Array(keys));

/** SectionReads split by a key per row (readers, attribute values); parts with no read are null. */
export const partitionReads = (reads: SectionReads, key: Int32Array, keys: number): (SectionReads | null)[] => {
  const fill = new Int32Array(keys);
  const unaided = partitionSetCounted(reads.unaided, key, countKeys(reads.unaided.rows, key, keys), fill);
  const aided = partitionSetCounted(reads.aided, key, countKeys(reads.aided.rows, key, keys), fill);
  const all = partsOf(Int32Array.from(unaided, (u, i) => u.rows.length + (aided[i] as ReadSet).rows.length));
  deal(reads.all, key, all, fill);
  return all.map((a, i) => (a.length === 0 ? null : { all: a, unaided: unaided[i] as ReadSet, aided: aided[i] as ReadSet }));
};
