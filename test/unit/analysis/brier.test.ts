import { brier } from '../../../src/analysis/brier';

describe('brier', () => {
  it('is the mean squared error of s/100 against truth', () => {
    expect(brier([90, 20], [1, 0])).toBeCloseTo(0.025, 14);
    expect(brier([100, 0], [1, 0])).toBe(0);
    expect(brier([0], [1])).toBe(1);
  });
  it('gives null for n = 0 and refuses a score outside 0..100', () => {
    expect(brier([], [])).toBeNull();
    expect(() => brier([101], [1])).toThrow(/score 0 is outside/);
  });
});
