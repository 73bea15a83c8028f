/**
 * Wilson score interval for a binomial proportion, without continuity correction
 * (Wilson 1927; Newcombe 1998, method 3):
 *   centre = (k + z²/2) / (n + z²),  half = z·sqrt(k(n−k)/n + z²/4) / (n + z²).
 * n = 0 gives nulls, never NaN. Throws RangeError when k or n is not a whole number with 0 ≤ k ≤ n.
 * Example: wilson(81, 263) → estimate 0.30798, lower 0.25529, upper 0.36621 (Newcombe 1998, Table I: 0.2553, 0.3662).
 */
export const Z95 = 1.959963984540054;

export type Proportion = {
  k: number;
  n: number;
  estimate: number | null;
  lower: number | null;
  upper: number | null;
};

export const wilson = (k: number, n: number, z: number = Z95): Proportion => {
  if (!Number.isInteger(k) || !Number.isInteger(n) || k < 0 || n < 0 || k > n) {
    throw new RangeError(`wilson needs whole numbers 0 <= k <= n, got k=${k}, n=${n}`);
  }
  if (n === 0) return { k, n, estimate: null, lower: null, upper: null };
  const z2 = z * z;
  const centre = (k + z2 / 2) / (n + z2);
  const half = (z * Math.sqrt((k * (n - k)) / n + z2 / 4)) / (n + z2);
  return { k, n, estimate: k / n, lower: Math.max(0, centre - half), upper: Math.min(1, centre + half) };
};

/** Half-width of the Wilson interval, for planning: how precise a rate p would be with n reads. */
export const wilsonHalfWidth = (p: number, n: number, z: number = Z95): number | null => {
  if (n <= 0) return null;
  const z2 = z * z;
  return (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / (1 + z2 / n);
};
