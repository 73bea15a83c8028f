import type { ReadRow } from '../../core/read-log';
import { wilson, type Proportion } from '../wilson';

export type ConfidenceBin = {
  /** stated confidence from lower (inclusive) to upper (exclusive; the last bin includes 100) */
  lower: number;
  upper: number;
  n: number;
  /** mean stated confidence in the bin, 0..100; null when empty */
  mean_confidence: number | null;
  /** share right a well-calibrated reader would have: 0.5 + mean/200 (confidence 0 is a guess, 100 is certain) */
  expected_right: number | null;
  /** share of the bin's final calls that were right, with its Wilson interval */
  right: Proportion;
};

export const CONFIDENCE_EDGES = [0, 20, 40, 60, 80, 100] as const;

/**
 * Stated confidence against the share right: final calls grouped by final confidence into
 * [0,20), [20,40), [40,60), [60,80), [80,100]. The confidence scale says 0 is guessing (half
 * right by chance on a yes/no call) and 100 is certain, so a well-calibrated reader is right in
 * 50% + c/2 of calls stated at confidence c. Reads without a stated confidence are left out.
 * Throws RangeError on a confidence outside 0..100.
 * Example: reads at confidence 90, 90, 90, 90 of which 3 right → bin [80,100]: n 4, right 0.75, expected 0.95.
 */
export const confidenceCalibration = (reads: readonly ReadRow[]): ConfidenceBin[] => {
  const last = CONFIDENCE_EDGES.length - 2;
  const n = new Array<number>(last + 1).fill(0);
  const sum = new Array<number>(last + 1).fill(0);
  const right = new Array<number>(last + 1).fill(0);
  for (const r of reads) {
    const c = r.final_confidence;
    if (c === null) continue;
    if (!(c >= 0 && c <= 100)) throw new RangeError(`confidence outside 0..100: ${c} (case ${r.case_id})`);
    const b = Math.min(last, Math.floor(c / 20));
    n[b] = (n[b] as number) + 1;
    sum[b] = (sum[b] as number) + c;
    if (r.final_call === r.truth) right[b] = (right[b] as number) + 1;
  }
  return n.map((count, b) => {
    const mean = count > 0 ? (sum[b] as number) / count : null;
    return {
      lower: CONFIDENCE_EDGES[b] as number,
      upper: CONFIDENCE_EDGES[b + 1] as number,
      n: count,
      mean_confidence: mean,
      expected_right: mean === null ? null : 0.5 + mean / 200,
      right: wilson(right[b] as number, count),
    };
  });
};
