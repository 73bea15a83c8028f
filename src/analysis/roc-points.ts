/** One point of an empirical ROC curve: false-positive rate, true-positive rate, and the threshold (score ≥ threshold calls positive). */
export type RocPoint = { fpr: number; tpr: number; threshold: number };

/**
 * The empirical ROC curve of scores against truth (1 = finding present): one point per distinct
 * score, taken as a threshold from the highest down (a read is called positive when its score is
 * at or above it), after a first point (0, 0) whose threshold is +Infinity. Ties move the curve
 * diagonally, so the trapezoidal area under these points is the Mann-Whitney AUC with ties
 * counted one half. This is scikit-learn's `roc_curve(y, s, drop_intermediate=False)` (Fawcett
 * 2006, "An introduction to ROC analysis", Pattern Recognition Letters 27:861-874, Algorithm 2).
 * Throws RangeError on unequal lengths, a non-finite score, a truth other than 0/1, or a class
 * with no member (the curve is undefined).
 * Example: rocPoints([0.9, 0.4, 0.4, 0.1], [1, 1, 0, 0]) → (0,0) (0,0.5) (0.5,1) (1,1).
 */
export const rocPoints = (scores: ArrayLike<number>, truth: ArrayLike<number>): RocPoint[] => {
  const n = scores.length;
  if (truth.length !== n) throw new RangeError(`scores (${n}) and truth (${truth.length}) differ in length`);
  let positives = 0;
  for (let i = 0; i < n; i++) {
    const t = truth[i];
    if (t !== 0 && t !== 1) throw new RangeError(`truth ${i} is not 0 or 1: ${String(t)}`);
    if (!Number.isFinite(scores[i] as number)) throw new RangeError(`score ${i} is not a finite number: ${String(scores[i])}`);
    positives += t;
  }
  const negatives = n - positives;
  if (positives === 0 || negatives === 0) throw new RangeError(`an ROC curve needs both classes: ${positives} positive, ${negatives} negative`);
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => (scores[b] as number) - (scores[a] as number));
  const points: RocPoint[] = [{ fpr: 0, tpr: 0, threshold: Number.POSITIVE_INFINITY }];
  let tp = 0;
  let fp = 0;
  for (let k = 0; k < n; k++) {
    const i = order[k] as number;
    if (truth[i] === 1) tp++;
    else fp++;
    const next = order[k + 1];
    if (next === undefined || scores[next] !== scores[i]) points.push({ fpr: fp / negatives, tpr: tp / positives, threshold: scores[i] as number });
  }
  return points;
};

/** Trapezoidal area under ROC points sorted by fpr (for rocPoints' output: the Mann-Whitney AUC). */
export const rocArea = (points: readonly { fpr: number; tpr: number }[]): number => {
  let area = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as { fpr: number; tpr: number };
    const b = points[i] as { fpr: number; tpr: number };
    area += ((b.fpr - a.fpr) * (a.tpr + b.tpr)) / 2;
  }
  return area;
};

/** A point of a reader-averaged curve (no threshold: readers' thresholds differ). */
export type AveragePoint = { fpr: number; tpr: number };

// The lowest and highest tpr of a piecewise linear curve at x (they differ where the curve is vertical at x).
const tprRangeAt = (curve: readonly RocPoint[], x: number, from: number): { low: number; high: number; next: number } => {
  let i = from;
  while (i < curve.length && (curve[i] as RocPoint).fpr < x) i++;
  const at = curve[i] as RocPoint;
  if (at.fpr === x) {
    let j = i;
    while (j + 1 < curve.length && (curve[j + 1] as RocPoint).fpr === x) j++;
    return { low: at.tpr, high: (curve[j] as RocPoint).tpr, next: i };
  }
  const before = curve[i - 1] as RocPoint;
  const y = before.tpr + ((at.tpr - before.tpr) * (x - before.fpr)) / (at.fpr - before.fpr);
  return { low: y, high: y, next: i };
};

/**
 * Reader-averaged ROC curve by vertical averaging (Fawcett 2006, section 8.1): at each false-
 * positive rate, the mean over readers of each reader's true-positive rate on their own curve
 * (linear between its points). The grid is every false-positive rate where some reader's curve
 * has a point, and where a curve rises vertically the bottom and the top are averaged apart, so
 * the result is exact: its trapezoidal area equals the mean of the readers' AUCs, the
 * reader-averaged AUC that the multi-reader analysis tests. Pooling all readers' reads into one
 * curve was not chosen: it mixes readers who use the confidence scale differently, which
 * flattens the curve and gives an area that is no reader's and not the figure tested.
 * Each curve must come from rocPoints (sorted, from (0,0) to (1,1)). Throws RangeError for no curves.
 * Example: averageRocVertical([rocPoints(s1, y1), rocPoints(s2, y2)]).
 */
export const averageRocVertical = (curves: readonly (readonly RocPoint[])[]): AveragePoint[] => {
  if (curves.length === 0) throw new RangeError('vertical averaging needs at least one curve');
  const grid = new Set<number>();
  for (const c of curves) for (const p of c) grid.add(p.fpr);
  const xs = [...grid].sort((a, b) => a - b);
  const cursor = new Int32Array(curves.length);
  const out: AveragePoint[] = [];
  for (const x of xs) {
    let low = 0;
    let high = 0;
    curves.forEach((c, k) => {
      const r = tprRangeAt(c, x, cursor[k] as number);
      cursor[k] = r.next;
      low += r.low;
      high += r.high;
    });
    low /= curves.length;
    high /= curves.length;
    out.push({ fpr: x, tpr: low });
    if (high !== low) out.push({ fpr: x, tpr: high });
  }
  return out;
};
