import { quantileSorted, sortValues } from './quantile';

/**
 * quantile (quantile.ts, Hyndman & Fan definition 7) by selection instead of a full sort: the
 * order statistics x⌊h⌋ and x⌊h⌋+1 are found by quickselect (median-of-three pivots; a sort after
 * too many rounds, so never quadratic), and the same interpolation is applied to them, so the
 * result equals quantile's for any values without a −0 (which a sort keeps before +0 and
 * selection need not). n = 0 gives null. Throws RangeError when q is outside [0,1] or a value is
 * not finite (the same messages as quantile).
 * Example: quantileBySelection([0.2, 1, 0, 0.5], 0.5) → 0.35.
 */
export const quantileBySelection = (values: ArrayLike<number>, q: number): number | null => {
  if (!(q >= 0 && q <= 1)) throw new RangeError(`quantile level must be in [0,1], got ${q}`);
  const n = values.length;
  if (n < SELECT_FROM) return quantileSorted(sortValues(values), q);
  const x = finiteCopy(values);
  const h = (n - 1) * q;
  const lo = Math.floor(h);
  if (!select(x, lo)) return quantileSorted(x.sort(), q);
  const a = x[lo] as number;
  if (lo + 1 >= n) return a;
  // after selection every value right of lo is ≥ x[lo]: the next order statistic is their least
  const b = leastFrom(x, lo + 1);
  return a + (h - lo) * (b - a);
};

/** Below this many values a sort is as quick, and quantile itself is used. */
export const SELECT_FROM = 64;

const finiteCopy = (values: ArrayLike<number>): Float64Array => {
  const out = Float64Array.from(values);
  for (let i = 0; i < out.length; i++) {
    const v = out[i] as number;
    if (v - v !== 0) throw new RangeError(`value ${i} is not a finite number: ${v}`);
  }
  return out;
};

const leastFrom = (x: Float64Array, from: number): number => {
  let b = x[from] as number;
  for (let i = from + 1; i < x.length; i++) if ((x[i] as number) < b) b = x[i] as number;
  return b;
};

// Rearranges x so that x[k] is the k-th smallest, everything left of it ≤ and right of it ≥;
// false (x still a permutation of the values) when it gives up after too many rounds.
const select = (x: Float64Array, k: number): boolean => {
  let left = 0;
  let right = x.length - 1;
  let rounds = 2 * Math.ceil(Math.log2(x.length)) + 8;
  while (right > left) {
    if (rounds-- === 0) return false;
    const [i, j] = split(x, left, right, pivotOf(x, left, right));
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return true;
  }
  return true;
};

const pivotOf = (x: Float64Array, left: number, right: number): number => {
  const a = x[left] as number;
  const b = x[(left + right) >>> 1] as number;
  const c = x[right] as number;
  return a < b ? (b < c ? b : a < c ? c : a) : a < c ? a : b < c ? c : b;
};

// Hoare partition of x[left..right] around the value p: afterwards x[left..j] ≤ p ≤ x[i..right]
// and every value between j and i equals p.
const split = (x: Float64Array, left: number, right: number, p: number): [number, number] => {
  let i = left;
  let j = right;
  while (i <= j) {
    while ((x[i] as number) < p) i++;
    while ((x[j] as number) > p) j--;
    if (i <= j) {
      const t = x[i] as number;
      x[i] = x[j] as number;
      x[j] = t;
      i++;
      j--;
    }
  }
  return [i, j];
};
