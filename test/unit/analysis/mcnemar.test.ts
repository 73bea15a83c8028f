import { mcnemar } from '../../../src/analysis/mcnemar';

// docs/methods.md formula, worked by hand: X ~ Binomial(b+c, 1/2).
describe('mcnemar', () => {
  it('computes exact p, mid-p and chi-square by hand', () => {
    const t = mcnemar(3, 0); // P(X <= 0) = 1/8
    expect(t.p).toBeCloseTo(0.25, 12);
    expect(t.mid_p).toBeCloseTo(0.125, 12);
    expect(t.chi_square).toBe(3);
    const u = mcnemar(2, 3); // P(X <= 2 | 5) = 16/32, so p = min(1, 1) = 1; mid-p = 1 - 10/32
    expect(u.p).toBe(1);
    expect(u.mid_p).toBeCloseTo(1 - 10 / 32, 12);
  });
  it('gives p = 1 with no discordant pairs', () => {
    expect(mcnemar(0, 0)).toEqual({ b: 0, c: 0, p: 1, mid_p: 1, chi_square: null });
  });
  it('refuses bad counts', () => {
    expect(() => mcnemar(-1, 2)).toThrow(/b=-1/);
  });
});
