/**
 * The tests a plan counts rejections of, on one simulated study's reader figures.
 *
 * Over-reliance above a reference p0: a one-sided one-sample t-test of the reader rates
 * (t = (mean - p0) / (sd / sqrt(r)) on r - 1 df, reject when t > t(0.95; r - 1)). Readers are the
 * units a study generalises over and their rates differ by more than binomial chance (the model's
 * Beta spread), so a test that pooled all reads as independent would reject too often; the
 * t-test treats readers as a random sample (as the random-reader AUC test does).
 * Notice effect: a two-sided paired t-test of each reader's over-reliance without minus with the
 * notice (alpha 0.05), over readers with wrong suggestions in both arms.
 * Both need at least 2 readers with a rate; otherwise they do not reject.
 */
import tQuantile from '@stdlib/stats-base-dists-t-quantile';

export const ALPHA = 0.05;

const meanSd = (xs: readonly number[]): { mean: number; sd: number } => {
  const n = xs.length;
  let sum = 0;
  for (const x of xs) sum += x;
  const mean = sum / n;
  let ss = 0;
  for (const x of xs) ss += (x - mean) ** 2;
  return { mean, sd: n > 1 ? Math.sqrt(ss / (n - 1)) : 0 };
};

/** Does the one-sided one-sample t-test show the mean of `rates` above p0 at level alpha? */
export const showsAbove = (rates: readonly number[], p0: number, alpha = ALPHA): boolean => {
  const r = rates.length;
  if (r < 2) return false;
  const { mean, sd } = meanSd(rates);
  if (sd === 0) return mean > p0;
  return (mean - p0) / (sd / Math.sqrt(r)) > tQuantile(1 - alpha, r - 1);
};

/** Does the two-sided paired t-test find a mean difference other than 0 at level alpha? */
export const pairedDiffers = (differences: readonly number[], alpha = ALPHA): boolean => {
  const r = differences.length;
  if (r < 2) return false;
  const { mean, sd } = meanSd(differences);
  if (sd === 0) return mean !== 0;
  return Math.abs(mean / (sd / Math.sqrt(r))) > tQuantile(1 - alpha / 2, r - 1);
};
