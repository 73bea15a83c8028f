import { mcnemar } from '../../../src/analysis/mcnemar';

// Agresti A. Categorical Data Analysis (2nd ed., 2002), Table 10.1: approval of the Prime
// Minister's performance in two surveys of the same 1600 people: 794 approve/approve,
// 150 approve/disapprove, 86 disapprove/approve, 570 disapprove/disapprove. Agresti reports
// McNemar's z = 4.17, so z² = 17.36 (uncorrected chi-square on 1 df). Table number and
// wording are quoted from memory; the four counts and 17.36 are the values checked.
// The exact two-sided p is not in the book; it is checked against an exact rational sum below.
const exactTwoSided = (b: number, c: number): number => {
  const n = b + c;
  const x = Math.min(b, c);
  let term = 1n; // C(n, 0)
  let sum = 0n;
  for (let k = 0; k <= x; k++) {
    sum += term;
    term = (term * BigInt(n - k)) / BigInt(k + 1);
  }
  // 2·sum / 2^n, kept exact until the final division (scaled to 40 digits)
  const scale = 10n ** 40n;
  return Number((2n * sum * scale) / 2n ** BigInt(n)) / Number(scale);
};

describe("Agresti's McNemar example (Table 10.1)", () => {
  const t = mcnemar(150, 86);
  it('gives the published chi-square 17.36 from b = 150, c = 86', () => {
    expect(t.chi_square).toBeCloseTo(17.36, 2);
    expect(Math.sqrt(t.chi_square as number)).toBeCloseTo(4.17, 2);
  });
  it('gives the exact two-sided binomial p (exact rational arithmetic)', () => {
    const p = exactTwoSided(150, 86);
    expect(t.p / p).toBeCloseTo(1, 10);
    expect(t.p).toBeLessThan(0.0001);
  });
});
