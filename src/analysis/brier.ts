/**
 * Brier (1950) score: mean squared difference between a forecast probability and the 0/1 outcome,
 * here mean((s/100 − y)²) over derived scores s in 0..100 (docs/methods.md). Lower is better.
 * n = 0 gives null. Throws RangeError on unequal lengths or a score outside 0..100.
 * Example: brier([90, 20], [1, 0]) → ((0.1)² + (0.2)²)/2 = 0.025.
 */
export const brier = (scores100: ArrayLike<number>, truth: ArrayLike<number>): number | null => {
  if (scores100.length !== truth.length) throw new RangeError(`scores (${scores100.length}) and truth (${truth.length}) differ in length`);
  if (scores100.length === 0) return null;
  let s = 0;
  for (let i = 0; i < scores100.length; i++) {
    const v = scores100[i] as number;
    if (!(v >= 0 && v <= 100)) throw new RangeError(`score ${i} is outside 0..100: ${v}`);
    s += (v / 100 - (truth[i] as number)) ** 2;
  }
  return s / scores100.length;
};
