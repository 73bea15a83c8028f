import betaQuantile from '@stdlib/stats-base-dists-beta-quantile';
import type { Proportion } from './wilson';

/**
 * Clopper-Pearson "exact" interval for a binomial proportion (Clopper & Pearson 1934;
 * Newcombe 1998, method 5): lower = B(α/2; k, n−k+1), upper = B(1−α/2; k+1, n−k), with
 * lower = 0 when k = 0 and upper = 1 when k = n; B the beta quantile (@stdlib).
 * n = 0 gives nulls. Throws RangeError when k, n are not whole numbers with 0 ≤ k ≤ n or
 * alpha is not in (0,1).
 * Example: clopperPearson(0, 20).upper → 1 − 0.025^(1/20) = 0.16843.
 */
export const clopperPearson = (k: number, n: number, alpha = 0.05): Proportion => {
  if (!Number.isInteger(k) || !Number.isInteger(n) || k < 0 || n < 0 || k > n) {
    throw new RangeError(`clopperPearson needs whole numbers 0 <= k <= n, got k=${k}, n=${n}`);
  }
  if (!(alpha > 0 && alpha < 1)) throw new RangeError(`alpha must be in (0,1), got ${alpha}`);
  if (n === 0) return { k, n, estimate: null, lower: null, upper: null };
  const lower = k === 0 ? 0 : betaQuantile(alpha / 2, k, n - k + 1);
  const upper = k === n ? 1 : betaQuantile(1 - alpha / 2, k + 1, n - k);
  return { k, n, estimate: k / n, lower, upper };
};
