import { quantile } from './quantile';

export type WeightOfAdvice = { n: number; mean: number | null; median: number | null };

/**
 * Weight of advice (Harvey & Fischer 1997; Yaniv 2004): per read w = (s − s0)/(100·p − s0), with
 * s0, s the initial and final derived scores (0..100) and p the suggestion's score in [0,1]:
 * 0 keeps one's own view, 1 adopts the advice. Reads with |100·p − s0| < 1 are left out (the
 * advice barely differs from the initial view, so w is unstable); w is truncated to [0,1]
 * (SPEC Contract 2). Reports the mean, median and count used; n = 0 gives nulls.
 * Throws RangeError when the arrays differ in length.
 * Example: weightOfAdvice([70], [50], [0.9]) → w = 20/40 = 0.5.
 */
export const weightOfAdvice = (final: ArrayLike<number>, initial: ArrayLike<number>, advice: ArrayLike<number>): WeightOfAdvice => {
  if (final.length !== initial.length || final.length !== advice.length) {
    throw new RangeError(`weight of advice needs equal lengths: ${final.length}, ${initial.length}, ${advice.length}`);
  }
  const ws: number[] = [];
  for (let i = 0; i < final.length; i++) {
    const s0 = initial[i] as number;
    const gap = 100 * (advice[i] as number) - s0;
    if (!(Math.abs(gap) >= 1)) continue;
    const w = ((final[i] as number) - s0) / gap;
    ws.push(Math.min(1, Math.max(0, w)));
  }
  if (ws.length === 0) return { n: 0, mean: null, median: null };
  return { n: ws.length, mean: ws.reduce((a, b) => a + b, 0) / ws.length, median: quantile(ws, 0.5) };
};
