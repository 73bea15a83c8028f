import { midranks } from '../../../src/analysis/midrank';

// Midranks by definition (ties share the mean of their ranks), checked against a brute-force count.
describe('midranks', () => {
  it('averages tied ranks', () => {
    expect(Array.from(midranks([3, 1, 3, 2]))).toEqual([3.5, 1, 3.5, 2]);
    expect(Array.from(midranks([5, 5, 5]))).toEqual([2, 2, 2]);
    expect(midranks([]).length).toBe(0);
  });
  it('matches a brute-force count on random tied data', () => {
    const v = Array.from({ length: 200 }, (_, i) => (i * 37) % 17);
    const brute = v.map((x) => v.filter((y) => y < x).length + (v.filter((y) => y === x).length + 1) / 2);
    expect(Array.from(midranks(v))).toEqual(brute);
  });
  it('refuses a non-finite value', () => {
    expect(() => midranks([1, Number.NaN])).toThrow(/value 1 is not a finite number/);
  });
});
