import { clopperPearson } from '../../../src/analysis/clopper-pearson';

// Binomial upper tail by direct summation in log space, independent of the beta quantile.
const upperTail = (k: number, n: number, p: number) => {
  let lgam = [0];
  for (let i = 1; i <= n; i++) lgam = [...lgam, (lgam[i - 1] as number) + Math.log(i)];
  let s = 0;
  for (let i = k; i <= n; i++) s += Math.exp((lgam[n] as number) - (lgam[i] as number) - (lgam[n - i] as number) + i * Math.log(p) + (n - i) * Math.log1p(-p));
  return s;
};

// Definition (Clopper & Pearson 1934): P(X >= k | lower) = α/2 and P(X <= k | upper) = α/2.
describe('clopperPearson', () => {
  it('solves the defining tail equations', () => {
    for (const [k, n] of [[81, 263], [15, 148], [1, 29], [7, 9]] as const) {
      const ci = clopperPearson(k, n);
      expect(upperTail(k, n, ci.lower as number)).toBeCloseTo(0.025, 9);
      expect(1 - upperTail(k + 1, n, ci.upper as number)).toBeCloseTo(0.025, 9);
    }
  });
  it('has closed forms at k = 0 and k = n', () => {
    expect(clopperPearson(0, 20)).toEqual({ k: 0, n: 20, estimate: 0, lower: 0, upper: expect.closeTo(1 - 0.025 ** (1 / 20), 10) });
    expect(clopperPearson(20, 20).lower).toBeCloseTo(0.025 ** (1 / 20), 10);
    expect(clopperPearson(20, 20).upper).toBe(1);
  });
  it('gives nulls for n = 0 and refuses bad counts', () => {
    expect(clopperPearson(0, 0).estimate).toBeNull();
    expect(() => clopperPearson(3, 2)).toThrow(/0 <= k <= n/);
    expect(() => clopperPearson(1, 2, 0)).toThrow(/alpha/);
  });
});
