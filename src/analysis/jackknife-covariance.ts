import { covarianceSums, deviations } from './covariance-sums';

/**
 * The four averaged error (co)variances of the Obuchowski & Rockette (1995) model, estimated by
 * the case jackknife (Hillis, Obuchowski, Schartz & Berbaum 2005, Stat Med 24:1579-1607):
 *   Cov̂(θij, θi'j') = (c − 1)/c · Σk (θij(k) − θij(·))(θi'j'(k) − θi'j'(·)),
 * θij(k) the AUC of modality i, reader j without case k, θij(·) their mean over k; then
 *   varE = mean of Cov̂ over (i, j) = (i', j')          (error variance)
 *   cov1 = mean over i ≠ i', j = j'   (same reader, different modalities)
 *   cov2 = mean over i = i', j ≠ j'   (same modality, different readers)
 *   cov3 = mean over i ≠ i', j ≠ j'   (different modality and reader).
 * Computed in O(t·r·c) from per-case sums (covariance-sums.ts), not by forming the (t·r)² matrix.
 * Throws RangeError when fewer than 2 modalities, readers or cases are given or the arrays are ragged.
 * Example: jackknifeCovariances(leaveOneOut) with leaveOneOut[i][j] a Float64Array over cases.
 */
export type OrCovariances = { varE: number; cov1: number; cov2: number; cov3: number };

export const jackknifeCovariances = (leaveOneOut: ArrayLike<number>[][]): OrCovariances => {
  const t = leaveOneOut.length;
  const r = leaveOneOut[0]?.length ?? 0;
  const c = leaveOneOut[0]?.[0]?.length ?? 0;
  if (t < 2 || r < 2 || c < 2) throw new RangeError(`jackknife covariances need >= 2 modalities, readers and cases; got ${t}, ${r}, ${c}`);
  for (let i = 0; i < t; i++) {
    const row = leaveOneOut[i] as ArrayLike<number>[];
    if (row.length !== r) throw new RangeError(`modality ${i} has ${row.length} readers, modality 0 has ${r}`);
    for (let j = 0; j < r; j++) {
      if ((row[j] as ArrayLike<number>).length !== c) throw new RangeError(`modality ${i} reader ${j} has ${(row[j] as ArrayLike<number>).length} cases, expected ${c}`);
    }
  }
  // deviations from each (i, j) jackknife mean
  const dev: Float64Array[][] = leaveOneOut.map((row) => row.map((v) => deviations(v, 0, c)));
  const { diag, sameReader, sameModality, other } = covarianceSums(dev, 0, c);
  const f = (c - 1) / c;
  return {
    varE: (f * diag) / (t * r),
    cov1: (f * sameReader) / (t * (t - 1) * r),
    cov2: (f * sameModality) / (t * r * (r - 1)),
    cov3: (f * other) / (t * (t - 1) * r * (r - 1)),
  };
};
