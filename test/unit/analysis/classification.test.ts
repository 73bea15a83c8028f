import { classification } from '../../../src/analysis/classification';

// docs/methods.md definitions, counted by hand.
describe('classification', () => {
  it('counts accuracy, sensitivity and specificity', () => {
    const c = classification([1, 0, 1, 1, 0], [1, 1, 0, 1, 0]);
    expect(c.accuracy.k).toBe(3);
    expect(c.accuracy.n).toBe(5);
    expect(c.sensitivity).toMatchObject({ k: 2, n: 3 });
    expect(c.specificity).toMatchObject({ k: 1, n: 2, estimate: 0.5 });
  });
  it('gives nulls for an empty class, never NaN', () => {
    const c = classification([1, 1], [1, 1]);
    expect(c.specificity).toEqual({ k: 0, n: 0, estimate: null, lower: null, upper: null });
    expect(classification([], []).accuracy.estimate).toBeNull();
  });
  it('refuses non-0/1 values and unequal lengths', () => {
    expect(() => classification([2], [1])).toThrow(/index 0/);
    expect(() => classification([1], [])).toThrow(/differ in length/);
  });
});
