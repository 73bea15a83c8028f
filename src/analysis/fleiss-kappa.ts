/**
 * Fleiss' (1971) kappa for many raters, Psychological Bulletin 76:378-382. counts[i][j] is the
 * number of raters who put subject i in category j; every subject has the same number of raters r:
 *   Pi = (Σj nij² − r)/(r(r−1)),  P̄ = mean Pi,  pj = Σi nij/(N·r),  P̄e = Σj pj²,
 *   κ = (P̄ − P̄e)/(1 − P̄e).
 * Null when there are no subjects, fewer than 2 raters, or P̄e = 1 (one category only).
 * Throws RangeError when subjects have different numbers of raters or a count is not a whole number ≥ 0.
 * Example: the 30 subjects × 6 raters × 5 categories of Fleiss (1971) give κ = 0.430.
 */
export const fleissKappa = (counts: number[][]): number | null => {
  const N = counts.length;
  if (N === 0) return null;
  const k = counts[0]?.length ?? 0;
  const r = (counts[0] ?? []).reduce((s, v) => s + v, 0);
  const colSum = new Float64Array(k);
  let sumP = 0;
  for (const [i, row] of counts.entries()) {
    if (row.length !== k) throw new RangeError(`subject ${i} has ${row.length} categories, expected ${k}`);
    let total = 0;
    let sq = 0;
    for (const [j, c] of row.entries()) {
      if (!Number.isInteger(c) || c < 0) throw new RangeError(`subject ${i}, category ${j}: ${c} is not a count`);
      total += c;
      sq += c * c;
      colSum[j] = (colSum[j] as number) + c;
    }
    if (total !== r) throw new RangeError(`subject ${i} has ${total} ratings, subject 0 has ${r}`);
    if (r >= 2) sumP += (sq - r) / (r * (r - 1));
  }
  if (r < 2) return null;
  const pBar = sumP / N;
  let pe = 0;
  for (const c of colSum) pe += (c / (N * r)) ** 2;
  if (pe >= 1) return null;
  return (pBar - pe) / (1 - pe);
};
