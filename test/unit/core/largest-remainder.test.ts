import { allocateLargestRemainder } from '../../../src/core/largest-remainder';

// Hand computations of the largest-remainder (Hamilton) method.
describe('allocateLargestRemainder', () => {
  it('gives the leftover units to the largest fractional parts', () => {
    // 7 among 5, 8, 7 (sum 20): quotas 1.75, 2.8, 2.45 -> floors 1, 2, 2, two left -> .8 then .75
    expect(allocateLargestRemainder(7, [5, 8, 7])).toEqual([2, 3, 2]);
  });
  it('breaks ties toward the earlier group', () => {
    // 5 among 6, 3, 1: quotas 3, 1.5, 0.5 -> floors 3, 1, 0, one left, tie .5/.5 -> group 2
    expect(allocateLargestRemainder(5, [6, 3, 1])).toEqual([3, 2, 0]);
  });
  it('is exact at the edges', () => {
    expect(allocateLargestRemainder(0, [3, 4])).toEqual([0, 0]);
    expect(allocateLargestRemainder(7, [3, 4])).toEqual([3, 4]);
    expect(allocateLargestRemainder(2, [0, 5, 0])).toEqual([0, 2, 0]);
  });
  it('always sums to the total and never exceeds a group', () => {
    const sizes = [13, 1, 7, 0, 22, 5];
    for (let total = 0; total <= 48; total += 1) {
      const shares = allocateLargestRemainder(total, sizes);
      expect(shares.reduce((a, b) => a + b, 0)).toBe(total);
      shares.forEach((s, i) => expect(s).toBeLessThanOrEqual(sizes[i] ?? 0));
    }
  });
  it('refuses more than there is, or fractions', () => {
    expect(() => allocateLargestRemainder(9, [3, 4])).toThrow(/cannot allocate 9/);
    expect(() => allocateLargestRemainder(1.5, [3])).toThrow(RangeError);
  });
});
