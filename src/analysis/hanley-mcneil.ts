/**
 * Standard error of an AUC by the approximation of Hanley & McNeil (1982), Radiology 143:29-36:
 *   Q1 = A/(2 − A), Q2 = 2A²/(1 + A),
 *   SE = sqrt([A(1−A) + (m−1)(Q1 − A²) + (n−1)(Q2 − A²)] / (m·n)),
 * m abnormal and n normal cases. Heed reports the DeLong SE; this one is kept to check against
 * the published table and for planning.
 * Throws RangeError when A is outside [0,1] or m, n are not whole numbers ≥ 1.
 * Example: hanleyMcNeilSe(0.893, 51, 58) → 0.0325 (published as 0.032).
 */
export const hanleyMcNeilSe = (auc: number, m: number, n: number): number => {
  if (!(auc >= 0 && auc <= 1)) throw new RangeError(`AUC must be in [0,1], got ${auc}`);
  if (!Number.isInteger(m) || !Number.isInteger(n) || m < 1 || n < 1) throw new RangeError(`case counts must be whole numbers >= 1, got ${m}, ${n}`);
  const q1 = auc / (2 - auc);
  const q2 = (2 * auc * auc) / (1 + auc);
  const a2 = auc * auc;
  return Math.sqrt((auc * (1 - auc) + (m - 1) * (q1 - a2) + (n - 1) * (q2 - a2)) / (m * n));
};
