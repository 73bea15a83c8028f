import { cohenKappa, cohenKappaTable } from '../../../src/analysis/cohen-kappa';

describe('cohenKappa', () => {
  it('matches a hand count on a 2x2 table', () => {
    // po = 0.75, pe = 0.5·0.25 + 0.5·0.75 = 0.5, so κ = 0.5
    expect(cohenKappa([1, 1, 0, 0], [1, 0, 0, 0]).estimate).toBeCloseTo(0.5, 12);
  });
  it('matches the SAS worked example quoted in statsmodels 0.14 tests (test_inter_rater.py, table10)', () => {
    // SAS PROC FREQ printout: Kappa 0.4842, ASE 0.1380, ASE under H0 0.1484 (4 decimals as printed)
    const k = cohenKappaTable([[0, 4, 1], [0, 8, 0], [0, 1, 5]]);
    expect(k.estimate).toBeCloseTo(0.4842, 4);
    expect(k.se).toBeCloseTo(0.138, 4);
    expect(k.se0).toBeCloseTo(0.1484, 4);
  });
  it('gives nulls when both raters are constant and equal, or n = 0', () => {
    expect(cohenKappa([1, 1], [1, 1]).estimate).toBeNull();
    expect(cohenKappa([], []).se).toBeNull();
  });
  it('refuses a ragged table or bad values', () => {
    expect(() => cohenKappaTable([[1, 2], [3]])).toThrow(/row 1 has 1 cells/);
    expect(() => cohenKappa([1, 2], [1, 0])).toThrow(/index 1/);
  });
});
