import { wilson, type Proportion } from './wilson';

export type Classification = { n: number; accuracy: Proportion; sensitivity: Proportion; specificity: Proportion };

/**
 * Accuracy P(d = y), sensitivity P(d = 1 | y = 1) and specificity P(d = 0 | y = 0) of calls d
 * against truth y (docs/methods.md), each with its Wilson interval; an empty class gives nulls.
 * Throws RangeError when the arrays differ in length or hold anything but 0/1.
 * Example: classification([1, 0, 1], [1, 1, 0]) → accuracy 1/3, sensitivity 1/2, specificity 0/1.
 */
export const classification = (calls: ArrayLike<number>, truth: ArrayLike<number>): Classification => {
  if (calls.length !== truth.length) throw new RangeError(`calls (${calls.length}) and truth (${truth.length}) differ in length`);
  let tp = 0;
  let tn = 0;
  let pos = 0;
  for (let i = 0; i < calls.length; i++) {
    const d = calls[i];
    const y = truth[i];
    if ((d !== 0 && d !== 1) || (y !== 0 && y !== 1)) throw new RangeError(`call and truth must be 0/1 at index ${i}`);
    if (y === 1) {
      pos++;
      if (d === 1) tp++;
    } else if (d === 0) tn++;
  }
  const n = calls.length;
  return { n, accuracy: wilson(tp + tn, n), sensitivity: wilson(tp, pos), specificity: wilson(tn, n - pos) };
};
