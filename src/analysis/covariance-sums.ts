/**
 * Sums of cross-products of per-case deviations, grouped the way the Obuchowski & Rockette (1995)
 * covariances are averaged: dev[i][j][k] is the deviation, for case k, of modality i and reader j
 * (a jackknife pseudo-value or a DeLong placement value, minus its mean over cases).
 *   diag         Σk Σij dev_ij²                      (same modality, same reader)
 *   sameReader   Σk Σ over i ≠ i', j = j'            (different modalities, same reader)
 *   sameModality Σk Σ over i = i', j ≠ j'            (same modality, different readers)
 *   other        Σk Σ over i ≠ i', j ≠ j'            (different modality and reader)
 * over cases from ≤ k < to. O(t·r) per case from row and column sums, not the (t·r)² products.
 * Throws nothing; the caller checks shapes.
 * Example: covarianceSums(dev, 0, c).diag / (t·r) is the mean of the per-(i, j) sums of squares.
 */
export type CovarianceSums = { diag: number; sameReader: number; sameModality: number; other: number };

export const covarianceSums = (dev: readonly (readonly Float64Array[])[], from: number, to: number): CovarianceSums => {
  const t = dev.length;
  const r = dev[0]?.length ?? 0;
  let diag = 0;
  let sameReader = 0;
  let sameModality = 0;
  let all = 0;
  const readerSum = new Float64Array(r);
  const modalitySum = new Float64Array(t);
  for (let k = from; k < to; k++) {
    readerSum.fill(0);
    modalitySum.fill(0);
    let total = 0;
    let sq = 0;
    for (let i = 0; i < t; i++) {
      const row = dev[i] as readonly Float64Array[];
      for (let j = 0; j < r; j++) {
        const d = (row[j] as Float64Array)[k] as number;
        readerSum[j] = (readerSum[j] as number) + d;
        modalitySum[i] = (modalitySum[i] as number) + d;
        total += d;
        sq += d * d;
      }
    }
    let a2 = 0;
    for (let j = 0; j < r; j++) a2 += (readerSum[j] as number) ** 2;
    let b2 = 0;
    for (let i = 0; i < t; i++) b2 += (modalitySum[i] as number) ** 2;
    diag += sq;
    sameReader += a2 - sq;
    sameModality += b2 - sq;
    all += total * total;
  }
  return { diag, sameReader, sameModality, other: all - diag - sameReader - sameModality };
};

/** Deviations of each array from its own mean over the index range [from, to). */
export const deviations = (values: ArrayLike<number>, from: number, to: number): Float64Array => {
  let mean = 0;
  for (let k = from; k < to; k++) mean += values[k] as number;
  mean /= to - from;
  const d = new Float64Array(to - from);
  for (let k = from; k < to; k++) d[k - from] = (values[k] as number) - mean;
  return d;
};
