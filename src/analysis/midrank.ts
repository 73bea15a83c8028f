import { argsort } from './argsort';

/**
 * Midranks: the rank of each value among all values, ties sharing the mean of the ranks they
 * span (1-based). This is the building block of the fast DeLong algorithm of Sun & Xu (2014),
 * "Fast implementation of DeLong's algorithm for comparing the areas under correlated receiver
 * operating characteristic curves", IEEE Signal Processing Letters 21(11):1389-1393.
 * O(n log n) for small arrays, O(n) radix argsort for large ones (see midranksOf).
 * Throws RangeError when a value is not a finite number.
 * Example: midranks([3, 1, 3, 2]) → [3.5, 1, 3.5, 2].
 */
export const midranks = (values: ArrayLike<number>): Float64Array => midranksOf(toFloat64(values, 'midranks'));

/**
 * Midranks of finite typed values (no checks). Small arrays: a sorted copy and two binary
 * searches per value (cache-friendly). Large arrays: one radix argsort, then a sweep over runs of ties.
 */
export const midranksOf = (values: Float64Array): Float64Array => {
  const n = values.length;
  const out = new Float64Array(n);
  if (n < SWEEP_MIN) {
    const sorted = values.slice().sort();
    for (let i = 0; i < n; i++) {
      const v = values[i] as number;
      // sorted positions lo..hi-1 (0-based) equal v, so their 1-based ranks average (lo+1+hi)/2
      out[i] = (lowerBound(sorted, v) + upperBound(sorted, v) + 1) / 2;
    }
    return out;
  }
  const perm = argsort(values);
  let start = 0;
  while (start < n) {
    const v = values[perm[start] as number] as number;
    let end = start + 1;
    while (end < n && values[perm[end] as number] === v) end++;
    // sorted positions start..end-1 tie: ranks average (start+1+end)/2, as above
    const rank = (start + 1 + end) / 2;
    for (let k = start; k < end; k++) out[perm[k] as number] = rank;
    start = end;
  }
  return out;
};

/** A Float64Array copy; throws RangeError naming `what` on a non-finite value. */
export const toFloat64 = (values: ArrayLike<number>, what: string): Float64Array => {
  // copy natively first, then check on the typed copy: one monomorphic loop for any input kind
  const copy = Float64Array.from(values);
  for (let i = 0; i < copy.length; i++) {
    const v = copy[i] as number;
    if (v - v !== 0) throw new RangeError(`${what}: value ${i} is not a finite number (${v})`);
  }
  return copy;
};

/** A sorted Float64Array copy; throws RangeError naming `what` on a non-finite value. */
export const sortedCopy = (values: ArrayLike<number>, what: string): Float64Array => toFloat64(values, what).sort();

/** First index whose value is >= v, in an ascending array. */
export const lowerBound = (sorted: Float64Array, v: number): number => {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((sorted[mid] as number) < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
};

/** First index whose value is > v, in an ascending array. */
export const upperBound = (sorted: Float64Array, v: number): number => {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((sorted[mid] as number) <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
};

const SWEEP_MIN = 8192;
