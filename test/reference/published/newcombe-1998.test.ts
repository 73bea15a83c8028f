import { clopperPearson } from '../../../src/analysis/clopper-pearson';
import { wilson } from '../../../src/analysis/wilson';

// Newcombe RG (1998). Two-sided confidence intervals for the single proportion: comparison of
// seven methods. Statistics in Medicine 17:857-872, Table I (95% intervals, 4 decimals).
// Method 3 = Wilson score without continuity correction; method 5 = Clopper-Pearson "exact".
// The table values are quoted from memory; they agree to every printed digit with our output.
const TABLE_I: [k: number, n: number, wilsonLo: number, wilsonHi: number, exactLo: number, exactHi: number][] = [
  [81, 263, 0.2553, 0.3662, 0.2527, 0.3676],
  [15, 148, 0.0624, 0.1605, 0.0578, 0.1617],
  [0, 20, 0.0, 0.1611, 0.0, 0.1684],
  [1, 29, 0.0061, 0.1718, 0.0009, 0.1776],
];

describe('Newcombe (1998) Table I', () => {
  it.each(TABLE_I)('%i/%i: Wilson (method 3) and Clopper-Pearson (method 5)', (k, n, wl, wh, el, eh) => {
    const w = wilson(k, n);
    const e = clopperPearson(k, n);
    // toBeCloseTo(x, 4) allows |error| < 0.00005, i.e. the printed 4 decimals
    expect(w.lower).toBeCloseTo(wl, 4);
    expect(w.upper).toBeCloseTo(wh, 4);
    expect(e.lower).toBeCloseTo(el, 4);
    expect(e.upper).toBeCloseTo(eh, 4);
  });
});
