import { quantileBySelection } from './quantile-select';

export type WeightOfAdvice = { n: number; mean: number | null; median: number | null };

/** The two published forms of weight of advice (docs/methods.md, "Weight of advice"). */
export type WoaForm = 'signed' | 'absolute';

/**
 * Weight of advice in its signed form (Harvey & Fischer 1997, Organ Behav Hum Decis Process
 * 70:117-133; the form is quoted from memory of the paper): per read
 *   w = (s − s0) / (100·p − s0),
 * with s0, s the initial and final derived scores (0..100) and p the suggestion's score in [0,1]:
 * 0 keeps one's own view, 1 adopts the advice, and a move away from the advice is negative
 * (truncated to 0 here). Reads with |100·p − s0| < 1 are left out (the advice barely differs from
 * the initial view, so w is unstable); w is truncated to [0,1] (docs/methods.md). Reports the
 * mean, median and count used; n = 0 gives nulls.
 * Throws RangeError when the arrays differ in length.
 * Example: weightOfAdvice([70], [50], [0.9]) → w = 20/40 = 0.5.
 */
export const weightOfAdvice = (final: ArrayLike<number>, initial: ArrayLike<number>, advice: ArrayLike<number>): WeightOfAdvice =>
  weightOfAdviceForm('signed', final, initial, advice);

/**
 * Weight of advice in its absolute form (Yaniv 2004, Organ Behav Hum Decis Process 93:1-13,
 * "Receiving other people's advice: influence and benefit"; the formula is quoted from memory of
 * the paper): per read
 *   w = |s − s0| / |100·p − s0|,
 * so any move counts, toward the advice or away from it. Same exclusion (|100·p − s0| < 1) and
 * truncation to [0,1] as the signed form; mean, median and count used; n = 0 gives nulls.
 * Throws RangeError when the arrays differ in length.
 * Example: weightOfAdviceAbsolute([40], [50], [0.9]) → |−10| / 40 = 0.25 (the signed form gives 0).
 */
export const weightOfAdviceAbsolute = (final: ArrayLike<number>, initial: ArrayLike<number>, advice: ArrayLike<number>): WeightOfAdvice =>
  weightOfAdviceForm('absolute', final, initial, advice);

const weightOfAdviceForm = (form: WoaForm, final: ArrayLike<number>, initial: ArrayLike<number>, advice: ArrayLike<number>): WeightOfAdvice => {
  if (final.length !== initial.length || final.length !== advice.length) {
    throw new RangeError(`weight of advice needs equal lengths: ${final.length}, ${initial.length}, ${advice.length}`);
  }
  const ws: number[] = [];
  for (let i = 0; i < final.length; i++) {
    const s0 = initial[i] as number;
    const gap = 100 * (advice[i] as number) - s0;
    if (!(Math.abs(gap) >= 1)) continue;
    const move = (final[i] as number) - s0;
    const w = form === 'signed' ? move / gap : Math.abs(move) / Math.abs(gap);
    ws.push(Math.min(1, Math.max(0, w)));
  }
  if (ws.length === 0) return { n: 0, mean: null, median: null };
  return { n: ws.length, mean: ws.reduce((a, b) => a + b, 0) / ws.length, median: quantileBySelection(ws, 0.5) };
};
