import { lowerBound, midranksOf, toFloat64 } from './midrank';
import { Z95 } from './wilson';

/**
 * Structural components (placement values) of the Mann-Whitney AUC, DeLong, DeLong &
 * Clarke-Pearson (1988), computed from midranks as in Sun & Xu (2014):
 *   v10[i] = (Tz[i] − Tx[i]) / n   the share of negatives below positive i (ties count ½),
 *   v01[j] = 1 − (Tz[m+j] − Ty[j]) / m   the share of positives above negative j,
 *   auc = mean(v10) = mean(v01),
 * where Tz are midranks in the pooled sample, Tx within positives, Ty within negatives.
 * Throws RangeError when a class is empty or a score is not finite.
 * Example: placements([0.9, 0.4], [0.1, 0.4]) → v10 [1, 0.75], v01 [1, 0.75], auc 0.875.
 */
export type Placements = { v10: Float64Array; v01: Float64Array; auc: number };

export const placements = (positives: ArrayLike<number>, negatives: ArrayLike<number>): Placements => {
  const m = positives.length;
  const n = negatives.length;
  if (m === 0 || n === 0) throw new RangeError(`AUC needs both classes: ${m} positives, ${n} negatives`);
  const x = toFloat64(positives, 'AUC positives');
  const y = toFloat64(negatives, 'AUC negatives');
  if (m + n < MIDRANKS_FROM) return placementsByCounts(x, y);
  const pooled = new Float64Array(m + n);
  pooled.set(x);
  pooled.set(y, m);
  const tz = midranksOf(pooled);
  const tx = midranksOf(x);
  const ty = midranksOf(y);
  const v10 = new Float64Array(m);
  const v01 = new Float64Array(n);
  let sum = 0;
  for (let i = 0; i < m; i++) {
    const v = ((tz[i] as number) - (tx[i] as number)) / n;
    v10[i] = v;
    sum += v;
  }
  for (let j = 0; j < n; j++) v01[j] = 1 - ((tz[m + j] as number) - (ty[j] as number)) / m;
  return { v10, v01, auc: sum / m };
};

// Small samples: Tz[i] − Tx[i] is the number of negatives below positive i plus half those tied
// with it (and likewise for negatives), so one sweep over the distinct values of both sorted
// classes gives every placement; each value then finds its distinct value by binary search.
// Scores that are whole or half numbers in a short range (ratings, percents, the derived score
// 50 ± confidence/2) skip the sorts and searches: a count per value, swept in value order, gives
// the same whole numbers of cases below and tied, so the same placements to the last bit.
const placementsByCounts = (x: Float64Array, y: Float64Array): Placements => {
  const low = Math.min(lowestSlot(x), lowestSlot(y));
  const high = Math.max(highestSlot(x), highestSlot(y));
  if (high - low < SLOT_SPAN) return placementsBySlots(x, y, low, high - low + 1);
  return placementsBySort(x, y);
};

/**
 * Scores whose doubles (2·score, exact) are whole numbers within ±2^31 spanning fewer than this
 * many are counted per value (slot 2·score − the lowest 2·score); others are sorted.
 */
export const SLOT_SPAN = 4096;

// the smallest 2·value when every 2·value is a whole number within ±2^31, else NaN (no slot path)
const lowestSlot = (v: Float64Array): number => {
  let low = Infinity;
  for (let k = 0; k < v.length; k++) {
    const a = 2 * (v[k] as number);
    if (!(Number.isInteger(a) && a >= -2147483648 && a <= 2147483647)) return Number.NaN;
    if (a < low) low = a;
  }
  return low;
};

const highestSlot = (v: Float64Array): number => {
  let high = -Infinity;
  for (let k = 0; k < v.length; k++) if (2 * (v[k] as number) > high) high = 2 * (v[k] as number);
  return high;
};

const countSlots = (v: Float64Array, low: number, count: Int32Array): void => {
  for (let k = 0; k < v.length; k++) {
    const s = 2 * (v[k] as number) - low;
    count[s] = (count[s] as number) + 1;
  }
};

const fillBySlot = (v: Float64Array, low: number, bySlot: Float64Array, out: Float64Array): void => {
  for (let k = 0; k < v.length; k++) out[k] = bySlot[2 * (v[k] as number) - low] as number;
};

const placementsBySlots = (x: Float64Array, y: Float64Array, low: number, span: number): Placements => {
  const m = x.length;
  const n = y.length;
  const countX = new Int32Array(span);
  const countY = new Int32Array(span);
  countSlots(x, low, countX);
  countSlots(y, low, countY);
  const negBelowHalf = new Float64Array(span);
  const posAboveHalf = new Float64Array(span);
  // i, j: positives and negatives at or below the current value, as in the sorted sweep below
  let i = 0;
  let j = 0;
  for (let s = 0; s < span; s++) {
    const i0 = i;
    const j0 = j;
    i += countX[s] as number;
    j += countY[s] as number;
    negBelowHalf[s] = (j0 + (j - j0) / 2) / n;
    posAboveHalf[s] = (m - i + (i - i0) / 2) / m;
  }
  const v10 = new Float64Array(m);
  const v01 = new Float64Array(n);
  fillBySlot(x, low, negBelowHalf, v10);
  fillBySlot(y, low, posAboveHalf, v01);
  let sum = 0;
  for (let k = 0; k < m; k++) sum += v10[k] as number;
  return { v10, v01, auc: sum / m };
};

