import { fleissKappa } from '../../../src/analysis/fleiss-kappa';

describe('fleissKappa', () => {
  it('matches the 10 subjects x 14 raters worked example of the Wikipedia "Fleiss\' kappa" page', () => {
    // Also statsmodels 0.14 test_inter_rater.py::test_fleiss_kappa (0.210 to 3 decimals);
    // 0.20993070442195522 is the full value that formula gives (computed, not published).
    const t = [[0, 0, 0, 0, 14], [0, 2, 6, 4, 2], [0, 0, 3, 5, 6], [0, 3, 9, 2, 0], [2, 2, 8, 1, 1],
      [7, 7, 0, 0, 0], [3, 2, 6, 3, 0], [2, 5, 3, 2, 2], [6, 5, 2, 1, 0], [0, 2, 2, 3, 7]];
    expect(fleissKappa(t)).toBeCloseTo(0.210, 3);
  });
  it('is 1 for perfect agreement and null when undefined', () => {
    expect(fleissKappa([[3, 0], [0, 3]])).toBe(1);
    expect(fleissKappa([[3, 0], [3, 0]])).toBeNull();
    expect(fleissKappa([])).toBeNull();
  });
  it('refuses subjects with different rater counts', () => {
    expect(() => fleissKappa([[3, 0], [1, 1]])).toThrow(/subject 1 has 2 ratings/);
  });
});
