export type CalibrationBin = {
  lower: number;
  upper: number;
  n: number;
  /** mean forecast probability in the bin; null when empty */
  mean_predicted: number | null;
  /** observed share of positives in the bin; null when empty */
  observed: number | null;
};

export type Calibration = { ece: number | null; bins: CalibrationBin[] };

/**
 * Expected calibration error with equal-width bins (Naeini, Cooper & Hauskrecht 2015):
 * ECE = Σb (nb/N)·|mean forecast in b − share of positives in b|. Forecasts are probabilities
 * in [0,1]; with 10 bins they are [0,0.1), [0.1,0.2), …, [0.8,0.9), [0.9,1.0]: each bin closed
 * on the left, the last one closed on both sides. The bins double as a reliability plot.
 * n = 0 gives ece null (bins still listed, empty). Throws RangeError on unequal lengths, a
 * forecast outside [0,1], or a bin count that is not a whole number ≥ 1.
 * Example: calibration([0.05, 0.95], [0, 1]).ece → 0.05.
 */
export const calibration = (forecasts: ArrayLike<number>, truth: ArrayLike<number>, binCount = 10): Calibration => {
  if (forecasts.length !== truth.length) throw new RangeError(`forecasts (${forecasts.length}) and truth (${truth.length}) differ in length`);
  if (!Number.isInteger(binCount) || binCount < 1) throw new RangeError(`bin count must be a whole number >= 1, got ${binCount}`);
  const count = new Float64Array(binCount);
  const sumF = new Float64Array(binCount);
  const sumY = new Float64Array(binCount);
  for (let i = 0; i < forecasts.length; i++) {
    const f = forecasts[i] as number;
    if (!(f >= 0 && f <= 1)) throw new RangeError(`forecast ${i} is outside [0,1]: ${f}`);
    const b = Math.min(binCount - 1, Math.floor(f * binCount));
    count[b] = (count[b] as number) + 1;
    sumF[b] = (sumF[b] as number) + f;
    sumY[b] = (sumY[b] as number) + (truth[i] as number);
  }
  const n = forecasts.length;
  let ece = 0;
  const bins: CalibrationBin[] = [];
  for (let b = 0; b < binCount; b++) {
    const nb = count[b] as number;
    const mp = nb > 0 ? (sumF[b] as number) / nb : null;
    const ob = nb > 0 ? (sumY[b] as number) / nb : null;
    if (mp !== null && ob !== null) ece += (nb / n) * Math.abs(mp - ob);
    bins.push({ lower: b / binCount, upper: (b + 1) / binCount, n: nb, mean_predicted: mp, observed: ob });
  }
  return { ece: n === 0 ? null : ece, bins };
};
