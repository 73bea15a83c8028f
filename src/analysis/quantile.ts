/**
 * Sample quantile by linear interpolation between order statistics (Hyndman & Fan 1996,
 * definition 7, the default of R's quantile() and numpy.quantile): h = (n − 1)·q,
 * Q = x⌊h⌋ + (h − ⌊h⌋)(x⌊h⌋+1 − x⌊h⌋). q = 0.5 is the usual median.
 * n = 0 gives null. Throws RangeError when q is outside [0,1] or a value is not finite.
 * Example: quantile([4, 1, 3, 2], 0.25) → 1.75; quantile([4, 1, 3, 2], 0.5) → 2.5.
 */
export const quantile = (values: ArrayLike<number>, q: number): number | null => quantileSorted(sortValues(values), q);

/** As quantile, on values already sorted ascending (no check). */
export const quantileSorted = (sorted: ArrayLike<number>, q: number): number | null => {
  if (!(q >= 0 && q <= 1)) throw new RangeError(`quantile level must be in [0,1], got ${q}`);
  const n = sorted.length;
  if (n === 0) return null;
  const h = (n - 1) * q;
  const lo = Math.floor(h);
  const a = sorted[lo] as number;
  return lo + 1 < n ? a + (h - lo) * ((sorted[lo + 1] as number) - a) : a;
};

/** Ascending typed copy; throws RangeError on a non-finite value. */
export const sortValues = (values: ArrayLike<number>): Float64Array => {
  const out = Float64Array.from(values);
  for (let i = 0; i < out.length; i++) {
    const v = out[i] as number;
    if (v - v !== 0) throw new RangeError(`value ${i} is not a finite number: ${v}`);
  }
  return out.sort();
};
