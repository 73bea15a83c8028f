/**
 * Stable ascending argsort by counting, for values that are whole or half numbers in a short
 * range (scores 50 ± confidence/2, ratings, percents, times in whole ms): slot 2·v − the lowest
 * 2·v, one count per slot, then each index placed in its slot in the order given. It gives the
 * very permutation of any stable ascending sort; null when the values do not fit (a 2·v not whole,
 * beyond ±2^31, a span of more than SLOT_SORT_SPAN slots, or a −0, which a radix sort keeps
 * before +0 and counting would not).
 * Example: slotArgsort(Float64Array.of(3, 1.5, 3, 0)) → [3, 1, 0, 2].
 */
export const slotArgsort = (values: Float64Array): Uint32Array | null => {
  const low = lowestSlot(values);
  if (Number.isNaN(low)) return null;
  const span = highestSlot(values) - low + 1;
  if (span > SLOT_SORT_SPAN) return null;
  const start = new Uint32Array(span + 1);
  countSlots(values, low, start);
  startsOf(start);
  const perm = new Uint32Array(values.length);
  placeBySlot(values, low, start, perm);
  return perm;
};

/** At most this many slots (2·(largest − smallest) + 1) are counted; wider ranges are sorted otherwise. */
export const SLOT_SORT_SPAN = 1 << 17;

// Small functions: `heed analyze` sorts a few times per process, and V8 optimises a small
// function called a few times sooner than one long loop (see argsort.ts).

const lowestSlot = (values: Float64Array): number => {
  let low = Infinity;
  for (let k = 0; k < values.length; k++) {
    const v = values[k] as number;
    const a = 2 * v;
    if (!(Number.isInteger(a) && a >= -2147483648 && a <= 2147483647) || (v === 0 && 1 / v < 0)) return Number.NaN;
    if (a < low) low = a;
  }
  return low;
};

const highestSlot = (values: Float64Array): number => {
  let high = -Infinity;
  for (let k = 0; k < values.length; k++) if (2 * (values[k] as number) > high) high = 2 * (values[k] as number);
  return high;
};

// count[s + 1] += 1 for each value in slot s, so the prefix sums below give each slot's start
const countSlots = (values: Float64Array, low: number, count: Uint32Array): void => {
  for (let k = 0; k < values.length; k++) {
    const s = 2 * (values[k] as number) - low + 1;
    count[s] = (count[s] as number) + 1;
  }
};

const startsOf = (count: Uint32Array): void => {
  for (let s = 1; s < count.length; s++) count[s] = (count[s] as number) + (count[s - 1] as number);
};

const placeBySlot = (values: Float64Array, low: number, start: Uint32Array, perm: Uint32Array): void => {
  for (let k = 0; k < values.length; k++) {
    const s = 2 * (values[k] as number) - low;
    const at = start[s] as number;
    perm[at] = k;
    start[s] = at + 1;
  }
};