const placementsBySort = (x: Float64Array, y: Float64Array): Placements => {
  const m = x.length;
  const n = y.length;
  const xs = x.slice().sort();
  const ys = y.slice().sort();
  const values = new Float64Array(m + n);
  const negBelowHalf = new Float64Array(m + n);
  const posAboveHalf = new Float64Array(m + n);
  let d = 0;
  let i = 0;
  let j = 0;
  while (i < m || j < n) {
    const v = Math.min(i < m ? (xs[i] as number) : Infinity, j < n ? (ys[j] as number) : Infinity);
    const i0 = i;
    const j0 = j;
    while (i < m && xs[i] === v) i++;
    while (j < n && ys[j] === v) j++;
    values[d] = v;
    negBelowHalf[d] = (j0 + (j - j0) / 2) / n;
    posAboveHalf[d] = (m - i + (i - i0) / 2) / m;
    d++;
  }
  const distinct = values.subarray(0, d);
  const v10 = new Float64Array(m);
  const v01 = new Float64Array(n);
  let sum = 0;
  for (let k = 0; k < m; k++) {
    const p = negBelowHalf[lowerBound(distinct, x[k] as number)] as number;
    v10[k] = p;
    sum += p;
  }
  for (let k = 0; k < n; k++) v01[k] = posAboveHalf[lowerBound(distinct, y[k] as number)] as number;
  return { v10, v01, auc: sum / m };
};

/** From this many scores placements come from midranks (radix sorts), below it from counts; the two round differently. */
export const MIDRANKS_FROM = 8192;

/** Sample covariance (denominator k − 1) of two equal-length arrays; null when k < 2. */
export const sampleCovariance = (a: ArrayLike<number>, b: ArrayLike<number>): number | null => {
  const k = a.length;
  if (k < 2) return null;
  let ma = 0;
  let mb = 0;
  for (let i = 0; i < k; i++) {
    ma += a[i] as number;
    mb += b[i] as number;
  }
  ma /= k;
  mb /= k;
  let s = 0;
  for (let i = 0; i < k; i++) s += ((a[i] as number) - ma) * ((b[i] as number) - mb);
  return s / (k - 1);
};

export type DelongAuc = {
  auc: number;
  /** DeLong variance S10/m + S01/n; null when a class has fewer than 2 members */
  variance: number | null;
  se: number | null;
  v10: Float64Array;
  v01: Float64Array;
};

/**
 * Mann-Whitney AUC (ties count one half) with the DeLong et al. (1988) variance
 * var = S10/m + S01/n, S10 and S01 the sample variances of the placement values.
 * Throws RangeError when a class is empty or a score is not finite.
 * Example: delongAuc([0.9, 0.8, 0.4], [0.1, 0.4, 0.5]).auc → 0.8333 (7.5 of 9 pairs).
 */
export const delongAuc = (positives: ArrayLike<number>, negatives: ArrayLike<number>): DelongAuc => {
  const { v10, v01, auc } = placements(positives, negatives);
  const s10 = sampleCovariance(v10, v10);
  const s01 = sampleCovariance(v01, v01);
  const variance = s10 === null || s01 === null ? null : s10 / v10.length + s01 / v01.length;
  return { auc, variance, se: variance === null ? null : Math.sqrt(variance), v10, v01 };
};

export type AucSummary = { estimate: number | null; se: number | null; lower: number | null; upper: number | null };

/**
 * AUC as reported (docs/methods.md): estimate, DeLong SE, and estimate ± z·se clipped to [0,1].
 * Unlike delongAuc it never throws for an empty class: it gives nulls.
 * Example: aucSummary([1], []) → all null.
 */
export const aucSummary = (positives: ArrayLike<number>, negatives: ArrayLike<number>, z: number = Z95): AucSummary => {
  if (positives.length === 0 || negatives.length === 0) return { estimate: null, se: null, lower: null, upper: null };
  const { auc, se } = delongAuc(positives, negatives);
  return summarizeAuc(auc, se, z);
};

/** An AUC and its DeLong SE as reported: the interval estimate ± z·se clipped to [0,1], nulls without an SE. */
export const summarizeAuc = (auc: number, se: number | null, z: number = Z95): AucSummary => {
  if (se === null) return { estimate: auc, se: null, lower: null, upper: null };
  return { estimate: auc, se, lower: Math.max(0, auc - z * se), upper: Math.min(1, auc + z * se) };
};
