import { weightOfAdvice, weightOfAdviceAbsolute } from '../../../src/analysis/weight-of-advice';

// docs/methods.md, "Weight of advice": signed w = (s − s0)/(100p − s0) (Harvey & Fischer 1997) and
// absolute w = |s − s0|/|100p − s0| (Yaniv 2004), left out when |100p − s0| < 1, truncated to [0,1].
// Neither paper's printed worked example could be found for this check, so the example below is
// worked by hand (arithmetic beside each read).
describe('weightOfAdvice, signed and absolute', () => {
  it('computes, truncates and leaves out near-equal advice (signed)', () => {
    // 0.5; 1.5 → 1; −0.25 → 0; advice 50.5 vs s0 50 left out
    const w = weightOfAdvice([70, 90, 45, 60], [50, 30, 50, 50], [0.9, 0.7, 0.7, 0.505]);
    expect(w.n).toBe(3);
    expect(w.mean).toBeCloseTo(0.5, 12);
    expect(w.median).toBe(0.5);
  });

  // read   s0   advice 100p   s     s − s0   100p − s0   signed            absolute
  //  a     20      80         50     +30        +60      30/60 = 0.5       0.5
  //  b     70      10         55     −15        −60      −15/−60 = 0.25    0.25
  //  c     60      90         30     −30        +30      −1 → 0 (moved away) 30/30 = 1
  //  d     30      90        100     +70        +60      7/6 → 1           7/6 → 1
  //  e     50      50.5       80     +30        +0.5     left out (|gap| < 1)
  //  f     40      20         35      −5        −20      0.25              0.25
  // signed  [0.5, 0.25, 0, 1, 0.25]: n 5, mean 2/5 = 0.4, sorted [0, 0.25, 0.25, 0.5, 1], median 0.25
  // absolute [0.5, 0.25, 1, 1, 0.25]: n 5, mean 3/5 = 0.6, sorted [0.25, 0.25, 0.5, 1, 1], median 0.5
  const s = [50, 55, 30, 100, 80, 35];
  const s0 = [20, 70, 60, 30, 50, 40];
  const p = [0.8, 0.1, 0.9, 0.9, 0.505, 0.2];
  it('signed form on the hand-worked example', () => {
    const w = weightOfAdvice(s, s0, p);
    expect(w.n).toBe(5);
    expect(w.mean).toBeCloseTo(0.4, 12);
    expect(w.median).toBeCloseTo(0.25, 12);
  });
  it('absolute form on the hand-worked example', () => {
    const w = weightOfAdviceAbsolute(s, s0, p);
    expect(w.n).toBe(5);
    expect(w.mean).toBeCloseTo(0.6, 12);
    expect(w.median).toBeCloseTo(0.5, 12);
  });
  it('gives nulls when no read qualifies, and refuses unequal lengths', () => {
    expect(weightOfAdvice([50], [50], [0.5])).toEqual({ n: 0, mean: null, median: null });
    expect(weightOfAdviceAbsolute([50], [50], [0.5])).toEqual({ n: 0, mean: null, median: null });
    expect(() => weightOfAdviceAbsolute([50, 60], [50], [0.5])).toThrow(RangeError);
  });
});
