import { fleissKappa } from '../../../src/analysis/fleiss-kappa';

// Fleiss JL (1971). Measuring nominal scale agreement among many raters. Psychological
// Bulletin 76:378-382, Table 1: 30 patients, each diagnosed by 6 of the psychiatrists into
// 5 categories (1 depression, 2 personality disorder, 3 schizophrenia, 4 neurosis, 5 other).
// Published: κ = 0.430. The paper gives counts per category; the rater-wise form below is the
// one distributed with R package irr (dataset `diagnoses`) and quoted in statsmodels 0.14's
// test_inter_rater.py, where irr's kappam.fleiss(diagnoses) gives 0.4302445.
const diagnoses = [
  [4, 4, 4, 4, 4, 4], [2, 2, 2, 5, 5, 5], [2, 3, 3, 3, 3, 5], [5, 5, 5, 5, 5, 5], [2, 2, 2, 4, 4, 4],
  [1, 1, 3, 3, 3, 3], [3, 3, 3, 3, 5, 5], [1, 1, 3, 3, 3, 4], [1, 1, 4, 4, 4, 4], [5, 5, 5, 5, 5, 5],
  [1, 4, 4, 4, 4, 4], [1, 2, 4, 4, 4, 4], [2, 2, 2, 3, 3, 3], [1, 4, 4, 4, 4, 4], [2, 2, 4, 4, 4, 5],
  [3, 3, 3, 3, 3, 5], [1, 1, 1, 4, 5, 5], [1, 1, 1, 1, 1, 2], [2, 2, 4, 4, 4, 4], [1, 3, 3, 5, 5, 5],
  [5, 5, 5, 5, 5, 5], [2, 4, 4, 4, 4, 4], [2, 2, 4, 5, 5, 5], [1, 1, 4, 4, 4, 4], [1, 4, 4, 4, 4, 5],
  [2, 2, 2, 2, 2, 4], [1, 1, 1, 1, 5, 5], [2, 2, 4, 4, 4, 4], [1, 3, 3, 3, 3, 3], [5, 5, 5, 5, 5, 5],
];
const counts = diagnoses.map((ratings) => [1, 2, 3, 4, 5].map((c) => ratings.filter((r) => r === c).length));

describe('Fleiss (1971) Table 1', () => {
  it('has the category totals of the paper (p_j = 0.144, 0.144, 0.167, 0.306, 0.239)', () => {
    const totals = [0, 1, 2, 3, 4].map((j) => counts.reduce((s, row) => s + (row[j] as number), 0));
    expect(totals).toEqual([26, 26, 30, 55, 43]);
  });
  it('gives the published κ = 0.430 (irr: 0.4302445)', () => {
    expect(fleissKappa(counts)).toBeCloseTo(0.430, 3);
    expect(fleissKappa(counts)).toBeCloseTo(0.4302445, 7);
  });
});
