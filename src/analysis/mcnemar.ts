import binomialCdf from '@stdlib/stats-base-dists-binomial-cdf';
import binomialPmf from '@stdlib/stats-base-dists-binomial-pmf';

export type McNemar = {
  b: number;
  c: number;
  /** exact two-sided p = min(1, 2·P(X ≤ min(b,c))), X ~ Binomial(b+c, ½); 1 when b + c = 0 */
  p: number;
  /** mid-p: the exact p less P(X = min(b,c)) (Lancaster 1961; Fagerland, Lydersen & Laake 2013) */
  mid_p: number;
  /** (b − c)²/(b + c) without continuity correction (McNemar 1947); null when b + c = 0 */
  chi_square: number | null;
};

/**
 * McNemar's test for paired binary outcomes from the discordant counts b and c (docs/methods.md):
 * exact two-sided p, mid-p and the uncorrected chi-square statistic.
 * Throws RangeError when b or c is not a whole number ≥ 0.
 * Example: mcnemar(150, 86).chi_square → 17.356 (Agresti, Categorical Data Analysis, Table 10.1).
 */
export const mcnemar = (b: number, c: number): McNemar => {
  if (!Number.isInteger(b) || !Number.isInteger(c) || b < 0 || c < 0) {
    throw new RangeError(`McNemar needs whole discordant counts, got b=${b}, c=${c}`);
  }
  const n = b + c;
  if (n === 0) return { b, c, p: 1, mid_p: 1, chi_square: null };
  const x = Math.min(b, c);
  const { tail, pmf } = binomialHalf(x, n);
  const p = Math.min(1, 2 * tail);
  const mid = Math.min(1, 2 * tail - pmf);
  return { b, c, p, mid_p: mid, chi_square: ((b - c) * (b - c)) / n };
};

// P(X <= x) and P(X = x) for X ~ Binomial(n, 1/2). The engine asks for the same few (x, n) many
// times (every reader, subgroup and pooled crossover) and the incomplete beta behind them is slow,
// so answers are kept: the same function of the same two whole numbers, so the same bits.
const halfTails = new Map<number, { tail: number; pmf: number }>();
const binomialHalf = (x: number, n: number): { tail: number; pmf: number } => {
  const key = n < 1 << 20 ? n * (1 << 20) + x : -1;
  const known = key === -1 ? undefined : halfTails.get(key);
  if (known !== undefined) return known;
  const made = { tail: binomialCdf(x, n, 0.5), pmf: binomialPmf(x, n, 0.5) };
  if (key !== -1) {
    if (halfTails.size >= 65536) halfTails.clear();
    halfTails.set(key, made);
  }
  return made;
};
