import { weightOfAdvice } from '../../../src/analysis/weight-of-advice';

// SPEC Contract 2: w = (s − s0)/(100p − s0), left out when |100p − s0| < 1, truncated to [0,1].
describe('weightOfAdvice', () => {
  it('computes, truncates and leaves out near-equal advice', () => {
    // 0.5; 1.5 → 1; −0.25 → 0; advice 50.5 vs s0 50 left out
    const w = weightOfAdvice([70, 90, 45, 60], [50, 30, 50, 50], [0.9, 0.7, 0.7, 0.505]);
    expect(w.n).toBe(3);
    expect(w.mean).toBeCloseTo(0.5, 12);
    expect(w.median).toBe(0.5);
  });
  it('gives nulls when no read qualifies', () => {
    expect(weightOfAdvice([50], [50], [0.5])).toEqual({ n: 0, mean: null, median: null });
  });
});
